import { useQueryClient } from '@tanstack/react-query';
import { Navigate, Outlet, useLocation } from 'react-router';
import { Button, FullPageLoading, Wordmark } from '../../components/ui';
import { useMe } from '../../features/auth/api/get-me';
import { endedBySignOut } from '../../features/auth/api/sign-out';
import { AppShell } from '../shell/app-shell';

export function signInPathFor(location: { pathname: string; search: string }): string {
  const here = `${location.pathname}${location.search}`;
  return here === '/' ? '/sign-in' : `/sign-in?next=${encodeURIComponent(here)}`;
}

/** Everything inside needs a signed-in person; others are sent to sign in and brought back afterwards. */
export function ProtectedLayout() {
  const me = useMe();
  const location = useLocation();
  const queryClient = useQueryClient();

  if (me.isPending) return <FullPageLoading />;
  if (me.isError) {
    return (
      <div className="flex min-h-dvh flex-col items-center justify-center gap-4 bg-paper px-4 text-center">
        <Wordmark />
        <div role="alert" className="max-w-md">
          <h1 className="text-xl font-bold text-ink">Understudy cannot reach its server</h1>
          <p className="mt-2 text-sm text-ink-soft">{me.error.message}</p>
        </div>
        <Button onClick={() => void me.refetch()} loading={me.isFetching}>
          Try again
        </Button>
      </div>
    );
  }
  if (!me.data) {
    if (endedBySignOut(queryClient)) return <Navigate to="/sign-in" replace state={{ notice: 'You are signed out.' }} />;
    return <Navigate to={signInPathFor(location)} replace />;
  }

  return (
    <AppShell user={me.data}>
      <Outlet />
    </AppShell>
  );
}
