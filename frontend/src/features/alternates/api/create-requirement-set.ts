import { useMutation, useQueryClient } from '@tanstack/react-query';
import { RequirementSetDtoSchema, type RequirementSetBody, type RequirementSetDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { requirementSetKeys } from '../keys';

export function createRequirementSet(body: RequirementSetBody): Promise<RequirementSetDto> {
  return api.post('/requirement-sets', body, RequirementSetDtoSchema);
}

export function useCreateRequirementSet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRequirementSet,
    onSuccess: (set) => {
      queryClient.setQueryData(requirementSetKeys.detail(set.id), set);
      void queryClient.invalidateQueries({ queryKey: requirementSetKeys.lists() });
    },
  });
}
