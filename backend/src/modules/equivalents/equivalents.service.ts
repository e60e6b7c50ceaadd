import type { DataSource, EntityManager } from 'typeorm';
import { z } from 'zod';
import { getFamily, type EquivalentBodySchema, type EquivalentDto, type EquivalentUpdateBodySchema, type FamilyKey } from '@understudy/shared-types';
import { EquivalentEntity, type Equivalent } from '../../entities';
import { ConflictError, DomainError, NotFoundError } from '../../errors';
import type { JobQueue } from '../../queue/job-queue';
import { recordApprovedEquivalent } from '../alerts/alerts.service';
import { recordAudit } from '../audit-events/audit-events.service';

type Db = DataSource | EntityManager;
export type EquivalentInput = z.output<typeof EquivalentBodySchema>;
export type EquivalentUpdate = z.output<typeof EquivalentUpdateBodySchema>;

/** The pair as stored: smaller id first, so a ruling made from either side lands on the same row. */
export function orderedPair(a: string, b: string): [string, string] {
  return a < b ? [a, b] : [b, a];
}

interface EquivalentRow {
  id: string;
  part_a: string;
  part_b: string;
  status: EquivalentDto['status'];
  use: string;
  note: string;
  decided_by: string | null;
  decider_name: string | null;
  created_at: Date;
  updated_at: Date;
}

const SELECT_EQUIVALENTS = `SELECT e.id, e.part_a, e.part_b, e.status, e.use, e.note, e.decided_by, u.name AS decider_name, e.created_at, e.updated_at
  FROM equivalents e LEFT JOIN users u ON u.id = e.decided_by`;

/** Seen from `fromPartId`: partId is that part, equivalentId the other one. Without it, the stored order. */
function present(row: EquivalentRow, fromPartId?: string): EquivalentDto {
  const flip = fromPartId !== undefined && row.part_b === fromPartId;
  return {
    id: row.id,
    partId: flip ? row.part_b : row.part_a,
    equivalentId: flip ? row.part_a : row.part_b,
    status: row.status,
    use: row.use,
    note: row.note,
    decidedBy: row.decided_by ? { id: row.decided_by, name: row.decider_name ?? '' } : null,
    createdAt: new Date(row.created_at).toISOString(),
    updatedAt: new Date(row.updated_at).toISOString(),
  };
}

async function findRow(db: Db, id: string): Promise<EquivalentRow | undefined> {
  const rows: EquivalentRow[] = await db.query(`${SELECT_EQUIVALENTS} WHERE e.id = $1`, [id]);
  return rows[0];
}

/** Approved rulings first, then the most recent. */
const ORDER = `ORDER BY (e.status = 'approved') DESC, e.updated_at DESC, e.id`;

export async function listEquivalents(db: Db, partId: string): Promise<EquivalentDto[]> {
  const exists: unknown[] = await db.query(`SELECT 1 FROM parts WHERE id = $1`, [partId]);
  if (!exists.length) throw new NotFoundError('No such part.');
  const rows: EquivalentRow[] = await db.query(`${SELECT_EQUIVALENTS} WHERE e.part_a = $1 OR e.part_b = $1 ${ORDER}`, [partId]);
  return rows.map((r) => present(r, partId));
}

/**
 * One ruling per other part, for ranking a part's alternates. A pair can carry several rulings for different uses;
 * the ranking has no use to match against, so a rejection for any use wins (the safe reading), else the latest approval.
 */
export async function equivalentsByOtherPart(db: Db, partId: string): Promise<Map<string, EquivalentDto>> {
  const rows: EquivalentRow[] = await db.query(
    `${SELECT_EQUIVALENTS} WHERE e.part_a = $1 OR e.part_b = $1 ORDER BY (e.status = 'rejected') DESC, e.updated_at DESC, e.id`,
    [partId],
  );
  const byOther = new Map<string, EquivalentDto>();
  for (const row of rows) {
    const dto = present(row, partId);
    if (!byOther.has(dto.equivalentId)) byOther.set(dto.equivalentId, dto);
  }
  return byOther;
}

/** Every approved ruling touching any of these parts, grouped by each of them (each seen from that part). */
export async function approvedEquivalentsAmong(db: Db, partIds: readonly string[]): Promise<Map<string, EquivalentDto[]>> {
  const out = new Map<string, EquivalentDto[]>();
  if (!partIds.length) return out;
  const rows: EquivalentRow[] = await db.query(
    `${SELECT_EQUIVALENTS} WHERE e.status = 'approved' AND (e.part_a = ANY($1::uuid[]) OR e.part_b = ANY($1::uuid[])) ${ORDER}`,
    [partIds],
  );
  const wanted = new Set(partIds);
  for (const row of rows) {
    for (const side of [row.part_a, row.part_b]) {
      if (!wanted.has(side)) continue;
      const list = out.get(side) ?? [];
      list.push(present(row, side));
      out.set(side, list);
    }
  }
  return out;
}

/** An approved equivalent as an export names it: the other part by maker and number, with the use it was approved for. */
export interface ExportedEquivalent {
  manufacturer: string;
  partNumber: string;
  use: string;
  note: string;
}

/** The approved equivalents of each part, for the catalog export; one query however many parts. */
export async function approvedEquivalentsForExport(db: Db, partIds: readonly string[]): Promise<Map<string, ExportedEquivalent[]>> {
  const out = new Map<string, ExportedEquivalent[]>();
  if (!partIds.length) return out;
  const rows: { part_id: string; manufacturer: string; part_number: string; use: string; note: string }[] = await db.query(
    `SELECT side.part_id, m.name AS manufacturer, o.part_number, e.use, e.note
       FROM equivalents e
      CROSS JOIN LATERAL (VALUES (e.part_a, e.part_b), (e.part_b, e.part_a)) AS side(part_id, other_id)
       JOIN parts o ON o.id = side.other_id
       JOIN manufacturers m ON m.id = o.manufacturer_id
      WHERE e.status = 'approved' AND side.part_id = ANY($1::uuid[])
      ORDER BY side.part_id, o.part_number_key, e.use`,
    [partIds],
  );
  for (const r of rows) {
    const list = out.get(r.part_id) ?? [];
    list.push({ manufacturer: r.manufacturer, partNumber: r.part_number, use: r.use, note: r.note });
    out.set(r.part_id, list);
  }
  return out;
}

const snapshot = (e: Pick<Equivalent, 'partA' | 'partB' | 'status' | 'use' | 'note'>) => ({ partA: e.partA, partB: e.partB, status: e.status, use: e.use, note: e.note });

function duplicate(use: string): ConflictError {
  return new ConflictError(`These two parts already have a ruling for "${use}"; change that one instead.`, 'equivalent_exists');
}

const isUniqueViolation = (err: unknown) => (err as { code?: string; driverError?: { code?: string } }).driverError?.code === '23505' || (err as { code?: string }).code === '23505';

async function assertNoRuling(tx: EntityManager, partA: string, partB: string, use: string, exceptId?: string) {
  const rows: unknown[] = await tx.query(
    `SELECT 1 FROM equivalents WHERE part_a = $1 AND part_b = $2 AND lower(use) = lower($3) AND ($4::uuid IS NULL OR id <> $4)`,
    [partA, partB, use, exceptId ?? null],
  );
  if (rows.length) throw duplicate(use);
}

/** An approved ruling is news for the BOMs using either part; the alerts record it in the ruling's transaction. */
export async function createEquivalent(db: DataSource, queue: JobQueue, actorId: string, body: EquivalentInput): Promise<EquivalentDto> {
  if (body.partId === body.equivalentId) throw new DomainError(422, 'same_part', 'A part cannot be ruled an equivalent of itself.');
  const parts: { id: string; family: FamilyKey; part_number: string }[] = await db.query(`SELECT id, family, part_number FROM parts WHERE id = ANY($1::uuid[])`, [
    [body.partId, body.equivalentId],
  ]);
  const part = parts.find((p) => p.id === body.partId);
  const other = parts.find((p) => p.id === body.equivalentId);
  if (!part || !other) throw new DomainError(422, 'unknown_part', `No part with id ${!part ? body.partId : body.equivalentId}.`);
  if (part.family !== other.family) {
    throw new DomainError(
      422,
      'family_mismatch',
      `${part.part_number} is a ${getFamily(part.family).label.toLowerCase()} and ${other.part_number} a ${getFamily(other.family).label.toLowerCase()}; only parts of one family can stand in for each other.`,
    );
  }
  const [partA, partB] = orderedPair(body.partId, body.equivalentId);
  try {
    const id = await db.transaction(async (tx) => {
      await assertNoRuling(tx, partA, partB, body.use);
      const repo = tx.getRepository(EquivalentEntity);
      const saved = await repo.save(repo.create({ partA, partB, status: body.status, use: body.use, note: body.note, decidedById: actorId }));
      await recordAudit(tx, { actorId, action: 'equivalent.created', subjectType: 'Equivalent', subjectId: saved.id, after: snapshot(saved) });
      if (saved.status === 'approved') {
        await recordApprovedEquivalent(tx, queue, { equivalentId: saved.id, partIds: [partA, partB], use: saved.use, note: saved.note, actorId });
      }
      return saved.id;
    });
    return present((await findRow(db, id))!, body.partId);
  } catch (err) {
    // Two editors ruling on the same pair at once: the unique index decides.
    if (isUniqueViolation(err)) throw duplicate(body.use);
    throw err;
  }
}

export async function updateEquivalent(db: DataSource, queue: JobQueue, actorId: string, id: string, body: EquivalentUpdate): Promise<EquivalentDto> {
  try {
    await db.transaction(async (tx) => {
      const repo = tx.getRepository(EquivalentEntity);
      const current = await repo.createQueryBuilder('e').setLock('pessimistic_write').where('e.id = :id', { id }).getOne();
      if (!current) throw new NotFoundError('No such ruling.');
      const next: Equivalent = {
        ...current,
        status: body.status ?? current.status,
        use: body.use ?? current.use,
        note: body.note ?? current.note,
        // Whoever changes a ruling now answers for it.
        decidedById: actorId,
      };
      if (next.use.toLowerCase() !== current.use.toLowerCase()) await assertNoRuling(tx, current.partA, current.partB, next.use, id);
      await repo.save(next);
      await recordAudit(tx, { actorId, action: 'equivalent.updated', subjectType: 'Equivalent', subjectId: id, before: snapshot(current), after: snapshot(next) });
      // Only a ruling that turns approved is news; editing the note of an approved one is not.
      if (next.status === 'approved' && current.status !== 'approved') {
        await recordApprovedEquivalent(tx, queue, { equivalentId: id, partIds: [next.partA, next.partB], use: next.use, note: next.note, actorId });
      }
    });
  } catch (err) {
    if (isUniqueViolation(err)) throw duplicate(body.use ?? '');
    throw err;
  }
  return present((await findRow(db, id))!);
}

export async function deleteEquivalent(db: DataSource, actorId: string, id: string): Promise<void> {
  await db.transaction(async (tx) => {
    const repo = tx.getRepository(EquivalentEntity);
    const current = await repo.findOneBy({ id });
    if (!current) throw new NotFoundError('No such ruling.');
    await repo.delete({ id });
    await recordAudit(tx, { actorId, action: 'equivalent.deleted', subjectType: 'Equivalent', subjectId: id, before: snapshot(current) });
  });
}
