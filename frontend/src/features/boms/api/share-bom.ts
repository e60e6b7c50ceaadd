import { useMutation, useQueryClient } from '@tanstack/react-query';
import { BomDetailDtoSchema, type BomDetailDto, type BomShareBody } from '@understudy/shared-types';
import { apiRequest } from '../../../lib/api-client';
import { bomKeys } from '../keys';

/** Replaces the whole list of colleagues the BOM is shared with (read-only for them). */
export function shareBom({ id, body }: { id: string; body: BomShareBody }): Promise<BomDetailDto> {
  return apiRequest(`/boms/${encodeURIComponent(id)}/shares`, { method: 'PUT', body, schema: BomDetailDtoSchema });
}

export function useShareBom() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: shareBom,
    onSuccess: (bom) => {
      queryClient.setQueryData(bomKeys.detail(bom.id), bom);
      void queryClient.invalidateQueries({ queryKey: bomKeys.lists() });
    },
  });
}
