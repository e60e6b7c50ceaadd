import { EntitySchema } from 'typeorm';

export interface AuditEvent {
  id: string;
  actorId: string | null;
  action: string;
  subjectType: string;
  subjectId: string | null;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
  createdAt: Date;
}

export const AuditEventEntity = new EntitySchema<AuditEvent>({
  name: 'AuditEvent',
  tableName: 'audit_events',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    actorId: { type: 'uuid', name: 'actor_id', nullable: true },
    action: { type: 'varchar', length: 64 },
    subjectType: { type: 'varchar', length: 32, name: 'subject_type' },
    subjectId: { type: 'varchar', length: 64, name: 'subject_id', nullable: true },
    before: { type: 'jsonb', nullable: true },
    after: { type: 'jsonb', nullable: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
  },
});
