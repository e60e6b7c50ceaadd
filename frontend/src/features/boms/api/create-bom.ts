import { useMutation, useQueryClient } from '@tanstack/react-query';
import { BomDetailDtoSchema, type BomCreateBody, type BomDetailDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { bomKeys } from '../keys';

/** Saves the previewed text with its mapping; the answer is the first check, done. */
export function createBom(body: BomCreateBody): Promise<BomDetailDto> {
  return api.post('/boms', body, BomDetailDtoSchema);
}

export function useCreateBom() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createBom,
    onSuccess: (bom) => {
      queryClient.setQueryData(bomKeys.detail(bom.id), bom);
      void queryClient.invalidateQueries({ queryKey: bomKeys.lists() });
    },
  });
}
