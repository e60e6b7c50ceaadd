import type { BomSummary } from '@understudy/shared-types';
import { cx } from '../../../components/ui';
import { RISK_CATEGORIES, type RiskKey, type Tone } from '../lib/lines';

const TONE_CLASSES: Record<Tone, { idle: string; count: string }> = {
  neutral: { idle: 'border-rule', count: 'text-ink-soft' },
  accent: { idle: 'border-copper/30', count: 'text-copper-deep' },
  ok: { idle: 'border-ok/30', count: 'text-ok' },
  warning: { idle: 'border-warn/35', count: 'text-warn' },
  danger: { idle: 'border-danger/35', count: 'text-danger' },
  ink: { idle: 'border-ink/30', count: 'text-ink' },
};

/**
 * The BOM's risks as a row of counts. Each is a toggle that filters the lines to that risk; pressing it again
 * (or "All lines") shows everything. A zero stays visible, greyed, so the row reads the same on every BOM.
 */
export function RiskSummary({
  summary,
  active,
  onChange,
}: {
  summary: BomSummary;
  active: RiskKey | null;
  onChange: (key: RiskKey | null) => void;
}) {
  return (
    <div className="flex flex-col gap-2">
      <ul aria-label="Risks in this BOM" className="grid grid-cols-2 gap-2 sm:grid-cols-4 lg:grid-cols-8">
        <li>
          <button
            type="button"
            aria-pressed={active === null}
            onClick={() => onChange(null)}
            className={cx(
              'flex h-full w-full flex-col items-start rounded-md border bg-card px-3 py-2 text-left hover:border-ink',
              active === null ? 'border-ink shadow-[inset_0_-3px_0_var(--color-copper)]' : 'border-rule',
            )}
          >
            <span className="text-xl font-bold text-ink tabular-nums">{summary.lines.toLocaleString()}</span>{' '}
            <span className="text-xs font-semibold text-ink-soft">all lines</span>
          </button>
        </li>
        {RISK_CATEGORIES.map((c) => {
          const count = summary[c.key];
          const pressed = active === c.key;
          const tone = TONE_CLASSES[c.tone];
          return (
            <li key={c.key}>
              <button
                type="button"
                aria-pressed={pressed}
                data-risk={c.key}
                onClick={() => onChange(pressed ? null : c.key)}
                className={cx(
                  'flex h-full w-full flex-col items-start rounded-md border bg-card px-3 py-2 text-left hover:border-ink',
                  pressed ? 'border-ink shadow-[inset_0_-3px_0_var(--color-copper)]' : tone.idle,
                  count === 0 && !pressed && 'opacity-60',
                )}
              >
                <span className={cx('text-xl font-bold tabular-nums', count > 0 ? tone.count : 'text-ink-faint')}>
                  {count.toLocaleString()}
                </span>{' '}
                <span className="text-xs font-semibold text-ink-soft">{c.label}</span>
              </button>
            </li>
          );
        })}
      </ul>
      <p className="text-sm text-ink-soft">{summary.text}</p>
    </div>
  );
}
