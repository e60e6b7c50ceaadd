/** Query keys for notices and the alert preference; mutations invalidate through these. */
export const notificationKeys = {
  all: ['notifications'] as const,
  lists: () => [...notificationKeys.all, 'list'] as const,
};

export const alertPreferenceKeys = {
  all: ['alert-preferences'] as const,
  mine: () => [...alertPreferenceKeys.all, 'me'] as const,
};
