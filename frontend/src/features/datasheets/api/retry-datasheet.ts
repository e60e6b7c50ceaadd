import { useMutation, useQueryClient } from '@tanstack/react-query';
import { DatasheetDtoSchema, type DatasheetDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { datasheetKeys } from '../keys';

/** Sends a datasheet that failed to parse back to the queue. */
export function retryDatasheet(id: string): Promise<DatasheetDto> {
  return api.post(`/datasheets/${encodeURIComponent(id)}/retry`, undefined, DatasheetDtoSchema);
}

export function useRetryDatasheet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryDatasheet,
    onSuccess: (sheet) => {
      queryClient.setQueryData(datasheetKeys.detail(sheet.id), sheet);
      void queryClient.invalidateQueries({ queryKey: datasheetKeys.lists() });
    },
  });
}
