import { queryOptions, useQuery } from '@tanstack/react-query';
import { PartDtoSchema, type PartDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { datasheetKeys } from '../keys';

/** The chosen part as it is now: its values are the "before" of the diff and its version goes with the apply. */
export function getTargetPart(id: string, signal?: AbortSignal): Promise<PartDto> {
  return api.get(`/parts/${encodeURIComponent(id)}`, PartDtoSchema, { signal });
}

export const targetPartQueryOptions = (id: string) =>
  queryOptions({
    queryKey: datasheetKeys.targetPart(id),
    queryFn: ({ signal }) => getTargetPart(id, signal),
    // Always fetched afresh when chosen, so the diff is against what is saved now.
    staleTime: 0,
  });

export function useTargetPart(id: string | null) {
  return useQuery({ ...targetPartQueryOptions(id ?? ''), enabled: !!id });
}
