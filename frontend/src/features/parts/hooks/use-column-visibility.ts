import type { VisibilityState } from '@tanstack/react-table';
import type { FamilyDefinition } from '@understudy/shared-types';
import { useCallback, useState } from 'react';

const storageKey = (family: string) => `understudy:catalog-columns:${family}`;

/** Optional columns for a family: its parameters and the package. */
export function optionalColumns(family: FamilyDefinition): { id: string; label: string; byDefault: boolean }[] {
  return [
    ...family.parameters.map((p) => ({ id: p.key, label: p.label, byDefault: p.columnByDefault })),
    { id: 'package', label: 'Package', byDefault: false },
  ];
}

function defaults(family: FamilyDefinition): VisibilityState {
  return Object.fromEntries(optionalColumns(family).map((c) => [c.id, c.byDefault]));
}

function load(family: FamilyDefinition): VisibilityState {
  const base = defaults(family);
  try {
    const raw = window.localStorage.getItem(storageKey(family.key));
    if (!raw) return base;
    const shown: unknown = JSON.parse(raw);
    if (!Array.isArray(shown)) return base;
    // Columns added since the choice was saved keep their default.
    const known = new Set(Object.keys(base));
    const saved = new Set(shown.filter((id): id is string => typeof id === 'string' && known.has(id)));
    return Object.fromEntries(Object.keys(base).map((id) => [id, saved.has(id)]));
  } catch {
    return base;
  }
}

/** Which parameter columns show, per family, remembered in this browser. */
export function useColumnVisibility(family: FamilyDefinition | undefined) {
  const [state, setState] = useState<{ family: string | undefined; visibility: VisibilityState }>(() => ({
    family: family?.key,
    visibility: family ? load(family) : {},
  }));
  // Switching family swaps the whole choice; derived during render so there is no stale frame.
  const current = state.family === family?.key ? state.visibility : family ? load(family) : {};
  if (state.family !== family?.key) setState({ family: family?.key, visibility: current });

  const setVisibility = useCallback(
    (next: VisibilityState) => {
      if (!family) return;
      setState({ family: family.key, visibility: next });
      try {
        const shown = Object.entries(next)
          .filter(([, on]) => on)
          .map(([id]) => id);
        window.localStorage.setItem(storageKey(family.key), JSON.stringify(shown));
      } catch {
        // Private windows may refuse storage; the choice then lasts for this visit.
      }
    },
    [family],
  );

  const reset = useCallback(() => {
    if (!family) return;
    try {
      window.localStorage.removeItem(storageKey(family.key));
    } catch {
      // As above.
    }
    setState({ family: family.key, visibility: defaults(family) });
  }, [family]);

  return { visibility: current, setVisibility, reset };
}
