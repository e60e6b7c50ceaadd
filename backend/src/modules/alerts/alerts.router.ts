import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { AlertPreferencesSchema, IdParamsSchema } from '@understudy/shared-types';
import { authorize } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import {
  getAlertPreferences,
  listNotifications,
  markAllNotificationsRead,
  markNotificationRead,
  setAlertPreferences,
} from './notifications.service';

const ListQuerySchema = z.object({ unread: z.enum(['0', '1', 'true', 'false']).optional() });

/** Mounted at /api: the signed-in person's notices, and how alerts reach them. */
export function alertsRouter(db: DataSource): Router {
  const router = Router();

  router.get(
    '/notifications',
    authorize('read', 'Notification'),
    ...validate({ query: ListQuerySchema }, async ({ query }, req, res) => {
      res.json(await listNotifications(db, req.user!.id, { unreadOnly: query.unread === '1' || query.unread === 'true' }));
    }),
  );

  router.post('/notifications/read-all', authorize('update', 'Notification'), async (req, res) => {
    await markAllNotificationsRead(db, req.user!.id);
    res.status(204).end();
  });

  router.post(
    '/notifications/:id/read',
    authorize('update', 'Notification'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      res.json(await markNotificationRead(db, req.ability, params.id));
    }),
  );

  router.get('/me/alert-preferences', authorize('read', 'Notification'), async (req, res) => {
    res.json(await getAlertPreferences(db, req.user!.id));
  });

  router.put(
    '/me/alert-preferences',
    authorize('update', 'Notification'),
    ...validate({ body: AlertPreferencesSchema }, async ({ body }, req, res) => {
      res.json(await setAlertPreferences(db, req.user!.id, body));
    }),
  );

  return router;
}
