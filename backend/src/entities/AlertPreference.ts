import { EntitySchema } from 'typeorm';
import type { AlertDelivery } from '@understudy/shared-types';

/** How a person wants alerts about their watched BOMs delivered; no row means the default, 'immediate'. */
export interface AlertPreference {
  userId: string;
  delivery: AlertDelivery;
  updatedAt: Date;
}

export const AlertPreferenceEntity = new EntitySchema<AlertPreference>({
  name: 'AlertPreference',
  tableName: 'alert_preferences',
  columns: {
    userId: { type: 'uuid', name: 'user_id', primary: true },
    delivery: { type: 'varchar', length: 16 },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
  },
});
