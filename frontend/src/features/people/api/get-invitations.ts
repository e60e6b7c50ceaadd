import { queryOptions, useQuery } from '@tanstack/react-query';
import { InvitationListResponseSchema, type InvitationDto } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { invitationKeys } from './keys';

export async function getInvitations(signal?: AbortSignal): Promise<InvitationDto[]> {
  const { items } = await api.get('/invitations', InvitationListResponseSchema, { signal });
  return items;
}

export const invitationsQueryOptions = () =>
  queryOptions({
    queryKey: invitationKeys.list(),
    queryFn: ({ signal }) => getInvitations(signal),
  });

export function useInvitations() {
  return useQuery(invitationsQueryOptions());
}
