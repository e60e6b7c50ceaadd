import { useMutation, useQueryClient } from '@tanstack/react-query';
import { BomLineDtoSchema, type BomDetailDto, type BomLineDto, type BomLineUpdateBody } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { bomKeys } from '../keys';

export interface BomLineUpdate {
  bomId: string;
  lineId: string;
  body: BomLineUpdateBody;
}

/** Confirms or clears a line's match, or chooses or clears its replacement. */
export function updateBomLine({ bomId, lineId, body }: BomLineUpdate): Promise<BomLineDto> {
  return api.patch(`/boms/${encodeURIComponent(bomId)}/lines/${encodeURIComponent(lineId)}`, body, BomLineDtoSchema);
}

export function useUpdateBomLine() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateBomLine,
    onSuccess: (line, { bomId }) => {
      // The line changes at once; the summary counts come back with the refetch.
      queryClient.setQueryData<BomDetailDto>(bomKeys.detail(bomId), (old) =>
        old ? { ...old, lines: old.lines.map((l) => (l.id === line.id ? line : l)) } : old,
      );
      void queryClient.invalidateQueries({ queryKey: bomKeys.detail(bomId) });
      void queryClient.invalidateQueries({ queryKey: bomKeys.lists() });
    },
  });
}
