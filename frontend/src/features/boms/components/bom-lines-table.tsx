import {
  getCoreRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type ExpandedState,
  type PaginationState,
  type SortingState,
  type Table,
} from '@tanstack/react-table';
import type { BomLineDto } from '@understudy/shared-types';
import { useEffect, useState, type ReactNode } from 'react';
import { Link } from 'react-router';
import { Button, CadmiumMark, ExpandableTableView, InlineSelect } from '../../../components/ui';
import { compareWorstFirst, matchKindText } from '../lib/lines';
import { LineStatusBadge } from './line-status-badge';

export const PAGE_SIZES = [50, 100, 250] as const;

interface LinesTableMeta {
  confirmedByYou: boolean;
}

const metaOf = (table: Table<BomLineDto>) => table.options.meta as LinesTableMeta;

const dash = <span className="text-ink-faint">—</span>;

// Defined once at module level: flexRender mounts each cell as a component, so identities must not change.
const COLUMNS: ColumnDef<BomLineDto, any>[] = [
  {
    id: 'row',
    accessorKey: 'row',
    header: 'Row',
    cell: ({ row }) => <span className="font-semibold text-ink-soft tabular-nums">{row.original.row}</span>,
  },
  {
    id: 'partNumber',
    accessorKey: 'partNumber',
    header: 'As written',
    cell: ({ row }) => (
      <span className="flex flex-col">
        <span className="font-mono text-xs font-semibold break-all text-ink">{row.original.partNumber || dash}</span>
        {row.original.manufacturer && <span className="text-xs text-ink-faint">{row.original.manufacturer}</span>}
      </span>
    ),
  },
  {
    id: 'matched',
    accessorFn: (line) => line.match.part?.partNumber ?? '',
    header: 'Matched part',
    cell: ({ row, table }) => {
      const line = row.original;
      const part = line.match.part;
      return (
        <span className="flex flex-col">
          {part ? (
            <span className="inline-flex items-center gap-1.5 whitespace-nowrap">
              <Link to={`/parts/${part.id}`} className="font-semibold text-ink underline-offset-2 hover:text-copper-deep hover:underline">
                {part.partNumber}
              </Link>
              {part.cadmium && <CadmiumMark />}
            </span>
          ) : (
            dash
          )}
          {part && <span className="text-xs text-ink-soft">{part.manufacturer}</span>}
          <span className="text-xs text-ink-faint" data-testid="match-kind">
            {matchKindText(line, metaOf(table).confirmedByYou)}
          </span>
        </span>
      );
    },
  },
  {
    id: 'quantity',
    accessorFn: (line) => line.quantity ?? -1,
    header: 'Qty',
    cell: ({ row }) => <span className="tabular-nums">{row.original.quantity ?? dash}</span>,
  },
  {
    id: 'designators',
    accessorFn: (line) => line.designators.join(', '),
    header: 'Designators',
    enableSorting: false,
    cell: ({ row }) => {
      const text = row.original.designators.join(', ');
      return text ? (
        <span className="line-clamp-2 max-w-48 text-xs break-words text-ink-soft" title={text}>
          {text}
        </span>
      ) : (
        dash
      );
    },
  },
  {
    id: 'status',
    accessorKey: 'status',
    header: 'Status',
    sortingFn: (a, b) => compareWorstFirst(a.original, b.original),
    cell: ({ row }) => <LineStatusBadge status={row.original.status} />,
  },
  {
    id: 'risk',
    accessorKey: 'risk',
    header: 'Risk',
    enableSorting: false,
    cell: ({ row }) => <span className="text-sm text-ink">{row.original.risk || dash}</span>,
  },
  {
    id: 'replacement',
    accessorFn: (line) => line.replacement?.part.partNumber ?? '',
    header: 'Replacement',
    cell: ({ row }) => {
      const r = row.original.replacement;
      if (!r) return dash;
      return (
        <span className="flex flex-col">
          <Link to={`/parts/${r.part.id}`} className="font-semibold whitespace-nowrap text-ok underline-offset-2 hover:underline">
            {r.part.partNumber}
          </Link>
          {r.note && (
            <span className="line-clamp-2 max-w-48 text-xs text-ink-soft" title={r.note}>
              {r.note}
            </span>
          )}
        </span>
      );
    },
  },
];

/**
 * Every line of the BOM, worst first, a page at a time so a 10,000-line BOM renders only what is on screen. A line
 * opens (a real button: Enter and Space) to show its match, its options and its problems.
 */
export function BomLinesTable({
  lines,
  confirmedByYou,
  renderDetails,
  resetKey,
  caption,
}: {
  lines: BomLineDto[];
  confirmedByYou: boolean;
  renderDetails: (line: BomLineDto) => ReactNode;
  /** Changes when the filter does, to go back to the first page. */
  resetKey: string;
  caption: string;
}) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'status', desc: false }]);
  const [expanded, setExpanded] = useState<ExpandedState>({});
  const [pagination, setPagination] = useState<PaginationState>({ pageIndex: 0, pageSize: 100 });

  useEffect(() => setPagination((p) => ({ ...p, pageIndex: 0 })), [resetKey]);

  // TanStack Table returns fresh functions each render by design; the React Compiler is not in use here.
  const table = useReactTable({
    data: lines,
    columns: COLUMNS,
    meta: { confirmedByYou } satisfies LinesTableMeta,
    state: { sorting, expanded, pagination },
    onSortingChange: (updater) => {
      setSorting(updater);
      setPagination((p) => ({ ...p, pageIndex: 0 }));
    },
    onExpandedChange: setExpanded,
    onPaginationChange: setPagination,
    // Numbers would sort descending on the first click; a BOM reads from the top.
    sortDescFirst: false,
    // A line saved from its details must stay open, on the same page.
    autoResetExpanded: false,
    autoResetPageIndex: false,
    getRowId: (line) => line.id,
    getRowCanExpand: () => true,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
  });

  const total = lines.length;
  const { pageIndex, pageSize } = table.getState().pagination;
  const first = total === 0 ? 0 : pageIndex * pageSize + 1;
  const last = Math.min(total, (pageIndex + 1) * pageSize);
  const pageCount = Math.max(1, table.getPageCount());

  return (
    <div className="flex flex-col">
      <ExpandableTableView
        table={table}
        caption={caption}
        rowName={(line) => `row ${line.row}, ${line.partNumber || 'no part number'}`}
        renderDetails={renderDetails}
        rowData={(line) => ({ 'data-status': line.status })}
        verticalAlign="top"
        minWidth="min-w-[60rem]"
        detailsClassName="bg-paper/30"
      />
      {total === 0 && <p className="px-5 py-6 text-center text-sm text-ink-soft">No line matches.</p>}
      {total > 0 && (
        <nav aria-label="Pages of lines" className="flex flex-wrap items-center justify-between gap-3 border-t border-rule px-5 py-3 text-sm">
          <p className="text-ink-soft" aria-live="polite">
            Lines {first.toLocaleString()}–{last.toLocaleString()} of {total.toLocaleString()}
          </p>
          <div className="flex items-center gap-2">
            <div className="w-36">
              <InlineSelect
                aria-label="Lines per page"
                value={String(pageSize)}
                onValueChange={(value) => table.setPageSize(Number(value))}
                options={PAGE_SIZES.map((n) => ({ value: String(n), label: `${n} a page` }))}
              />
            </div>
            <Button variant="secondary" size="sm" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
              Previous
            </Button>
            <span className="whitespace-nowrap text-ink-soft tabular-nums">
              Page {pageIndex + 1} of {pageCount}
            </span>
            <Button variant="secondary" size="sm" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
              Next
            </Button>
          </div>
        </nav>
      )}
    </div>
  );
}
