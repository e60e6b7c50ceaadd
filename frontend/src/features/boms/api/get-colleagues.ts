import { queryOptions, useQuery } from '@tanstack/react-query';
import { ColleagueSchema, type Colleague } from '@understudy/shared-types';
import { z } from 'zod';
import { api } from '../../../lib/api-client';
import { bomKeys } from '../keys';

const ColleagueListSchema = z.object({ items: z.array(ColleagueSchema) });

/** The people a BOM can be shared with: everyone active but the caller. */
export async function getColleagues(signal?: AbortSignal): Promise<Colleague[]> {
  const { items } = await api.get('/boms/colleagues', ColleagueListSchema, { signal });
  return items;
}

export const colleaguesQueryOptions = () =>
  queryOptions({
    queryKey: bomKeys.colleagues(),
    queryFn: ({ signal }) => getColleagues(signal),
    staleTime: 5 * 60_000,
  });

export function useColleagues({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...colleaguesQueryOptions(), enabled });
}
