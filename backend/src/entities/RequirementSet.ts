import { EntitySchema } from 'typeorm';
import type { PositionRequirements } from '@understudy/shared-types';

/** A named position of a design with its circuit requirements, kept so it can be ranked again later. */
export interface RequirementSet {
  id: string;
  ownerId: string;
  name: string;
  design: string;
  requirements: PositionRequirements;
  createdAt: Date;
  updatedAt: Date;
}

export const RequirementSetEntity = new EntitySchema<RequirementSet>({
  name: 'RequirementSet',
  tableName: 'requirement_sets',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    ownerId: { type: 'uuid', name: 'owner_id' },
    name: { type: 'varchar', length: 120 },
    design: { type: 'varchar', length: 120 },
    requirements: { type: 'jsonb' },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
  },
});
