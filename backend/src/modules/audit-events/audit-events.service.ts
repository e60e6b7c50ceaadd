import type { DataSource, EntityManager } from 'typeorm';
import { AuditEventEntity } from '../../entities';
import type { AuditEventDto } from '@understudy/shared-types';

export interface AuditInput {
  actorId: string | null;
  action: string;
  subjectType: string;
  subjectId?: string | null;
  before?: Record<string, unknown> | null;
  after?: Record<string, unknown> | null;
}

/** Writes through the caller's transaction manager when given one, so the event and the change commit together. */
export async function recordAudit(db: DataSource | EntityManager, input: AuditInput): Promise<void> {
  await db.getRepository(AuditEventEntity).insert({
    actorId: input.actorId,
    action: input.action,
    subjectType: input.subjectType,
    subjectId: input.subjectId ?? null,
    // jsonb columns: TypeORM's deep-partial type cannot describe arbitrary records.
    before: (input.before ?? null) as never,
    after: (input.after ?? null) as never,
  });
}

export async function listAuditEvents(db: DataSource, limit = 200): Promise<AuditEventDto[]> {
  const rows = await db
    .getRepository(AuditEventEntity)
    .createQueryBuilder('e')
    .leftJoin('users', 'u', 'u.id = e.actor_id')
    .select(['e.id', 'e.actorId', 'e.action', 'e.subjectType', 'e.subjectId', 'e.before', 'e.after', 'e.createdAt'])
    .addSelect('u.email', 'actor_email')
    .orderBy('e.created_at', 'DESC')
    .limit(limit)
    .getRawAndEntities();
  return rows.entities.map((e, i) => ({
    id: e.id,
    actorId: e.actorId,
    actorEmail: (rows.raw[i] as { actor_email: string | null }).actor_email ?? null,
    action: e.action,
    subjectType: e.subjectType,
    subjectId: e.subjectId,
    before: e.before,
    after: e.after,
    createdAt: e.createdAt.toISOString(),
  }));
}
