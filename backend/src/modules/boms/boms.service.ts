import { randomUUID } from 'node:crypto';
import { ForbiddenError, subject } from '@casl/ability';
import Papa from 'papaparse';
import type { DataSource, EntityManager } from 'typeorm';
import { z } from 'zod';
import {
  AlternatesQuerySchema,
  BOM_EXPORT_COLUMNS,
  BOM_LIMITS,
  LIFECYCLE_LABELS,
  LINE_STATUS_LABELS,
  partNumberKey,
  ROHS_LABELS,
  type AppAbility,
  type ApprovedEquivalentRef,
  type BomCheckDto,
  type BomCreateBodySchema,
  type BomDelimiter,
  type BomDetailDto,
  type BomDto,
  type BomLineDto,
  type BomLineOptions,
  type BomLineUpdateBodySchema,
  type BomListQuerySchema,
  type BomPart,
  type BomPreview,
  type BomSummary,
  type BomUpdateBodySchema,
  type Colleague,
  type LineStatus,
  type RememberedMapping,
} from '@understudy/shared-types';
import type { BomCheckTrigger } from '../../entities';
import { DomainError, ForbiddenRequestError, NotFoundError } from '../../errors';
import { findAlternates } from '../alternates/alternates.service';
import { approvedEquivalentsAmong } from '../equivalents/equivalents.service';
import { parseBom } from './bom-lines';
import { matchLines } from './bom-matching.service';
import { buildPreview, decodeBytes } from './bom-read';
import { adjustSummary, describeChanges, evaluateLine, MATCHED_KINDS, partLabel, summarise, type Catalog, type StoredLine } from './bom-status';
import { BOM_SELECT, CHECK_SELECT, PART_COLUMNS, presentBom, presentCheck, presentPart, type BomRow, type CheckRow, type PartRow } from './boms.presenter';

type Db = DataSource | EntityManager;
export type BomCreateInput = z.output<typeof BomCreateBodySchema>;
export type BomUpdateInput = z.output<typeof BomUpdateBodySchema>;
export type BomLineUpdateInput = z.output<typeof BomLineUpdateBodySchema>;
export type BomScope = z.output<typeof BomListQuerySchema>['scope'];

/** The detail lists this many checks, newest first. */
export const CHECKS_SHOWN = 50;

const notFound = () => new NotFoundError('No such BOM.');

// ---------------------------------------------------------------------------------------------------------------
// Who may do what

interface Access {
  ownerId: string;
  sharedWith: string[];
}

/**
 * A BOM someone may not even read answers 404, so its existence is not given away. One they may read but not
 * change (shared with them, or an editor reading a viewer's) answers 403.
 */
function assertCan(ability: AppAbility, action: 'read' | 'update' | 'delete', bom: Access) {
  const target = subject('Bom', { ownerId: bom.ownerId, sharedWith: bom.sharedWith });
  if (ability.cannot('read', target)) throw notFound();
  try {
    ForbiddenError.from(ability).throwUnlessCan(action, target);
  } catch (err) {
    if (err instanceof ForbiddenError) throw new ForbiddenRequestError('Only the person who saved this BOM can change it.');
    throw err;
  }
}

async function findBomRow(db: Db, id: string, lock = false): Promise<BomRow | undefined> {
  if (lock) await db.query(`SELECT 1 FROM boms WHERE id = $1 FOR UPDATE`, [id]);
  const rows: BomRow[] = await db.query(`${BOM_SELECT} WHERE b.id = $1`, [id]);
  return rows[0];
}

const accessOf = (row: BomRow): Access => ({ ownerId: row.owner_id, sharedWith: row.shared_with.map((p) => p.id) });

/** The BOM row, once the caller is known to be allowed `action` on it. */
async function bomFor(db: Db, ability: AppAbility, id: string, action: 'read' | 'update' | 'delete', lock = false): Promise<BomRow> {
  const row = await findBomRow(db, id, lock);
  if (!row) throw notFound();
  assertCan(ability, action, accessOf(row));
  return row;
}

// ---------------------------------------------------------------------------------------------------------------
// Lines and the catalog they are judged against

interface LineRow {
  id: string;
  position: number;
  row_number: number;
  cells: string[];
  part_number: string;
  part_number_key: string;
  manufacturer: string | null;
  quantity: number | null;
  designators: string[];
  notes: string;
  problems: StoredLine['problems'];
  match_kind: StoredLine['matchKind'];
  part_id: string | null;
  match_detail: string | null;
  candidates: StoredLine['candidates'];
  replacement_part_id: string | null;
  replacement_note: string;
  replacement_chosen_by: string | null;
  chooser_name: string | null;
  replacement_chosen_at: Date | null;
}

const LINE_SELECT = `SELECT l.id, l.position, l.row_number, l.cells, l.part_number, l.part_number_key, l.manufacturer, l.quantity, l.designators,
    l.notes, l.problems, l.match_kind, l.part_id, l.match_detail, l.candidates, l.replacement_part_id, l.replacement_note,
    l.replacement_chosen_by, u.name AS chooser_name, l.replacement_chosen_at
  FROM bom_lines l LEFT JOIN users u ON u.id = l.replacement_chosen_by`;

function lineFromRow(r: LineRow): StoredLine {
  return {
    id: r.id,
    position: r.position,
    rowNumber: r.row_number,
    cells: r.cells,
    partNumber: r.part_number,
    partNumberKey: r.part_number_key,
    manufacturer: r.manufacturer,
    quantity: r.quantity,
    designators: r.designators,
    notes: r.notes,
    problems: r.problems,
    matchKind: r.match_kind,
    partId: r.part_id,
    matchDetail: r.match_detail,
    candidates: r.candidates,
    replacementPartId: r.replacement_part_id,
    replacementNote: r.replacement_note,
    replacementChosenBy: r.replacement_chosen_by ? { id: r.replacement_chosen_by, name: r.chooser_name ?? '' } : null,
    replacementChosenAt: r.replacement_chosen_at,
  };
}

async function loadLines(db: Db, bomId: string): Promise<StoredLine[]> {
  const rows: LineRow[] = await db.query(`${LINE_SELECT} WHERE l.bom_id = $1 ORDER BY l.position`, [bomId]);
  return rows.map(lineFromRow);
}

async function loadParts(db: Db, ids: Iterable<string>, into: Map<string, BomPart>, archived?: Set<string>) {
  const wanted = [...new Set(ids)].filter((id) => !into.has(id));
  if (!wanted.length) return;
  const rows: PartRow[] = await db.query(`SELECT ${PART_COLUMNS} FROM parts p JOIN manufacturers m ON m.id = p.manufacturer_id WHERE p.id = ANY($1::uuid[])`, [wanted]);
  for (const r of rows) {
    into.set(r.id, presentPart(r));
    if (r.archived) archived?.add(r.id);
  }
}

/** Every part the lines name (matched, candidates, replacements) and the approved equivalents of the matched ones. */
async function loadCatalog(db: Db, lines: readonly StoredLine[]): Promise<Catalog> {
  const parts = new Map<string, BomPart>();
  const ids = new Set<string>();
  for (const l of lines) {
    if (l.partId) ids.add(l.partId);
    if (l.replacementPartId) ids.add(l.replacementPartId);
    for (const c of l.candidates) ids.add(c.partId);
  }
  const matched = [...new Set(lines.filter((l) => l.partId && MATCHED_KINDS.has(l.matchKind)).map((l) => l.partId!))];
  const [, rulings] = await Promise.all([loadParts(db, ids, parts), approvedEquivalentsAmong(db, matched)]);
  const archived = new Set<string>();
  await loadParts(db, [...rulings.values()].flat().map((e) => e.equivalentId), parts, archived);
  const equivalents = new Map<string, ApprovedEquivalentRef[]>();
  for (const [partId, list] of rulings) {
    // An archived or obsolete part is no longer offered, even where an editor once approved it: the ruling is
    // symmetric, so an active part's approved equivalent may be the very obsolete part it replaced.
    const refs = list.flatMap((e) => {
      const part = parts.get(e.equivalentId);
      return part && !archived.has(part.id) && part.lifecycle !== 'obsolete' ? [{ part, use: e.use, note: e.note }] : [];
    });
    if (refs.length) equivalents.set(partId, refs);
  }
  return { parts, equivalents };
}

async function evaluate(db: Db, lines: readonly StoredLine[]): Promise<BomLineDto[]> {
  const catalog = await loadCatalog(db, lines);
  return lines.map((l) => evaluateLine(l, catalog));
}

async function loadChecks(db: Db, bomId: string): Promise<BomCheckDto[]> {
  const rows: CheckRow[] = await db.query(`${CHECK_SELECT} WHERE c.bom_id = $1 ORDER BY c.checked_at DESC, c.id DESC LIMIT ${CHECKS_SHOWN}`, [bomId]);
  return rows.map(presentCheck);
}

function detailOf(row: BomRow, lines: BomLineDto[], summary: BomSummary, checks: BomCheckDto[]): BomDetailDto {
  return {
    ...presentBom({ ...row, summary }),
    encoding: row.encoding,
    delimiter: row.delimiter,
    hasHeader: row.has_header,
    columns: row.columns,
    mapping: row.mapping,
    lines,
    checks,
  };
}

// ---------------------------------------------------------------------------------------------------------------
// Preview

async function rememberedMapping(db: Db, userId: string): Promise<RememberedMapping | null> {
  const rows: { by_header: RememberedMapping['byHeader']; by_index: RememberedMapping['byIndex'] }[] = await db.query(
    `SELECT by_header, by_index FROM bom_mapping_memory WHERE user_id = $1`,
    [userId],
  );
  return rows[0] ? { byHeader: rows[0].by_header, byIndex: rows[0].by_index } : null;
}

export interface PreviewSource {
  /** An uploaded file's bytes, or pasted text. */
  bytes?: Uint8Array;
  text?: string;
  delimiter?: BomDelimiter;
  hasHeader?: boolean;
}

export async function previewBom(db: Db, userId: string, source: PreviewSource): Promise<BomPreview> {
  const decoded = source.bytes ? decodeBytes(source.bytes) : { text: source.text ?? '', encoding: 'text' };
  return buildPreview({ ...decoded, delimiter: source.delimiter, hasHeader: source.hasHeader }, await rememberedMapping(db, userId));
}

// ---------------------------------------------------------------------------------------------------------------
// Saving

const LINE_RECORD = `x(id uuid, position int, row_number int, cells jsonb, part_number text, part_number_key text, manufacturer text,
  quantity float8, designators jsonb, notes text, problems jsonb, match_kind text, part_id uuid, match_detail text, candidates jsonb)`;

/** Rows per INSERT: a 10,000-line BOM goes in a handful of statements, each a modest JSON document. */
const INSERT_BATCH = 2500;

async function insertLines(tx: EntityManager, bomId: string, lines: readonly StoredLine[]) {
  for (let i = 0; i < lines.length; i += INSERT_BATCH) {
    const batch = lines.slice(i, i + INSERT_BATCH).map((l) => ({
      id: l.id,
      position: l.position,
      row_number: l.rowNumber,
      cells: l.cells,
      part_number: l.partNumber,
      part_number_key: l.partNumberKey,
      manufacturer: l.manufacturer,
      quantity: l.quantity,
      designators: l.designators,
      notes: l.notes,
      problems: l.problems,
      match_kind: l.matchKind,
      part_id: l.partId,
      match_detail: l.matchDetail,
      candidates: l.candidates,
    }));
    await tx.query(
      `INSERT INTO bom_lines (id, bom_id, position, row_number, cells, part_number, part_number_key, manufacturer, quantity, designators, notes, problems,
                              match_kind, part_id, match_detail, candidates)
       SELECT x.id, $1, x.position, x.row_number, x.cells, x.part_number, x.part_number_key, x.manufacturer, x.quantity, x.designators, x.notes, x.problems,
              x.match_kind, x.part_id, x.match_detail, x.candidates
         FROM jsonb_to_recordset($2::jsonb) AS ${LINE_RECORD}`,
      [bomId, JSON.stringify(batch)],
    );
  }
}

async function insertCheck(
  tx: EntityManager,
  bomId: string,
  trigger: BomCheckTrigger,
  actorId: string | null,
  summary: BomSummary,
  changes: string[],
  statuses: LineStatus[],
  durationMs: number,
): Promise<string> {
  const [inserted]: { id: string }[] = await tx.query(
    `INSERT INTO bom_checks (bom_id, checked_by, trigger, summary, changes, line_statuses, duration_ms) VALUES ($1, $2, $3, $4, $5, $6, $7) RETURNING id`,
    [bomId, actorId, trigger, JSON.stringify(summary), JSON.stringify(changes), JSON.stringify(statuses), durationMs],
  );
  await tx.query(`UPDATE boms SET summary = $2, last_checked_at = now() WHERE id = $1`, [bomId, JSON.stringify(summary)]);
  return inserted!.id;
}

/** The mapping just confirmed, remembered by header text (when the file has headers) and by position. */
async function rememberMapping(tx: EntityManager, userId: string, body: BomCreateInput, columns: string[]) {
  const byIndex = body.mapping;
  const byHeader = body.hasHeader
    ? Object.fromEntries(Object.entries(body.mapping).flatMap(([field, index]) => (columns[index!]?.trim() ? [[field, columns[index!]!.trim()]] : [])))
    : null;
  await tx.query(
    `INSERT INTO bom_mapping_memory (user_id, by_header, by_index) VALUES ($1, COALESCE($2::jsonb, '{}'), $3)
     ON CONFLICT (user_id) DO UPDATE SET by_header = COALESCE($2::jsonb, bom_mapping_memory.by_header), by_index = $3, updated_at = now()`,
    [userId, byHeader ? JSON.stringify(byHeader) : null, JSON.stringify(byIndex)],
  );
}

const ms = (since: number) => Math.round(performance.now() - since);

export async function createBom(db: DataSource, userId: string, body: BomCreateInput): Promise<BomDetailDto> {
  const parsed = parseBom(body.text, body);
  const started = performance.now();
  const matches = await matchLines(db, parsed.lines);
  const stored: StoredLine[] = parsed.lines.map((l, i) => ({
    id: randomUUID(),
    position: i,
    rowNumber: l.row,
    cells: l.cells,
    partNumber: l.partNumber,
    partNumberKey: partNumberKey(l.partNumber),
    manufacturer: l.manufacturer,
    quantity: l.quantity,
    designators: l.designators,
    notes: l.notes,
    problems: l.problems,
    matchKind: matches[i]!.kind,
    partId: matches[i]!.partId,
    matchDetail: matches[i]!.detail,
    candidates: matches[i]!.candidates,
    replacementPartId: null,
    replacementNote: '',
    replacementChosenBy: null,
    replacementChosenAt: null,
  }));
  const lines = await evaluate(db, stored);
  const summary = summarise(lines);
  const durationMs = ms(started);

  const bomId = randomUUID();
  await db.transaction(async (tx) => {
    await tx.query(
      `INSERT INTO boms (id, owner_id, name, file_name, encoding, delimiter, has_header, columns, mapping, line_count)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10)`,
      [bomId, userId, body.name, body.fileName, body.encoding, body.delimiter, body.hasHeader, JSON.stringify(parsed.columns), JSON.stringify(body.mapping), stored.length],
    );
    await insertLines(tx, bomId, stored);
    await insertCheck(tx, bomId, 'upload', userId, summary, [], lines.map((l) => l.status), durationMs);
    await rememberMapping(tx, userId, body, parsed.columns);
  });
  return detailOf((await findBomRow(db, bomId))!, lines, summary, await loadChecks(db, bomId));
}

// ---------------------------------------------------------------------------------------------------------------
// Reading, changing, sharing

/** Whether the rules let this person read every BOM (a rule without conditions), as editors and admins may. */
function readsAll(ability: AppAbility): boolean {
  return ability.rulesFor('read', 'Bom').some((rule) => !rule.inverted && !rule.conditions);
}

export async function listBoms(db: Db, ability: AppAbility, userId: string, scope: BomScope): Promise<BomDto[]> {
  const where =
    scope === 'mine'
      ? `b.owner_id = $1`
      : scope === 'shared'
        ? `EXISTS (SELECT 1 FROM bom_shares s WHERE s.bom_id = b.id AND s.user_id = $1)`
        : readsAll(ability)
          ? null
          : `(b.owner_id = $1 OR EXISTS (SELECT 1 FROM bom_shares s WHERE s.bom_id = b.id AND s.user_id = $1))`;
  const rows: BomRow[] = await db.query(`${BOM_SELECT} ${where ? `WHERE ${where}` : ''} ORDER BY b.updated_at DESC, b.id LIMIT 500`, where ? [userId] : []);
  return rows.map(presentBom);
}

/** The BOM judged against today's catalog; the stored summary (what the list shows) follows if it moved. */
export async function getBomDetail(db: Db, ability: AppAbility, id: string): Promise<BomDetailDto> {
  const row = await bomFor(db, ability, id, 'read');
  const [lines, checks] = await Promise.all([loadLines(db, id).then((l) => evaluate(db, l)), loadChecks(db, id)]);
  const summary = summarise(lines);
  if (JSON.stringify(summary) !== JSON.stringify(row.summary)) await db.query(`UPDATE boms SET summary = $2 WHERE id = $1`, [id, JSON.stringify(summary)]);
  return detailOf(row, lines, summary, checks);
}

export async function updateBom(db: DataSource, ability: AppAbility, id: string, body: BomUpdateInput): Promise<BomDto> {
  await bomFor(db, ability, id, 'update');
  await db.query(`UPDATE boms SET name = COALESCE($2, name), watched = COALESCE($3, watched), updated_at = now() WHERE id = $1`, [id, body.name ?? null, body.watched ?? null]);
  return presentBom((await findBomRow(db, id))!);
}

export async function deleteBom(db: DataSource, ability: AppAbility, id: string): Promise<void> {
  await bomFor(db, ability, id, 'delete');
  await db.query(`DELETE FROM boms WHERE id = $1`, [id]);
}

export async function listColleagues(db: Db, userId: string): Promise<Colleague[]> {
  return db.query(`SELECT id, name, email FROM users WHERE NOT disabled AND id <> $1 ORDER BY lower(name), lower(email), id`, [userId]);
}

/** Shares the BOM, read-only, with exactly these people (replacing the previous list). */
export async function setShares(db: DataSource, ability: AppAbility, id: string, userIds: string[]): Promise<BomDetailDto> {
  const row = await bomFor(db, ability, id, 'update');
  const wanted = [...new Set(userIds)];
  if (wanted.includes(row.owner_id)) throw new DomainError(422, 'share_with_owner', 'A BOM is always open to its owner; share it with other people.');
  const found: { id: string }[] = await db.query(`SELECT id FROM users WHERE id = ANY($1::uuid[]) AND NOT disabled`, [wanted]);
  const missing = wanted.filter((u) => !found.some((f) => f.id === u));
  if (missing.length) throw new DomainError(422, 'unknown_user', `No active person with id ${missing.join(', ')}.`);
  await db.transaction(async (tx) => {
    await tx.query(`DELETE FROM bom_shares WHERE bom_id = $1 AND NOT (user_id = ANY($2::uuid[]))`, [id, wanted]);
    await tx.query(`INSERT INTO bom_shares (bom_id, user_id) SELECT $1, u FROM unnest($2::uuid[]) AS u ON CONFLICT DO NOTHING`, [id, wanted]);
    await tx.query(`UPDATE boms SET updated_at = now() WHERE id = $1`, [id]);
  });
  return getBomDetail(db, ability, id);
}

// ---------------------------------------------------------------------------------------------------------------
// Checking again

const sameMatch = (l: StoredLine, m: { kind: string; partId: string | null; detail: string | null; candidates: StoredLine['candidates'] }) =>
  l.matchKind === m.kind && l.partId === m.partId && l.matchDetail === m.detail && JSON.stringify(l.candidates) === JSON.stringify(m.candidates);

export interface RecheckOptions {
  trigger: 'manual' | 'change';
  actorId: string | null;
}

interface Rechecked {
  checkId: string;
  row: BomRow;
  lines: BomLineDto[];
  summary: BomSummary;
}

async function recheck(db: Db, bomId: string, { trigger, actorId }: RecheckOptions, ability?: AppAbility): Promise<Rechecked> {
  return db.transaction(async (tx) => {
    const row = await findBomRow(tx, bomId, true);
    if (!row) throw notFound();
    if (ability) assertCan(ability, 'update', accessOf(row));
    const started = performance.now();
    const stored = await loadLines(tx, bomId);
    const automatic = stored.filter((l) => l.matchKind !== 'confirmed');
    const matches = await matchLines(tx, automatic);
    const moved = automatic.flatMap((l, i) => (sameMatch(l, matches[i]!) ? [] : [{ line: l, match: matches[i]! }]));
    for (const { line, match } of moved) Object.assign(line, { matchKind: match.kind, partId: match.partId, matchDetail: match.detail, candidates: match.candidates });
    if (moved.length) {
      await tx.query(
        `UPDATE bom_lines l SET match_kind = x.match_kind, part_id = x.part_id, match_detail = x.match_detail, candidates = x.candidates, updated_at = now()
           FROM jsonb_to_recordset($2::jsonb) AS x(id uuid, match_kind text, part_id uuid, match_detail text, candidates jsonb)
          WHERE l.id = x.id AND l.bom_id = $1`,
        [bomId, JSON.stringify(moved.map(({ line: l }) => ({ id: l.id, match_kind: l.matchKind, part_id: l.partId, match_detail: l.matchDetail, candidates: l.candidates })))],
      );
    }
    const lines = await evaluate(tx, stored);
    const summary = summarise(lines);
    const previous: { line_statuses: LineStatus[] }[] = await tx.query(
      `SELECT line_statuses FROM bom_checks WHERE bom_id = $1 ORDER BY checked_at DESC, id DESC LIMIT 1`,
      [bomId],
    );
    const changes = describeChanges(previous[0]?.line_statuses ?? null, lines);
    const checkId = await insertCheck(tx, bomId, trigger, actorId, summary, changes, lines.map((l) => l.status), ms(started));
    return { checkId, row, lines, summary };
  });
}

/**
 * Matches every line the user has not confirmed against today's catalog again, judges every line, and records a
 * check whose `changes` name the lines whose status moved since the check before. Checks of one BOM take turns.
 * The alerts call this with trigger 'change' when a part a BOM uses changes.
 */
export async function recheckBom(db: Db, bomId: string, options: RecheckOptions): Promise<BomCheckDto> {
  const { checkId } = await recheck(db, bomId, options);
  const rows: CheckRow[] = await db.query(`${CHECK_SELECT} WHERE c.id = $1`, [checkId]);
  return presentCheck(rows[0]!);
}

/** The Check again button: the owner (or whoever may change the BOM) reruns it and gets the detail back. */
export async function checkBom(db: DataSource, ability: AppAbility, id: string, actorId: string): Promise<BomDetailDto> {
  const { row, lines, summary } = await recheck(db, id, { trigger: 'manual', actorId }, ability);
  return detailOf(row, lines, summary, await loadChecks(db, id));
}

// ---------------------------------------------------------------------------------------------------------------
// One line

async function findLine(db: Db, bomId: string, lineId: string): Promise<StoredLine> {
  const rows: LineRow[] = await db.query(`${LINE_SELECT} WHERE l.bom_id = $1 AND l.id = $2`, [bomId, lineId]);
  if (!rows[0]) throw new NotFoundError('No such line in this BOM.');
  return lineFromRow(rows[0]);
}

async function assertPart(db: Db, id: string, field: string) {
  const rows: unknown[] = await db.query(`SELECT 1 FROM parts WHERE id = $1`, [id]);
  if (!rows.length) throw new DomainError(422, 'unknown_part', `No catalog part with id ${id} (${field}).`);
}

/**
 * Confirms a match (a candidate or any catalog part), puts a line back to automatic matching (partId null), and
 * chooses or clears a replacement with a note; who chose it and when is kept until the replacement changes.
 */
export async function updateLine(db: DataSource, ability: AppAbility, bomId: string, lineId: string, actorId: string, body: BomLineUpdateInput): Promise<BomLineDto> {
  return db.transaction(async (tx) => {
    const bom = await bomFor(tx, ability, bomId, 'update', true);
    const line = await findLine(tx, bomId, lineId);
    const before = (await evaluate(tx, [line]))[0]!;
    const next: StoredLine = { ...line };

    if (body.partId === null) {
      const [match] = await matchLines(tx, [line]);
      Object.assign(next, { matchKind: match!.kind, partId: match!.partId, matchDetail: match!.detail, candidates: match!.candidates });
    } else if (body.partId !== undefined) {
      await assertPart(tx, body.partId, 'partId');
      const [actor]: { name: string }[] = await tx.query(`SELECT name FROM users WHERE id = $1`, [actorId]);
      Object.assign(next, { matchKind: 'confirmed', partId: body.partId, matchDetail: `Confirmed by ${actor?.name ?? 'the owner'}`, candidates: [] });
    }

    if (body.replacementPartId === null) {
      Object.assign(next, { replacementPartId: null, replacementNote: '', replacementChosenBy: null, replacementChosenAt: null });
    } else if (body.replacementPartId !== undefined) {
      await assertPart(tx, body.replacementPartId, 'replacementPartId');
      if (body.replacementPartId !== line.replacementPartId) {
        Object.assign(next, { replacementPartId: body.replacementPartId, replacementNote: '', replacementChosenBy: { id: actorId, name: '' }, replacementChosenAt: new Date() });
      }
    }
    if (body.replacementNote !== undefined) {
      if (!next.replacementPartId) throw new DomainError(422, 'no_replacement', 'Choose a replacement before writing a note about it.');
      next.replacementNote = body.replacementNote;
    }
    if (next.replacementPartId && next.replacementPartId === next.partId && MATCHED_KINDS.has(next.matchKind)) {
      throw new DomainError(422, 'same_part', 'The replacement is the part the line already uses.');
    }

    await tx.query(
      `UPDATE bom_lines SET match_kind = $2, part_id = $3, match_detail = $4, candidates = $5, replacement_part_id = $6, replacement_note = $7,
              replacement_chosen_by = $8, replacement_chosen_at = $9, updated_at = now()
        WHERE id = $1`,
      [
        lineId,
        next.matchKind,
        next.partId,
        next.matchDetail,
        JSON.stringify(next.candidates),
        next.replacementPartId,
        next.replacementNote,
        next.replacementChosenBy?.id ?? null,
        next.replacementChosenAt,
      ],
    );
    const after = (await evaluate(tx, [await findLine(tx, bomId, lineId)]))[0]!;
    // The list's summary follows the change without judging every other line again.
    const summary = bom.summary ? adjustSummary(bom.summary, before, after) : null;
    await tx.query(`UPDATE boms SET updated_at = now(), summary = COALESCE($2::jsonb, summary) WHERE id = $1`, [bomId, summary ? JSON.stringify(summary) : null]);
    return after;
  });
}

/** What may go in the line's place: the approved equivalents of its part, then the engine's best others. */
export async function lineOptions(db: DataSource, ability: AppAbility, bomId: string, lineId: string): Promise<BomLineOptions> {
  await bomFor(db, ability, bomId, 'read');
  const line = await findLine(db, bomId, lineId);
  const dto = (await evaluate(db, [line]))[0]!;
  const part = dto.match.part;
  if (!part) return { approvedEquivalents: [], alternates: [] };
  const approved = dto.approvedEquivalents;
  const ranked = await findAlternates(db, part.id, AlternatesQuerySchema.parse({ limit: BOM_LIMITS.alternatesPerLine + approved.length }));
  const listed = new Set(approved.map((a) => a.part.id));
  return { approvedEquivalents: approved, alternates: ranked.items.filter((a) => !listed.has(a.part.id)).slice(0, BOM_LIMITS.alternatesPerLine) };
}

// ---------------------------------------------------------------------------------------------------------------
// Export

/** A cell the export adds that a spreadsheet would run as a formula gets a leading apostrophe (OWASP CSV injection). */
const inert = (value: string) => (/^[=+\-@\t\r]/.test(value) ? `'${value}` : value);

/**
 * The checked BOM as CSV: the original header (or "Column 1"…) and cells untouched, then the status, matched
 * part, lifecycle, RoHS, risk and replacement. UTF-8 with a byte order mark so spreadsheets read accents; a
 * semicolon file stays semicolon-delimited (it came from a locale whose spreadsheets expect it), others use commas.
 */
export async function exportBomCsv(db: DataSource, ability: AppAbility, id: string): Promise<{ fileName: string; csv: string }> {
  const detail = await getBomDetail(db, ability, id);
  const width = detail.columns.length;
  const data = detail.lines.map((l) => {
    const cells = Array.from({ length: width }, (_, i) => l.cells[i] ?? '');
    const part = l.match.part;
    return [
      ...cells,
      LINE_STATUS_LABELS[l.status],
      part ? inert(partLabel(part)) : '',
      part ? LIFECYCLE_LABELS[part.lifecycle] : '',
      part ? ROHS_LABELS[part.rohsStatus] : '',
      inert(l.risk),
      l.replacement ? inert(partLabel(l.replacement.part)) : '',
      l.replacement ? inert(l.replacement.note) : '',
    ];
  });
  const delimiter = detail.delimiter === ';' ? ';' : ',';
  const csv = Papa.unparse({ fields: [...detail.columns, ...BOM_EXPORT_COLUMNS], data }, { delimiter, newline: '\r\n' });
  return { fileName: `${safeFileName(detail.name)} - checked.csv`, csv: `\uFEFF${csv}\r\n` };
}

/** A name any file system takes: no path separators, reserved or control characters. */
export function safeFileName(name: string): string {
  const cleaned = name
    .replace(/[\\/:*?"<>|\u0000-\u001f\u007f]+/g, '_')
    .replace(/^[\s.]+|[\s.]+$/g, '')
    .slice(0, 100);
  return cleaned || 'BOM';
}
