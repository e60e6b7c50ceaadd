import type { DataSource } from 'typeorm';
import { PartCreateBodySchema } from '@understudy/shared-types';
import { PartEntity, UserEntity } from '@understudy/backend/src/entities';
import { hashPassword } from '@understudy/backend/src/lib/passwords';
import { createPart } from '@understudy/backend/src/modules/parts/parts.service';
import { DEMO_PARTS } from './catalog';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-users';

export interface SeedReport {
  users: number;
  parts: number;
}

/**
 * Loads the demo scenario section by section, each only into an empty table, so a database that already has
 * people or parts keeps them untouched. Parts go through the catalog service, so each gets its first revision.
 */
export async function seedDemoData(db: DataSource): Promise<SeedReport> {
  const report: SeedReport = { users: 0, parts: 0 };
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
  return report;
}
