import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { PartListResponseSchema, type FamilyKey, type PartDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { datasheetKeys } from '../keys';

export const PART_SEARCH_SIZE = 8;

/** Candidates for the part a datasheet's values go into: a free-text search within the datasheet's family. */
export async function searchParts(query: Record<string, string>, signal?: AbortSignal): Promise<PartDto[]> {
  const { items } = await api.get('/parts', PartListResponseSchema, { query, signal });
  return items;
}

export function usePartSearch(q: string, family: FamilyKey | undefined) {
  const query: Record<string, string> = { q: q.trim(), pageSize: String(PART_SEARCH_SIZE), ...(family ? { family } : {}) };
  return useQuery({
    ...queryOptions({
      queryKey: datasheetKeys.partSearch(query),
      queryFn: ({ signal }) => searchParts(query, signal),
      placeholderData: keepPreviousData,
    }),
    enabled: query.q !== '',
  });
}
