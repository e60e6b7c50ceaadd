import { useMutation, useQueryClient } from '@tanstack/react-query';
import { EquivalentDtoSchema, type EquivalentBody, type EquivalentDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { invalidateAfterRuling } from './create-equivalent';

export type EquivalentUpdate = Partial<Pick<EquivalentBody, 'status' | 'use' | 'note'>>;

export function updateEquivalent({ id, body }: { id: string; body: EquivalentUpdate }): Promise<EquivalentDto> {
  return api.patch(`/equivalents/${encodeURIComponent(id)}`, body, EquivalentDtoSchema);
}

export function useUpdateEquivalent() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateEquivalent, onSuccess: () => invalidateAfterRuling(queryClient) });
}
