import type { DataSource } from 'typeorm';
import { UserEntity, type User } from '../../entities';
import { dummyPasswordHash, verifyPassword } from '../../lib/passwords';
import { recordAudit } from '../audit-events/audit-events.service';
import { findUserByEmail } from '../users/users.service';

/** Returns the account when the e-mail and password match an active one, otherwise null — never which part failed. */
export async function verifyCredentials(db: DataSource, email: string, password: string): Promise<User | null> {
  const user = await findUserByEmail(db, email);
  if (!user) {
    await verifyPassword(await dummyPasswordHash(), password);
    return null;
  }
  const matches = await verifyPassword(user.passwordHash, password);
  if (!matches || user.disabled) return null;
  return user;
}

export async function recordSignIn(db: DataSource, user: User): Promise<void> {
  user.lastSignInAt = new Date();
  await db.getRepository(UserEntity).update({ id: user.id }, { lastSignInAt: user.lastSignInAt });
  await recordAudit(db, { actorId: user.id, action: 'auth.signed_in', subjectType: 'User', subjectId: user.id });
}
