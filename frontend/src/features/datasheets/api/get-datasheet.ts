import { queryOptions, useQuery } from '@tanstack/react-query';
import { DatasheetDtoSchema, type DatasheetDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { datasheetKeys } from '../keys';
import { isInProgress } from './get-datasheets';

export function getDatasheet(id: string, signal?: AbortSignal): Promise<DatasheetDto> {
  return api.get(`/datasheets/${encodeURIComponent(id)}`, DatasheetDtoSchema, { signal });
}

export const datasheetQueryOptions = (id: string) =>
  queryOptions({
    queryKey: datasheetKeys.detail(id),
    queryFn: ({ signal }) => getDatasheet(id, signal),
    refetchInterval: (query) => (query.state.data && isInProgress(query.state.data.status) ? 1_000 : false),
  });

export function useDatasheet(id: string) {
  return useQuery(datasheetQueryOptions(id));
}
