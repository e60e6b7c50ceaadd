import type { BomListQuerySchema } from '@understudy/shared-types';
import type { z } from 'zod';

export type BomScope = z.output<typeof BomListQuerySchema>['scope'];

/** Query keys for BOMs; mutations invalidate through these, never through retyped arrays. */
export const bomKeys = {
  all: ['boms'] as const,
  lists: () => [...bomKeys.all, 'list'] as const,
  list: (scope: BomScope) => [...bomKeys.lists(), scope] as const,
  details: () => [...bomKeys.all, 'detail'] as const,
  detail: (id: string) => [...bomKeys.details(), id] as const,
  /** Under the BOM's key, so a re-check refreshes what each line may be replaced by. */
  options: (bomId: string, lineId: string) => [...bomKeys.detail(bomId), 'options', lineId] as const,
  colleagues: () => [...bomKeys.all, 'colleagues'] as const,
};
