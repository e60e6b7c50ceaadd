import type { EquivalentDto } from '@understudy/shared-types';
import { Badge } from './badge';

/** An editor's ruling on the pair, as everyone sees it; the note rides along as a tooltip. */
export function EquivalentFlag({ equivalent }: { equivalent: Pick<EquivalentDto, 'status' | 'use' | 'note'> }) {
  const approved = equivalent.status === 'approved';
  return (
    <span title={equivalent.note || undefined} className="inline-flex">
      <Badge tone={approved ? 'ok' : 'danger'} className="gap-1 whitespace-normal!">
        <span aria-hidden="true">{approved ? '✓' : '✕'}</span>
        {approved ? 'Approved' : 'Rejected'} for {equivalent.use}
      </Badge>
    </span>
  );
}
