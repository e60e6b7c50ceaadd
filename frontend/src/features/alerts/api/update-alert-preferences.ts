import { useMutation, useQueryClient } from '@tanstack/react-query';
import { AlertPreferencesSchema, type AlertPreferences } from '@understudy/shared-types';
import { apiRequest } from '../../../lib/api-client';
import { alertPreferenceKeys } from '../keys';

export function updateAlertPreferences(body: AlertPreferences): Promise<AlertPreferences> {
  return apiRequest('/me/alert-preferences', { method: 'PUT', body, schema: AlertPreferencesSchema });
}

export function useUpdateAlertPreferences() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAlertPreferences,
    onSuccess: (preferences) => queryClient.setQueryData(alertPreferenceKeys.mine(), preferences),
  });
}
