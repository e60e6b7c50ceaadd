import { cx } from './cx';

/**
 * A horizontal progress bar. Without `value` it is indeterminate (no aria-valuenow), e.g. while a server works.
 * `label` is its accessible name; `valueText` what a screen reader says instead of the bare percentage.
 */
export function ProgressBar({
  value,
  max = 100,
  label,
  valueText,
  tone = 'accent',
  className,
}: {
  value?: number;
  max?: number;
  label: string;
  valueText?: string;
  tone?: 'accent' | 'ok' | 'danger';
  className?: string;
}) {
  const known = value !== undefined && Number.isFinite(value);
  const clamped = known ? Math.min(max, Math.max(0, value)) : 0;
  const percent = max > 0 ? (clamped / max) * 100 : 0;
  return (
    <div
      role="progressbar"
      aria-label={label}
      aria-valuemin={0}
      aria-valuemax={max}
      aria-valuenow={known ? Math.round(clamped) : undefined}
      aria-valuetext={valueText}
      className={cx('h-1.5 w-full overflow-hidden rounded-full bg-paper-deep', className)}
    >
      <div
        className={cx(
          'h-full rounded-full transition-[width] duration-200 motion-reduce:transition-none',
          tone === 'ok' ? 'bg-ok' : tone === 'danger' ? 'bg-danger' : 'bg-copper',
          !known && 'w-1/3 animate-pulse',
        )}
        style={known ? { width: `${percent}%` } : undefined}
      />
    </div>
  );
}
