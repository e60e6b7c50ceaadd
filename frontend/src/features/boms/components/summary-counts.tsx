import type { BomSummary } from '@understudy/shared-types';
import { Badge } from '../../../components/ui';
import { RISK_CATEGORIES, plural } from '../lib/lines';

/** The summary as coloured counts for a list row: only what is wrong, or that all is well. */
export function SummaryCounts({ summary }: { summary: BomSummary }) {
  const shown = RISK_CATEGORIES.filter((c) => summary[c.key] > 0);
  return (
    <span className="flex flex-col gap-1" title={summary.text}>
      <span className="flex flex-wrap gap-1">
        {shown.length === 0 ? (
          <Badge tone="ok">{summary.lines === 0 ? 'No lines' : `All ${summary.lines.toLocaleString()} OK`}</Badge>
        ) : (
          shown.map((c) => (
            <Badge key={c.key} tone={c.tone}>
              {summary[c.key].toLocaleString()} {c.label}
            </Badge>
          ))
        )}
      </span>
      {summary.replaced > 0 && (
        <span className="text-xs text-ink-faint">{plural(summary.replaced, 'replacement')} chosen</span>
      )}
    </span>
  );
}
