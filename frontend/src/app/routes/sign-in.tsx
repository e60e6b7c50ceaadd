import { Navigate, useLocation, useNavigate, useSearchParams } from 'react-router';
import { Alert, FullPageLoading } from '../../components/ui';
import { useMe } from '../../features/auth/api/get-me';
import { DemoAccounts } from '../../features/auth/components/demo-accounts';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { safeNextPath } from '../../lib/format';
import { AuthFrame } from '../shell/auth-frame';

function noticeFrom(state: unknown): string | null {
  if (state && typeof state === 'object' && 'notice' in state && typeof state.notice === 'string') return state.notice;
  return null;
}

export function SignInRoute() {
  const [params] = useSearchParams();
  const location = useLocation();
  const navigate = useNavigate();
  const me = useMe();
  const next = safeNextPath(params.get('next'));
  const notice = noticeFrom(location.state);

  if (me.isPending) return <FullPageLoading />;
  if (me.data) return <Navigate to={next} replace />;

  return (
    <AuthFrame title="Sign in to Understudy" subtitle="Use the e-mail address your invitation was sent to.">
      <title>Sign in · Understudy</title>
      <div className="flex flex-col gap-6">
        {notice && <Alert tone="success">{notice}</Alert>}
        {params.has('next') && !notice && <Alert tone="info">Sign in to continue to that page.</Alert>}
        <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
        <DemoAccounts />
      </div>
    </AuthFrame>
  );
}
