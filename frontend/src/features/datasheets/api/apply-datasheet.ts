import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  DatasheetApplyResponseSchema,
  PartConflictSchema,
  type DatasheetApplyBody,
  type DatasheetApplyResponse,
  type PartDto,
} from '@understudy/shared-types';
import { api, isApiClientError } from '../../../lib/api-client';
import { datasheetKeys } from '../keys';

/** The part was saved by someone else since the editor loaded it; `current` is the part as it is now. */
export class ApplyConflictError extends Error {
  readonly current: PartDto;
  constructor(message: string, current: PartDto) {
    super(message);
    this.name = 'ApplyConflictError';
    this.current = current;
  }
}

export function isApplyConflictError(error: unknown): error is ApplyConflictError {
  return error instanceof ApplyConflictError;
}

export async function applyDatasheet({ id, body }: { id: string; body: DatasheetApplyBody }): Promise<DatasheetApplyResponse> {
  try {
    return await api.post(`/datasheets/${encodeURIComponent(id)}/apply`, body, DatasheetApplyResponseSchema);
  } catch (error) {
    if (isApiClientError(error) && error.status === 409) {
      const conflict = PartConflictSchema.safeParse(error.payload);
      if (conflict.success) throw new ApplyConflictError(conflict.data.error.message, conflict.data.current);
    }
    throw error;
  }
}

export function useApplyDatasheet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: applyDatasheet,
    onSuccess: ({ datasheet, part }) => {
      queryClient.setQueryData(datasheetKeys.detail(datasheet.id), datasheet);
      queryClient.setQueryData(datasheetKeys.targetPart(part.id), part);
      void queryClient.invalidateQueries({ queryKey: datasheetKeys.lists() });
    },
    onError: (error, { body }) => {
      // The diff was drawn against a stale copy; show the fresh one so the editor sees what they would overwrite.
      if (isApplyConflictError(error) && body.target === 'existing') {
        queryClient.setQueryData(datasheetKeys.targetPart(body.partId), error.current);
      }
    },
  });
}
