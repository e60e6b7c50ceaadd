import { cx } from './cx';

const WAVE = 'M4 14c2.4 0 3-6 5.5-6s3 6 5.5 6 3-6 5.5-6 3 6 5.5 6';

/**
 * The Understudy mark: a signal and its stand-in — a solid wave with a dashed wave a step behind it,
 * the way a substitute part shadows the original.
 */
export function LogoMark({ className, inverted = false }: { className?: string; inverted?: boolean }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" className={cx('size-8', className)}>
      <rect x="1" y="1" width="30" height="30" rx="7" className={inverted ? 'fill-paper/10' : 'fill-ink'} />
      <path
        d={WAVE}
        fill="none"
        strokeWidth="2"
        strokeLinecap="round"
        strokeDasharray="2 2.6"
        transform="translate(2 5)"
        className="stroke-paper/55"
      />
      <path d={WAVE} fill="none" strokeWidth="2.6" strokeLinecap="round" strokeLinejoin="round" className="stroke-copper-bright" />
    </svg>
  );
}

export function Wordmark({
  className,
  inverted = false,
  compact = false,
}: {
  className?: string;
  inverted?: boolean;
  /** Hides the name on narrow screens, keeping the mark. */
  compact?: boolean;
}) {
  return (
    <span className={cx('inline-flex items-center gap-2.5', className)}>
      <LogoMark inverted={inverted} />
      <span className={cx('text-lg font-bold tracking-tight', inverted ? 'text-paper' : 'text-ink', compact && 'sr-only sm:not-sr-only')}>
        Understudy
      </span>
    </span>
  );
}
