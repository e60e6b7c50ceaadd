import type { DataSource } from 'typeorm';
import type { UserUpdateBody } from '@understudy/shared-types';
import { UserEntity, type User } from '../../entities';
import { ConflictError, NotFoundError } from '../../errors';
import { hashPassword } from '../../lib/passwords';
import { recordAudit } from '../audit-events/audit-events.service';

export function findUserByEmail(db: DataSource, email: string): Promise<User | null> {
  return db.getRepository(UserEntity).createQueryBuilder('u').where('lower(u.email) = lower(:email)', { email }).getOne();
}

export function listUsers(db: DataSource): Promise<User[]> {
  return db.getRepository(UserEntity).find({ order: { createdAt: 'ASC' } });
}

export async function createUser(
  db: DataSource,
  input: { email: string; name: string; password: string; role: User['role'] },
): Promise<User> {
  if (await findUserByEmail(db, input.email)) throw new ConflictError('An account with that e-mail already exists.', 'email_taken');
  const repo = db.getRepository(UserEntity);
  return repo.save(repo.create({ email: input.email, name: input.name, role: input.role, passwordHash: await hashPassword(input.password), disabled: false, lastSignInAt: null }));
}

/**
 * Role and status changes by an admin. Guards keep the team from locking itself out:
 * nobody changes their own role or disables themselves, and the last active admin stays one.
 */
export async function updateUser(db: DataSource, actor: User, id: string, changes: UserUpdateBody): Promise<User> {
  return db.transaction(async (tx) => {
    const repo = tx.getRepository(UserEntity);
    // Lock admins so two concurrent demotions cannot both pass the last-admin check.
    await tx.query(`SELECT id FROM users WHERE role = 'admin' FOR UPDATE`);
    const user = await repo.findOneBy({ id });
    if (!user) throw new NotFoundError('No such person.');
    const before = { role: user.role, disabled: user.disabled, name: user.name };

    if (user.id === actor.id && changes.role !== undefined && changes.role !== user.role) {
      throw new ConflictError('You cannot change your own role; ask another admin.', 'self_role_change');
    }
    if (user.id === actor.id && changes.disabled === true) {
      throw new ConflictError('You cannot disable your own account.', 'self_disable');
    }
    const losesAdmin = user.role === 'admin' && !user.disabled && ((changes.role && changes.role !== 'admin') || changes.disabled === true);
    if (losesAdmin) {
      const activeAdmins = await repo.countBy({ role: 'admin', disabled: false });
      if (activeAdmins <= 1) throw new ConflictError('Understudy needs at least one active admin.', 'last_admin');
    }

    if (changes.role !== undefined) user.role = changes.role;
    if (changes.disabled !== undefined) user.disabled = changes.disabled;
    if (changes.name !== undefined) user.name = changes.name;
    const saved = await repo.save(user);
    if (changes.disabled === true) {
      // End every session of a disabled account at once.
      await tx.query(`DELETE FROM sessions WHERE sess->>'userId' = $1`, [user.id]);
    }
    await recordAudit(tx, {
      actorId: actor.id,
      action: 'user.updated',
      subjectType: 'User',
      subjectId: user.id,
      before,
      after: { role: saved.role, disabled: saved.disabled, name: saved.name },
    });
    return saved;
  });
}
