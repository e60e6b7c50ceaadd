import { z } from 'zod';

export const AuditEventDtoSchema = z.object({
  id: z.uuid(),
  actorId: z.uuid().nullable(),
  actorEmail: z.string().nullable(),
  action: z.string(),
  subjectType: z.string(),
  subjectId: z.string().nullable(),
  before: z.record(z.string(), z.unknown()).nullable(),
  after: z.record(z.string(), z.unknown()).nullable(),
  createdAt: z.iso.datetime(),
});
export type AuditEventDto = z.infer<typeof AuditEventDtoSchema>;

export const AuditEventListResponseSchema = z.object({ items: z.array(AuditEventDtoSchema) });
export type AuditEventListResponse = z.infer<typeof AuditEventListResponseSchema>;
