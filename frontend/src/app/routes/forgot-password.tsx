import { Link } from 'react-router';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';
import { AuthFrame } from '../shell/auth-frame';

export function ForgotPasswordRoute() {
  return (
    <AuthFrame title="Reset your password" subtitle="Enter your e-mail address and we will send you a link to choose a new password.">
      <title>Reset your password · Understudy</title>
      <div className="flex flex-col gap-6">
        <ForgotPasswordForm />
        <Link to="/sign-in" className="text-sm font-semibold text-copper-deep underline-offset-2 hover:underline">
          Back to sign in
        </Link>
      </div>
    </AuthFrame>
  );
}
