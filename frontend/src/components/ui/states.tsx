import type { ReactNode } from 'react';
import { Button } from './button';
import { cx } from './cx';
import { Spinner } from './spinner';

export function LoadingState({ label = 'Loading…', className }: { label?: string; className?: string }) {
  return (
    <div role="status" className={cx('flex items-center justify-center gap-2 py-10 text-sm text-ink-soft', className)}>
      <Spinner className="size-5 text-copper" />
      <span>{label}</span>
    </div>
  );
}

export function FullPageLoading({ label = 'Loading Understudy…' }: { label?: string }) {
  return (
    <div className="flex min-h-dvh items-center justify-center bg-paper">
      <LoadingState label={label} />
    </div>
  );
}

export function EmptyState({
  title,
  children,
  action,
  className,
}: {
  title: ReactNode;
  children?: ReactNode;
  action?: ReactNode;
  className?: string;
}) {
  return (
    <div className={cx('flex flex-col items-center gap-2 rounded-lg border border-dashed border-rule-strong px-6 py-10 text-center', className)}>
      <svg aria-hidden="true" viewBox="0 0 48 24" className="h-6 w-12 text-rule-strong">
        <path d="M2 12h10l4-8 6 16 6-16 6 16 4-8h8" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" strokeLinecap="round" />
      </svg>
      <p className="font-semibold text-ink">{title}</p>
      {children && <div className="max-w-prose text-sm text-ink-soft">{children}</div>}
      {action && <div className="mt-2">{action}</div>}
    </div>
  );
}

export function ErrorState({
  title = 'This could not be loaded',
  message,
  onRetry,
  className,
}: {
  title?: ReactNode;
  message: ReactNode;
  onRetry?: () => void;
  className?: string;
}) {
  return (
    <div role="alert" className={cx('flex flex-col items-start gap-2 rounded-lg border border-danger/30 bg-danger-wash px-5 py-4', className)}>
      <p className="font-semibold text-danger">{title}</p>
      <p className="text-sm text-ink">{message}</p>
      {onRetry && (
        <Button variant="secondary" size="sm" onClick={onRetry} className="mt-1">
          Try again
        </Button>
      )}
    </div>
  );
}
