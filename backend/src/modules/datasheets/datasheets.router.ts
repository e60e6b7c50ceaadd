import { create as contentDisposition } from 'content-disposition';
import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import {
  DatasheetApplyBodySchema,
  DatasheetListQuerySchema,
  DatasheetUploadFieldsSchema,
  IdParamsSchema,
  ProposalParamsSchema,
  ProposalReviewBodySchema,
} from '@understudy/shared-types';
import { DomainError } from '../../errors';
import { authorize } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import {
  applyDatasheet,
  getDatasheet,
  listDatasheets,
  openDatasheetFile,
  retryDatasheet,
  reviewProposal,
  uploadDatasheets,
  UploadRejectedError,
  type DatasheetDeps,
} from './datasheets.service';

const FileQuerySchema = z.object({ download: z.enum(['0', '1', 'true', 'false']).optional() });

/** multer, with its limit errors turned into answers that say which limit and how big it is. */
function receiveFiles({ maxBytes, maxFiles }: DatasheetDeps['limits']): RequestHandler {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: maxFiles, fields: 5, parts: maxFiles + 5 } }).array('files');
  const megabytes = `${Math.round((maxBytes / 1024 / 1024) * 10) / 10} MB`;
  return (req, res, next) =>
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          return next(new UploadRejectedError([{ fileName: err.field ?? 'file', code: 'too-large', message: `A file is over the ${megabytes} limit for one datasheet.` }], 413, 'too_large'));
        }
        if (err.code === 'LIMIT_FILE_COUNT') {
          return next(new DomainError(413, 'too_many_files', `Upload at most ${maxFiles} files at once.`));
        }
        if (err.code === 'LIMIT_UNEXPECTED_FILE') {
          return next(new DomainError(400, 'unexpected_field', 'Send the PDFs in the "files" field.'));
        }
        return next(new DomainError(400, 'bad_upload', err.message));
      }
      next(new DomainError(400, 'bad_upload', 'The upload could not be read; send it as multipart/form-data.'));
    });
}

export function datasheetsRouter(deps: DatasheetDeps): Router {
  const router = Router();
  const { db } = deps;

  router.get(
    '/',
    authorize('read', 'Datasheet'),
    ...validate({ query: DatasheetListQuerySchema }, async ({ query }, _req, res) => {
      res.json({ items: await listDatasheets(db, query) });
    }),
  );

  router.post(
    '/',
    authorize('create', 'Datasheet'),
    (req, _res, next) => (req.is('multipart/form-data') ? next() : next(new DomainError(415, 'multipart_required', 'Upload datasheets as multipart/form-data in the "files" field.'))),
    receiveFiles(deps.limits),
    ...validate({ body: DatasheetUploadFieldsSchema }, async ({ body }, req, res) => {
      const files = ((req.files as Express.Multer.File[] | undefined) ?? []).map((f) => ({ originalName: f.originalname, data: f.buffer }));
      res.status(201).json({ items: await uploadDatasheets(deps, req.user!.id, files, body.partId) });
    }),
  );

  router.get(
    '/:id',
    authorize('read', 'Datasheet'),
    ...validate({ params: IdParamsSchema }, async ({ params }, _req, res) => {
      res.json(await getDatasheet(db, params.id));
    }),
  );

  router.get(
    '/:id/file',
    authorize('read', 'Datasheet'),
    ...validate({ params: IdParamsSchema, query: FileQuerySchema }, async ({ params, query }, _req, res) => {
      const file = await openDatasheetFile(deps, params.id);
      const download = query.download === '1' || query.download === 'true';
      res.set({
        'Content-Type': 'application/pdf',
        'Content-Length': String(file.byteSize),
        'Content-Disposition': contentDisposition(file.fileName, { type: download ? 'attachment' : 'inline' }),
        'Cache-Control': 'private, max-age=3600',
      });
      file.stream.on('error', (err) => res.destroy(err));
      file.stream.pipe(res);
    }),
  );

  router.patch(
    '/:id/proposals/:proposalId',
    authorize('review', 'Datasheet'),
    ...validate({ params: ProposalParamsSchema, body: ProposalReviewBodySchema }, async ({ params, body }, _req, res) => {
      res.json(await reviewProposal(db, params.id, params.proposalId, body));
    }),
  );

  router.post(
    '/:id/apply',
    authorize('review', 'Datasheet'),
    authorize('update', 'Part'),
    ...validate({ params: IdParamsSchema, body: DatasheetApplyBodySchema }, async ({ params, body }, req, res) => {
      res.json(await applyDatasheet(db, deps.queue, req.user!.id, params.id, body));
    }),
  );

  router.post(
    '/:id/retry',
    authorize('update', 'Datasheet'),
    ...validate({ params: IdParamsSchema }, async ({ params }, _req, res) => {
      res.json(await retryDatasheet(deps, params.id));
    }),
  );

  return router;
}
