import { createColumnHelper, type SortingFn } from '@tanstack/react-table';
import { DATASHEET_STATUSES, type DatasheetListItem } from '@understudy/shared-types';
import { Link } from 'react-router';
import { DataTable } from '../../../components/ui';
import { formatDateTime, formatRelative } from '../../../lib/format';
import { datasheetFileUrl } from '../api/datasheet-file';
import { formatBytes } from '../lib/format-bytes';
import { DatasheetStatusBadge } from './datasheet-status-badge';

const LINK = 'font-semibold text-copper-deep underline-offset-2 hover:underline';

const byStatus: SortingFn<DatasheetListItem> = (a, b) =>
  DATASHEET_STATUSES.indexOf(a.original.status) - DATASHEET_STATUSES.indexOf(b.original.status);

const column = createColumnHelper<DatasheetListItem>();

const columns = [
  column.accessor('fileName', {
    header: 'File',
    cell: (info) => {
      const d = info.row.original;
      return (
        <div className="flex min-w-0 flex-col">
          <Link to={`/datasheets/${d.id}`} className={`${LINK} break-all`}>
            {d.fileName}
          </Link>
          <span className="text-xs text-ink-faint">
            {formatBytes(d.byteSize)} · {d.pageCount} {d.pageCount === 1 ? 'page' : 'pages'}
            {d.status === 'ready' || d.status === 'applied' ? ` · ${d.proposalCount} proposed ${d.proposalCount === 1 ? 'value' : 'values'}` : ''}
          </span>
        </div>
      );
    },
  }),
  column.accessor('status', {
    header: 'Status',
    sortingFn: byStatus,
    cell: (info) => {
      const d = info.row.original;
      return (
        <div className="flex max-w-64 flex-col items-start gap-1">
          <DatasheetStatusBadge status={d.status} />
          {d.status === 'failed' && d.failureReason && <span className="text-xs text-danger">{d.failureReason}</span>}
        </div>
      );
    },
  }),
  column.accessor((d) => d.part?.partNumber ?? '', {
    id: 'part',
    header: 'Part',
    cell: (info) => {
      const part = info.row.original.part;
      return part ? (
        <span className="flex flex-col whitespace-nowrap">
          <Link to={`/parts/${part.id}`} className={LINK}>
            {part.partNumber}
          </Link>
          <span className="text-xs text-ink-faint">{part.manufacturer}</span>
        </span>
      ) : (
        <span className="text-ink-faint">Not attached</span>
      );
    },
  }),
  column.accessor((d) => d.uploadedBy?.name ?? '', {
    id: 'uploadedBy',
    header: 'Uploaded by',
    cell: (info) => <span className="whitespace-nowrap text-ink-soft">{info.getValue() || '—'}</span>,
  }),
  column.accessor('createdAt', {
    header: 'Uploaded',
    cell: (info) => (
      <time dateTime={info.getValue()} title={formatDateTime(info.getValue())} className="whitespace-nowrap text-ink-soft">
        {formatRelative(info.getValue())}
      </time>
    ),
  }),
  column.display({
    id: 'download',
    header: () => <span className="sr-only">Download</span>,
    cell: (info) => (
      <a href={datasheetFileUrl(info.row.original.id, { download: true })} className={`${LINK} text-sm whitespace-nowrap`}>
        Download<span className="sr-only"> {info.row.original.fileName}</span>
      </a>
    ),
  }),
];

export function DatasheetsTable({ items }: { items: DatasheetListItem[] }) {
  return (
    <DataTable
      caption="Datasheets"
      data={items}
      columns={columns}
      getRowId={(d) => d.id}
      initialSorting={[{ id: 'createdAt', desc: true }]}
    />
  );
}
