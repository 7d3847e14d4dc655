import { AuthLayout } from '@/components/layouts/auth-layout';
import { GuestOnly } from '@/features/auth/components/guest-only';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { WaitingLogsSignInNotice } from '@/features/daily-log/components/waiting-logs-sign-in-notice';

export function SignInRoute() {
  return (
    <GuestOnly>
      <AuthLayout title="Sign in" description="Welcome back. Sign in to your company's workspace.">
        <WaitingLogsSignInNotice />
        <SignInForm />
      </AuthLayout>
    </GuestOnly>
  );
}
