import { partKeys } from '../parts/keys';

/** Quick-find answers live under the parts keys, so anything that invalidates parts (an edit, an import) refreshes them. */
export const quickFindKeys = {
  all: [...partKeys.all, 'quick-find'] as const,
  search: (q: string) => [...quickFindKeys.all, q] as const,
};
