import { EntitySchema } from 'typeorm';
import type { BomField } from '@understudy/shared-types';

/** The column mapping a person last confirmed, so the next file from the same tool maps itself. */
export interface BomMappingMemory {
  userId: string;
  byHeader: Partial<Record<BomField, string>>;
  byIndex: Partial<Record<BomField, number>>;
  updatedAt: Date;
}

export const BomMappingMemoryEntity = new EntitySchema<BomMappingMemory>({
  name: 'BomMappingMemory',
  tableName: 'bom_mapping_memory',
  columns: {
    userId: { type: 'uuid', name: 'user_id', primary: true },
    byHeader: { type: 'jsonb', name: 'by_header' },
    byIndex: { type: 'jsonb', name: 'by_index' },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
  },
});
