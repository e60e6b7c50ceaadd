import { queryOptions, useQuery } from '@tanstack/react-query';
import { NotificationListResponseSchema, type NotificationListResponse } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { notificationKeys } from '../keys';

/** How often the header looks for new notices while the app is open. */
export const NOTICES_POLL_MS = 60_000;

/** The signed-in person's notices, newest first, with how many are unread. */
export function getNotifications(signal?: AbortSignal): Promise<NotificationListResponse> {
  return api.get('/notifications', NotificationListResponseSchema, { signal });
}

export const notificationsQueryOptions = () =>
  queryOptions({
    queryKey: notificationKeys.lists(),
    queryFn: ({ signal }) => getNotifications(signal),
    refetchInterval: NOTICES_POLL_MS,
  });

export function useNotifications() {
  return useQuery(notificationsQueryOptions());
}
