import { queryOptions, useQuery } from '@tanstack/react-query';
import { BomListResponseSchema, type BomDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { bomKeys, type BomScope } from '../keys';

export async function getBoms(scope: BomScope, signal?: AbortSignal): Promise<BomDto[]> {
  const { items } = await api.get('/boms', BomListResponseSchema, { query: { scope }, signal });
  return items;
}

export const bomsQueryOptions = (scope: BomScope) =>
  queryOptions({
    queryKey: bomKeys.list(scope),
    queryFn: ({ signal }) => getBoms(scope, signal),
  });

export function useBoms(scope: BomScope) {
  return useQuery(bomsQueryOptions(scope));
}
