import { queryOptions, useQuery } from '@tanstack/react-query';
import { BomLineOptionsSchema, type BomLineOptions } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { bomKeys } from '../keys';

/** What may take a line's place: approved equivalents first, then the closest alternates with their scores. */
export function getLineOptions(bomId: string, lineId: string, signal?: AbortSignal): Promise<BomLineOptions> {
  return api.get(`/boms/${encodeURIComponent(bomId)}/lines/${encodeURIComponent(lineId)}/options`, BomLineOptionsSchema, { signal });
}

export const lineOptionsQueryOptions = (bomId: string, lineId: string) =>
  queryOptions({
    queryKey: bomKeys.options(bomId, lineId),
    queryFn: ({ signal }) => getLineOptions(bomId, lineId, signal),
  });

export function useLineOptions(bomId: string, lineId: string, { enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ ...lineOptionsQueryOptions(bomId, lineId), enabled });
}
