import { IsNull, type DataSource } from 'typeorm';
import { PASSWORD_RESET_LIFETIME_MINUTES } from '@understudy/shared-types';
import { PasswordResetEntity, UserEntity } from '../../entities';
import { GoneError, NotFoundError } from '../../errors';
import { hashPassword } from '../../lib/passwords';
import { hashToken, newToken } from '../../lib/tokens';
import type { Mailer } from '../../mail/mailer';
import { passwordResetMail } from '../../mail/templates';
import { recordAudit } from '../audit-events/audit-events.service';
import { findUserByEmail } from '../users/users.service';

/** Sends a link to an active account; says nothing about whether the address has one. */
export async function requestPasswordReset(db: DataSource, mailer: Mailer, appUrl: string, email: string): Promise<void> {
  const user = await findUserByEmail(db, email);
  if (!user || user.disabled) return;
  const { token, tokenHash } = newToken();
  const repo = db.getRepository(PasswordResetEntity);
  const reset = await repo.save(
    repo.create({ userId: user.id, tokenHash, expiresAt: new Date(Date.now() + PASSWORD_RESET_LIFETIME_MINUTES * 60_000), usedAt: null }),
  );
  try {
    await mailer.send(passwordResetMail({ to: user.email, name: user.name, link: `${appUrl}/reset-password?token=${encodeURIComponent(token)}` }));
  } catch (err) {
    await repo.delete({ id: reset.id });
    throw err;
  }
  await recordAudit(db, { actorId: null, action: 'password_reset.requested', subjectType: 'User', subjectId: user.id });
}

/** Sets the new password, burns the token and every other open reset of that account, and ends its sessions. */
export async function completePasswordReset(db: DataSource, token: string, password: string): Promise<void> {
  const repo = db.getRepository(PasswordResetEntity);
  const reset = await repo.findOneBy({ tokenHash: hashToken(token) });
  if (!reset || reset.usedAt) throw new NotFoundError('This reset link is not valid. It may have been used already.', 'reset_invalid');
  if (reset.expiresAt <= new Date()) throw new GoneError('This reset link has expired. Ask for a new one.', 'reset_expired');
  const passwordHash = await hashPassword(password);
  await db.transaction(async (tx) => {
    const claimed = await tx.getRepository(PasswordResetEntity).update({ id: reset.id, usedAt: IsNull() }, { usedAt: new Date() });
    if (!claimed.affected) throw new NotFoundError('This reset link is not valid. It may have been used already.', 'reset_invalid');
    await tx.getRepository(PasswordResetEntity).update({ userId: reset.userId, usedAt: IsNull() }, { usedAt: new Date() });
    await tx.getRepository(UserEntity).update({ id: reset.userId }, { passwordHash });
    await tx.query(`DELETE FROM sessions WHERE sess->>'userId' = $1`, [reset.userId]);
    await recordAudit(tx, { actorId: reset.userId, action: 'password_reset.completed', subjectType: 'User', subjectId: reset.userId });
  });
}
