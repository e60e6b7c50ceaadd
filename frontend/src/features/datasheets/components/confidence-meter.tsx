import { cx } from '../../../components/ui';
import { CONFIDENCE_WORDS, confidenceLevel } from '../lib/proposals';

const BAR = { high: 'bg-ok', medium: 'bg-warn', low: 'bg-danger' } as const;

/** A small meter and the words for it, so the level does not depend on colour alone. */
export function ConfidenceMeter({ confidence, className }: { confidence: number; className?: string }) {
  const level = confidenceLevel(confidence);
  const percent = Math.round(confidence * 100);
  return (
    <span className={cx('inline-flex items-center gap-1.5 text-xs text-ink-soft', className)}>
      <meter
        min={0}
        max={1}
        low={0.5}
        high={0.8}
        optimum={1}
        value={confidence}
        aria-label={`${CONFIDENCE_WORDS[level]}, ${percent} %`}
        className="sr-only"
      />
      <span aria-hidden="true" className="h-1.5 w-12 overflow-hidden rounded-full bg-paper-deep">
        <span className={cx('block h-full rounded-full', BAR[level])} style={{ width: `${percent}%` }} />
      </span>
      <span>
        {CONFIDENCE_WORDS[level]} <span className="tabular-nums text-ink-faint">({percent} %)</span>
      </span>
    </span>
  );
}
