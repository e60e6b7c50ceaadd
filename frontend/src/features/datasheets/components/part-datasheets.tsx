import { Link } from 'react-router';
import { Card, ErrorState, LoadingState, SectionHeading } from '../../../components/ui';
import { Can } from '../../../lib/ability';
import { formatDate } from '../../../lib/format';
import { datasheetFileUrl } from '../api/datasheet-file';
import { useDatasheets } from '../api/get-datasheets';
import { DatasheetStatusBadge } from './datasheet-status-badge';
import { DatasheetUploader } from './datasheet-uploader';

const LINK = 'font-semibold text-copper-deep underline-offset-2 hover:underline';

/** A part's datasheets for its page, with a small drop zone for editors that attaches new ones to the part. */
export function PartDatasheets({ partId, allowUpload = true }: { partId: string; allowUpload?: boolean }) {
  const list = useDatasheets({ partId });
  return (
    <Card aria-labelledby="part-datasheets-title">
      <SectionHeading id="part-datasheets-title">Datasheets</SectionHeading>
      {list.isPending && <LoadingState label="Loading datasheets…" className="py-6" />}
      {list.isError && <ErrorState className="m-4" message={list.error.message} onRetry={() => void list.refetch()} />}
      {list.data && list.data.length === 0 && <p className="px-5 py-4 text-sm text-ink-soft">No datasheet for this part yet.</p>}
      {list.data && list.data.length > 0 && (
        <ul aria-label="Datasheets of this part" className="divide-y divide-rule">
          {list.data.map((d) => (
            <li key={d.id} className="flex flex-wrap items-center justify-between gap-x-3 gap-y-1 px-5 py-3 text-sm">
              <span className="flex min-w-0 flex-col">
                <Link to={`/datasheets/${d.id}`} className={`${LINK} break-all`}>
                  {d.fileName}
                </Link>
                <span className="text-xs text-ink-faint">
                  {formatDate(d.createdAt)}
                  {d.uploadedBy ? ` · ${d.uploadedBy.name}` : ''}
                </span>
              </span>
              <span className="flex items-center gap-3">
                <DatasheetStatusBadge status={d.status} />
                <a href={datasheetFileUrl(d.id, { download: true })} className={LINK}>
                  Download<span className="sr-only"> {d.fileName}</span>
                </a>
              </span>
            </li>
          ))}
        </ul>
      )}
      {allowUpload && (
        <Can I="create" a="Datasheet">
          <div className="border-t border-rule p-4">
            <DatasheetUploader partId={partId} compact />
          </div>
        </Can>
      )}
    </Card>
  );
}
