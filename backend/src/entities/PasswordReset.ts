import { EntitySchema } from 'typeorm';

export interface PasswordReset {
  id: string;
  userId: string;
  /** SHA-256 of the token sent by e-mail. */
  tokenHash: string;
  expiresAt: Date;
  usedAt: Date | null;
  createdAt: Date;
}

export const PasswordResetEntity = new EntitySchema<PasswordReset>({
  name: 'PasswordReset',
  tableName: 'password_resets',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    userId: { type: 'uuid', name: 'user_id' },
    tokenHash: { type: 'char', length: 64, name: 'token_hash', unique: true },
    expiresAt: { type: 'timestamptz', name: 'expires_at' },
    usedAt: { type: 'timestamptz', name: 'used_at', nullable: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
  },
});
