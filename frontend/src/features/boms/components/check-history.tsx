import type { BomCheckDto } from '@understudy/shared-types';
import { Card, SectionHeading } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { plural } from '../lib/lines';

const TRIGGER_LABELS: Record<BomCheckDto['trigger'], string> = {
  upload: 'Uploaded',
  manual: 'Checked again',
  change: 'A part changed',
};

const SHOWN_CHANGES = 5;

/** Every check of the BOM, newest first: when, who or what started it, what it found and what moved since the last. */
export function CheckHistory({ checks }: { checks: BomCheckDto[] }) {
  const newestFirst = [...checks].sort((a, b) => b.checkedAt.localeCompare(a.checkedAt));
  return (
    <Card aria-labelledby="bom-history-title">
      <SectionHeading id="bom-history-title">History of checks</SectionHeading>
      {newestFirst.length === 0 ? (
        <p className="px-5 py-4 text-sm text-ink-soft">Not checked yet.</p>
      ) : (
        <ol aria-labelledby="bom-history-title" className="divide-y divide-rule">
          {newestFirst.map((check) => (
            <li key={check.id} className="flex flex-col gap-1 px-5 py-3">
              <p className="flex flex-wrap items-baseline gap-x-2 text-sm">
                <span className="font-semibold text-ink">{TRIGGER_LABELS[check.trigger]}</span>
                <time dateTime={check.checkedAt} className="text-ink-soft">
                  {formatDateTime(check.checkedAt)}
                </time>
                <span className="text-ink-faint">
                  {check.checkedBy ? `by ${check.checkedBy.name}` : 'by Understudy'}
                </span>
              </p>
              <p className="text-sm text-ink">{check.summary.text}</p>
              {check.changes.length > 0 ? (
                <details className="text-sm" open={check.changes.length <= SHOWN_CHANGES}>
                  <summary className="cursor-pointer font-semibold text-copper-deep">{plural(check.changes.length, 'change')} since the check before</summary>
                  <ul className="mt-1 flex max-h-60 flex-col gap-0.5 overflow-y-auto pl-4 text-ink-soft">
                    {check.changes.map((change, i) => (
                      <li key={i} className="list-disc">
                        {change}
                      </li>
                    ))}
                  </ul>
                </details>
              ) : (
                check.trigger !== 'upload' && <p className="text-xs text-ink-faint">No line changed status.</p>
              )}
            </li>
          ))}
        </ol>
      )}
    </Card>
  );
}
