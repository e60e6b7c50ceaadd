import { queryOptions, useQuery } from '@tanstack/react-query';
import { RequirementSetDtoSchema, type RequirementSetDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { requirementSetKeys } from '../keys';

export function getRequirementSet(id: string, signal?: AbortSignal): Promise<RequirementSetDto> {
  return api.get(`/requirement-sets/${encodeURIComponent(id)}`, RequirementSetDtoSchema, { signal });
}

export const requirementSetQueryOptions = (id: string) =>
  queryOptions({
    queryKey: requirementSetKeys.detail(id),
    queryFn: ({ signal }) => getRequirementSet(id, signal),
  });

export function useRequirementSet(id: string | undefined) {
  return useQuery({ ...requirementSetQueryOptions(id ?? ''), enabled: !!id });
}
