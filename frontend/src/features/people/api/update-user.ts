import { useMutation, useQueryClient } from '@tanstack/react-query';
import { UserDtoSchema, type UserDto, type UserUpdateBody } from '@understudy/shared-types';
import { api } from '../../../lib/api-client';
import { userKeys } from './keys';

export function updateUser({ id, body }: { id: string; body: UserUpdateBody }): Promise<UserDto> {
  return api.patch(`/users/${encodeURIComponent(id)}`, body, UserDtoSchema);
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: (user) => {
      // Show the change at once, then let the list catch up with anything else the server changed.
      queryClient.setQueryData<UserDto[]>(userKeys.list(), (users) => users?.map((u) => (u.id === user.id ? user : u)));
      void queryClient.invalidateQueries({ queryKey: userKeys.all });
    },
  });
}
