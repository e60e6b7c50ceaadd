import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { invalidateAfterRuling } from './create-equivalent';

export async function deleteEquivalent(id: string): Promise<void> {
  await api.delete(`/equivalents/${encodeURIComponent(id)}`);
}

export function useDeleteEquivalent() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deleteEquivalent, onSuccess: () => invalidateAfterRuling(queryClient) });
}
