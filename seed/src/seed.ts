import type { DataSource } from 'typeorm';
import { UserEntity } from '@understudy/backend/src/entities';
import { hashPassword } from '@understudy/backend/src/lib/passwords';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-users';

export interface SeedReport {
  seeded: boolean;
  users: number;
}

/** Loads the demo scenario into an empty database; leaves a database that already has people alone. */
export async function seedDemoData(db: DataSource): Promise<SeedReport> {
  const users = db.getRepository(UserEntity);
  if ((await users.count()) > 0) return { seeded: false, users: 0 };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  await db.transaction(async (tx) => {
    const repo = tx.getRepository(UserEntity);
    await repo.save(DEMO_USERS.map((u) => repo.create({ ...u, passwordHash, disabled: false, lastSignInAt: null })));
  });
  return { seeded: true, users: DEMO_USERS.length };
}
