import { FAMILIES, MAX_COMPARE, type FamilyDefinition, type FamilyKey } from '@understudy/shared-types';
import { useCallback, useId, useMemo, useRef, type KeyboardEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { Alert, Button, Card, EmptyState, ErrorState, InlineSelect, PageHeader, buttonClasses, cx } from '../../../components/ui';
import { Can } from '../../../lib/ability';
import { apiUrl, isApiClientError } from '../../../lib/api-client';
import { useFamilies } from '../api/get-families';
import { useParts } from '../api/get-parts';
import { useColumnVisibility } from '../hooks/use-column-visibility';
import { useCompareSelection } from '../hooks/use-compare-selection';
import { useDebouncedCommit } from '../hooks/use-debounced-value';
import {
  PAGE_SIZES,
  activeFilters,
  addressKeyForIssue,
  exportQuery,
  parseSort,
  readFamily,
  readPage,
  readPageSize,
  toApiSearch,
  withFamily,
  type ActiveFilter,
} from '../lib/search-params';
import { ColumnChooser } from './column-chooser';
import { FilterPanel, type UpdateSearch } from './filter-panel';
import { ResultsSkeleton, ResultsTable, type SortState } from './results-table';

function FamilyTabs({
  families,
  current,
  onSelect,
  panelId,
}: {
  families: readonly FamilyDefinition[];
  current: FamilyKey | undefined;
  onSelect: (family: FamilyKey | undefined) => void;
  panelId: string;
}) {
  const tabs: Array<{ key: FamilyKey | undefined; label: string }> = [
    { key: undefined, label: 'All families' },
    ...families.map((f) => ({ key: f.key, label: f.pluralLabel })),
  ];
  const refs = useRef<Array<HTMLButtonElement | null>>([]);
  const selectedIndex = Math.max(0, tabs.findIndex((t) => t.key === current));

  function onKeyDown(event: KeyboardEvent<HTMLButtonElement>, index: number) {
    const last = tabs.length - 1;
    const next =
      event.key === 'ArrowRight' ? (index === last ? 0 : index + 1)
      : event.key === 'ArrowLeft' ? (index === 0 ? last : index - 1)
      : event.key === 'Home' ? 0
      : event.key === 'End' ? last
      : undefined;
    if (next === undefined) return;
    event.preventDefault();
    refs.current[next]?.focus();
    onSelect(tabs[next]!.key);
  }

  return (
    <div role="tablist" aria-label="Part family" className="flex gap-1 overflow-x-auto border-b border-rule">
      {tabs.map((tab, index) => {
        const selected = index === selectedIndex;
        return (
          <button
            key={tab.key ?? 'all'}
            ref={(el) => {
              refs.current[index] = el;
            }}
            type="button"
            role="tab"
            aria-selected={selected}
            aria-controls={panelId}
            tabIndex={selected ? 0 : -1}
            onClick={() => onSelect(tab.key)}
            onKeyDown={(event) => onKeyDown(event, index)}
            className={cx(
              '-mb-px shrink-0 border-b-2 px-3 py-2 text-sm font-semibold whitespace-nowrap transition-colors',
              selected ? 'border-copper text-ink' : 'border-transparent text-ink-soft hover:border-rule-strong hover:text-ink',
            )}
          >
            {tab.label}
          </button>
        );
      })}
    </div>
  );
}

function FilterChips({
  filters,
  onRemove,
  errors = {},
}: {
  filters: ActiveFilter[];
  onRemove: (filter: ActiveFilter) => void;
  /** Boxes that could not be read: their chips say the filter is not applied. */
  errors?: Record<string, string>;
}) {
  return (
    <ul aria-label="Active filters" className="flex flex-wrap gap-1.5">
      {filters.map((f) => (
        <li key={f.id}>
          <button
            type="button"
            onClick={() => onRemove(f)}
            aria-label={`Remove filter: ${f.label}`}
            className={cx(
              'inline-flex items-center gap-1.5 rounded-full border py-0.5 pr-1.5 pl-2.5 text-xs font-semibold',
              errors[f.id]
                ? 'border-danger/40 bg-danger-wash text-danger line-through decoration-danger/50 hover:border-danger'
                : 'border-copper/30 bg-copper-wash/60 text-copper-deep hover:border-copper hover:bg-copper-wash',
            )}
          >
            {f.label}
            {errors[f.id] && <span className="no-underline">(not applied)</span>}
            <svg aria-hidden="true" viewBox="0 0 12 12" className="size-3">
              <path d="M3 3l6 6M9 3l-6 6" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
            </svg>
          </button>
        </li>
      ))}
    </ul>
  );
}

function SearchBox({ value, onCommit }: { value: string; onCommit: (q: string) => void }) {
  const [text, setText] = useDebouncedCommit(value, onCommit, 300);
  const id = useId();
  return (
    <div className="relative flex-1">
      <label htmlFor={id} className="sr-only">
        Search the catalog
      </label>
      <svg aria-hidden="true" viewBox="0 0 16 16" className="pointer-events-none absolute top-1/2 left-3 size-4 -translate-y-1/2 text-ink-faint">
        <circle cx="7" cy="7" r="4.5" fill="none" stroke="currentColor" strokeWidth="1.6" />
        <path d="m10.5 10.5 3.5 3.5" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
      </svg>
      <input
        id={id}
        type="search"
        value={text}
        onChange={(event) => setText(event.target.value)}
        placeholder="Part number, manufacturer, description or tag"
        autoComplete="off"
        className="h-11 w-full rounded-md border border-rule-strong bg-card pr-3 pl-9 text-ink placeholder:text-ink-faint hover:border-ink-soft"
      />
    </div>
  );
}

function Pagination({
  page,
  pageSize,
  total,
  onPage,
  onPageSize,
}: {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  onPageSize: (size: number) => void;
}) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label="Pages of results" className="flex flex-wrap items-center justify-between gap-3 border-t border-rule px-4 py-3 text-sm">
      <p className="text-ink-soft tabular-nums">
        {first}–{last} of {total}
      </p>
      <div className="flex items-center gap-2">
        <label className="flex items-center gap-2 text-ink-soft">
          Per page
          <InlineSelect
            aria-label="Parts per page"
            value={String(pageSize)}
            onValueChange={(v) => onPageSize(Number(v))}
            options={PAGE_SIZES.map((n) => ({ value: String(n), label: String(n) }))}
            className="w-20"
          />
        </label>
        <Button variant="secondary" size="sm" disabled={page <= 1} onClick={() => onPage(page - 1)}>
          Previous
        </Button>
        <span className="text-ink-soft tabular-nums">
          Page {Math.min(page, pages)} of {pages}
        </span>
        <Button variant="secondary" size="sm" disabled={page >= pages} onClick={() => onPage(page + 1)}>
          Next
        </Button>
      </div>
    </nav>
  );
}

/** The catalog: family, free text and parameter filters, all kept in the address so a search can be shared. */
export function CatalogSearch() {
  const [params, setParams] = useSearchParams();
  const navigate = useNavigate();
  const families = useFamilies();
  const familyKey = readFamily(params);
  const family = familyKey ? FAMILIES[familyKey] : undefined;
  const panelId = useId();

  const { query, errors: clientErrors } = useMemo(() => toApiSearch(params), [params]);
  const parts = useParts(query);
  const columns = useColumnVisibility(family);
  const compare = useCompareSelection();

  const update: UpdateSearch = useCallback(
    (mutate, options) => {
      setParams(
        (prev) => {
          const next = new URLSearchParams(prev);
          mutate(next);
          next.delete('page');
          return next;
        },
        { replace: options?.replace, preventScrollReset: true },
      );
    },
    [setParams],
  );

  const serverErrors = useMemo(() => {
    const error = parts.error;
    if (!isApiClientError(error) || error.status !== 400) return {};
    const out: Record<string, string> = {};
    for (const issue of error.issues) {
      const key = addressKeyForIssue(issue.path, family);
      if (key && !(key in out)) out[key] = issue.message;
    }
    return out;
  }, [parts.error, family]);
  const errors = { ...serverErrors, ...clientErrors };

  const filters = activeFilters(params);
  const sort = parseSort(query.sort);
  const page = readPage(params);
  const pageSize = readPageSize(params);
  const data = parts.data;

  const setSort = (next: SortState | undefined) =>
    update((p) => {
      if (next) p.set('sort', `${next.desc ? '-' : ''}${next.id}`);
      else p.delete('sort');
    });

  const removeFilter = (f: ActiveFilter) => setParams(f.without(params), { preventScrollReset: true });
  const clearFilters = () => {
    const next = new URLSearchParams();
    if (familyKey) next.set('family', familyKey);
    setParams(next, { preventScrollReset: true });
  };

  const compareHref = `/compare?ids=${compare.items.map((i) => i.id).join(',')}`;
  const badRequest = isApiClientError(parts.error) && parts.error.status === 400;

  let body;
  if (parts.isPending && !data) {
    body = <ResultsSkeleton columns={family ? 8 : 7} />;
  } else if (parts.isError && !data) {
    body = badRequest ? (
      <Alert tone="error" title="Some filters could not be read" className="m-4">
        Correct the highlighted boxes; the rest of the search is unchanged.
      </Alert>
    ) : (
      <ErrorState className="m-4" message={parts.error.message} onRetry={() => void parts.refetch()} />
    );
  } else if (data && data.total === 0) {
    body = (
      <EmptyState
        className="m-4"
        title="No parts match — loosen a filter"
        action={
          filters.length > 0 ? (
            <Button variant="secondary" size="sm" onClick={clearFilters}>
              Clear all filters
            </Button>
          ) : undefined
        }
      >
        {filters.length > 0 ? (
          <div className="flex flex-col items-center gap-2">
            <p>These filters are in force; remove one to widen the search.</p>
            <FilterChips filters={filters} onRemove={removeFilter} errors={errors} />
          </div>
        ) : (
          <p>There are no {family ? family.pluralLabel.toLowerCase() : 'parts'} in the catalog yet.</p>
        )}
      </EmptyState>
    );
  } else if (data) {
    body = (
      <ResultsTable
        parts={data.items}
        family={family}
        sort={sort}
        onSortChange={setSort}
        visibility={columns.visibility}
        isSelected={compare.isSelected}
        selectionFull={compare.isFull}
        onToggleCompare={compare.toggle}
        busy={parts.isPlaceholderData}
      />
    );
  }

  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title="Catalog"
        description="Search every part by what it does: engineering notation works in every box (4k7, 5 V/µs, ±15 V)."
        actions={
          <Can I="create" a="Part">
            <Link to={`/parts/new${familyKey ? `?family=${familyKey}` : ''}`} className={buttonClasses('primary', 'sm')}>
              Add a part
            </Link>
          </Can>
        }
      />

      <FamilyTabs families={families} current={familyKey} onSelect={(f) => setParams(withFamily(params, f), { preventScrollReset: true })} panelId={panelId} />

      <div id={panelId} role="tabpanel" aria-label={family ? family.pluralLabel : 'All families'} className="flex flex-col gap-4">
        {family && <p className="-mt-2 text-sm text-ink-soft">{family.description}</p>}
        <SearchBox
          value={params.get('q') ?? ''}
          onCommit={(q) =>
            update(
              (p) => {
                if (q.trim()) p.set('q', q);
                else p.delete('q');
              },
              { replace: true },
            )
          }
        />

        <div className="grid items-start gap-5 lg:grid-cols-[17rem_minmax(0,1fr)]">
          <Card as="div" className="lg:sticky lg:top-20 lg:max-h-[calc(100dvh-6rem)] lg:overflow-y-auto">
            <FilterPanel family={family} params={params} update={update} errors={errors} />
          </Card>

          <Card as="div" className="min-w-0">
            <div className="flex flex-col gap-3 border-b border-rule px-4 py-3">
              <div className="flex flex-wrap items-center justify-between gap-3">
                <p aria-live="polite" className="text-sm font-semibold text-ink tabular-nums">
                  {data ? `${data.total} ${data.total === 1 ? 'part' : 'parts'}` : parts.isPending ? 'Searching…' : '—'}
                  {parts.isFetching && data && <span className="ml-2 font-normal text-ink-faint">updating…</span>}
                </p>
                <div className="flex flex-wrap items-center gap-2">
                  {family && (
                    <ColumnChooser family={family} visibility={columns.visibility} onChange={columns.setVisibility} onReset={columns.reset} />
                  )}
                  <a href={apiUrl('/parts/export', exportQuery(query, 'csv'))} download className={buttonClasses('secondary', 'sm')}>
                    Export CSV
                  </a>
                  <Can I="create" a="Part">
                    <Link to="/parts/import" className={buttonClasses('secondary', 'sm')}>
                      Import
                    </Link>
                  </Can>
                  <Button size="sm" disabled={compare.items.length < 2} onClick={() => void navigate(compareHref)}>
                    Compare ({compare.items.length})
                  </Button>
                </div>
              </div>
              {filters.length > 0 && data && data.total > 0 && <FilterChips filters={filters} onRemove={removeFilter} errors={errors} />}
              {badRequest && data && (
                <Alert tone="error">Some filters could not be read; correct the highlighted boxes to update the results.</Alert>
              )}
              {compare.items.length > 0 && (
                <div className="flex flex-wrap items-center gap-2 text-xs text-ink-soft">
                  <span>
                    To compare ({compare.items.length} of {MAX_COMPARE}):
                  </span>
                  <ul aria-label="Parts to compare" className="flex flex-wrap gap-1.5">
                    {compare.items.map((item) => (
                      <li key={item.id}>
                        <span className="inline-flex items-center gap-1 rounded-full border border-rule-strong bg-card py-0.5 pr-1 pl-2 font-semibold text-ink">
                          {item.partNumber}
                          <button
                            type="button"
                            onClick={() => compare.remove(item.id)}
                            aria-label={`Stop comparing ${item.partNumber}`}
                            className="rounded-full p-0.5 text-ink-faint hover:bg-paper-deep hover:text-ink"
                          >
                            <svg aria-hidden="true" viewBox="0 0 12 12" className="size-3">
                              <path d="M3 3l6 6M9 3l-6 6" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
                            </svg>
                          </button>
                        </span>
                      </li>
                    ))}
                  </ul>
                  <button type="button" onClick={compare.clear} className="font-semibold text-copper-deep hover:underline">
                    Clear
                  </button>
                  {compare.items.length < 2 && <span>Pick one more to compare.</span>}
                </div>
              )}
            </div>
            {body}
            {data && data.total > 0 && (
              <Pagination
                page={page}
                pageSize={pageSize}
                total={data.total}
                onPage={(p) =>
                  setParams(
                    (prev) => {
                      const next = new URLSearchParams(prev);
                      if (p > 1) next.set('page', String(p));
                      else next.delete('page');
                      return next;
                    },
                    { preventScrollReset: true },
                  )
                }
                onPageSize={(size) => update((p) => p.set('pageSize', String(size)))}
              />
            )}
          </Card>
        </div>
      </div>
    </div>
  );
}
