import { useMutation } from '@tanstack/react-query';
import type { PasswordResetCompleteBody } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';

export async function completePasswordReset(body: PasswordResetCompleteBody): Promise<void> {
  await api.post('/password-resets/complete', body);
}

export function useCompletePasswordReset() {
  return useMutation({ mutationFn: completePasswordReset });
}
