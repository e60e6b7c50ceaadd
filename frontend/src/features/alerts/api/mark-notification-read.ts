import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { NotificationListResponse } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { notificationKeys } from '../keys';

export function markNotificationRead(id: string): Promise<undefined> {
  return api.post(`/notifications/${encodeURIComponent(id)}/read`);
}

export function useMarkNotificationRead() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: markNotificationRead,
    onSuccess: (_, id) => {
      // The bell drops at once; the list is asked again for the server's word.
      const now = new Date().toISOString();
      queryClient.setQueryData<NotificationListResponse>(notificationKeys.lists(), (old) => {
        if (!old) return old;
        const wasUnread = old.items.some((n) => n.id === id && n.readAt === null);
        return {
          items: old.items.map((n) => (n.id === id && n.readAt === null ? { ...n, readAt: now } : n)),
          unread: Math.max(0, old.unread - (wasUnread ? 1 : 0)),
        };
      });
      void queryClient.invalidateQueries({ queryKey: notificationKeys.lists() });
    },
  });
}
