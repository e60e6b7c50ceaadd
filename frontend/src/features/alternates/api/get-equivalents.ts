import { queryOptions, useQuery } from '@tanstack/react-query';
import { EquivalentDtoSchema, type EquivalentDto } from '@understudy/shared-types';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { equivalentKeys } from '../keys';

const EquivalentListSchema = z.object({ items: z.array(EquivalentDtoSchema) });

/** Every editor ruling on pairs that include this part, approved and rejected. */
export async function getEquivalents(partId: string, signal?: AbortSignal): Promise<EquivalentDto[]> {
  const { items } = await api.get(`/parts/${encodeURIComponent(partId)}/equivalents`, EquivalentListSchema, { signal });
  return items;
}

export const equivalentsQueryOptions = (partId: string) =>
  queryOptions({
    queryKey: equivalentKeys.list(partId),
    queryFn: ({ signal }) => getEquivalents(partId, signal),
  });

export function useEquivalents(partId: string) {
  return useQuery(equivalentsQueryOptions(partId));
}

/** The ruling on a pair, whichever way round it was recorded. */
export function rulingFor(rulings: readonly EquivalentDto[] | undefined, a: string, b: string): EquivalentDto | undefined {
  return rulings?.find((r) => (r.partId === a && r.equivalentId === b) || (r.partId === b && r.equivalentId === a));
}
