import { useMutation, useQueryClient } from '@tanstack/react-query';
import { PartConflictSchema, PartDtoSchema, type PartDto, type PartUpdateBody } from '@understudy/shared-types';
import { api, isApiClientError } from '../../../lib/api-client';
import { partKeys } from '../keys';

/** Someone saved the part after this edit began; `current` is the part as it is now. */
export class PartConflictError extends Error {
  readonly current: PartDto;
  constructor(message: string, current: PartDto) {
    super(message);
    this.name = 'PartConflictError';
    this.current = current;
  }
}

export function isPartConflictError(error: unknown): error is PartConflictError {
  return error instanceof PartConflictError;
}

export async function updatePart({ id, body }: { id: string; body: PartUpdateBody }): Promise<PartDto> {
  try {
    return await api.patch(`/parts/${encodeURIComponent(id)}`, body, PartDtoSchema);
  } catch (error) {
    if (isApiClientError(error) && error.status === 409) {
      const conflict = PartConflictSchema.safeParse(error.payload);
      if (conflict.success) throw new PartConflictError(conflict.data.error.message, conflict.data.current);
    }
    throw error;
  }
}

export function useUpdatePart() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePart,
    onSuccess: (part) => {
      queryClient.setQueryData(partKeys.detail(part.id), part);
      void queryClient.invalidateQueries({ queryKey: partKeys.revisions(part.id) });
      void queryClient.invalidateQueries({ queryKey: partKeys.lists() });
    },
    onError: (error, { id }) => {
      // The cached copy is stale too; the conflict carries the fresh one.
      if (isPartConflictError(error)) queryClient.setQueryData(partKeys.detail(id), error.current);
    },
  });
}
