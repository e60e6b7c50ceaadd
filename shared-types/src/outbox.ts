import { z } from 'zod';

export const OutboxMessageSchema = z.object({
  id: z.string(),
  receivedAt: z.iso.datetime(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
});
export type OutboxMessage = z.infer<typeof OutboxMessageSchema>;

export const OutboxListResponseSchema = z.object({ items: z.array(OutboxMessageSchema) });
export type OutboxListResponse = z.infer<typeof OutboxListResponseSchema>;
