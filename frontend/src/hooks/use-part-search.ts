import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { PartListResponseSchema, type FamilyKey, type PartDto } from '@understudy/shared-types';
import { api } from '../lib/api-client';

/** How many parts a picker offers at once. */
export const PART_SEARCH_SIZE = 8;

export const partSearchKey = (query: Record<string, string>) => ['part-search', query] as const;

export async function searchParts(query: Record<string, string>, signal?: AbortSignal): Promise<PartDto[]> {
  const { items } = await api.get('/parts', PartListResponseSchema, { query, signal });
  return items;
}

/**
 * The parts a picker offers for what has been typed, within one family when given. With nothing typed it offers
 * nothing, unless `listWithoutText` asks for the family's first parts (a picker that opens on a list).
 */
export function usePartSearch(q: string, family?: FamilyKey, { listWithoutText = false }: { listWithoutText?: boolean } = {}) {
  const text = q.trim();
  const query: Record<string, string> = { pageSize: String(PART_SEARCH_SIZE), ...(family ? { family } : {}), ...(text ? { q: text } : {}) };
  return useQuery({
    queryKey: partSearchKey(query),
    queryFn: ({ signal }) => searchParts(query, signal),
    placeholderData: keepPreviousData,
    enabled: text !== '' || listWithoutText,
  });
}
