/** Query keys for parts; mutations invalidate through these, never through retyped arrays. */
export const partKeys = {
  all: ['parts'] as const,
  lists: () => [...partKeys.all, 'list'] as const,
  /** The API query exactly as sent, so two searches that read the same share a cache entry. */
  list: (query: Record<string, string>) => [...partKeys.lists(), query] as const,
  details: () => [...partKeys.all, 'detail'] as const,
  detail: (id: string) => [...partKeys.details(), id] as const,
  revisions: (id: string) => [...partKeys.detail(id), 'revisions'] as const,
};

export const familyKeys = {
  all: ['families'] as const,
  list: () => [...familyKeys.all, 'list'] as const,
};
