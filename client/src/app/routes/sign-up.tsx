import { AuthLayout } from '@/components/layouts/auth-layout';
import { GuestOnly } from '@/features/auth/components/guest-only';
import { SignUpForm } from '@/features/auth/components/sign-up-form';

export function SignUpRoute() {
  return (
    <GuestOnly>
      <AuthLayout
        title="Set up your company"
        description="You will be the company's owner. You can invite estimators and crew leads next."
      >
        <SignUpForm />
      </AuthLayout>
    </GuestOnly>
  );
}
