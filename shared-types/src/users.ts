import { z } from 'zod';
import { RoleSchema } from './roles';

export const UserDtoSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
  disabled: z.boolean(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  lastSignInAt: z.iso.datetime().nullable(),
});
export type UserDto = z.infer<typeof UserDtoSchema>;

export const UserListResponseSchema = z.object({ items: z.array(UserDtoSchema) });
export type UserListResponse = z.infer<typeof UserListResponseSchema>;

export const UserUpdateBodySchema = z
  .object({
    role: RoleSchema.optional(),
    disabled: z.boolean().optional(),
    name: z.string().trim().min(1).max(120).optional(),
  })
  .refine((body) => Object.keys(body).length > 0, { message: 'Nothing to change' });
export type UserUpdateBody = z.infer<typeof UserUpdateBodySchema>;
