import { queryOptions, useQuery } from '@tanstack/react-query';
import { PartDtoSchema, type PartDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { partKeys } from '../keys';

export function getPart(id: string, signal?: AbortSignal): Promise<PartDto> {
  return api.get(`/parts/${encodeURIComponent(id)}`, PartDtoSchema, { signal });
}

export const partQueryOptions = (id: string) =>
  queryOptions({
    queryKey: partKeys.detail(id),
    queryFn: ({ signal }) => getPart(id, signal),
  });

export function usePart(id: string) {
  return useQuery(partQueryOptions(id));
}
