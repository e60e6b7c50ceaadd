import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { IdParamsSchema, InvitationAcceptBodySchema, InvitationCreateBodySchema, TokenSchema } from '@understudy/shared-types';
import type { AppConfig } from '../../config';
import type { Mailer } from '../../mail/mailer';
import { authorize, publicRoute } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import { startSession } from '../auth/session';
import { presentCurrentUser } from '../users/users.presenter';
import { acceptInvitation, createInvitation, listInvitations, previewInvitation, revokeInvitation } from './invitations.service';

export function invitationsRouter(db: DataSource, mailer: Mailer, config: AppConfig): Router {
  const router = Router();
  router.get('/', authorize('read', 'Invitation'), async (_req, res) => {
    res.json({ items: await listInvitations(db) });
  });
  router.post(
    '/',
    authorize('create', 'Invitation'),
    ...validate({ body: InvitationCreateBodySchema }, async ({ body }, req, res) => {
      res.status(201).json(await createInvitation(db, mailer, config.appUrl, req.user!, body));
    }),
  );
  router.delete(
    '/:id',
    authorize('delete', 'Invitation'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      await revokeInvitation(db, req.user!, params.id);
      res.status(204).end();
    }),
  );
  router.get(
    '/preview',
    publicRoute,
    ...validate({ query: z.object({ token: TokenSchema }) }, async ({ query }, _req, res) => {
      res.json(await previewInvitation(db, query.token));
    }),
  );
  router.post(
    '/accept',
    publicRoute,
    ...validate({ body: InvitationAcceptBodySchema }, async ({ body }, req, res) => {
      const user = await acceptInvitation(db, body);
      await startSession(req, user.id);
      res.status(201).json({ user: presentCurrentUser(user) });
    }),
  );
  return router;
}
