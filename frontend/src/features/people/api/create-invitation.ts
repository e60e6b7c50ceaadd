import { useMutation, useQueryClient } from '@tanstack/react-query';
import { InvitationDtoSchema, type InvitationCreateBody, type InvitationDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { invitationKeys } from './keys';

export function createInvitation(body: InvitationCreateBody): Promise<InvitationDto> {
  return api.post('/invitations', body, InvitationDtoSchema);
}

export function useCreateInvitation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvitation,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: invitationKeys.all }),
  });
}
