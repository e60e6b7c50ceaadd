import { randomUUID } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { Role } from '@understudy/shared-types';
import { UserEntity, type User } from '../src/entities';
import { hashPassword } from '../src/lib/passwords';

export const TEST_PASSWORD = 'correct horse battery';

let cachedHash: Promise<string> | undefined;

export async function createUser(db: DataSource, overrides: Partial<Pick<User, 'email' | 'name' | 'role' | 'disabled'>> & { password?: string } = {}): Promise<User> {
  const role: Role = overrides.role ?? 'viewer';
  const passwordHash = overrides.password ? await hashPassword(overrides.password) : await (cachedHash ??= hashPassword(TEST_PASSWORD));
  const repo = db.getRepository(UserEntity);
  return repo.save(
    repo.create({
      email: overrides.email ?? `${role}-${randomUUID().slice(0, 8)}@example.test`,
      name: overrides.name ?? `Test ${role}`,
      role,
      disabled: overrides.disabled ?? false,
      passwordHash,
      lastSignInAt: null,
    }),
  );
}
