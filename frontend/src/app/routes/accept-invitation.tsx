import { useNavigate, useSearchParams } from 'react-router';
import { AcceptInvitation } from '../../features/auth/components/accept-invitation-form';
import { AuthFrame } from '../shell/auth-frame';

export function AcceptInvitationRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token') ?? '';

  return (
    <AuthFrame title="Join Understudy" subtitle="You have been invited. Tell us your name and choose a password to finish.">
      <title>Join Understudy</title>
      <AcceptInvitation token={token} onAccepted={() => void navigate('/', { replace: true })} />
    </AuthFrame>
  );
}
