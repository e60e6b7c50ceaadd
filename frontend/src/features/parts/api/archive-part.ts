import { useMutation, useQueryClient } from '@tanstack/react-query';
import { PartDtoSchema, type PartDto } from '@understudy/shared-types';
import { apiRequest } from '../../../lib/api-client';
import { partKeys } from '../keys';

/** Archiving hides the part from searches but keeps it, its history and every link to it. */
export function archivePart(id: string): Promise<PartDto> {
  return apiRequest(`/parts/${encodeURIComponent(id)}`, { method: 'DELETE', schema: PartDtoSchema });
}

export function useArchivePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: archivePart,
    onSuccess: (part) => {
      queryClient.setQueryData(partKeys.detail(part.id), part);
      void queryClient.invalidateQueries({ queryKey: partKeys.revisions(part.id) });
      void queryClient.invalidateQueries({ queryKey: partKeys.lists() });
    },
  });
}
