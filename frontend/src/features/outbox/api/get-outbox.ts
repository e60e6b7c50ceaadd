import { queryOptions, useQuery } from '@tanstack/react-query';
import { OutboxListResponseSchema, type OutboxMessage } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { outboxKeys } from './keys';

export const OUTBOX_REFRESH_MS = 5_000;

export async function getOutbox(signal?: AbortSignal): Promise<OutboxMessage[]> {
  const { items } = await api.get('/outbox', OutboxListResponseSchema, { signal });
  // Newest first, whatever order the capture store keeps.
  return [...items].sort((a, b) => Date.parse(b.receivedAt) - Date.parse(a.receivedAt));
}

export const outboxQueryOptions = () =>
  queryOptions({
    queryKey: outboxKeys.list(),
    queryFn: ({ signal }) => getOutbox(signal),
    staleTime: 0,
    refetchInterval: OUTBOX_REFRESH_MS,
  });

export function useOutbox() {
  return useQuery(outboxQueryOptions());
}
