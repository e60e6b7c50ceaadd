import { isRouteErrorResponse, useRouteError } from 'react-router';
import { Button, Wordmark } from '../../components/ui';

/** Shown when a page throws or its code fails to load (often a stale tab after a new release). */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : undefined;

  if (import.meta.env.DEV && error) console.error(error);

  return (
    <div className="flex min-h-dvh flex-col items-center justify-center gap-6 bg-paper px-4 text-center">
      <title>Something went wrong · Understudy</title>
      <Wordmark />
      <div role="alert" className="flex max-w-md flex-col items-center gap-3">
        <h1 className="text-2xl font-bold tracking-tight text-ink">Something went wrong on this page</h1>
        <p className="text-sm text-ink-soft">
          Understudy hit a problem it could not recover from. Reloading usually fixes it; your saved work is safe.
        </p>
        {detail && <p className="rounded bg-paper-deep px-2 py-1 font-mono text-xs text-ink-soft">{detail}</p>}
      </div>
      <div className="flex gap-2">
        <Button onClick={() => window.location.reload()}>Reload the page</Button>
        <a href="/" className="inline-flex h-10 items-center rounded-md px-4 text-sm font-semibold text-copper-deep hover:underline">
          Go to Home
        </a>
      </div>
    </div>
  );
}
