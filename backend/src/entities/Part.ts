import { EntitySchema } from 'typeorm';
import type { FamilyKey, Lifecycle, ParameterValue, RohsStatus } from '@understudy/shared-types';

export interface Part {
  id: string;
  family: FamilyKey;
  manufacturerId: string;
  partNumber: string;
  /** partNumberKey(partNumber): unique per manufacturer, and what typo-tolerant search matches against. */
  partNumberKey: string;
  description: string;
  lifecycle: Lifecycle;
  rohsStatus: RohsStatus;
  rohsNote: string;
  package: string;
  pinLayout: string | null;
  pinMap: Record<string, string>;
  /** { key: { min?, typ?, max?, value?, conditions? } } with numbers in SI base units. */
  parameters: Record<string, ParameterValue>;
  tags: string[];
  version: number;
  archived: boolean;
  createdAt: Date;
  updatedAt: Date;
}

export const PartEntity = new EntitySchema<Part>({
  name: 'Part',
  tableName: 'parts',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    family: { type: 'varchar', length: 24 },
    manufacturerId: { type: 'uuid', name: 'manufacturer_id' },
    partNumber: { type: 'varchar', length: 64, name: 'part_number' },
    partNumberKey: { type: 'varchar', length: 64, name: 'part_number_key' },
    description: { type: 'text' },
    lifecycle: { type: 'varchar', length: 16 },
    rohsStatus: { type: 'varchar', length: 16, name: 'rohs_status' },
    rohsNote: { type: 'text', name: 'rohs_note' },
    package: { type: 'varchar', length: 40 },
    pinLayout: { type: 'varchar', length: 48, name: 'pin_layout', nullable: true },
    pinMap: { type: 'jsonb', name: 'pin_map' },
    parameters: { type: 'jsonb' },
    tags: { type: 'text', array: true },
    version: { type: 'int' },
    archived: { type: 'boolean' },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
  },
});
