import { queryOptions, useQuery } from '@tanstack/react-query';
import { MeResponseSchema, type CurrentUser } from '@understudy/shared-types';
import { api, isApiClientError } from '../../../lib/api-client';
import { authKeys } from './keys';

/** The signed-in person, or null when nobody is signed in (a 401 is an answer, not a failure). */
export async function getMe(signal?: AbortSignal): Promise<CurrentUser | null> {
  try {
    const { user } = await api.get('/auth/me', MeResponseSchema, { signal });
    return user;
  } catch (error) {
    if (isApiClientError(error) && error.status === 401) return null;
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: ({ signal }) => getMe(signal),
    staleTime: 5 * 60_000,
  });

export function useMe() {
  return useQuery(meQueryOptions());
}
