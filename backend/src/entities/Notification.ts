import { EntitySchema } from 'typeorm';

/** The BOMs a notice was about, as they were when it was written. */
export interface NotifiedBom {
  id: string;
  name: string;
  /** Lines of that BOM using the part (as matched or as the chosen replacement). */
  lines: number;
}

/**
 * One person's notice of one part change; unique per (user, change), which is what makes a repeated fan-out
 * add nothing. `emailedAt` is set once the mail (immediate or digest) is accepted by the mail server.
 */
export interface Notification {
  id: string;
  userId: string;
  changeId: string;
  title: string;
  body: string;
  boms: NotifiedBom[];
  readAt: Date | null;
  emailedAt: Date | null;
  createdAt: Date;
}

export const NotificationEntity = new EntitySchema<Notification>({
  name: 'Notification',
  tableName: 'notifications',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    userId: { type: 'uuid', name: 'user_id' },
    changeId: { type: 'uuid', name: 'change_id' },
    title: { type: 'varchar', length: 300 },
    body: { type: 'text' },
    boms: { type: 'jsonb' },
    readAt: { type: 'timestamptz', name: 'read_at', nullable: true },
    emailedAt: { type: 'timestamptz', name: 'emailed_at', nullable: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
  },
});
