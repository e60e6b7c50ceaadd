import { FAMILIES, type FamilyKey, type PartDto } from '@understudy/shared-types';
import { useId, useState } from 'react';
import { Button, CadmiumMark, LifecycleBadge, Spinner, cx } from '../../../components/ui';
import { useDebouncedValue } from '../../../hooks/use-debounced-value';
import { containsCadmium } from '../../../lib/part-display';
import { usePart } from '../api/get-part';
import { usePartSearch } from '../../../hooks/use-part-search';

/** Mid-sentence: "Photoresistors" reads "photoresistors", "Paired LED" "paired LED", "LEDs" stays. */
const inSentence = (label: string) => (/^[A-Z][a-z]/.test(label) ? label.charAt(0).toLowerCase() + label.slice(1) : label);

/**
 * Choose one part of a family by searching the catalog. Shows the chosen one with a way to change it; the search
 * list is plain buttons, so it works with a keyboard and a screen reader without a custom combobox.
 */
export function PartPicker({
  label,
  family,
  value,
  onChange,
  hint,
  className,
}: {
  label: string;
  family: FamilyKey;
  /** The chosen part, or its id when only that is known (from an address). */
  value: PartDto | string | null;
  onChange: (part: PartDto | null) => void;
  hint?: string;
  className?: string;
}) {
  const inputId = useId();
  const hintId = useId();
  const [q, setQ] = useState('');
  const [searching, setSearching] = useState(false);
  const debounced = useDebouncedValue(q, 200);
  const byId = usePart(typeof value === 'string' ? value : undefined);
  const chosen = typeof value === 'string' ? byId.data : value;
  const open = searching || value === null;
  const results = usePartSearch(debounced, family, { listWithoutText: true });

  return (
    <div className={cx('flex flex-col gap-1.5', className)} role="group" aria-labelledby={`${inputId}-label`}>
      <span id={`${inputId}-label`} className="text-sm font-semibold text-ink">
        {label}
      </span>
      {value !== null && !searching && (
        <div className="flex flex-wrap items-center justify-between gap-2 rounded-md border border-rule-strong bg-card px-3 py-2">
          {chosen ? (
            <span className="flex min-w-0 flex-col">
              <span className="inline-flex items-center gap-1.5 font-semibold text-ink">
                {chosen.partNumber}
                {containsCadmium(chosen.parameters) && <CadmiumMark />}
              </span>
              <span className="text-xs text-ink-soft">{chosen.manufacturer.name}</span>
            </span>
          ) : byId.isError ? (
            <span className="text-sm text-danger">That part could not be loaded.</span>
          ) : (
            <Spinner className="text-copper" />
          )}
          <span className="flex gap-1">
            <Button variant="ghost" size="sm" onClick={() => setSearching(true)}>
              Change<span className="sr-only"> {inSentence(label)}</span>
            </Button>
            <Button variant="ghost" size="sm" onClick={() => onChange(null)}>
              Clear<span className="sr-only"> {inSentence(label)}</span>
            </Button>
          </span>
        </div>
      )}
      {open && (
        <>
          <label htmlFor={inputId} className="sr-only">
            Search {inSentence(FAMILIES[family].pluralLabel)} for {inSentence(label)}
          </label>
          <input
            id={inputId}
            type="search"
            value={q}
            onChange={(event) => setQ(event.target.value)}
            onKeyDown={(event) => {
              if (event.key === 'Escape' && value !== null) setSearching(false);
            }}
            placeholder={`Search ${inSentence(FAMILIES[family].pluralLabel)}`}
            aria-describedby={hint ? hintId : undefined}
            autoComplete="off"
            className="block h-9 w-full rounded-md border border-rule-strong bg-card px-3 text-sm text-ink placeholder:text-ink-faint hover:border-ink-soft"
          />
          {hint && (
            <p id={hintId} className="text-xs text-ink-soft">
              {hint}
            </p>
          )}
          <ul aria-label={`${FAMILIES[family].pluralLabel} found`} aria-busy={results.isFetching || undefined} className="flex max-h-56 flex-col overflow-y-auto rounded-md border border-rule bg-card">
            {results.isPending && (
              <li className="px-3 py-2 text-sm text-ink-soft">
                <Spinner className="mr-2 inline text-copper" />
                Searching…
              </li>
            )}
            {results.isError && <li className="px-3 py-2 text-sm text-danger">{results.error.message}</li>}
            {results.data?.length === 0 && <li className="px-3 py-2 text-sm text-ink-soft">Nothing matches “{debounced}”.</li>}
            {results.data?.map((part) => (
              <li key={part.id} className="border-b border-rule last:border-b-0">
                <button
                  type="button"
                  onClick={() => {
                    onChange(part);
                    setSearching(false);
                    setQ('');
                  }}
                  className="flex w-full items-center justify-between gap-2 px-3 py-1.5 text-left text-sm hover:bg-paper"
                >
                  <span className="flex min-w-0 flex-col">
                    <span className="inline-flex items-center gap-1.5 font-semibold text-ink">
                      {part.partNumber}
                      {containsCadmium(part.parameters) && <CadmiumMark />}
                    </span>
                    <span className="truncate text-xs text-ink-soft">{part.manufacturer.name}</span>
                  </span>
                  {part.lifecycle !== 'active' && <LifecycleBadge lifecycle={part.lifecycle} short />}
                </button>
              </li>
            ))}
          </ul>
          {value !== null && (
            <Button variant="ghost" size="sm" className="self-start" onClick={() => setSearching(false)}>
              Keep the current one
            </Button>
          )}
        </>
      )}
    </div>
  );
}
