import type { DataSource, EntityManager } from 'typeorm';
import {
  PIN_LAYOUTS,
  parametersSchemaFor,
  partNumberKey,
  type PartCreateInput,
  type PartDto,
  type PartRevisionDto,
  type PartUpdateBody,
  type RevisionChange,
} from '@understudy/shared-types';
import { ManufacturerEntity, PartEntity, PartRevisionEntity, type Part } from '../../entities';
import { ConflictError, DomainError, NotFoundError } from '../../errors';
import { ValidationError } from '../../middleware/validate';
import type { JobQueue } from '../../queue/job-queue';
import { recordLifecycleChange } from '../alerts/alerts.service';
import { presentPart } from './parts.presenter';

/** A stale edit: carries the part as it is now so the client can show what changed meanwhile. */
export class VersionConflictError extends DomainError {
  constructor(readonly current: PartDto) {
    super(409, 'version_conflict', 'Someone changed this part after you opened it. Review their changes, then save again.', { current });
  }
}

type Db = DataSource | EntityManager;

export async function findOrCreateManufacturer(db: Db, name: string): Promise<{ id: string; name: string }> {
  const repo = db.getRepository(ManufacturerEntity);
  const existing = await repo.createQueryBuilder('m').where('lower(m.name) = lower(:name)', { name: name.trim() }).getOne();
  if (existing) return existing;
  await repo.createQueryBuilder().insert().values({ name: name.trim() }).orIgnore().execute();
  return repo.createQueryBuilder('m').where('lower(m.name) = lower(:name)', { name: name.trim() }).getOneOrFail();
}

async function manufacturerName(db: Db, id: string): Promise<string> {
  return (await db.getRepository(ManufacturerEntity).findOneByOrFail({ id })).name;
}

export async function getPart(db: Db, id: string): Promise<PartDto> {
  const part = await db.getRepository(PartEntity).findOneBy({ id });
  if (!part) throw new NotFoundError('No such part.');
  return presentPart(part, await manufacturerName(db, part.manufacturerId));
}

/** A named shared layout fills the pin map when none is given. */
function resolvePinMap(pinLayout: string | null | undefined, pinMap: Record<string, string> | undefined): Record<string, string> {
  if (pinMap && Object.keys(pinMap).length) return pinMap;
  const layout = pinLayout ? (PIN_LAYOUTS as Record<string, { pins: Record<number, string> }>)[pinLayout] : undefined;
  if (pinLayout && !layout) throw new ValidationError([{ path: 'body.pinLayout', message: `Unknown pin layout "${pinLayout}".` }]);
  return layout ? Object.fromEntries(Object.entries(layout.pins).map(([n, f]) => [String(n), f])) : {};
}

/** The fields a revision compares, flattened so each parameter is its own line ("parameters.slewRate"). */
function comparable(part: Omit<PartDto, 'id' | 'version' | 'createdAt' | 'updatedAt' | 'family'>): Record<string, unknown> {
  const out: Record<string, unknown> = {
    manufacturer: part.manufacturer.name,
    partNumber: part.partNumber,
    description: part.description,
    lifecycle: part.lifecycle,
    rohsStatus: part.rohsStatus,
    rohsNote: part.rohsNote,
    package: part.package,
    pinLayout: part.pinLayout,
    pinMap: part.pinMap,
    tags: part.tags,
    archived: part.archived,
  };
  for (const [key, value] of Object.entries(part.parameters)) out[`parameters.${key}`] = value;
  return out;
}

/** JSON with object keys sorted, so {min, max} and {max, min} compare equal. */
function stableJson(value: unknown): string {
  return JSON.stringify(value, (_key, v) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => a.localeCompare(b))) : v,
  );
}

export function diffParts(before: Record<string, unknown>, after: Record<string, unknown>): RevisionChange[] {
  const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
  const changes: RevisionChange[] = [];
  for (const field of keys) {
    const a = before[field] ?? null;
    const b = after[field] ?? null;
    if (stableJson(a) !== stableJson(b)) changes.push({ field, before: a, after: b });
  }
  return changes.sort((x, y) => x.field.localeCompare(y.field));
}

/** Why a revision was written: a plain source ('edit', 'import'…), or a datasheet whose reviewed values were applied. */
export type RevisionOrigin = string | { source: 'datasheet'; datasheetId: string };

async function writeRevision(db: Db, partId: string, version: number, actorId: string | null, origin: RevisionOrigin, changes: RevisionChange[]) {
  const { source, datasheetId } = typeof origin === 'string' ? { source: origin, datasheetId: null } : origin;
  await db.getRepository(PartRevisionEntity).insert({ partId, version, actorId, source, datasheetId, changes: changes as never });
}

export async function createPart(db: DataSource | EntityManager, actorId: string | null, input: PartCreateInput, source: RevisionOrigin = 'created'): Promise<PartDto> {
  const run = async (tx: EntityManager) => {
    const manufacturer = await findOrCreateManufacturer(tx, input.manufacturer);
    const key = partNumberKey(input.partNumber);
    const repo = tx.getRepository(PartEntity);
    if (await repo.existsBy({ manufacturerId: manufacturer.id, partNumberKey: key })) {
      throw new ConflictError(`${manufacturer.name} already has a part numbered ${input.partNumber}.`, 'part_exists');
    }
    const saved = await repo.save(
      repo.create({
        family: input.family,
        manufacturerId: manufacturer.id,
        partNumber: input.partNumber,
        partNumberKey: key,
        description: input.description,
        lifecycle: input.lifecycle,
        rohsStatus: input.rohsStatus,
        rohsNote: input.rohsNote,
        package: input.package,
        pinLayout: input.pinLayout,
        pinMap: resolvePinMap(input.pinLayout, input.pinMap),
        parameters: input.parameters,
        tags: input.tags,
        version: 1,
        archived: false,
      }),
    );
    const dto = presentPart(saved, manufacturer.name);
    await writeRevision(tx, saved.id, 1, actorId, source, diffParts({}, comparable(dto)));
    return dto;
  };
  // Inside an import's transaction this nests as a savepoint.
  return db.transaction(run);
}

/**
 * Optimistic concurrency: the edit names the version it started from. The row is locked, the version compared,
 * and only then written, so two editors can never overwrite each other silently. A lifecycle change is recorded
 * for the BOM alerts in the same transaction (hence the queue).
 */
export async function updatePart(db: DataSource | EntityManager, queue: JobQueue, actorId: string | null, id: string, body: PartUpdateBody, source: RevisionOrigin = 'edit'): Promise<PartDto> {
  const run = async (tx: EntityManager) => {
    const repo = tx.getRepository(PartEntity);
    const part = await repo.createQueryBuilder('p').setLock('pessimistic_write').where('p.id = :id', { id }).getOne();
    if (!part) throw new NotFoundError('No such part.');
    const currentName = await manufacturerName(tx, part.manufacturerId);
    const before = presentPart(part, currentName);
    if (part.version !== body.version) throw new VersionConflictError(before);

    if (body.parameters !== undefined) {
      const checked = parametersSchemaFor(part.family).safeParse(body.parameters);
      if (!checked.success) {
        throw new ValidationError(checked.error.issues.map((i) => ({ path: ['body', 'parameters', ...i.path.map(String)].join('.'), message: i.message })));
      }
    }
    let manufacturer = { id: part.manufacturerId, name: currentName };
    if (body.manufacturer !== undefined && body.manufacturer.toLowerCase() !== currentName.toLowerCase()) {
      manufacturer = await findOrCreateManufacturer(tx, body.manufacturer);
    }
    const next: Part = {
      ...part,
      manufacturerId: manufacturer.id,
      partNumber: body.partNumber ?? part.partNumber,
      partNumberKey: partNumberKey(body.partNumber ?? part.partNumber),
      description: body.description ?? part.description,
      lifecycle: body.lifecycle ?? part.lifecycle,
      rohsStatus: body.rohsStatus ?? part.rohsStatus,
      rohsNote: body.rohsNote ?? part.rohsNote,
      package: body.package ?? part.package,
      pinLayout: body.pinLayout !== undefined ? body.pinLayout : part.pinLayout,
      pinMap: body.pinMap !== undefined || body.pinLayout !== undefined ? resolvePinMap(body.pinLayout ?? part.pinLayout, body.pinMap) : part.pinMap,
      parameters: (body.parameters as Part['parameters']) ?? part.parameters,
      tags: body.tags ?? part.tags,
    };
    if ((next.partNumberKey !== part.partNumberKey || next.manufacturerId !== part.manufacturerId) &&
      (await repo.existsBy({ manufacturerId: next.manufacturerId, partNumberKey: next.partNumberKey }))) {
      throw new ConflictError(`${manufacturer.name} already has a part numbered ${next.partNumber}.`, 'part_exists');
    }
    const changes = diffParts(comparable(before), comparable(presentPart(next, manufacturer.name)));
    if (!changes.length) return before;
    next.version = part.version + 1;
    const saved = await repo.save(next);
    await writeRevision(tx, id, saved.version, actorId, source, changes);
    if (saved.lifecycle !== part.lifecycle) await recordLifecycleChange(tx, queue, { partId: id, before: part.lifecycle, after: saved.lifecycle, actorId });
    return presentPart(saved, manufacturer.name);
  };
  return db.transaction(run);
}

/** Archiving hides a part from searches but keeps it, its datasheets and its history. */
export async function setArchived(db: DataSource, actorId: string, id: string, archived: boolean): Promise<PartDto> {
  return db.transaction(async (tx) => {
    const repo = tx.getRepository(PartEntity);
    const part = await repo.createQueryBuilder('p').setLock('pessimistic_write').where('p.id = :id', { id }).getOne();
    if (!part) throw new NotFoundError('No such part.');
    const name = await manufacturerName(tx, part.manufacturerId);
    if (part.archived === archived) return presentPart(part, name);
    part.archived = archived;
    part.version += 1;
    const saved = await repo.save(part);
    await writeRevision(tx, id, saved.version, actorId, archived ? 'archived' : 'restored', [{ field: 'archived', before: !archived, after: archived }]);
    return presentPart(saved, name);
  });
}

export async function listRevisions(db: DataSource, partId: string): Promise<PartRevisionDto[]> {
  if (!(await db.getRepository(PartEntity).existsBy({ id: partId }))) throw new NotFoundError('No such part.');
  const rows: {
    id: string;
    version: number;
    actor_id: string | null;
    actor_name: string | null;
    source: string;
    datasheet_id: string | null;
    datasheet_file_name: string | null;
    changes: RevisionChange[];
    created_at: Date;
  }[] =
    await db.query(
      `SELECT r.id, r.version, r.actor_id, u.name AS actor_name, r.source, r.changes, r.created_at,
              r.datasheet_id, d.file_name AS datasheet_file_name
         FROM part_revisions r
         LEFT JOIN users u ON u.id = r.actor_id
         LEFT JOIN datasheets d ON d.id = r.datasheet_id
        WHERE r.part_id = $1 ORDER BY r.version DESC, r.created_at DESC`,
      [partId],
    );
  return rows.map((r) => ({
    id: r.id,
    version: r.version,
    actor: r.actor_id ? { id: r.actor_id, name: r.actor_name ?? 'Former account' } : null,
    source: r.source,
    datasheet: r.datasheet_id ? { id: r.datasheet_id, fileName: r.datasheet_file_name ?? 'Datasheet' } : null,
    changes: r.changes,
    createdAt: new Date(r.created_at).toISOString(),
  }));
}
