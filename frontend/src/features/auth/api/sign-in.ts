import { useMutation, useQueryClient } from '@tanstack/react-query';
import { MeResponseSchema, type CurrentUser, type SignInBody } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { authKeys } from './keys';

export async function signIn(body: SignInBody): Promise<CurrentUser> {
  const { user } = await api.post('/auth/sign-in', body, MeResponseSchema);
  return user;
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (user) => {
      // Nothing cached for a previous visitor may leak into this session.
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
      queryClient.removeQueries({ queryKey: authKeys.signedOut() });
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
