import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { PartListResponseSchema, type FamilyKey, type PartDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { alternatesKeys } from '../keys';

export const PART_SEARCH_SIZE = 8;

/** Parts offered by a picker (the LED lighting a cell, the cell of an estimate): free text within one family. */
export async function searchParts(query: Record<string, string>, signal?: AbortSignal): Promise<PartDto[]> {
  const { items } = await api.get('/parts', PartListResponseSchema, { query, signal });
  return items;
}

export function usePartSearch(q: string, family: FamilyKey) {
  const query: Record<string, string> = { family, pageSize: String(PART_SEARCH_SIZE), ...(q.trim() ? { q: q.trim() } : {}) };
  return useQuery({
    ...queryOptions({
      queryKey: alternatesKeys.partSearch(query),
      queryFn: ({ signal }) => searchParts(query, signal),
      placeholderData: keepPreviousData,
    }),
  });
}
