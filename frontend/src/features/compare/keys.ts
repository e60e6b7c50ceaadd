/** Query keys for the comparison; each part is fetched on its own so adding one to the set refetches nothing. */
export const compareKeys = {
  all: ['compare'] as const,
  parts: () => [...compareKeys.all, 'part'] as const,
  part: (id: string) => [...compareKeys.parts(), id] as const,
};
