import { z } from 'zod';
import { EmailSchema, NewPasswordSchema, PersonNameSchema } from './common';
import { RoleSchema } from './roles';

export const InvitationCreateBodySchema = z.object({
  email: EmailSchema,
  role: RoleSchema,
});
export type InvitationCreateBody = z.infer<typeof InvitationCreateBodySchema>;

export const InvitationStatusSchema = z.enum(['pending', 'accepted', 'expired', 'revoked']);
export type InvitationStatus = z.infer<typeof InvitationStatusSchema>;

export const InvitationDtoSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: RoleSchema,
  status: InvitationStatusSchema,
  invitedBy: z.string().nullable(),
  createdAt: z.iso.datetime(),
  expiresAt: z.iso.datetime(),
});
export type InvitationDto = z.infer<typeof InvitationDtoSchema>;

export const InvitationListResponseSchema = z.object({ items: z.array(InvitationDtoSchema) });
export type InvitationListResponse = z.infer<typeof InvitationListResponseSchema>;

export const TokenSchema = z.string().trim().min(20, 'This link is incomplete').max(200);

export const InvitationAcceptBodySchema = z.object({
  token: TokenSchema,
  name: PersonNameSchema,
  password: NewPasswordSchema,
});
export type InvitationAcceptBody = z.infer<typeof InvitationAcceptBodySchema>;

/** What the accept page shows before the person sets a password. */
export const InvitationPreviewSchema = z.object({ email: z.string(), role: RoleSchema });
export type InvitationPreview = z.infer<typeof InvitationPreviewSchema>;

export const INVITATION_LIFETIME_HOURS = 72;
