import { createHash } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import {
  getFamily,
  parameterValueSchemaFor,
  PartCreateBodySchema,
  reviewedParameters,
  type DatasheetApplyBody,
  type DatasheetApplyResponse,
  type DatasheetDto,
  type DatasheetExtraction,
  type DatasheetListItem,
  type DatasheetListQuery,
  type ProposalReviewBody,
  type UploadRejection,
} from '@understudy/shared-types';
import { DatasheetEntity, PartEntity, type Datasheet } from '../../entities';
import { ConflictError, DomainError, NotFoundError } from '../../errors';
import { ValidationError } from '../../middleware/validate';
import type { JobQueue } from '../../queue/job-queue';
import { QUEUES } from '../../queue/job-queue';
import type { FileStorage } from '../../storage/file-storage';
import { createPart, getPart, listRevisions, updatePart } from '../parts/parts.service';
import { extractDatasheet, inspectPdf, PdfRejectionError } from './extraction';

export interface DatasheetDeps {
  db: DataSource;
  storage: FileStorage;
  queue: JobQueue;
  limits: { maxBytes: number; maxFiles: number; maxPages: number };
}

export interface UploadedFile {
  originalName: string;
  data: Buffer;
}

/** The whole upload is refused, with every file's reason, and nothing is kept. */
export class UploadRejectedError extends DomainError {
  constructor(files: UploadRejection[], status = 422, code = 'upload_rejected') {
    const message =
      files.length === 1 ? files[0]!.message : `${files.length} files could not be accepted; nothing was uploaded.`;
    super(status, code, message, { files });
  }
}

/** Browsers send UTF-8 file names that multipart parsers read as Latin-1; keep a plain, bounded, path-free name. */
export function cleanFileName(raw: string): string {
  const utf8 = Buffer.from(raw, 'latin1').toString('utf8');
  const decoded = utf8.includes('\uFFFD') ? raw : utf8;
  const base = decoded.split(/[\\/]/).pop() ?? '';
  const cleaned = base.replace(/[\u0000-\u001f\u007f]/g, '').trim().slice(0, 255);
  return cleaned || 'datasheet.pdf';
}

const storageKeyFor = (sha256: string) => `datasheets/${sha256.slice(0, 2)}/${sha256}.pdf`;

// ---------------------------------------------------------------------------------------------------------------
// Reading

type Row = {
  id: string;
  file_name: string;
  byte_size: number;
  sha256: string;
  page_count: number;
  status: Datasheet['status'];
  failure_reason: string | null;
  extraction: DatasheetExtraction | null;
  part_id: string | null;
  part_number: string | null;
  manufacturer_name: string | null;
  uploaded_by: string | null;
  uploader_name: string | null;
  created_at: Date;
  updated_at: Date;
  parsed_at: Date | null;
  applied_at: Date | null;
};

const SELECT = `
  SELECT d.id, d.file_name, d.byte_size, d.sha256, d.page_count, d.status, d.failure_reason, d.part_id,
         d.uploaded_by, d.created_at, d.updated_at, d.parsed_at, d.applied_at,
         p.part_number, m.name AS manufacturer_name, u.name AS uploader_name, %EXTRACTION%
    FROM datasheets d
    LEFT JOIN parts p ON p.id = d.part_id
    LEFT JOIN manufacturers m ON m.id = p.manufacturer_id
    LEFT JOIN users u ON u.id = d.uploaded_by`;

const iso = (d: Date | null) => (d ? new Date(d).toISOString() : null);

function presentListItem(r: Row, proposalCount: number): DatasheetListItem {
  return {
    id: r.id,
    fileName: r.file_name,
    byteSize: r.byte_size,
    sha256: r.sha256.trim(),
    pageCount: r.page_count,
    status: r.status,
    failureReason: r.failure_reason,
    part: r.part_id ? { id: r.part_id, partNumber: r.part_number ?? '', manufacturer: r.manufacturer_name ?? '' } : null,
    uploadedBy: r.uploaded_by ? { id: r.uploaded_by, name: r.uploader_name ?? 'Former account' } : null,
    proposalCount,
    createdAt: iso(r.created_at)!,
    updatedAt: iso(r.updated_at)!,
    parsedAt: iso(r.parsed_at),
    appliedAt: iso(r.applied_at),
  };
}

export async function listDatasheets(db: DataSource, query: DatasheetListQuery): Promise<DatasheetListItem[]> {
  const where: string[] = [];
  const params: unknown[] = [];
  if (query.partId) where.push(`d.part_id = $${params.push(query.partId)}`);
  if (query.status) where.push(`d.status = $${params.push(query.status)}`);
  const sql = `${SELECT.replace('%EXTRACTION%', `coalesce(jsonb_array_length(d.extraction->'proposals'), 0) AS proposal_count`)}
    ${where.length ? `WHERE ${where.join(' AND ')}` : ''}
    ORDER BY d.created_at DESC, d.id LIMIT $${params.push(query.limit)}`;
  const rows: (Row & { proposal_count: number })[] = await db.query(sql, params);
  return rows.map((r) => presentListItem(r, Number(r.proposal_count)));
}

export async function getDatasheet(db: DataSource | EntityManager, id: string): Promise<DatasheetDto> {
  const rows: Row[] = await db.query(`${SELECT.replace('%EXTRACTION%', 'd.extraction')} WHERE d.id = $1`, [id]);
  const row = rows[0];
  if (!row) throw new NotFoundError('No such datasheet.');
  return { ...presentListItem(row, row.extraction?.proposals.length ?? 0), extraction: row.extraction };
}

export async function openDatasheetFile(deps: Pick<DatasheetDeps, 'db' | 'storage'>, id: string) {
  const sheet = await deps.db.getRepository(DatasheetEntity).findOneBy({ id });
  if (!sheet) throw new NotFoundError('No such datasheet.');
  if (!(await deps.storage.exists(sheet.storageKey))) throw new NotFoundError('The file of this datasheet is missing from storage.', 'file_missing');
  return { fileName: sheet.fileName, byteSize: sheet.byteSize, stream: deps.storage.stream(sheet.storageKey) };
}

// ---------------------------------------------------------------------------------------------------------------
// Upload

/**
 * Checks every file first (by content, never by name), then stores them and their rows and jobs together.
 * Any refusal refuses the whole upload; any failure while saving removes what was written.
 */
export async function uploadDatasheets(
  deps: DatasheetDeps,
  actorId: string,
  files: UploadedFile[],
  partId?: string,
): Promise<DatasheetListItem[]> {
  if (files.length === 0) throw new DomainError(400, 'no_files', 'Choose at least one PDF to upload.');
  if (partId && !(await deps.db.getRepository(PartEntity).existsBy({ id: partId }))) throw new NotFoundError('No such part.');

  const rejections: UploadRejection[] = [];
  const accepted: { fileName: string; data: Buffer; sha256: string; pageCount: number }[] = [];
  for (const file of files) {
    const fileName = cleanFileName(file.originalName);
    const sha256 = createHash('sha256').update(file.data).digest('hex');
    try {
      const { pageCount } = await inspectPdf(new Uint8Array(file.data), { maxPages: deps.limits.maxPages });
      if (accepted.some((a) => a.sha256 === sha256)) {
        rejections.push({ fileName, code: 'duplicate', message: `${fileName} is the same file as another one in this upload.` });
      } else accepted.push({ fileName, data: file.data, sha256, pageCount });
    } catch (err) {
      if (!(err instanceof PdfRejectionError)) throw err;
      rejections.push({ fileName, code: err.code, message: `${fileName}: ${err.message}` });
    }
  }
  const known = accepted.length
    ? await deps.db.getRepository(DatasheetEntity).find({ select: { id: true, sha256: true, fileName: true }, where: accepted.map((a) => ({ sha256: a.sha256 })) })
    : [];
  for (const existing of known) {
    const file = accepted.find((a) => a.sha256 === existing.sha256.trim())!;
    rejections.push({
      fileName: file.fileName,
      code: 'duplicate',
      message: `${file.fileName} is already here, uploaded as ${existing.fileName}.`,
      existingId: existing.id,
    });
  }
  if (rejections.length) throw new UploadRejectedError(rejections);

  const written: string[] = [];
  try {
    for (const file of accepted) {
      const key = storageKeyFor(file.sha256);
      await deps.storage.put(key, file.data);
      written.push(key);
    }
    const ids = await deps.db.transaction(async (tx) => {
      const out: string[] = [];
      for (const file of accepted) {
        const inserted = await tx.getRepository(DatasheetEntity).insert({
          sha256: file.sha256,
          fileName: file.fileName,
          byteSize: file.data.length,
          pageCount: file.pageCount,
          storageKey: storageKeyFor(file.sha256),
          status: 'queued',
          failureReason: null,
          extraction: null,
          partId: partId ?? null,
          uploadedById: actorId,
          parsedAt: null,
          appliedAt: null,
        });
        const id = inserted.identifiers[0]!.id as string;
        await deps.queue.send(QUEUES.parseDatasheet, { datasheetId: id }, tx);
        out.push(id);
      }
      return out;
    });
    return Promise.all(ids.map(async (id) => stripExtraction(await getDatasheet(deps.db, id))));
  } catch (err) {
    await Promise.all(written.map((key) => deps.storage.remove(key).catch(() => undefined)));
    // Two people uploading the same file at the same moment: the second loses the race on the unique hash.
    if ((err as { code?: string }).code === '23505') {
      throw new UploadRejectedError(accepted.map((a) => ({ fileName: a.fileName, code: 'duplicate' as const, message: `${a.fileName} was uploaded by someone else just now.` })));
    }
    throw err;
  }
}

function stripExtraction({ extraction: _extraction, ...item }: DatasheetDto): DatasheetListItem {
  return item;
}

// ---------------------------------------------------------------------------------------------------------------
// Parsing (the background job)

/** One parse job: queued → parsing → ready, or failed with the reason a person can act on. */
export async function runParseJob(deps: Pick<DatasheetDeps, 'db' | 'storage' | 'limits'>, datasheetId: string): Promise<void> {
  const repo = deps.db.getRepository(DatasheetEntity);
  const claimed = await repo.update({ id: datasheetId, status: 'queued' }, { status: 'parsing' });
  if (!claimed.affected) {
    // Already parsed, or a retry after a crash mid-parse: only a sheet left in 'parsing' is taken again.
    const sheet = await repo.findOneBy({ id: datasheetId });
    if (sheet?.status !== 'parsing') return;
  }
  try {
    const sheet = await repo.findOneByOrFail({ id: datasheetId });
    const data = await deps.storage.read(sheet.storageKey);
    const extraction = await extractDatasheet(new Uint8Array(data), { maxPages: deps.limits.maxPages });
    await repo.update({ id: datasheetId }, { status: 'ready', extraction: extraction as never, failureReason: null, parsedAt: new Date() });
  } catch (err) {
    const reason =
      err instanceof PdfRejectionError
        ? err.message
        : `The parser stopped with an unexpected error (${(err as Error).message}). Try again, or enter the values by hand.`;
    if (!(err instanceof PdfRejectionError)) console.error(`[datasheets] parsing ${datasheetId} failed:`, err);
    await repo.update({ id: datasheetId }, { status: 'failed', failureReason: reason });
  }
}

export async function retryDatasheet(deps: DatasheetDeps, id: string): Promise<DatasheetDto> {
  await deps.db.transaction(async (tx) => {
    const repo = tx.getRepository(DatasheetEntity);
    const sheet = await repo.createQueryBuilder('d').setLock('pessimistic_write').where('d.id = :id', { id }).getOne();
    if (!sheet) throw new NotFoundError('No such datasheet.');
    if (sheet.status !== 'failed') throw new ConflictError('Only a datasheet that failed to parse can be tried again.', 'not_failed');
    await repo.update({ id }, { status: 'queued', failureReason: null });
    await deps.queue.send(QUEUES.parseDatasheet, { datasheetId: id }, tx);
  });
  return getDatasheet(deps.db, id);
}

// ---------------------------------------------------------------------------------------------------------------
// Review and apply

async function lockReviewable(tx: EntityManager, id: string): Promise<Datasheet & { extraction: DatasheetExtraction }> {
  const sheet = await tx.getRepository(DatasheetEntity).createQueryBuilder('d').setLock('pessimistic_write').where('d.id = :id', { id }).getOne();
  if (!sheet) throw new NotFoundError('No such datasheet.');
  if ((sheet.status !== 'ready' && sheet.status !== 'applied') || !sheet.extraction) {
    throw new ConflictError('This datasheet has not been parsed yet.', 'datasheet_not_ready');
  }
  return sheet as Datasheet & { extraction: DatasheetExtraction };
}

function definitionFor(extraction: DatasheetExtraction, key: string) {
  const family = extraction.identity.family?.value;
  return family ? getFamily(family).parameters.find((p) => p.key === key) : undefined;
}

export async function reviewProposal(db: DataSource, id: string, proposalId: string, body: ProposalReviewBody): Promise<DatasheetDto> {
  return db.transaction(async (tx) => {
    const sheet = await lockReviewable(tx, id);
    const proposal = sheet.extraction.proposals.find((p) => p.id === proposalId);
    if (!proposal) throw new NotFoundError('No such proposal on this datasheet.');
    if (body.decision === 'edited') {
      const def = definitionFor(sheet.extraction, proposal.key);
      const checked = def ? parameterValueSchemaFor(def).safeParse(body.value) : { success: true as const, data: body.value };
      if (!checked.success) {
        throw new ValidationError(checked.error.issues.map((i) => ({ path: ['body', 'value', ...i.path.map(String)].join('.'), message: i.message })));
      }
      proposal.editedValue = checked.data;
    } else {
      proposal.editedValue = null;
    }
    proposal.decision = body.decision;
    await tx.getRepository(DatasheetEntity).update({ id }, { extraction: sheet.extraction as never });
    return getDatasheet(tx, id);
  });
}

/**
 * Writes the reviewed values into the catalog through the parts service, so the optimistic-concurrency rule and
 * the revision history apply exactly as for a hand edit; the revision names this datasheet.
 */
export async function applyDatasheet(db: DataSource, queue: JobQueue, actorId: string, id: string, body: DatasheetApplyBody): Promise<DatasheetApplyResponse> {
  const origin = { source: 'datasheet' as const, datasheetId: id };
  const partId = await db.transaction(async (tx) => {
    const sheet = await lockReviewable(tx, id);
    const parameters = reviewedParameters(sheet.extraction.proposals);
    if (!Object.keys(parameters).length) {
      throw new DomainError(422, 'nothing_to_apply', 'Accept or edit at least one proposed value before applying.');
    }
    let targetId: string;
    if (body.target === 'existing') {
      const current = await getPart(tx, body.partId);
      const family = sheet.extraction.identity.family?.value;
      if (family && family !== current.family) {
        throw new DomainError(422, 'family_mismatch', `This datasheet describes a ${getFamily(family).label.toLowerCase()}, but ${current.partNumber} is a ${getFamily(current.family).label.toLowerCase()}.`);
      }
      await updatePart(tx, queue, actorId, body.partId, { version: body.version, parameters: { ...current.parameters, ...parameters } }, origin);
      targetId = body.partId;
    } else {
      const pinMap = sheet.extraction.identity.pinMap?.value;
      const input = PartCreateBodySchema.safeParse({
        family: body.family,
        partNumber: body.partNumber,
        manufacturer: body.manufacturer,
        package: body.package ?? '',
        description: body.description ?? '',
        pinMap: pinMap && Object.keys(pinMap).length ? pinMap : undefined,
        parameters,
      });
      if (!input.success) {
        throw new ValidationError(input.error.issues.map((i) => ({ path: ['body', ...i.path.map(String)].join('.'), message: i.message })));
      }
      targetId = (await createPart(tx, actorId, input.data, origin)).id;
    }
    await tx.getRepository(DatasheetEntity).update({ id }, { status: 'applied', partId: targetId, appliedAt: new Date() });
    return targetId;
  });
  const revisions = await listRevisions(db, partId);
  return {
    datasheet: await getDatasheet(db, id),
    part: await getPart(db, partId),
    revision: revisions.find((r) => r.datasheet?.id === id) ?? null,
  };
}
