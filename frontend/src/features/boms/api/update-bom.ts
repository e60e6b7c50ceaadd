import { useMutation, useQueryClient } from '@tanstack/react-query';
import { BomDtoSchema, type BomDetailDto, type BomDto, type BomUpdateBody } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { bomKeys } from '../keys';

/** Rename, or watch / stop watching. Read as the list item shape, which a detail answer also satisfies. */
export function updateBom({ id, body }: { id: string; body: BomUpdateBody }): Promise<BomDto> {
  return api.patch(`/boms/${encodeURIComponent(id)}`, body, BomDtoSchema);
}

export function useUpdateBom() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateBom,
    onSuccess: (bom) => {
      queryClient.setQueryData<BomDetailDto>(bomKeys.detail(bom.id), (old) => (old ? { ...old, ...bom } : old));
      void queryClient.invalidateQueries({ queryKey: bomKeys.lists() });
    },
  });
}
