import { EntitySchema } from 'typeorm';

/** A colleague a BOM is shared with, read-only. */
export interface BomShare {
  bomId: string;
  userId: string;
  createdAt: Date;
}

export const BomShareEntity = new EntitySchema<BomShare>({
  name: 'BomShare',
  tableName: 'bom_shares',
  columns: {
    bomId: { type: 'uuid', name: 'bom_id', primary: true },
    userId: { type: 'uuid', name: 'user_id', primary: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
  },
});
