import { queryOptions, useQuery } from '@tanstack/react-query';
import { AlertPreferencesSchema, type AlertPreferences } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { alertPreferenceKeys } from '../keys';

export function getAlertPreferences(signal?: AbortSignal): Promise<AlertPreferences> {
  return api.get('/me/alert-preferences', AlertPreferencesSchema, { signal });
}

export const alertPreferencesQueryOptions = () =>
  queryOptions({
    queryKey: alertPreferenceKeys.mine(),
    queryFn: ({ signal }) => getAlertPreferences(signal),
  });

export function useAlertPreferences() {
  return useQuery(alertPreferencesQueryOptions());
}
