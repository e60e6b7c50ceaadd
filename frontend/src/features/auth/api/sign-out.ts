import { useMutation, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { authKeys } from './keys';

export async function signOut(): Promise<void> {
  await api.post('/auth/sign-out');
}

/** True when the person chose to sign out, so the sign-in page should not offer to return them to where they were. */
export function endedBySignOut(queryClient: QueryClient): boolean {
  return queryClient.getQueryData<boolean>(authKeys.signedOut()) === true;
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      // The marker is written before the session is cleared, so the guard sees both in the same render.
      queryClient.setQueryData(authKeys.signedOut(), true);
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
      queryClient.setQueryData(authKeys.me(), null);
    },
  });
}
