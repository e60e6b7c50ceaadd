import { MAX_COMPARE } from '@understudy/shared-types';
import { useCallback, useSyncExternalStore } from 'react';

export interface CompareItem {
  id: string;
  partNumber: string;
}

const KEY = 'understudy:compare';
const listeners = new Set<() => void>();
let cache: { raw: string | null; items: CompareItem[] } = { raw: null, items: [] };

function read(): CompareItem[] {
  let raw: string | null = null;
  try {
    raw = window.sessionStorage.getItem(KEY);
  } catch {
    raw = null;
  }
  if (raw === cache.raw) return cache.items;
  let items: CompareItem[] = [];
  try {
    const parsed: unknown = raw ? JSON.parse(raw) : [];
    if (Array.isArray(parsed)) {
      items = parsed
        .filter((v): v is CompareItem => !!v && typeof v === 'object' && typeof v.id === 'string' && typeof v.partNumber === 'string')
        .slice(0, MAX_COMPARE);
    }
  } catch {
    items = [];
  }
  cache = { raw, items };
  return items;
}

function write(items: CompareItem[]) {
  try {
    window.sessionStorage.setItem(KEY, JSON.stringify(items));
  } catch {
    // Storage refused: keep the selection in memory for this page.
    cache = { raw: JSON.stringify(items), items };
  }
  for (const listener of listeners) listener();
}

function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/**
 * Parts picked for comparison, kept for this tab across pages, searches and reloads; at most MAX_COMPARE.
 */
export function useCompareSelection() {
  const items = useSyncExternalStore(subscribe, read, () => []);

  const toggle = useCallback((item: CompareItem) => {
    const current = read();
    if (current.some((i) => i.id === item.id)) write(current.filter((i) => i.id !== item.id));
    else if (current.length < MAX_COMPARE) write([...current, item]);
  }, []);

  const remove = useCallback((id: string) => write(read().filter((i) => i.id !== id)), []);
  const clear = useCallback(() => write([]), []);

  return {
    items,
    isSelected: (id: string) => items.some((i) => i.id === id),
    isFull: items.length >= MAX_COMPARE,
    toggle,
    remove,
    clear,
  };
}
