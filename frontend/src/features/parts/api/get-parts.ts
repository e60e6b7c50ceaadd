import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { PartListResponseSchema, type PartListResponse } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { partKeys } from '../keys';

/** One page of a catalog search; `query` is already in the API's terms (see lib/search-params). */
export function getParts(query: Record<string, string>, signal?: AbortSignal): Promise<PartListResponse> {
  return api.get('/parts', PartListResponseSchema, { query, signal });
}

export const partsQueryOptions = (query: Record<string, string>) =>
  queryOptions({
    queryKey: partKeys.list(query),
    queryFn: ({ signal }) => getParts(query, signal),
    // Keep the last page on screen while the next search loads, so the table does not flash empty.
    placeholderData: keepPreviousData,
  });

export function useParts(query: Record<string, string>, options: { enabled?: boolean } = {}) {
  return useQuery({ ...partsQueryOptions(query), enabled: options.enabled ?? true });
}
