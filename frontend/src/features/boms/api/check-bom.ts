import { useMutation, useQueryClient } from '@tanstack/react-query';
import { BomDetailDtoSchema, type BomDetailDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { bomKeys } from '../keys';

/** Matches the lines again against today's catalog and records a check in the history. */
export function checkBom(id: string): Promise<BomDetailDto> {
  return api.post(`/boms/${encodeURIComponent(id)}/check`, undefined, BomDetailDtoSchema);
}

export function useCheckBom() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: checkBom,
    onSuccess: (bom) => {
      queryClient.setQueryData(bomKeys.detail(bom.id), bom);
      // Lines' options hang under the detail key; new matches may mean new options.
      void queryClient.invalidateQueries({ queryKey: bomKeys.detail(bom.id), predicate: (q) => q.queryKey.length > 3 });
      void queryClient.invalidateQueries({ queryKey: bomKeys.lists() });
    },
  });
}
