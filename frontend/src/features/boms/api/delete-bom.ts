import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { bomKeys } from '../keys';

export function deleteBom(id: string): Promise<undefined> {
  return api.delete(`/boms/${encodeURIComponent(id)}`);
}

export function useDeleteBom() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteBom,
    onSuccess: (_, id) => {
      queryClient.removeQueries({ queryKey: bomKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: bomKeys.lists() });
    },
  });
}
