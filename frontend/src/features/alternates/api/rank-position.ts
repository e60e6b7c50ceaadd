import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { PositionResultsSchema, type PositionRequirementsInput, type PositionResults } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { alternatesKeys } from '../keys';

/** A ranking against a circuit's own requirements. A POST because the requirements are a document, not a filter. */
export function rankPosition(requirements: PositionRequirementsInput): Promise<PositionResults> {
  return api.post('/alternates/rank', requirements, PositionResultsSchema);
}

export const rankPositionQueryOptions = (requirements: PositionRequirementsInput) =>
  queryOptions({
    queryKey: alternatesKeys.rank(requirements),
    queryFn: () => rankPosition(requirements),
    // The form re-ranks as it is typed in: keep the last answer up while the next one comes.
    placeholderData: keepPreviousData,
  });

/** `null` while the form has nothing it can send. */
export function useRankPosition(requirements: PositionRequirementsInput | null) {
  return useQuery({
    ...rankPositionQueryOptions(requirements ?? { family: 'op-amp' }),
    enabled: requirements !== null,
  });
}
