import { DATASHEET_LIMITS, type DatasheetListItem } from '@understudy/shared-types';
import { Link } from 'react-router';
import { Button, FileDropZone, ProgressBar, cx } from '../../../components/ui';
import { useDatasheets } from '../api/get-datasheets';
import { useDatasheetUploads, type UploadEntry } from '../hooks/use-datasheet-uploads';
import { formatBytes } from '../lib/format-bytes';
import { DatasheetStatusBadge } from './datasheet-status-badge';

const LINK = 'font-semibold text-copper-deep underline-offset-2 hover:underline';

function percentOf(u: UploadEntry): number {
  if (u.phase === 'done') return 100;
  return u.total > 0 ? Math.round((u.loaded / u.total) * 100) : 0;
}

function ServerState({ item }: { item: DatasheetListItem }) {
  return (
    <span className="flex flex-wrap items-center gap-2">
      <DatasheetStatusBadge status={item.status} />
      {item.status === 'failed' && item.failureReason && <span className="text-sm text-danger">{item.failureReason}</span>}
      {(item.status === 'ready' || item.status === 'applied') && (
        <Link to={`/datasheets/${item.id}`} className={cx(LINK, 'text-sm')}>
          {item.status === 'ready' ? 'Review' : 'Open'}
          <span className="sr-only"> {item.fileName}</span>
        </Link>
      )}
    </span>
  );
}

function UploadRow({
  upload: u,
  latest,
  onCancel,
  onRetry,
  onDismiss,
}: {
  upload: UploadEntry;
  latest: DatasheetListItem | undefined;
  onCancel: () => void;
  onRetry: () => void;
  onDismiss: () => void;
}) {
  const name = u.file.name;
  const showBar = u.phase === 'waiting' || u.phase === 'uploading' || u.phase === 'done';
  const percent = percentOf(u);
  const item = latest ?? u.item;
  return (
    <li className="flex flex-col gap-2 px-4 py-3" data-phase={u.phase}>
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <p className="min-w-0 text-sm break-all">
          <span className="font-semibold text-ink">{name}</span> <span className="text-ink-faint">{formatBytes(u.file.size)}</span>
        </p>
        <div className="flex items-center gap-2">
          {(u.phase === 'waiting' || u.phase === 'uploading') && (
            <Button variant="ghost" size="sm" onClick={onCancel}>
              Cancel<span className="sr-only"> uploading {name}</span>
            </Button>
          )}
          {(u.phase === 'failed' || u.phase === 'cancelled') && (
            <Button variant="secondary" size="sm" onClick={onRetry}>
              Try again<span className="sr-only"> to upload {name}</span>
            </Button>
          )}
          {u.phase !== 'waiting' && u.phase !== 'uploading' && (
            <Button variant="ghost" size="sm" onClick={onDismiss}>
              Dismiss<span className="sr-only"> {name}</span>
            </Button>
          )}
        </div>
      </div>
      {showBar && (
        <ProgressBar
          label={`Uploading ${name}`}
          value={percent}
          valueText={u.phase === 'waiting' ? 'Waiting to upload' : `${percent} % uploaded`}
          tone={u.phase === 'done' ? 'ok' : 'accent'}
        />
      )}
      <div className="text-sm" aria-live="polite">
        {u.phase === 'waiting' && <span className="text-ink-soft">Waiting to upload…</span>}
        {u.phase === 'uploading' && <span className="text-ink-soft tabular-nums">{percent} % uploaded</span>}
        {u.phase === 'done' && item && <ServerState item={item} />}
        {u.phase === 'cancelled' && <span className="text-ink-soft">Cancelled; nothing was kept.</span>}
        {u.phase === 'failed' && (
          <p role="alert" className="font-medium text-danger">
            {u.error}
          </p>
        )}
        {u.phase === 'refused' && u.rejection && (
          <p role="alert" className="font-medium text-danger">
            {u.rejection.message}
            {u.rejection.code === 'duplicate' && u.rejection.existingId && (
              <>
                {' '}
                <Link to={`/datasheets/${u.rejection.existingId}`} className={LINK}>
                  Open the existing datasheet
                </Link>
              </>
            )}
          </p>
        )}
      </div>
    </li>
  );
}

/**
 * Drop PDFs (or choose them) and follow each one: its upload, then the parser's progress as the server reports it.
 * With `partId` the datasheets are attached to that part.
 */
export function DatasheetUploader({ partId, compact = false }: { partId?: string; compact?: boolean }) {
  const { uploads, add, cancel, retry, dismiss, clearFinished } = useDatasheetUploads({ partId });
  // The same list the page shows, so the rows follow the parser without extra requests.
  const list = useDatasheets(partId ? { partId } : {});
  const byId = new Map((list.data ?? []).map((d) => [d.id, d]));
  const finished = uploads.filter((u) => u.phase !== 'waiting' && u.phase !== 'uploading').length;
  const megabytes = Math.round(DATASHEET_LIMITS.maxBytes / 1024 / 1024);

  return (
    <div className="flex flex-col gap-3">
      <FileDropZone
        compact={compact}
        accept=".pdf,application/pdf"
        title={compact ? 'Drop PDF datasheets here' : 'Drop PDF datasheets here, one or many'}
        buttonLabel="Choose files"
        hint={`PDF only, up to ${megabytes} MB and ${DATASHEET_LIMITS.maxPages} pages each. Each file is sent and read on its own.`}
        onFiles={add}
      />
      {uploads.length > 0 && (
        <div className="rounded-md border border-rule bg-card">
          <div className="flex items-center justify-between gap-2 border-b border-rule px-4 py-2">
            <h3 className="text-sm font-semibold text-ink">Uploads</h3>
            {finished > 0 && (
              <Button variant="ghost" size="sm" onClick={clearFinished}>
                Clear finished
              </Button>
            )}
          </div>
          <ul aria-label="Uploads" className="divide-y divide-rule">
            {uploads.map((u) => (
              <UploadRow
                key={u.key}
                upload={u}
                latest={u.item ? byId.get(u.item.id) : undefined}
                onCancel={() => cancel(u.key)}
                onRetry={() => retry(u.key)}
                onDismiss={() => dismiss(u.key)}
              />
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}
