import { EntitySchema } from 'typeorm';
import type { PartChangeKind } from '@understudy/shared-types';

/**
 * Something that happened to a part which saved BOMs may care about, written in the same transaction as the change
 * itself. `before`/`after` keep what the alert has to say even if the part or ruling changes again later: the
 * lifecycle values, or for an approved equivalent the other part with its use and note.
 */
export interface PartChange {
  id: string;
  partId: string;
  kind: PartChangeKind;
  before: unknown;
  after: unknown;
  equivalentId: string | null;
  actorId: string | null;
  createdAt: Date;
}

/** `after` of an 'approved-equivalent' change. */
export interface ApprovedEquivalentChange {
  partId: string;
  partNumber: string;
  manufacturer: string;
  use: string;
  note: string;
}

export const PartChangeEntity = new EntitySchema<PartChange>({
  name: 'PartChange',
  tableName: 'part_changes',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    partId: { type: 'uuid', name: 'part_id' },
    kind: { type: 'varchar', length: 32 },
    before: { type: 'jsonb', nullable: true },
    after: { type: 'jsonb', nullable: true },
    equivalentId: { type: 'uuid', name: 'equivalent_id', nullable: true },
    actorId: { type: 'uuid', name: 'actor_id', nullable: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
  },
});
