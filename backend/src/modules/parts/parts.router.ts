import express, { Router } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { IdParamsSchema, PartCreateBodySchema, PartListQuerySchema, PartUpdateBodySchema } from '@understudy/shared-types';
import { authorize } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import type { JobQueue } from '../../queue/job-queue';
import { approvedEquivalentsForExport } from '../equivalents/equivalents.service';
import { parseFilters } from './part-filters';
import { searchParts } from './parts-search.service';
import { importParts, partsToCsv, readImport, toPortable } from './parts-transfer.service';
import { createPart, getPart, listRevisions, setArchived, updatePart } from './parts.service';

const ExportQuerySchema = PartListQuerySchema.extend({ format: z.enum(['csv', 'json']).default('csv') });
const ImportQuerySchema = z.object({ dryRun: z.enum(['0', '1', 'true', 'false']).optional() });

export function partsRouter(db: DataSource, queue: JobQueue): Router {
  const router = Router();

  router.get(
    '/',
    authorize('read', 'Part'),
    ...validate({ query: PartListQuerySchema }, async ({ query }, req, res) => {
      const filters = parseFilters(query.family, req.query as Record<string, unknown>);
      res.json(await searchParts(db, query, filters));
    }),
  );

  router.get(
    '/export',
    authorize('read', 'Part'),
    ...validate({ query: ExportQuerySchema }, async ({ query }, req, res) => {
      const filters = parseFilters(query.family, req.query as Record<string, unknown>);
      const { items } = await searchParts(db, { ...query, page: 1 }, filters, { all: true });
      const equivalents = await approvedEquivalentsForExport(db, items.map((p) => p.id));
      const portable = items.map((p) => ({ ...toPortable(p), approvedEquivalents: equivalents.get(p.id) ?? [] }));
      const stamp = new Date().toISOString().slice(0, 10);
      if (query.format === 'json') {
        res.attachment(`understudy-parts-${stamp}.json`).type('application/json').send(JSON.stringify(portable, null, 2));
      } else {
        res.attachment(`understudy-parts-${stamp}.csv`).type('text/csv; charset=utf-8').send(partsToCsv(portable));
      }
    }),
  );

  router.post(
    '/import',
    authorize('create', 'Part'),
    express.text({ type: ['text/csv', 'text/plain'], limit: '20mb' }),
    ...validate({ query: ImportQuerySchema }, async ({ query }, req, res) => {
      const dryRun = query.dryRun === '1' || query.dryRun === 'true';
      const contentType = req.get('content-type');
      const rows = readImport(req.body, contentType);
      res.json(await importParts(db, queue, req.user!.id, rows, { dryRun, csv: !contentType?.includes('json') }));
    }),
  );

  router.post(
    '/',
    authorize('create', 'Part'),
    ...validate({ body: PartCreateBodySchema }, async ({ body }, req, res) => {
      res.status(201).json(await createPart(db, req.user!.id, body));
    }),
  );

  router.get(
    '/:id',
    authorize('read', 'Part'),
    ...validate({ params: IdParamsSchema }, async ({ params }, _req, res) => {
      res.json(await getPart(db, params.id));
    }),
  );

  router.patch(
    '/:id',
    authorize('update', 'Part'),
    ...validate({ params: IdParamsSchema, body: PartUpdateBodySchema }, async ({ params, body }, req, res) => {
      res.json(await updatePart(db, queue, req.user!.id, params.id, body));
    }),
  );

  router.delete(
    '/:id',
    authorize('archive', 'Part'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      res.json(await setArchived(db, req.user!.id, params.id, true));
    }),
  );

  router.post(
    '/:id/restore',
    authorize('archive', 'Part'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      res.json(await setArchived(db, req.user!.id, params.id, false));
    }),
  );

  router.get(
    '/:id/revisions',
    authorize('read', 'Part'),
    ...validate({ params: IdParamsSchema }, async ({ params }, _req, res) => {
      res.json({ items: await listRevisions(db, params.id) });
    }),
  );

  return router;
}
