import { ForbiddenError, subject } from '@casl/ability';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import {
  PositionRequirementsSchema,
  type AppAbility,
  type RequirementSetBodySchema,
  type RequirementSetDto,
  type RequirementSetUpdateBodySchema,
} from '@understudy/shared-types';
import { RequirementSetEntity, type RequirementSet } from '../../entities';
import { ForbiddenRequestError, NotFoundError } from '../../errors';

export type RequirementSetInput = z.output<typeof RequirementSetBodySchema>;
export type RequirementSetUpdate = z.output<typeof RequirementSetUpdateBodySchema>;

interface Row {
  id: string;
  owner_id: string;
  owner_name: string;
  name: string;
  design: string;
  requirements: unknown;
  created_at: Date;
  updated_at: Date;
}

const SELECT = `SELECT r.id, r.owner_id, u.name AS owner_name, r.name, r.design, r.requirements, r.created_at, r.updated_at
  FROM requirement_sets r JOIN users u ON u.id = r.owner_id`;

function present(row: Row): RequirementSetDto {
  return {
    id: row.id,
    name: row.name,
    design: row.design,
    // Stored through the same schema; parsing again fills defaults added to the contract since.
    requirements: PositionRequirementsSchema.parse(row.requirements),
    owner: { id: row.owner_id, name: row.owner_name },
    createdAt: new Date(row.created_at).toISOString(),
    updatedAt: new Date(row.updated_at).toISOString(),
  };
}

const notFound = () => new NotFoundError('No such requirement set.');

/**
 * A set someone may not even read answers 404, so a viewer cannot learn that another person's set exists.
 * One they may read but not change (an editor and a viewer's set) answers 403.
 */
function assertCan(ability: AppAbility, action: 'read' | 'update' | 'delete', ownerId: string) {
  const target = subject('Requirement', { ownerId });
  if (ability.cannot('read', target)) throw notFound();
  try {
    ForbiddenError.from(ability).throwUnlessCan(action, target);
  } catch (err) {
    if (err instanceof ForbiddenError) throw new ForbiddenRequestError('Only the person who saved this requirement set can change it.');
    throw err;
  }
}

/** The owner to filter by, or null when the rules let this person read every set (no condition on the rule). */
function readableOwner(ability: AppAbility, userId: string): string | null {
  const unrestricted = ability.rulesFor('read', 'Requirement').some((rule) => !rule.inverted && !rule.conditions);
  return unrestricted ? null : userId;
}

export async function listRequirementSets(db: DataSource, ability: AppAbility, userId: string): Promise<RequirementSetDto[]> {
  const owner = readableOwner(ability, userId);
  const rows: Row[] = await db.query(`${SELECT} WHERE ($1::uuid IS NULL OR r.owner_id = $1) ORDER BY r.updated_at DESC, r.id LIMIT 500`, [owner]);
  return rows.map(present);
}

async function findRow(db: DataSource, id: string): Promise<Row | undefined> {
  const rows: Row[] = await db.query(`${SELECT} WHERE r.id = $1`, [id]);
  return rows[0];
}

export async function getRequirementSet(db: DataSource, ability: AppAbility, id: string): Promise<RequirementSetDto> {
  const row = await findRow(db, id);
  if (!row) throw notFound();
  assertCan(ability, 'read', row.owner_id);
  return present(row);
}

export async function createRequirementSet(db: DataSource, ownerId: string, body: RequirementSetInput): Promise<RequirementSetDto> {
  const repo = db.getRepository(RequirementSetEntity);
  const saved = await repo.save(repo.create({ ownerId, name: body.name, design: body.design, requirements: body.requirements as never }));
  return present((await findRow(db, saved.id))!);
}

export async function updateRequirementSet(db: DataSource, ability: AppAbility, id: string, body: RequirementSetUpdate): Promise<RequirementSetDto> {
  const repo = db.getRepository(RequirementSetEntity);
  const current = await repo.findOneBy({ id });
  if (!current) throw notFound();
  assertCan(ability, 'update', current.ownerId);
  const next: RequirementSet = {
    ...current,
    name: body.name ?? current.name,
    design: body.design ?? current.design,
    requirements: body.requirements ?? current.requirements,
  };
  await repo.save(next);
  return present((await findRow(db, id))!);
}

export async function deleteRequirementSet(db: DataSource, ability: AppAbility, id: string): Promise<void> {
  const repo = db.getRepository(RequirementSetEntity);
  const current = await repo.findOneBy({ id });
  if (!current) throw notFound();
  assertCan(ability, 'delete', current.ownerId);
  await repo.delete({ id });
}
