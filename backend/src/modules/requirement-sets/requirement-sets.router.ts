import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { IdParamsSchema, RequirementSetBodySchema, RequirementSetUpdateBodySchema } from '@understudy/shared-types';
import { authorize } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import { rankPosition } from '../alternates/alternates.service';
import {
  createRequirementSet,
  deleteRequirementSet,
  getRequirementSet,
  listRequirementSets,
  updateRequirementSet,
} from './requirement-sets.service';

export function requirementSetsRouter(db: DataSource): Router {
  const router = Router();

  router.get('/', authorize('read', 'Requirement'), async (req, res) => {
    res.json({ items: await listRequirementSets(db, req.ability, req.user!.id) });
  });

  router.post(
    '/',
    authorize('create', 'Requirement'),
    ...validate({ body: RequirementSetBodySchema }, async ({ body }, req, res) => {
      res.status(201).json(await createRequirementSet(db, req.user!.id, body));
    }),
  );

  router.get(
    '/:id',
    authorize('read', 'Requirement'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      res.json(await getRequirementSet(db, req.ability, params.id));
    }),
  );

  router.get(
    '/:id/results',
    authorize('read', 'Requirement'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      const set = await getRequirementSet(db, req.ability, params.id);
      res.json(await rankPosition(db, set.requirements));
    }),
  );

  router.patch(
    '/:id',
    authorize('update', 'Requirement'),
    ...validate({ params: IdParamsSchema, body: RequirementSetUpdateBodySchema }, async ({ params, body }, req, res) => {
      res.json(await updateRequirementSet(db, req.ability, params.id, body));
    }),
  );

  router.delete(
    '/:id',
    authorize('delete', 'Requirement'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      await deleteRequirementSet(db, req.ability, params.id);
      res.status(204).end();
    }),
  );

  return router;
}
