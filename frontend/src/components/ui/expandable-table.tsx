import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type ExpandedState,
  type Header,
  type Table,
  type TableMeta,
} from '@tanstack/react-table';
import { Fragment, useId, useState, type ReactNode } from 'react';
import { cx } from './cx';

export interface ColumnMeta {
  align?: 'end';
}

const alignOf = (meta: unknown) => ((meta as ColumnMeta | undefined)?.align === 'end' ? 'text-right' : undefined);

function SortIcon({ direction }: { direction: false | 'asc' | 'desc' }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 10 14" className="size-3 shrink-0">
      <path d="M5 1 9 5.5H1z" className={direction === 'asc' ? 'fill-copper' : 'fill-ink/25'} />
      <path d="M5 13 1 8.5h8z" className={direction === 'desc' ? 'fill-copper' : 'fill-ink/25'} />
    </svg>
  );
}

/**
 * One column heading; a sortable one is a button (Enter works) and announces its order through aria-sort. A table
 * built without sorting (`enableSorting: false`) gets plain headings.
 */
export function HeaderCell<T>({ header, className }: { header: Header<T, unknown>; className?: string }) {
  const sorted = header.column.getIsSorted();
  const canSort = header.column.getCanSort();
  const label = header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext());
  return (
    <th
      scope="col"
      aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : canSort ? 'none' : undefined}
      className={cx('py-2.5 text-xs font-semibold tracking-wider whitespace-nowrap text-ink-soft uppercase', alignOf(header.column.columnDef.meta), className)}
    >
      {canSort ? (
        <button
          type="button"
          onClick={header.column.getToggleSortingHandler()}
          className="-mx-1 inline-flex items-center gap-1.5 rounded px-1 uppercase hover:text-ink"
        >
          {label}
          <SortIcon direction={sorted} />
        </button>
      ) : (
        label
      )}
    </th>
  );
}

function Chevron({ open }: { open: boolean }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 12 12" className={cx('size-3 transition-transform motion-reduce:transition-none', open && 'rotate-90')}>
      <path d="M4 2 8 6 4 10" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  );
}

export interface ExpandableTableViewProps<T> {
  /** A TanStack table with expanding on; the caller decides sorting, paging and the rest. */
  table: Table<T>;
  caption: ReactNode;
  /** What the expand button names, e.g. the part number. */
  rowName: (row: T) => string;
  renderDetails: (row: T) => ReactNode;
  busy?: boolean;
  isRowHighlighted?: (row: T) => boolean;
  /** Extra data attributes on a row, for tests and styling (e.g. the line's status). */
  rowData?: (row: T) => Record<`data-${string}`, string>;
  /** Rows of several lines read better aligned to the top. */
  verticalAlign?: 'middle' | 'top';
  /** Below this the table scrolls sideways rather than squeezing its cells. */
  minWidth?: string;
  detailsClassName?: string;
}

/**
 * Rows that open to show their workings. The toggle is a real button (Enter and Space work, its state is announced
 * through aria-expanded); the details sit in a full-width row straight after it.
 */
export function ExpandableTableView<T>({
  table,
  caption,
  rowName,
  renderDetails,
  busy = false,
  isRowHighlighted,
  rowData,
  verticalAlign = 'middle',
  minWidth = 'min-w-[46rem]',
  detailsClassName,
}: ExpandableTableViewProps<T>) {
  const baseId = useId();
  const span = table.getVisibleLeafColumns().length + 1;
  const valign = verticalAlign === 'top' ? 'align-top' : 'align-middle';
  return (
    <div className={cx('overflow-x-auto transition-opacity', busy && 'opacity-60')} aria-busy={busy || undefined}>
      <table className={cx('w-full border-collapse text-left text-sm', minWidth)}>
        <caption className="sr-only">{caption}</caption>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b border-rule bg-paper/60">
              <th scope="col" className="w-10 px-2 py-2.5">
                <span className="sr-only">Details</span>
              </th>
              {group.headers.map((header) => (
                <HeaderCell key={header.id} header={header} className="px-3" />
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => {
            const open = row.getIsExpanded();
            const detailsId = `${baseId}-${row.id}`;
            return (
              <Fragment key={row.id}>
                <tr
                  data-row-id={row.id}
                  {...rowData?.(row.original)}
                  className={cx(
                    'border-b border-rule hover:bg-paper/50',
                    open && 'border-b-0 bg-paper/40',
                    isRowHighlighted?.(row.original) && 'bg-ok-wash/40',
                  )}
                >
                  <td className={cx('px-2 py-2', valign)}>
                    <button
                      type="button"
                      aria-expanded={open}
                      aria-controls={open ? detailsId : undefined}
                      onClick={row.getToggleExpandedHandler()}
                      className="inline-flex size-7 items-center justify-center rounded-md text-ink-soft hover:bg-paper-deep hover:text-ink"
                    >
                      <Chevron open={open} />
                      <span className="sr-only">Details for {rowName(row.original)}</span>
                    </button>
                  </td>
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} data-column={cell.column.id} className={cx('px-3 py-2.5', valign, alignOf(cell.column.columnDef.meta))}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
                {open && (
                  <tr id={detailsId} className="border-b border-rule">
                    <td colSpan={span} className={cx('p-0', detailsClassName)}>
                      {renderDetails(row.original)}
                    </td>
                  </tr>
                )}
              </Fragment>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

export interface ExpandableTableProps<T> extends Omit<ExpandableTableViewProps<T>, 'table'> {
  data: T[];
  // TanStack's column helpers produce per-column value types; the table only needs the row type.
  columns: ColumnDef<T, any>[];
  getRowId: (row: T) => string;
  /** Passed to the cells as table meta, so columns stay stable while these change. */
  meta?: object;
}

/** A ranking in the order it is given (no sorting, no paging) whose rows open. */
export function ExpandableTable<T>({ data, columns, getRowId, meta, ...view }: ExpandableTableProps<T>) {
  const [expanded, setExpanded] = useState<ExpandedState>({});
  // TanStack Table returns fresh functions each render by design; the React Compiler is not in use here.
  const table = useReactTable({
    data,
    columns,
    meta: meta as TableMeta<T> | undefined,
    state: { expanded },
    onExpandedChange: setExpanded,
    getRowId,
    getRowCanExpand: () => true,
    enableSorting: false,
    getCoreRowModel: getCoreRowModel(),
  });
  return <ExpandableTableView table={table} {...view} />;
}
