import { FAMILY_LABELS, type PartDto } from '@understudy/shared-types';
import { useEffect, useId, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { useNavigate } from 'react-router';
import { LifecycleBadge, Spinner, cx } from '../../../components/ui';
import { QUICK_FIND_MIN_CHARS, useFindParts } from '../api/find-parts';
import { useDebouncedValue } from '../../../hooks/use-debounced-value';
import { rankParts } from '../lib/rank';

export const QUICK_FIND_DEBOUNCE_MS = 200;

function isTypingTarget(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName);
}

/**
 * The top bar's part finder, an ARIA combobox: "/" focuses it, typing two or more characters lists up to eight
 * parts, arrows move through them, Enter opens one and Escape clears the box.
 */
export function QuickFind({ className }: { className?: string }) {
  const navigate = useNavigate();
  const inputRef = useRef<HTMLInputElement>(null);
  const listboxId = useId();
  const optionId = (index: number) => `${listboxId}-option-${index}`;
  const [text, setText] = useState('');
  const [focused, setFocused] = useState(false);
  const [active, setActive] = useState(-1);

  const term = text.trim();
  const debounced = useDebouncedValue(term, QUICK_FIND_DEBOUNCE_MS);
  const search = useFindParts(debounced);
  const results = useMemo(() => (search.data ? rankParts(search.data, debounced) : []), [search.data, debounced]);

  const long = term.length >= QUICK_FIND_MIN_CHARS;
  const loading = long && (term !== debounced || search.isPending);
  const open = focused && long;
  const showResults = open && !loading && !search.isError && results.length > 0;

  useEffect(() => {
    function onKeyDown(event: globalThis.KeyboardEvent) {
      if (event.key !== '/' || event.ctrlKey || event.metaKey || event.altKey || isTypingTarget(event.target)) return;
      event.preventDefault();
      inputRef.current?.focus();
      inputRef.current?.select();
    }
    document.addEventListener('keydown', onKeyDown);
    return () => document.removeEventListener('keydown', onKeyDown);
  }, []);

  // A new list starts with nothing highlighted.
  useEffect(() => setActive(-1), [results]);

  function openPart(part: PartDto) {
    setText('');
    setActive(-1);
    inputRef.current?.blur();
    void navigate(`/parts/${part.id}`);
  }

  function onKeyDown(event: KeyboardEvent<HTMLInputElement>) {
    if (event.key === 'Escape') {
      event.preventDefault();
      setText('');
      setActive(-1);
      return;
    }
    if (!showResults) return;
    const last = results.length - 1;
    if (event.key === 'ArrowDown') {
      event.preventDefault();
      setActive((i) => (i >= last ? 0 : i + 1));
    } else if (event.key === 'ArrowUp') {
      event.preventDefault();
      setActive((i) => (i <= 0 ? last : i - 1));
    } else if (event.key === 'Enter') {
      event.preventDefault();
      openPart(results[active >= 0 ? active : 0]!);
    }
  }

  let status: string | null = null;
  if (open && loading) status = 'Searching…';
  else if (open && search.isError) status = 'The search did not go through. Try again.';
  else if (open && results.length === 0) status = 'No parts match';

  return (
    <div className={cx('relative', className)}>
      <label htmlFor={`${listboxId}-input`} className="sr-only">
        Find a part
      </label>
      <svg aria-hidden="true" viewBox="0 0 16 16" className="pointer-events-none absolute top-1/2 left-2.5 size-4 -translate-y-1/2 text-ink-faint">
        <circle cx="7" cy="7" r="4.5" fill="none" stroke="currentColor" strokeWidth="1.6" />
        <path d="m10.5 10.5 3.5 3.5" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
      </svg>
      <input
        ref={inputRef}
        id={`${listboxId}-input`}
        type="text"
        role="combobox"
        aria-expanded={showResults}
        aria-controls={listboxId}
        aria-autocomplete="list"
        aria-activedescendant={showResults && active >= 0 ? optionId(active) : undefined}
        aria-keyshortcuts="/"
        autoComplete="off"
        spellCheck={false}
        placeholder="Find a part"
        value={text}
        onChange={(event) => setText(event.target.value)}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        onKeyDown={onKeyDown}
        className="h-9 w-full rounded-md border border-rule-strong bg-card pr-8 pl-8 text-sm text-ink placeholder:text-ink-faint hover:border-ink-soft"
      />
      <kbd
        aria-hidden="true"
        className="pointer-events-none absolute top-1/2 right-2 hidden -translate-y-1/2 rounded border border-rule px-1.5 font-mono text-[0.7rem] text-ink-faint sm:block"
      >
        /
      </kbd>
      <div
        hidden={!open}
        className="absolute right-0 z-30 mt-2 w-[min(28rem,calc(100vw-2rem))] overflow-hidden rounded-lg border border-rule bg-card shadow-xl"
      >
        <ul id={listboxId} role="listbox" aria-label="Parts found" hidden={!showResults} className="max-h-[70dvh] overflow-y-auto py-1">
          {showResults &&
            results.map((part, index) => (
              <li
                key={part.id}
                id={optionId(index)}
                role="option"
                aria-selected={index === active}
                // Keep focus in the box so the click lands before the list closes.
                onMouseDown={(event) => event.preventDefault()}
                onMouseEnter={() => setActive(index)}
                onClick={() => openPart(part)}
                className={cx(
                  'flex cursor-pointer items-center justify-between gap-3 px-3 py-2',
                  index === active ? 'bg-copper-wash/70' : 'hover:bg-paper',
                )}
              >
                <span className="min-w-0">
                  <span className="block truncate font-mono text-sm font-semibold text-ink">{part.partNumber}</span>
                  <span className="block truncate text-xs text-ink-soft">
                    {part.manufacturer.name} · {FAMILY_LABELS[part.family]}
                  </span>
                </span>
                <LifecycleBadge lifecycle={part.lifecycle} short className="shrink-0" />
              </li>
            ))}
        </ul>
        {status && (
          <p role="status" className="flex items-center gap-2 px-3 py-3 text-sm text-ink-soft">
            {loading && <Spinner className="size-4 text-copper" />}
            {status}
          </p>
        )}
      </div>
    </div>
  );
}
