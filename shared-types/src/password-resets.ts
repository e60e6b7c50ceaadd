import { z } from 'zod';
import { EmailSchema, NewPasswordSchema } from './common';
import { TokenSchema } from './invitations';

export const PasswordResetRequestBodySchema = z.object({ email: EmailSchema });
export type PasswordResetRequestBody = z.infer<typeof PasswordResetRequestBodySchema>;

export const PasswordResetCompleteBodySchema = z.object({
  token: TokenSchema,
  password: NewPasswordSchema,
});
export type PasswordResetCompleteBody = z.infer<typeof PasswordResetCompleteBodySchema>;

export const PASSWORD_RESET_LIFETIME_MINUTES = 60;

/** Same answer whether or not the address has an account, so the form cannot be used to probe for accounts. */
export const PASSWORD_RESET_REQUESTED_MESSAGE =
  'If that address belongs to an active account, a reset link is on its way. It works once, for one hour.';
