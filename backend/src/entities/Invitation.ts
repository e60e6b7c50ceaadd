import { EntitySchema } from 'typeorm';
import type { Role } from '@understudy/shared-types';

export interface Invitation {
  id: string;
  email: string;
  role: Role;
  /** SHA-256 of the token sent by e-mail; the token itself is never stored. */
  tokenHash: string;
  invitedById: string | null;
  expiresAt: Date;
  acceptedAt: Date | null;
  revokedAt: Date | null;
  createdAt: Date;
}

export const InvitationEntity = new EntitySchema<Invitation>({
  name: 'Invitation',
  tableName: 'invitations',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    email: { type: 'varchar', length: 254 },
    role: { type: 'varchar', length: 16 },
    tokenHash: { type: 'char', length: 64, name: 'token_hash', unique: true },
    invitedById: { type: 'uuid', name: 'invited_by_id', nullable: true },
    expiresAt: { type: 'timestamptz', name: 'expires_at' },
    acceptedAt: { type: 'timestamptz', name: 'accepted_at', nullable: true },
    revokedAt: { type: 'timestamptz', name: 'revoked_at', nullable: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
  },
});
