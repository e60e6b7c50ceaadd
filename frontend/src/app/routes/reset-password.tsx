import { TokenSchema } from '@understudy/shared-types';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { Alert } from '../../components/ui';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';
import { AuthFrame } from '../shell/auth-frame';

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token') ?? '';
  const wellFormed = TokenSchema.safeParse(token).success;

  return (
    <AuthFrame title="Choose a new password" subtitle="Your other sessions are signed out once the new password is set.">
      <title>Choose a new password · Understudy</title>
      <div className="flex flex-col gap-6">
        {wellFormed ? (
          <ResetPasswordForm
            token={token}
            onDone={() =>
              void navigate('/sign-in', {
                replace: true,
                state: { notice: 'Your password has been changed. Sign in with the new one.' },
              })
            }
          />
        ) : (
          <Alert tone="error" title="This reset link is incomplete">
            Open the link from your e-mail again, or copy the whole address into the browser.
          </Alert>
        )}
        <Link to="/sign-in" className="text-sm font-semibold text-copper-deep underline-offset-2 hover:underline">
          Back to sign in
        </Link>
      </div>
    </AuthFrame>
  );
}
