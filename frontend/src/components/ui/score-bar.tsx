import { cx } from './cx';

/** Whole points, except that only a perfect match reads 100: 99.9 stays 99.9, so a small loss is never hidden. */
export function formatScore(score: number): string {
  const whole = Math.round(score);
  return whole === 100 && score < 100 ? (Math.floor(score * 10) / 10).toFixed(1) : String(whole);
}

/** The score out of 100 as a number with a bar behind it; the number is what is read out. */
export function ScoreBar({ score, className }: { score: number; className?: string }) {
  const pct = Math.max(0, Math.min(100, score));
  const tone = pct >= 75 ? 'bg-ok' : pct >= 50 ? 'bg-copper' : 'bg-danger';
  return (
    <span className={cx('inline-flex items-center gap-2', className)} data-score={formatScore(score)}>
      <span aria-hidden="true" className="relative h-2 w-14 overflow-hidden rounded-full bg-paper-deep">
        <span className={cx('absolute inset-y-0 left-0 rounded-full', tone)} style={{ width: `${pct}%` }} />
      </span>
      <span className="w-8 text-right font-semibold tabular-nums text-ink">
        {formatScore(score)}
        <span className="sr-only"> out of 100</span>
      </span>
    </span>
  );
}
