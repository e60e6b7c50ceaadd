import type { PositionRequirementsInput } from '@understudy/shared-types';

/** The alternates query exactly as sent, so two pages that ask the same share a cache entry. */
export type AlternatesApiQuery = Record<string, string>;

/** Query keys for rankings; mutations invalidate through these, never through retyped arrays. */
export const alternatesKeys = {
  all: ['alternates'] as const,
  lists: () => [...alternatesKeys.all, 'list'] as const,
  list: (partId: string, query: AlternatesApiQuery) => [...alternatesKeys.lists(), partId, query] as const,
  ranks: () => [...alternatesKeys.all, 'rank'] as const,
  rank: (requirements: PositionRequirementsInput) => [...alternatesKeys.ranks(), requirements] as const,
  /** Parts this feature shows around a ranking (the original, a paired LED) and searches for pickers. */
  part: (id: string) => [...alternatesKeys.all, 'part', id] as const,
};

export const equivalentKeys = {
  all: ['equivalents'] as const,
  lists: () => [...equivalentKeys.all, 'list'] as const,
  list: (partId: string) => [...equivalentKeys.lists(), partId] as const,
};

export const requirementSetKeys = {
  all: ['requirement-sets'] as const,
  lists: () => [...requirementSetKeys.all, 'list'] as const,
  details: () => [...requirementSetKeys.all, 'detail'] as const,
  detail: (id: string) => [...requirementSetKeys.details(), id] as const,
  results: (id: string) => [...requirementSetKeys.detail(id), 'results'] as const,
};
