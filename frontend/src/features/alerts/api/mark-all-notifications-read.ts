import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { NotificationListResponse } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { notificationKeys } from '../keys';

export function markAllNotificationsRead(): Promise<undefined> {
  return api.post('/notifications/read-all');
}

export function useMarkAllNotificationsRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markAllNotificationsRead,
    onSuccess: () => {
      const now = new Date().toISOString();
      queryClient.setQueryData<NotificationListResponse>(notificationKeys.lists(), (old) =>
        old ? { items: old.items.map((n) => (n.readAt ? n : { ...n, readAt: now })), unread: 0 } : old,
      );
      void queryClient.invalidateQueries({ queryKey: notificationKeys.lists() });
    },
  });
}
