import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { AlternatesResponseSchema, type AlternatesResponse } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { alternatesKeys, type AlternatesApiQuery } from '../keys';

/** What the page asks for, before it becomes query-string text. */
export interface AlternatesRequest {
  /** `criterion:weight` pairs from formatWeights; absent means the family's defaults. */
  weights?: string;
  supply?: string;
  requireDropIn: boolean;
  allowObsolete: boolean;
  pairedWith?: string;
  limit: number;
}

/** Only what is set goes into the address, so equal requests share a cache entry. */
export function alternatesApiQuery(request: AlternatesRequest): AlternatesApiQuery {
  return {
    ...(request.weights ? { weights: request.weights } : {}),
    ...(request.supply ? { supply: request.supply } : {}),
    ...(request.requireDropIn ? { requireDropIn: '1' } : {}),
    ...(request.allowObsolete ? { allowObsolete: '1' } : {}),
    ...(request.pairedWith ? { pairedWith: request.pairedWith } : {}),
    limit: String(request.limit),
  };
}

export function getAlternates(partId: string, query: AlternatesApiQuery, signal?: AbortSignal): Promise<AlternatesResponse> {
  return api.get(`/parts/${encodeURIComponent(partId)}/alternates`, AlternatesResponseSchema, { query, signal });
}

export const alternatesQueryOptions = (partId: string, query: AlternatesApiQuery) =>
  queryOptions({
    queryKey: alternatesKeys.list(partId, query),
    queryFn: ({ signal }) => getAlternates(partId, query, signal),
    // While a moved weight re-ranks, the last order stays on screen (dimmed) instead of flashing empty. The page is
    // keyed by part, so this never shows another part's answer.
    placeholderData: keepPreviousData,
  });

export function useAlternates(partId: string, query: AlternatesApiQuery, options: { enabled?: boolean } = {}) {
  return useQuery({ ...alternatesQueryOptions(partId, query), enabled: options.enabled ?? true });
}
