import { EntitySchema } from 'typeorm';
import type { EquivalentStatus } from '@understudy/shared-types';

/**
 * An editor's ruling on a pair of parts for a stated use. The pair is unordered, so it is stored ordered
 * (partA < partB) and one unique index on (partA, partB, lower(use)) catches a ruling made from either side.
 */
export interface Equivalent {
  id: string;
  partA: string;
  partB: string;
  status: EquivalentStatus;
  use: string;
  note: string;
  decidedById: string | null;
  createdAt: Date;
  updatedAt: Date;
}

export const EquivalentEntity = new EntitySchema<Equivalent>({
  name: 'Equivalent',
  tableName: 'equivalents',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    partA: { type: 'uuid', name: 'part_a' },
    partB: { type: 'uuid', name: 'part_b' },
    status: { type: 'varchar', length: 16 },
    use: { type: 'varchar', length: 200 },
    note: { type: 'text' },
    decidedById: { type: 'uuid', name: 'decided_by', nullable: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
  },
});
