import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { EquivalentBodySchema, EquivalentUpdateBodySchema, IdParamsSchema } from '@understudy/shared-types';
import { authorize } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import type { JobQueue } from '../../queue/job-queue';
import { createEquivalent, deleteEquivalent, listEquivalents, updateEquivalent } from './equivalents.service';

/** Mounted at /api: a part's rulings live under the part, the rulings themselves under /equivalents. */
export function equivalentsRouter(db: DataSource, queue: JobQueue): Router {
  const router = Router();

  router.get(
    '/parts/:id/equivalents',
    authorize('read', 'Equivalent'),
    ...validate({ params: IdParamsSchema }, async ({ params }, _req, res) => {
      res.json({ items: await listEquivalents(db, params.id) });
    }),
  );

  router.post(
    '/equivalents',
    authorize('create', 'Equivalent'),
    ...validate({ body: EquivalentBodySchema }, async ({ body }, req, res) => {
      res.status(201).json(await createEquivalent(db, queue, req.user!.id, body));
    }),
  );

  router.patch(
    '/equivalents/:id',
    authorize('update', 'Equivalent'),
    ...validate({ params: IdParamsSchema, body: EquivalentUpdateBodySchema }, async ({ params, body }, req, res) => {
      res.json(await updateEquivalent(db, queue, req.user!.id, params.id, body));
    }),
  );

  router.delete(
    '/equivalents/:id',
    authorize('delete', 'Equivalent'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      await deleteEquivalent(db, req.user!.id, params.id);
      res.status(204).end();
    }),
  );

  return router;
}
