import { EntitySchema } from 'typeorm';
import type { DatasheetExtraction, DatasheetStatus } from '@understudy/shared-types';

export interface Datasheet {
  id: string;
  /** Hex SHA-256 of the file: the same bytes are stored once. */
  sha256: string;
  fileName: string;
  byteSize: number;
  pageCount: number;
  /** Where the storage backend keeps the bytes. */
  storageKey: string;
  status: DatasheetStatus;
  failureReason: string | null;
  extraction: DatasheetExtraction | null;
  partId: string | null;
  uploadedById: string | null;
  createdAt: Date;
  updatedAt: Date;
  parsedAt: Date | null;
  appliedAt: Date | null;
}

export const DatasheetEntity = new EntitySchema<Datasheet>({
  name: 'Datasheet',
  tableName: 'datasheets',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    sha256: { type: 'char', length: 64 },
    fileName: { type: 'varchar', length: 255, name: 'file_name' },
    byteSize: { type: 'int', name: 'byte_size' },
    pageCount: { type: 'int', name: 'page_count' },
    storageKey: { type: 'varchar', length: 200, name: 'storage_key' },
    status: { type: 'varchar', length: 16 },
    failureReason: { type: 'text', name: 'failure_reason', nullable: true },
    extraction: { type: 'jsonb', nullable: true },
    partId: { type: 'uuid', name: 'part_id', nullable: true },
    uploadedById: { type: 'uuid', name: 'uploaded_by', nullable: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
    parsedAt: { type: 'timestamptz', name: 'parsed_at', nullable: true },
    appliedAt: { type: 'timestamptz', name: 'applied_at', nullable: true },
  },
});
