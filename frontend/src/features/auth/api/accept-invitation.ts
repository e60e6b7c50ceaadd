import { useMutation, useQueryClient } from '@tanstack/react-query';
import { MeResponseSchema, type CurrentUser, type InvitationAcceptBody } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { authKeys } from './keys';

export async function acceptInvitation(body: InvitationAcceptBody): Promise<CurrentUser> {
  const { user } = await api.post('/invitations/accept', body, MeResponseSchema);
  return user;
}

/** Accepting signs the new person in, replacing whoever was signed in on this browser. */
export function useAcceptInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvitation,
    onSuccess: (user) => {
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
      queryClient.removeQueries({ queryKey: authKeys.invitationPreviews() });
      queryClient.removeQueries({ queryKey: authKeys.signedOut() });
      queryClient.setQueryData(authKeys.me(), user);
    },
  });
}
