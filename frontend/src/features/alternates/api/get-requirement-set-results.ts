import { queryOptions, useQuery } from '@tanstack/react-query';
import { PositionResultsSchema, type PositionResults } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { requirementSetKeys } from '../keys';

/** A saved position ranked against the catalog as it is now. */
export function getRequirementSetResults(id: string, signal?: AbortSignal): Promise<PositionResults> {
  return api.get(`/requirement-sets/${encodeURIComponent(id)}/results`, PositionResultsSchema, { signal });
}

export const requirementSetResultsQueryOptions = (id: string) =>
  queryOptions({
    queryKey: requirementSetKeys.results(id),
    queryFn: ({ signal }) => getRequirementSetResults(id, signal),
  });

export function useRequirementSetResults(id: string | undefined, options: { enabled?: boolean } = {}) {
  return useQuery({ ...requirementSetResultsQueryOptions(id ?? ''), enabled: !!id && (options.enabled ?? true) });
}
