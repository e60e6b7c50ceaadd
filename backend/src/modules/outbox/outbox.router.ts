import { Router } from 'express';
import { OutboxListResponseSchema } from '@understudy/shared-types';
import type { AppConfig } from '../../config';
import { DomainError, NotFoundError } from '../../errors';
import { authorize } from '../../middleware/authenticate';

/** Development-only window on the local fake mail server, so invitation and reset links can be followed. */
export function outboxRouter(config: AppConfig): Router {
  const router = Router();
  router.get('/', authorize('read', 'Outbox'), async (_req, res) => {
    if (config.env === 'production' || !config.fakeMailApiUrl) {
      throw new NotFoundError('The outbox exists only in development, with the local mail server.', 'outbox_unavailable');
    }
    const response = await fetch(`${config.fakeMailApiUrl}/messages`).catch(() => null);
    if (!response?.ok) throw new DomainError(502, 'mail_server_unreachable', 'The local mail server is not answering.');
    res.json(OutboxListResponseSchema.parse(await response.json()));
  });
  return router;
}
