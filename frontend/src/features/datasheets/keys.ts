import type { DatasheetStatus } from '@understudy/shared-types';

export interface DatasheetFilters {
  partId?: string;
  status?: DatasheetStatus;
}

/** Query keys for datasheets; mutations invalidate through these, never through retyped arrays. */
export const datasheetKeys = {
  all: ['datasheets'] as const,
  lists: () => [...datasheetKeys.all, 'list'] as const,
  list: (filters: DatasheetFilters) => [...datasheetKeys.lists(), filters] as const,
  details: () => [...datasheetKeys.all, 'detail'] as const,
  detail: (id: string) => [...datasheetKeys.details(), id] as const,
  /** The mutation key of decisions on one datasheet, to tell whether others are still in flight. */
  review: (id: string) => [...datasheetKeys.detail(id), 'review'] as const,
  /** Parts offered as the target of an apply, and the chosen one as it is now. */
  targetPart: (id: string) => [...datasheetKeys.all, 'target-part', id] as const,
};
