import {
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from '@tanstack/react-table';
import { useState, type ReactNode } from 'react';
import { cx } from './cx';
import { HeaderCell } from './expandable-table';

export interface DataTableProps<T> {
  data: T[];
  // TanStack's column helpers produce per-column value types; the table only needs the row type.
  columns: ColumnDef<T, any>[];
  caption: ReactNode;
  getRowId: (row: T) => string;
  initialSorting?: SortingState;
  /** Highlights a row, e.g. the signed-in person's own. */
  isRowHighlighted?: (row: T) => boolean;
}

/** A sortable table: click a column heading (or press Enter on it) to sort; the state is announced with aria-sort. */
export function DataTable<T>({ data, columns, caption, getRowId, initialSorting = [], isRowHighlighted }: DataTableProps<T>) {
  const [sorting, setSorting] = useState<SortingState>(initialSorting);
  // TanStack Table returns fresh functions each render by design; the React Compiler is not in use here.
  const table = useReactTable({
    data,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getRowId,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[52rem] border-collapse text-left text-sm">
        <caption className="sr-only">{caption}</caption>
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b border-rule bg-paper/60">
              {group.headers.map((header) => (
                <HeaderCell key={header.id} header={header} className="px-4" />
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr
              key={row.id}
              className={cx(
                'border-b border-rule last:border-b-0 hover:bg-paper/50',
                isRowHighlighted?.(row.original) && 'bg-copper-wash/40',
              )}
            >
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-4 py-3 align-middle">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
