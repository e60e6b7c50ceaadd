import { useMutation } from '@tanstack/react-query';
import type { PasswordResetRequestBody } from '@understudy/shared-types';
import { z } from 'zod';
import { api } from '../../../lib/api-client';

const PasswordResetRequestedSchema = z.object({ message: z.string() });

export async function requestPasswordReset(body: PasswordResetRequestBody): Promise<string> {
  const { message } = await api.post('/password-resets', body, PasswordResetRequestedSchema);
  return message;
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
