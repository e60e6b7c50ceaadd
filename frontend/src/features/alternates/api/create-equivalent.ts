import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { EquivalentDtoSchema, type EquivalentBody, type EquivalentDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { alternatesKeys, equivalentKeys } from '../keys';

export function createEquivalent(body: EquivalentBody): Promise<EquivalentDto> {
  return api.post('/equivalents', body, EquivalentDtoSchema);
}

/** A ruling moves rows (approved ones come first) and flags, in every ranking and position that shows the pair. */
export function invalidateAfterRuling(queryClient: QueryClient) {
  void queryClient.invalidateQueries({ queryKey: equivalentKeys.all });
  void queryClient.invalidateQueries({ queryKey: alternatesKeys.lists() });
  void queryClient.invalidateQueries({ queryKey: alternatesKeys.ranks() });
}

export function useCreateEquivalent() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createEquivalent, onSuccess: () => invalidateAfterRuling(queryClient) });
}
