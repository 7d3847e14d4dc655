import { useNavigate, useParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout';
import { paths } from '@/config/paths';
import { AcceptInviteForm } from '@/features/auth/components/accept-invite-form';

export function AcceptInviteRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  return (
    <AuthLayout
      title="Join your team"
      description="Choose your name and a password to get started."
    >
      <AcceptInviteForm
        token={token}
        onAccepted={() => navigate(paths.home.getHref(), { replace: true })}
      />
    </AuthLayout>
  );
}
