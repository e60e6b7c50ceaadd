import { EntitySchema } from 'typeorm';
import type { BomSummary, LineStatus } from '@understudy/shared-types';

export type BomCheckTrigger = 'upload' | 'manual' | 'change';

/** One evaluation of a BOM, kept as it was: the summary, what changed since the one before, each line's status. */
export interface BomCheck {
  id: string;
  bomId: string;
  checkedAt: Date;
  checkedById: string | null;
  trigger: BomCheckTrigger;
  summary: BomSummary;
  changes: string[];
  /** Status per line position, so the next check can say which lines changed. */
  lineStatuses: LineStatus[];
  durationMs: number;
}

export const BomCheckEntity = new EntitySchema<BomCheck>({
  name: 'BomCheck',
  tableName: 'bom_checks',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    bomId: { type: 'uuid', name: 'bom_id' },
    checkedAt: { type: 'timestamptz', name: 'checked_at', createDate: true },
    checkedById: { type: 'uuid', name: 'checked_by', nullable: true },
    trigger: { type: 'varchar', length: 8 },
    summary: { type: 'jsonb' },
    changes: { type: 'jsonb' },
    lineStatuses: { type: 'jsonb', name: 'line_statuses' },
    durationMs: { type: 'int', name: 'duration_ms' },
  },
});
