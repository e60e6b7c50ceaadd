import { queryOptions, useQueries } from '@tanstack/react-query';
import { PartDtoSchema, type PartDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { compareKeys } from '../keys';

export function getComparePart(id: string, signal?: AbortSignal): Promise<PartDto> {
  return api.get(`/parts/${encodeURIComponent(id)}`, PartDtoSchema, { signal });
}

export const comparePartQueryOptions = (id: string) =>
  queryOptions({
    queryKey: compareKeys.part(id),
    queryFn: ({ signal }) => getComparePart(id, signal),
  });

/** Every part in the comparison, in the order of the address. */
export function useCompareParts(ids: readonly string[]) {
  return useQueries({ queries: ids.map((id) => comparePartQueryOptions(id)) });
}
