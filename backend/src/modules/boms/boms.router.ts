import { create as contentDisposition } from 'content-disposition';
import express, { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import {
  BOM_LIMITS,
  BomCreateBodySchema,
  BomDelimiterSchema,
  BomLineUpdateBodySchema,
  BomListQuerySchema,
  BomPreviewBodySchema,
  BomShareBodySchema,
  BomUpdateBodySchema,
  IdParamsSchema,
} from '@understudy/shared-types';
import type { DataSource } from 'typeorm';
import { DomainError } from '../../errors';
import { authorize } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import { tooLarge } from './bom-read';
import {
  checkBom,
  createBom,
  deleteBom,
  exportBomCsv,
  getBomDetail,
  lineOptions,
  listBoms,
  listColleagues,
  previewBom,
  setShares,
  updateBom,
  updateLine,
} from './boms.service';

const LineParamsSchema = z.object({ id: z.uuid(), lineId: z.uuid() });

/** Form fields sent beside an uploaded file. */
const UploadFieldsSchema = z.object({
  delimiter: BomDelimiterSchema.optional(),
  hasHeader: z
    .enum(['true', 'false', '1', '0'])
    .transform((v) => v === 'true' || v === '1')
    .optional(),
});

/**
 * The JSON bodies of POST /boms and /boms/preview: a pasted 5 MB text grows when escaped, so their limit is wider
 * than the API's 1 MB, and the text itself is then held to BOM_LIMITS.maxBytes. Mounted on /api/boms ahead of
 * the general JSON parser, which then skips a body already read.
 */
export function bomJsonBody(): RequestHandler {
  const parse = express.json({ limit: BOM_LIMITS.maxBytes * 2 + 64 * 1024 });
  return (req, res, next) => {
    if (req.method !== 'POST' || (req.path !== '/' && req.path !== '/preview')) return next();
    parse(req, res, (err?: unknown) => {
      if ((err as { status?: number } | undefined)?.status === 413) return next(tooLarge());
      next(err);
    });
  };
}

/** The pasted or previewed text over the byte limit is a 413 with the rejection details, not a field error. */
const textWithinLimit: RequestHandler = (req, _res, next) => {
  const text = (req.body as { text?: unknown } | undefined)?.text;
  if (typeof text === 'string' && Buffer.byteLength(text, 'utf8') > BOM_LIMITS.maxBytes) return next(tooLarge());
  next();
};

/** One file in the "file" field, in memory; over the limit is 413 bom_too_large. */
function receiveFile(): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: BOM_LIMITS.maxBytes, files: 1, fields: 5, parts: 6 } }).single('file');
  return (req, res, next) =>
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') return next(tooLarge());
        if (err.code === 'LIMIT_UNEXPECTED_FILE' || err.code === 'LIMIT_FILE_COUNT') return next(new DomainError(400, 'unexpected_field', 'Send one BOM file in the "file" field.'));
        return next(new DomainError(400, 'bad_upload', err.message));
      }
      next(new DomainError(400, 'bad_upload', 'The upload could not be read; send it as multipart/form-data.'));
    });
}

export function bomsRouter(db: DataSource): Router {
  const router = Router();
  const upload = receiveFile();

  router.post(
    '/preview',
    authorize('create', 'Bom'),
    (req, res, next) => (req.is('multipart/form-data') ? upload(req, res, next) : next()),
    async (req, res, next) => {
      if (!req.is('multipart/form-data')) return next();
      try {
        if (!req.file) throw new DomainError(400, 'no_file', 'Send the BOM file in the "file" field, or paste its text.');
        const fields = UploadFieldsSchema.safeParse(req.body ?? {});
        if (!fields.success) throw new DomainError(400, 'bad_upload', 'delimiter must be one of , ; | or a tab, and hasHeader true or false.');
        res.json(await previewBom(db, req.user!.id, { bytes: req.file.buffer, ...fields.data }));
      } catch (err) {
        next(err);
      }
    },
    textWithinLimit,
    ...validate({ body: BomPreviewBodySchema }, async ({ body }, req, res) => {
      res.json(await previewBom(db, req.user!.id, body));
    }),
  );

  router.post(
    '/',
    authorize('create', 'Bom'),
    textWithinLimit,
    ...validate({ body: BomCreateBodySchema }, async ({ body }, req, res) => {
      res.status(201).json(await createBom(db, req.user!.id, body));
    }),
  );

  router.get(
    '/',
    authorize('read', 'Bom'),
    ...validate({ query: BomListQuerySchema }, async ({ query }, req, res) => {
      res.json({ items: await listBoms(db, req.ability, req.user!.id, query.scope) });
    }),
  );

  // Before /:id, which would take "colleagues" for an id.
  router.get('/colleagues', authorize('read', 'Bom'), async (req, res) => {
    res.json({ items: await listColleagues(db, req.user!.id) });
  });

  router.get(
    '/:id',
    authorize('read', 'Bom'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      res.json(await getBomDetail(db, req.ability, params.id));
    }),
  );

  router.patch(
    '/:id',
    authorize('update', 'Bom'),
    ...validate({ params: IdParamsSchema, body: BomUpdateBodySchema }, async ({ params, body }, req, res) => {
      res.json(await updateBom(db, req.ability, params.id, body));
    }),
  );

  router.delete(
    '/:id',
    authorize('delete', 'Bom'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      await deleteBom(db, req.ability, params.id);
      res.status(204).end();
    }),
  );

  router.put(
    '/:id/shares',
    authorize('update', 'Bom'),
    ...validate({ params: IdParamsSchema, body: BomShareBodySchema }, async ({ params, body }, req, res) => {
      res.json(await setShares(db, req.ability, params.id, body.userIds));
    }),
  );

  router.post(
    '/:id/check',
    authorize('update', 'Bom'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      res.json(await checkBom(db, req.ability, params.id, req.user!.id));
    }),
  );

  router.patch(
    '/:id/lines/:lineId',
    authorize('update', 'Bom'),
    ...validate({ params: LineParamsSchema, body: BomLineUpdateBodySchema }, async ({ params, body }, req, res) => {
      res.json(await updateLine(db, req.ability, params.id, params.lineId, req.user!.id, body));
    }),
  );

  router.get(
    '/:id/lines/:lineId/options',
    authorize('read', 'Bom'),
    ...validate({ params: LineParamsSchema }, async ({ params }, req, res) => {
      res.json(await lineOptions(db, req.ability, params.id, params.lineId));
    }),
  );

  router.get(
    '/:id/export.csv',
    authorize('read', 'Bom'),
    ...validate({ params: IdParamsSchema }, async ({ params }, req, res) => {
      const { fileName, csv } = await exportBomCsv(db, req.ability, params.id);
      res.set({
        'Content-Type': 'text/csv; charset=utf-8',
        'Content-Disposition': contentDisposition(fileName, { type: 'attachment' }),
        'Cache-Control': 'private, no-store',
      });
      res.send(csv);
    }),
  );

  return router;
}
