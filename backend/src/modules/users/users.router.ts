import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { IdParamsSchema, UserUpdateBodySchema } from '@understudy/shared-types';
import { authorize } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import { presentUser } from './users.presenter';
import { listUsers, updateUser } from './users.service';

export function usersRouter(db: DataSource): Router {
  const router = Router();
  router.get('/', authorize('read', 'User'), async (_req, res) => {
    res.json({ items: (await listUsers(db)).map(presentUser) });
  });
  router.patch(
    '/:id',
    authorize('update', 'User'),
    ...validate({ params: IdParamsSchema, body: UserUpdateBodySchema }, async ({ params, body }, req, res) => {
      res.json(presentUser(await updateUser(db, req.user!, params.id, body)));
    }),
  );
  return router;
}
