import { queryOptions, useQuery } from '@tanstack/react-query';
import { PartRevisionListResponseSchema, type PartRevisionDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { partKeys } from '../keys';

/** Newest first, as the API sends them. */
export async function getPartRevisions(id: string, signal?: AbortSignal): Promise<PartRevisionDto[]> {
  const { items } = await api.get(`/parts/${encodeURIComponent(id)}/revisions`, PartRevisionListResponseSchema, { signal });
  return items;
}

export const partRevisionsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: partKeys.revisions(id),
    queryFn: ({ signal }) => getPartRevisions(id, signal),
  });

export function usePartRevisions(id: string) {
  return useQuery(partRevisionsQueryOptions(id));
}
