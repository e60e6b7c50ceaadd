import { z } from 'zod';
import { EmailSchema } from './common';
import { RoleSchema } from './roles';

export const SignInBodySchema = z.object({
  email: EmailSchema,
  // Any non-empty password may be tried; the length rule applies only when one is chosen.
  password: z.string().min(1, 'Enter your password').max(200),
});
export type SignInBody = z.infer<typeof SignInBodySchema>;

export const CurrentUserSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
});
export type CurrentUser = z.infer<typeof CurrentUserSchema>;

export const MeResponseSchema = z.object({ user: CurrentUserSchema });
export type MeResponse = z.infer<typeof MeResponseSchema>;

/** The one message for an unknown e-mail, a wrong password and a disabled account. */
export const SIGN_IN_FAILED_MESSAGE = 'That e-mail and password do not match an active account.';
