import { queryOptions, useQuery } from '@tanstack/react-query';
import { RequirementSetDtoSchema, type RequirementSetDto } from '@understudy/shared-types';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { requirementSetKeys } from '../keys';

const RequirementSetListSchema = z.object({ items: z.array(RequirementSetDtoSchema) });

/** Saved positions: a viewer's own; an editor sees everyone's. */
export async function getRequirementSets(signal?: AbortSignal): Promise<RequirementSetDto[]> {
  const { items } = await api.get('/requirement-sets', RequirementSetListSchema, { signal });
  return items;
}

export const requirementSetsQueryOptions = () =>
  queryOptions({
    queryKey: requirementSetKeys.lists(),
    queryFn: ({ signal }) => getRequirementSets(signal),
  });

export function useRequirementSets() {
  return useQuery(requirementSetsQueryOptions());
}
