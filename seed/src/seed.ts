import type { DataSource } from 'typeorm';
import { PartCreateBodySchema } from '@understudy/shared-types';
import { EquivalentEntity, PartEntity, UserEntity } from '@understudy/backend/src/entities';
import { orderedPair } from '@understudy/backend/src/modules/equivalents/equivalents.service';
import { hashPassword } from '@understudy/backend/src/lib/passwords';
import { createPart } from '@understudy/backend/src/modules/parts/parts.service';
import { DEMO_EQUIVALENTS, DEMO_PARTS } from './catalog';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-users';

export interface SeedReport {
  users: number;
  parts: number;
  equivalents: number;
}

/**
 * Loads the demo scenario section by section, each only into an empty table, so a database that already has
 * people or parts keeps them untouched. Parts go through the catalog service, so each gets its first revision.
 */
export async function seedDemoData(db: DataSource): Promise<SeedReport> {
  const report: SeedReport = { users: 0, parts: 0, equivalents: 0 };
  if ((await db.getRepository(UserEntity).count()) === 0) {
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    await db.transaction(async (tx) => {
      const repo = tx.getRepository(UserEntity);
      await repo.save(DEMO_USERS.map((u) => repo.create({ ...u, passwordHash, disabled: false, lastSignInAt: null })));
    });
    report.users = DEMO_USERS.length;
  }
  if ((await db.getRepository(PartEntity).count()) === 0) {
    const editor = await db.getRepository(UserEntity).findOneBy({ email: 'editor@understudy.test' });
    await db.transaction(async (tx) => {
      for (const part of DEMO_PARTS) await createPart(tx, editor?.id ?? null, PartCreateBodySchema.parse(part), 'seed');
    });
    report.parts = DEMO_PARTS.length;
  }
  if ((await db.getRepository(EquivalentEntity).count()) === 0) report.equivalents = await seedEquivalents(db);
  return report;
}

/** The editor's rulings, stored directly: at seed time no BOM watches any part, so there is nobody to alert. */
async function seedEquivalents(db: DataSource): Promise<number> {
  const editor = await db.getRepository(UserEntity).findOneBy({ email: 'editor@understudy.test' });
  const rows: { id: string; part_number: string }[] = await db.query(`SELECT id, part_number FROM parts WHERE part_number = ANY($1)`, [
    DEMO_EQUIVALENTS.flatMap((e) => [e.a, e.b]),
  ]);
  const idOf = new Map(rows.map((r) => [r.part_number, r.id]));
  const repo = db.getRepository(EquivalentEntity);
  const rulings = DEMO_EQUIVALENTS.filter((e) => idOf.has(e.a) && idOf.has(e.b)).map((e) => {
    const [partA, partB] = orderedPair(idOf.get(e.a)!, idOf.get(e.b)!);
    return repo.create({ partA, partB, status: e.status, use: e.use, note: e.note, decidedById: editor?.id ?? null });
  });
  await repo.save(rulings);
  return rulings.length;
}
