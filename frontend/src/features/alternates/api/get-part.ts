import { queryOptions, useQuery } from '@tanstack/react-query';
import { PartDtoSchema, type PartDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { alternatesKeys } from '../keys';

/** A part shown beside a ranking: the original being replaced, or the LED a photocell is paired with. */
export function getPart(id: string, signal?: AbortSignal): Promise<PartDto> {
  return api.get(`/parts/${encodeURIComponent(id)}`, PartDtoSchema, { signal });
}

export const partQueryOptions = (id: string) =>
  queryOptions({
    queryKey: alternatesKeys.part(id),
    queryFn: ({ signal }) => getPart(id, signal),
  });

export function usePart(id: string | undefined) {
  return useQuery({ ...partQueryOptions(id ?? ''), enabled: !!id });
}
