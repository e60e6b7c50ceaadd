import type { ReactNode } from 'react';
import { cx } from './cx';

type Tone = 'info' | 'success' | 'warning' | 'error';

const TONES: Record<Tone, string> = {
  info: 'border-ink/15 bg-paper-deep text-ink',
  success: 'border-ok/30 bg-ok-wash text-ok',
  warning: 'border-warn/30 bg-warn-wash text-warn',
  error: 'border-danger/30 bg-danger-wash text-danger',
};

export function Alert({
  tone = 'info',
  title,
  children,
  className,
}: {
  tone?: Tone;
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
}) {
  // Errors interrupt; everything else is announced politely.
  const role = tone === 'error' ? 'alert' : 'status';
  return (
    <div role={role} className={cx('rounded-md border px-4 py-3 text-sm', TONES[tone], className)}>
      {title && <p className="font-semibold">{title}</p>}
      {children && <div className={cx(title ? 'mt-1' : undefined, 'text-ink/90')}>{children}</div>}
    </div>
  );
}
