import { Link } from 'react-router';
import { EmptyState, FullPageLoading, buttonClasses } from '../../components/ui';
import { useMe } from '../../features/auth/api/get-me';
import { AppShell } from '../shell/app-shell';
import { AuthFrame } from '../shell/auth-frame';

function Missing({ signedIn }: { signedIn: boolean }) {
  return (
    <EmptyState
      title="There is nothing at this address"
      action={
        <Link to={signedIn ? '/' : '/sign-in'} className={buttonClasses('secondary')}>
          {signedIn ? 'Back to Home' : 'Go to sign in'}
        </Link>
      }
    >
      The link may be mistyped, or the page may have moved.
    </EmptyState>
  );
}

export function NotFoundRoute() {
  const me = useMe();
  if (me.isPending) return <FullPageLoading />;
  if (me.data) {
    return (
      <AppShell user={me.data}>
        <title>Page not found · Understudy</title>
        <h1 className="sr-only">Page not found</h1>
        <Missing signedIn />
      </AppShell>
    );
  }
  return (
    <AuthFrame title="Page not found">
      <title>Page not found · Understudy</title>
      <Missing signedIn={false} />
    </AuthFrame>
  );
}
