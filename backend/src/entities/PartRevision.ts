import { EntitySchema } from 'typeorm';
import type { RevisionChange } from '@understudy/shared-types';

export interface PartRevision {
  id: string;
  partId: string;
  /** The part's version after this change. */
  version: number;
  actorId: string | null;
  /** 'created', 'edit', 'import', 'seed', 'datasheet'. */
  source: string;
  /** The datasheet a 'datasheet' revision applied. */
  datasheetId: string | null;
  changes: RevisionChange[];
  createdAt: Date;
}

export const PartRevisionEntity = new EntitySchema<PartRevision>({
  name: 'PartRevision',
  tableName: 'part_revisions',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    partId: { type: 'uuid', name: 'part_id' },
    version: { type: 'int' },
    actorId: { type: 'uuid', name: 'actor_id', nullable: true },
    source: { type: 'varchar', length: 80 },
    datasheetId: { type: 'uuid', name: 'datasheet_id', nullable: true },
    changes: { type: 'jsonb' },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
  },
});
