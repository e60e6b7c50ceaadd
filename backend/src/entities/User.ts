import { EntitySchema } from 'typeorm';
import type { Role } from '@understudy/shared-types';

export interface User {
  id: string;
  /** As typed by the person; uniqueness ignores case (unique index on lower(email)). */
  email: string;
  name: string;
  passwordHash: string;
  role: Role;
  disabled: boolean;
  lastSignInAt: Date | null;
  createdAt: Date;
  updatedAt: Date;
}

export const UserEntity = new EntitySchema<User>({
  name: 'User',
  tableName: 'users',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    email: { type: 'varchar', length: 254 },
    name: { type: 'varchar', length: 120 },
    passwordHash: { type: 'varchar', length: 255, name: 'password_hash' },
    role: { type: 'varchar', length: 16 },
    disabled: { type: 'boolean', default: false },
    lastSignInAt: { type: 'timestamptz', name: 'last_sign_in_at', nullable: true },
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
  },
});
