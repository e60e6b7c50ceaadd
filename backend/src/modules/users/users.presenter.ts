import type { CurrentUser, UserDto } from '@understudy/shared-types';
import type { User } from '../../entities';

/** Whitelists what leaves the server: never the password hash. */
export function presentUser(user: User): UserDto {
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    disabled: user.disabled,
    createdAt: user.createdAt.toISOString(),
    updatedAt: user.updatedAt.toISOString(),
    lastSignInAt: user.lastSignInAt ? user.lastSignInAt.toISOString() : null,
  };
}

export function presentCurrentUser(user: User): CurrentUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
