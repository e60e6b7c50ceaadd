import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type ExpandedState,
  type TableMeta,
} from '@tanstack/react-table';
import { Fragment, useId, useState, type ReactNode } from 'react';
import { cx } from '../../../components/ui';

export interface ColumnMeta {
  align?: 'end';
}

export interface ExpandableTableProps<T> {
  data: T[];
  // TanStack's column helpers produce per-column value types; the table only needs the row type.
  columns: ColumnDef<T, any>[];
  caption: ReactNode;
  getRowId: (row: T) => string;
  /** What the expand button names, e.g. the part number. */
  rowName: (row: T) => string;
  renderDetails: (row: T) => ReactNode;
  /** Passed to the cells as table meta, so columns stay stable while these change. */
  meta?: object;
  busy?: boolean;
  isRowHighlighted?: (row: T) => boolean;
  /** Below this the table scrolls sideways rather than squeezing its cells. */
  minWidth?: string;
}

function Chevron({ open }: { open: boolean }) {
  return (
    <svg aria-hidden="true" viewBox="0 0 12 12" className={cx('size-3 transition-transform motion-reduce:transition-none', open && 'rotate-90')}>
      <path d="M4 2 8 6 4 10" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  );
}

/**
 * A ranking whose rows open to show their workings. The toggle is a real button (Enter and Space work, its state is
 * announced through aria-expanded); the details sit in a full-width row straight after it.
 */
export function ExpandableTable<T>({
  data,
  columns,
  caption,
  getRowId,
  rowName,
  renderDetails,
  meta,
  busy = false,
  isRowHighlighted,
  minWidth = 'min-w-[46rem]',
}: ExpandableTableProps<T>) {
  const baseId = useId();
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
    getCoreRowModel: getCoreRowModel(),
  });
  const span = table.getVisibleLeafColumns().length + 1;

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
                <th
                  key={header.id}
                  scope="col"
                  className={cx(
                    'px-3 py-2.5 text-xs font-semibold tracking-wider whitespace-nowrap text-ink-soft uppercase',
                    (header.column.columnDef.meta as ColumnMeta | undefined)?.align === 'end' && 'text-right',
                  )}
                >
                  {header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext())}
                </th>
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
                  className={cx(
                    'border-b border-rule hover:bg-paper/50',
                    open && 'border-b-0 bg-paper/40',
                    isRowHighlighted?.(row.original) && 'bg-ok-wash/40',
                  )}
                >
                  <td className="px-2 py-2.5 align-middle">
                    <button
                      type="button"
                      aria-expanded={open}
                      aria-controls={detailsId}
                      onClick={row.getToggleExpandedHandler()}
                      className="inline-flex size-7 items-center justify-center rounded-md text-ink-soft hover:bg-paper-deep hover:text-ink"
                    >
                      <Chevron open={open} />
                      <span className="sr-only">Details for {rowName(row.original)}</span>
                    </button>
                  </td>
                  {row.getVisibleCells().map((cell) => (
                    <td
                      key={cell.id}
                      data-column={cell.column.id}
                      className={cx(
                        'px-3 py-2.5 align-middle',
                        (cell.column.columnDef.meta as ColumnMeta | undefined)?.align === 'end' && 'text-right',
                      )}
                    >
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
                {open && (
                  <tr id={detailsId} className="border-b border-rule">
                    <td colSpan={span} className="p-0">
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
