import { queryOptions, useQuery } from '@tanstack/react-query';
import { BomDetailDtoSchema, type BomDetailDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { bomKeys } from '../keys';

/** A BOM with every line and its check history; statuses are worked out against today's catalog. */
export function getBom(id: string, signal?: AbortSignal): Promise<BomDetailDto> {
  return api.get(`/boms/${encodeURIComponent(id)}`, BomDetailDtoSchema, { signal });
}

export const bomQueryOptions = (id: string) =>
  queryOptions({
    queryKey: bomKeys.detail(id),
    queryFn: ({ signal }) => getBom(id, signal),
  });

export function useBom(id: string) {
  return useQuery(bomQueryOptions(id));
}

/** What a missing BOM shows: it was deleted, or the link is someone else's that was never shared. */
export const NO_SUCH_BOM = {
  title: 'There is no such BOM',
  backTo: '/boms',
  backLabel: 'Back to the BOMs',
  text: 'It may have been deleted, or it is not shared with you.',
};
