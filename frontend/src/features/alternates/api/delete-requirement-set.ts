import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { requirementSetKeys } from '../keys';

export async function deleteRequirementSet(id: string): Promise<void> {
  await api.delete(`/requirement-sets/${encodeURIComponent(id)}`);
}

export function useDeleteRequirementSet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteRequirementSet,
    onSuccess: (_nothing, id) => {
      queryClient.removeQueries({ queryKey: requirementSetKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: requirementSetKeys.lists() });
    },
  });
}
