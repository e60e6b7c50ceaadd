import { queryOptions, useQuery } from '@tanstack/react-query';
import { FAMILIES, FAMILY_KEYS, FamilyKeySchema, type FamilyDefinition } from '@understudy/shared-types';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { familyKeys } from '../keys';

// The definitions themselves come from shared-types; the server only says which families it serves.
const FamilyListSchema = z.object({ items: z.array(z.looseObject({ key: FamilyKeySchema })) });

export async function getFamilies(signal?: AbortSignal): Promise<FamilyDefinition[]> {
  const { items } = await api.get('/families', FamilyListSchema, { signal });
  return items.map((f) => FAMILIES[f.key]);
}

export const familiesQueryOptions = () =>
  queryOptions({
    queryKey: familyKeys.list(),
    queryFn: ({ signal }) => getFamilies(signal),
    staleTime: 60 * 60_000,
  });

const ALL_FAMILIES = FAMILY_KEYS.map((key) => FAMILIES[key]);

/** The families to offer: the server's list once it answers, every known family until then or if it cannot. */
export function useFamilies(): FamilyDefinition[] {
  const { data } = useQuery(familiesQueryOptions());
  return data && data.length > 0 ? data : ALL_FAMILIES;
}
