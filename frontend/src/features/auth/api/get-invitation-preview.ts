import { queryOptions, useQuery } from '@tanstack/react-query';
import { InvitationPreviewSchema, type InvitationPreview } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { authKeys } from './keys';

export function getInvitationPreview(token: string, signal?: AbortSignal): Promise<InvitationPreview> {
  return api.get('/invitations/preview', InvitationPreviewSchema, { query: { token }, signal });
}

export const invitationPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.invitationPreview(token),
    queryFn: ({ signal }) => getInvitationPreview(token, signal),
    staleTime: Infinity,
  });

export function useInvitationPreview(token: string, options: { enabled?: boolean } = {}) {
  return useQuery({ ...invitationPreviewQueryOptions(token), enabled: options.enabled ?? true });
}
