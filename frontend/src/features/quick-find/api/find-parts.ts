import { queryOptions, useQuery } from '@tanstack/react-query';
import { PartListResponseSchema, type PartDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { quickFindKeys } from '../keys';

/** How many candidates the server sends for the client to re-rank. */
export const QUICK_FIND_CANDIDATES = 20;
/** Fewer characters than this say too little to search on. */
export const QUICK_FIND_MIN_CHARS = 2;

/** The server's first page for a free-text search; it already forgives spacing and dashes in part numbers. */
export async function findParts(q: string, signal?: AbortSignal): Promise<PartDto[]> {
  const page = await api.get('/parts', PartListResponseSchema, {
    query: { q, pageSize: String(QUICK_FIND_CANDIDATES) },
    signal,
  });
  return page.items;
}

export const findPartsQueryOptions = (q: string) =>
  queryOptions({
    queryKey: quickFindKeys.search(q),
    queryFn: ({ signal }) => findParts(q, signal),
    staleTime: 30_000,
  });

export function useFindParts(q: string) {
  return useQuery({ ...findPartsQueryOptions(q), enabled: q.length >= QUICK_FIND_MIN_CHARS });
}
