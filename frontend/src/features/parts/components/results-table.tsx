import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type Table,
  type VisibilityState,
} from '@tanstack/react-table';
import { FAMILY_LABELS, MAX_COMPARE, type FamilyDefinition, type ParameterDefinition, type PartDto } from '@understudy/shared-types';
import { useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import { CadmiumMark, LifecycleBadge, RohsBadge, cx } from '../../../components/ui';
import { containsCadmium, packageLabel, summarizeParameter } from '../../../lib/part-display';
import type { CompareItem } from '../hooks/use-compare-selection';

export interface SortState {
  id: string;
  desc: boolean;
}

interface ColumnMeta {
  sortable?: boolean;
  align?: 'end';
  /** A heading too long for the column, shortened visually but read in full. */
  headerTitle?: string;
}

const column = createColumnHelper<PartDto>();

/** What cells need that changes while the table stays put; passed as table meta so the columns stay stable. */
interface SelectionMeta {
  isSelected: (id: string) => boolean;
  selectionFull: boolean;
  onToggle: (item: CompareItem) => void;
}

function selectionOf(table: Table<PartDto>): SelectionMeta {
  return table.options.meta as SelectionMeta;
}

function ParameterCell({ def, part }: { def: ParameterDefinition; part: PartDto }) {
  const summary = summarizeParameter(def, part.parameters[def.key]);
  if (!summary) return <span className="text-ink-faint" aria-label="not given">—</span>;
  return (
    <span className="inline-flex items-baseline gap-1 whitespace-nowrap">
      <span data-quantity className="tabular-nums">
        {summary.text}
      </span>
      {summary.qualifier && <span className="text-[0.6875rem] font-semibold text-ink-faint uppercase">{summary.qualifier}</span>}
    </span>
  );
}

/**
 * Columns for one family. flexRender mounts each cell function as a component, so these must keep their identity
 * across renders (memoised per family); otherwise every render would remount every cell and drop clicks and focus.
 */
export function buildColumns(family: FamilyDefinition | undefined): ColumnDef<PartDto, any>[] {
  const select = column.display({
    id: 'select',
    header: () => <span className="sr-only">Compare</span>,
    cell: ({ row, table }) => {
      const { isSelected, selectionFull, onToggle } = selectionOf(table);
      const part = row.original;
      const selected = isSelected(part.id);
      return (
        <input
          type="checkbox"
          aria-label={`Compare ${part.partNumber}`}
          title={!selected && selectionFull ? `Up to ${MAX_COMPARE} parts can be compared` : undefined}
          checked={selected}
          disabled={!selected && selectionFull}
          tabIndex={-1}
          onChange={() => onToggle({ id: part.id, partNumber: part.partNumber })}
          className="size-4 accent-copper"
        />
      );
    },
  });

  const partNumber = column.accessor('partNumber', {
    header: 'Part number',
    meta: { sortable: true } satisfies ColumnMeta,
    cell: ({ row }) => (
      <span className="inline-flex items-center gap-1.5 whitespace-nowrap">
        <Link to={`/parts/${row.original.id}`} tabIndex={-1} className="font-semibold text-ink underline-offset-2 hover:text-copper-deep hover:underline">
          {row.original.partNumber}
        </Link>
        {containsCadmium(row.original.parameters) && <CadmiumMark />}
      </span>
    ),
  });

  const manufacturer = column.accessor((p) => p.manufacturer.name, {
    id: 'manufacturer',
    header: 'Manufacturer',
    meta: { sortable: true } satisfies ColumnMeta,
    cell: (info) => <span className="whitespace-nowrap text-ink-soft">{info.getValue<string>()}</span>,
  });

  const lifecycle = column.accessor('lifecycle', {
    header: 'Lifecycle',
    meta: { sortable: true } satisfies ColumnMeta,
    cell: (info) => <LifecycleBadge lifecycle={info.getValue()} short />,
  });

  const rohs = column.accessor('rohsStatus', {
    id: 'rohs',
    header: 'RoHS',
    cell: (info) => <RohsBadge status={info.getValue()} short />,
  });

  const pkg = column.accessor('package', {
    header: 'Package',
    cell: (info) => <span className="whitespace-nowrap text-ink-soft">{info.getValue() ? packageLabel(info.getValue()) : '—'}</span>,
  });

  if (!family) {
    const familyColumn = column.accessor('family', {
      header: 'Family',
      cell: (info) => <span className="whitespace-nowrap text-ink-soft">{FAMILY_LABELS[info.getValue()]}</span>,
    });
    const description = column.accessor('description', {
      header: 'Description',
      cell: (info) => <span className="line-clamp-1 max-w-[28rem] text-ink-soft">{info.getValue() || '—'}</span>,
    });
    return [select, partNumber, manufacturer, lifecycle, rohs, familyColumn, description, pkg];
  }

  const parameterColumns = family.parameters.map((def) =>
    column.display({
      id: def.key,
      header: def.label,
      meta: { sortable: def.kind === 'number', align: def.kind === 'number' ? 'end' : undefined } satisfies ColumnMeta,
      cell: ({ row }) => <ParameterCell def={def} part={row.original} />,
    }),
  );
  // Status next to the name: an obsolete part should be obvious before its numbers are read.
  return [select, partNumber, manufacturer, lifecycle, rohs, ...parameterColumns, pkg];
}

function SortIcon({ direction }: { direction: false | 'asc' | 'desc' }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 10 14" className="size-3 shrink-0">
      <path d="M5 1 9 5.5H1z" className={direction === 'asc' ? 'fill-copper' : 'fill-ink/25'} />
      <path d="M5 13 1 8.5h8z" className={direction === 'desc' ? 'fill-copper' : 'fill-ink/25'} />
    </svg>
  );
}

export interface ResultsTableProps {
  parts: PartDto[];
  family: FamilyDefinition | undefined;
  sort: SortState | undefined;
  onSortChange: (sort: SortState | undefined) => void;
  visibility: VisibilityState;
  isSelected: (id: string) => boolean;
  selectionFull: boolean;
  onToggleCompare: (item: CompareItem) => void;
  busy?: boolean;
}

/**
 * One page of results. Rows take focus: arrow keys move between them, Enter opens the part, Space adds it to the
 * comparison. The server sorts and pages; the table only shows what it sent.
 */
export function ResultsTable({
  parts,
  family,
  sort,
  onSortChange,
  visibility,
  isSelected,
  selectionFull,
  onToggleCompare,
  busy = false,
}: ResultsTableProps) {
  const navigate = useNavigate();
  const [activeIndex, setActiveIndex] = useState(0);
  const rowRefs = useRef<Array<HTMLTableRowElement | null>>([]);
  const columns = useMemo(() => buildColumns(family), [family]);

  const table = useReactTable({
    data: parts,
    columns,
    meta: { isSelected, selectionFull, onToggle: onToggleCompare } satisfies SelectionMeta,
    getRowId: (p) => p.id,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    state: {
      columnVisibility: visibility,
      sorting: sort ? [sort] : [],
    },
  });

  const rows = table.getRowModel().rows;
  const current = Math.min(activeIndex, Math.max(0, rows.length - 1));

  function focusRow(index: number) {
    const clamped = Math.max(0, Math.min(rows.length - 1, index));
    setActiveIndex(clamped);
    rowRefs.current[clamped]?.focus();
  }

  function onRowKeyDown(event: KeyboardEvent<HTMLTableRowElement>, index: number, part: PartDto) {
    if (event.target !== event.currentTarget) return;
    switch (event.key) {
      case 'ArrowDown':
        event.preventDefault();
        focusRow(index + 1);
        break;
      case 'ArrowUp':
        event.preventDefault();
        focusRow(index - 1);
        break;
      case 'Home':
        event.preventDefault();
        focusRow(0);
        break;
      case 'End':
        event.preventDefault();
        focusRow(rows.length - 1);
        break;
      case 'Enter':
        event.preventDefault();
        void navigate(`/parts/${part.id}`);
        break;
      case ' ':
        event.preventDefault();
        if (isSelected(part.id) || !selectionFull) onToggleCompare({ id: part.id, partNumber: part.partNumber });
        break;
    }
  }

  function toggleSort(id: string) {
    if (sort?.id !== id) onSortChange({ id, desc: false });
    else if (!sort.desc) onSortChange({ id, desc: true });
    else onSortChange(undefined);
  }

  return (
    <div className={cx('max-h-[70vh] overflow-auto', busy && 'opacity-60 transition-opacity')} aria-busy={busy || undefined}>
      <table className="w-full border-separate border-spacing-0 text-left text-sm" aria-describedby="results-keys">
        <caption className="sr-only">
          Catalog results
          <span id="results-keys"> Arrow keys move between parts, Enter opens one, Space adds it to the comparison.</span>
        </caption>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const meta = header.column.columnDef.meta as ColumnMeta | undefined;
                const sorted = sort?.id === header.column.id ? (sort.desc ? 'desc' : 'asc') : false;
                const label = flexRender(header.column.columnDef.header, header.getContext());
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : meta?.sortable ? 'none' : undefined}
                    className={cx(
                      'sticky top-0 z-[1] border-b border-rule-strong bg-paper-deep px-3 py-2 text-xs font-semibold tracking-wide whitespace-nowrap text-ink-soft',
                      meta?.align === 'end' && 'text-right',
                    )}
                  >
                    {meta?.sortable ? (
                      <button
                        type="button"
                        onClick={() => toggleSort(header.column.id)}
                        className={cx('-mx-1 inline-flex items-center gap-1.5 rounded px-1 hover:text-ink', meta.align === 'end' && 'flex-row-reverse')}
                      >
                        {label}
                        <SortIcon direction={sorted} />
                      </button>
                    ) : (
                      label
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {rows.map((row, index) => {
            const selected = isSelected(row.original.id);
            return (
              <tr
                key={row.id}
                ref={(el) => {
                  rowRefs.current[index] = el;
                }}
                tabIndex={index === current ? 0 : -1}
                data-selected={selected || undefined}
                data-part-id={row.original.id}
                onFocus={(event) => {
                  if (event.target === event.currentTarget) setActiveIndex(index);
                }}
                onKeyDown={(event) => onRowKeyDown(event, index, row.original)}
                onClick={(event) => {
                  // A click on the row (not its link or box) focuses it, so the keys pick up from there.
                  if (event.target instanceof HTMLElement && !event.target.closest('a,input,button')) focusRow(index);
                }}
                className={cx(
                  'group cursor-default outline-none focus-visible:bg-copper-wash/70 focus-visible:shadow-[inset_3px_0_0_var(--color-copper)]',
                  selected ? 'bg-copper-wash/40' : 'hover:bg-paper/70',
                )}
              >
                {row.getVisibleCells().map((cell) => {
                  const meta = cell.column.columnDef.meta as ColumnMeta | undefined;
                  return (
                    <td
                      key={cell.id}
                      data-column={cell.column.id}
                      className={cx('border-b border-rule px-3 py-2.5 align-middle', meta?.align === 'end' && 'text-right')}
                    >
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  );
                })}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

/** Grey bars where the first page will be, shaped like the table, while the first answer is on its way. */
export function ResultsSkeleton({ columns = 7, rows = 8 }: { columns?: number; rows?: number }) {
  return (
    <div role="status" aria-label="Loading parts" className="overflow-hidden">
      <table className="w-full border-separate border-spacing-0 text-sm" aria-hidden="true">
        <thead>
          <tr>
            {Array.from({ length: columns }, (_, i) => (
              <th key={i} className="border-b border-rule-strong bg-paper-deep px-3 py-2.5">
                <span className="block h-3 w-16 rounded bg-rule" />
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {Array.from({ length: rows }, (_, r) => (
            <tr key={r}>
              {Array.from({ length: columns }, (_, c) => (
                <td key={c} className="border-b border-rule px-3 py-3">
                  <span
                    className="block h-3.5 animate-pulse rounded bg-paper-deep motion-reduce:animate-none"
                    style={{ width: `${c === 0 ? 1 : 3 + ((r * 7 + c * 3) % 5)}rem` }}
                  />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <span className="sr-only">Loading parts…</span>
    </div>
  );
}
