import { z } from 'zod';

/** Every error the API sends has this shape; `issues` lists field problems on a 400. */
export const ApiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    issues: z
      .array(z.object({ path: z.string(), message: z.string() }))
      .optional(),
  }),
});
export type ApiError = z.infer<typeof ApiErrorSchema>;

export const IdParamsSchema = z.object({ id: z.uuid() });
export type IdParams = z.infer<typeof IdParamsSchema>;

export const EmailSchema = z
  .string()
  .trim()
  .min(1, 'Enter an e-mail address')
  .max(254, 'That e-mail address is too long')
  .pipe(z.email('Enter a valid e-mail address'));

/** Long passphrases beat complex short ones; 10 characters is the floor, 200 a sanity cap for hashing. */
export const NewPasswordSchema = z
  .string()
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');

export const PersonNameSchema = z.string().trim().min(1, 'Enter a name').max(120, 'Use at most 120 characters');

export const HealthSchema = z.object({
  status: z.enum(['ok', 'error']),
  db: z.enum(['ok', 'unreachable']),
});
export type Health = z.infer<typeof HealthSchema>;
