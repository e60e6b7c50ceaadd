import { IsNull, type DataSource } from 'typeorm';
import {
  INVITATION_LIFETIME_HOURS,
  type InvitationAcceptBody,
  type InvitationCreateBody,
  type InvitationDto,
  type InvitationStatus,
} from '@understudy/shared-types';
import { InvitationEntity, UserEntity, type Invitation, type User } from '../../entities';
import { ConflictError, GoneError, NotFoundError } from '../../errors';
import { hashPassword } from '../../lib/passwords';
import { hashToken, newToken } from '../../lib/tokens';
import type { Mailer } from '../../mail/mailer';
import { invitationMail } from '../../mail/templates';
import { recordAudit } from '../audit-events/audit-events.service';
import { findUserByEmail } from '../users/users.service';

export function invitationStatus(inv: Invitation, now = new Date()): InvitationStatus {
  if (inv.acceptedAt) return 'accepted';
  if (inv.revokedAt) return 'revoked';
  if (inv.expiresAt <= now) return 'expired';
  return 'pending';
}

export async function listInvitations(db: DataSource): Promise<InvitationDto[]> {
  const rows = await db
    .getRepository(InvitationEntity)
    .createQueryBuilder('i')
    .leftJoin('users', 'u', 'u.id = i.invited_by_id')
    .addSelect('u.name', 'inviter_name')
    .orderBy('i.created_at', 'DESC')
    .getRawAndEntities();
  return rows.entities.map((inv, i) => ({
    id: inv.id,
    email: inv.email,
    role: inv.role,
    status: invitationStatus(inv),
    invitedBy: (rows.raw[i] as { inviter_name: string | null }).inviter_name ?? null,
    createdAt: inv.createdAt.toISOString(),
    expiresAt: inv.expiresAt.toISOString(),
  }));
}

/**
 * Stores only the token's hash, then mails the link. If the mail cannot be sent the invitation is
 * rolled back, so the admin never sees a pending invitation nobody received.
 */
export async function createInvitation(
  db: DataSource,
  mailer: Mailer,
  appUrl: string,
  inviter: User,
  body: InvitationCreateBody,
): Promise<InvitationDto> {
  if (await findUserByEmail(db, body.email)) throw new ConflictError('That address already has an account.', 'email_taken');
  const { token, tokenHash } = newToken();
  const invitation = await db.transaction(async (tx) => {
    const repo = tx.getRepository(InvitationEntity);
    const pending = await repo
      .createQueryBuilder('i')
      .where('lower(i.email) = lower(:email)', { email: body.email })
      .andWhere('i.accepted_at IS NULL AND i.revoked_at IS NULL AND i.expires_at > now()')
      .getCount();
    if (pending) throw new ConflictError('That address already has a pending invitation; revoke it to send a new one.', 'invitation_pending');
    const saved = await repo.save(
      repo.create({
        email: body.email,
        role: body.role,
        tokenHash,
        invitedById: inviter.id,
        expiresAt: new Date(Date.now() + INVITATION_LIFETIME_HOURS * 3_600_000),
        acceptedAt: null,
        revokedAt: null,
      }),
    );
    await recordAudit(tx, { actorId: inviter.id, action: 'invitation.created', subjectType: 'Invitation', subjectId: saved.id, after: { email: saved.email, role: saved.role } });
    const link = `${appUrl}/accept-invitation?token=${encodeURIComponent(token)}`;
    await mailer.send(invitationMail({ to: body.email, role: body.role, inviterName: inviter.name, link }));
    return saved;
  });
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    status: 'pending',
    invitedBy: inviter.name,
    createdAt: invitation.createdAt.toISOString(),
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

export async function revokeInvitation(db: DataSource, actor: User, id: string): Promise<void> {
  const repo = db.getRepository(InvitationEntity);
  const inv = await repo.findOneBy({ id });
  if (!inv) throw new NotFoundError('No such invitation.');
  if (inv.acceptedAt) throw new ConflictError('That invitation was already accepted.', 'invitation_accepted');
  if (inv.revokedAt) return;
  await repo.update({ id }, { revokedAt: new Date() });
  await recordAudit(db, { actorId: actor.id, action: 'invitation.revoked', subjectType: 'Invitation', subjectId: id });
}

async function findUsableInvitation(db: DataSource, token: string): Promise<Invitation> {
  const inv = await db.getRepository(InvitationEntity).findOneBy({ tokenHash: hashToken(token) });
  if (!inv || inv.revokedAt || inv.acceptedAt) {
    throw new NotFoundError('This invitation link is not valid. It may have been used or revoked already.', 'invitation_invalid');
  }
  if (inv.expiresAt <= new Date()) throw new GoneError('This invitation has expired. Ask an admin for a new one.', 'invitation_expired');
  return inv;
}

export async function previewInvitation(db: DataSource, token: string) {
  const inv = await findUsableInvitation(db, token);
  return { email: inv.email, role: inv.role };
}

/** Creates the account and marks the invitation used in one transaction; a second use finds it accepted. */
export async function acceptInvitation(db: DataSource, body: InvitationAcceptBody): Promise<User> {
  const inv = await findUsableInvitation(db, body.token);
  const passwordHash = await hashPassword(body.password);
  return db.transaction(async (tx) => {
    const claimed = await tx.getRepository(InvitationEntity).update({ id: inv.id, acceptedAt: IsNull(), revokedAt: IsNull() }, { acceptedAt: new Date() });
    if (!claimed.affected) throw new NotFoundError('This invitation link is not valid. It may have been used or revoked already.', 'invitation_invalid');
    const taken = await tx.getRepository(UserEntity).createQueryBuilder('u').where('lower(u.email) = lower(:email)', { email: inv.email }).getCount();
    if (taken) throw new ConflictError('That address already has an account.', 'email_taken');
    const users = tx.getRepository(UserEntity);
    const user = await users.save(users.create({ email: inv.email, name: body.name, role: inv.role, passwordHash, disabled: false, lastSignInAt: new Date() }));
    await recordAudit(tx, { actorId: user.id, action: 'invitation.accepted', subjectType: 'Invitation', subjectId: inv.id, after: { userId: user.id, role: user.role } });
    return user;
  });
}
