import { EntitySchema } from 'typeorm';

export interface Manufacturer {
  id: string;
  name: string;
  createdAt: Date;
}

export const ManufacturerEntity = new EntitySchema<Manufacturer>({
  name: 'Manufacturer',
  tableName: 'manufacturers',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    name: { type: 'varchar', length: 120 },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
  },
});
