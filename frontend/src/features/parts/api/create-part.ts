import { useMutation, useQueryClient } from '@tanstack/react-query';
import { PartDtoSchema, type PartCreateInput, type PartDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { partKeys } from '../keys';

export function createPart(body: PartCreateInput): Promise<PartDto> {
  return api.post('/parts', body, PartDtoSchema);
}

export function useCreatePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createPart,
    onSuccess: (part) => {
      queryClient.setQueryData(partKeys.detail(part.id), part);
      void queryClient.invalidateQueries({ queryKey: partKeys.lists() });
    },
  });
}
