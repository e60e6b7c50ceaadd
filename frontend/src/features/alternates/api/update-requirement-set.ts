import { useMutation, useQueryClient } from '@tanstack/react-query';
import { RequirementSetDtoSchema, type RequirementSetBody, type RequirementSetDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { requirementSetKeys } from '../keys';

export type RequirementSetUpdate = Partial<RequirementSetBody>;

export function updateRequirementSet({ id, body }: { id: string; body: RequirementSetUpdate }): Promise<RequirementSetDto> {
  return api.patch(`/requirement-sets/${encodeURIComponent(id)}`, body, RequirementSetDtoSchema);
}

export function useUpdateRequirementSet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRequirementSet,
    onSuccess: (set) => {
      queryClient.setQueryData(requirementSetKeys.detail(set.id), set);
      void queryClient.invalidateQueries({ queryKey: requirementSetKeys.lists() });
      // New requirements rank differently.
      void queryClient.invalidateQueries({ queryKey: requirementSetKeys.results(set.id) });
    },
  });
}
