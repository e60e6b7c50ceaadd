import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { PartListResponseSchema, type PartDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { bomKeys } from '../keys';

export const PART_SEARCH_SIZE = 8;

/** Any catalog part, by free text, to match a line the automatic matching missed. */
export async function searchParts(query: Record<string, string>, signal?: AbortSignal): Promise<PartDto[]> {
  const { items } = await api.get('/parts', PartListResponseSchema, { query, signal });
  return items;
}

export function usePartSearch(q: string) {
  const text = q.trim();
  const query: Record<string, string> = { q: text, pageSize: String(PART_SEARCH_SIZE) };
  return useQuery({
    ...queryOptions({
      queryKey: bomKeys.partSearch(query),
      queryFn: ({ signal }) => searchParts(query, signal),
      placeholderData: keepPreviousData,
    }),
    enabled: text.length > 0,
  });
}
