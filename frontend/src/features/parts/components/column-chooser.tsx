import type { VisibilityState } from '@tanstack/react-table';
import type { FamilyDefinition } from '@understudy/shared-types';
import { useId, useRef, useState, useCallback } from 'react';
import { useDismissable } from '../../../hooks/use-dismissable';
import { Button } from '../../../components/ui';
import { optionalColumns } from '../hooks/use-column-visibility';

/** A disclosure listing the optional columns; Escape or a click elsewhere closes it. */
export function ColumnChooser({
  family,
  visibility,
  onChange,
  onReset,
}: {
  family: FamilyDefinition;
  visibility: VisibilityState;
  onChange: (next: VisibilityState) => void;
  onReset: () => void;
}) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const columns = optionalColumns(family);
  const shown = columns.filter((c) => visibility[c.id]).length;

  const close = useCallback(() => setOpen(false), []);
  useDismissable(open, close, rootRef, buttonRef);

  return (
    <div ref={rootRef} className="relative">
      <Button
        ref={buttonRef}
        variant="secondary"
        size="sm"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((v) => !v)}
      >
        <svg aria-hidden="true" viewBox="0 0 16 16" className="size-3.5">
          <path d="M2 3h3v10H2zM6.5 3h3v10h-3zM11 3h3v10h-3z" fill="none" stroke="currentColor" strokeWidth="1.4" />
        </svg>
        Columns ({shown})
      </Button>
      <div
        id={panelId}
        hidden={!open}
        role="group"
        aria-label="Columns to show"
        className="absolute right-0 z-20 mt-2 max-h-[60vh] w-72 overflow-auto rounded-lg border border-rule bg-card p-3 shadow-xl"
      >
        <p className="mb-2 text-xs font-semibold tracking-wider text-ink-soft uppercase">Columns to show</p>
        <ul className="flex flex-col gap-1.5">
          {columns.map((c) => (
            <li key={c.id}>
              <label className="flex cursor-pointer items-center gap-2 text-sm text-ink">
                <input
                  type="checkbox"
                  checked={!!visibility[c.id]}
                  onChange={(event) => onChange({ ...visibility, [c.id]: event.target.checked })}
                  className="size-4 accent-copper"
                />
                {c.label}
              </label>
            </li>
          ))}
        </ul>
        <Button variant="ghost" size="sm" className="mt-3 w-full" onClick={onReset}>
          Back to the usual columns
        </Button>
      </div>
    </div>
  );
}
