import { queryOptions, useQuery } from '@tanstack/react-query';
import { DatasheetListResponseSchema, type DatasheetListItem, type DatasheetStatus } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { datasheetKeys, type DatasheetFilters } from '../keys';

/** Still with the parser: screens showing these poll until they settle. */
export function isInProgress(status: DatasheetStatus): boolean {
  return status === 'queued' || status === 'parsing';
}

export const LIST_LIMIT = 100;

/** Newest first, as the API sends them. */
export async function getDatasheets(filters: DatasheetFilters, signal?: AbortSignal): Promise<DatasheetListItem[]> {
  const { items } = await api.get('/datasheets', DatasheetListResponseSchema, {
    query: { partId: filters.partId, status: filters.status, limit: String(LIST_LIMIT) },
    signal,
  });
  return items;
}

function normalise(filters: DatasheetFilters): DatasheetFilters {
  return {
    ...(filters.partId ? { partId: filters.partId } : {}),
    ...(filters.status ? { status: filters.status } : {}),
  };
}

export const datasheetsQueryOptions = (filters: DatasheetFilters = {}) => {
  const f = normalise(filters);
  return queryOptions({
    queryKey: datasheetKeys.list(f),
    queryFn: ({ signal }) => getDatasheets(f, signal),
    // Parsing takes seconds: follow it closely, then only look now and then for other people's uploads.
    refetchInterval: (query) => (query.state.data?.some((d) => isInProgress(d.status)) ? 1_000 : 30_000),
  });
};

export function useDatasheets(filters: DatasheetFilters = {}) {
  return useQuery(datasheetsQueryOptions(filters));
}
