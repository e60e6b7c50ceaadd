import { EntitySchema } from 'typeorm';
import type { BomDelimiter, BomMapping, BomSummary } from '@understudy/shared-types';

/** A saved bill of materials: how its text was read, and the summary of its latest evaluation. */
export interface Bom {
  id: string;
  ownerId: string;
  name: string;
  fileName: string | null;
  encoding: string;
  delimiter: BomDelimiter;
  hasHeader: boolean;
  /** Header texts, or "Column 1"… for a file without a header row. */
  columns: string[];
  mapping: BomMapping;
  watched: boolean;
  lineCount: number;
  /** As last computed (on save, on every check, on every read of the detail), so the list needs no re-evaluation. */
  summary: BomSummary | null;
  lastCheckedAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
}

export const BomEntity = new EntitySchema<Bom>({
  name: 'Bom',
  tableName: 'boms',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    ownerId: { type: 'uuid', name: 'owner_id' },
    name: { type: 'varchar', length: 120 },
    fileName: { type: 'varchar', length: 255, name: 'file_name', nullable: true },
    encoding: { type: 'varchar', length: 40 },
    delimiter: { type: 'varchar', length: 1 },
    hasHeader: { type: 'boolean', name: 'has_header' },
    columns: { type: 'jsonb' },
    mapping: { type: 'jsonb' },
    watched: { type: 'boolean', default: true },
    lineCount: { type: 'int', name: 'line_count' },
    summary: { type: 'jsonb', nullable: true },
    lastCheckedAt: { type: 'timestamptz', name: 'last_checked_at', nullable: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
  },
});
