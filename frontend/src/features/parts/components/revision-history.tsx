import type { FamilyDefinition } from '@understudy/shared-types';
import { Link } from 'react-router';
import { Badge, EmptyState, ErrorState, LoadingState } from '../../../components/ui';
import { formatDateTime, formatRelative } from '../../../lib/format';
import { usePartRevisions } from '../api/get-part-revisions';
import { describeChanges, sourceLabel } from '../lib/revision-format';

/** Who changed what and when, newest first, each field as before → after in its own units. */
export function RevisionHistory({ partId, family }: { partId: string; family: FamilyDefinition }) {
  const revisions = usePartRevisions(partId);

  if (revisions.isPending) return <LoadingState label="Loading history…" />;
  if (revisions.isError) {
    return <ErrorState className="m-4" message={revisions.error.message} onRetry={() => void revisions.refetch()} />;
  }
  if (revisions.data.length === 0) {
    return <EmptyState className="m-4" title="No history yet">Changes appear here once someone edits the part.</EmptyState>;
  }

  return (
    <ol aria-label="Revisions" className="divide-y divide-rule">
      {revisions.data.map((rev) => {
        const lines = describeChanges(family, rev.changes);
        return (
          <li key={rev.id} className="flex flex-col gap-2 px-5 py-3" data-version={rev.version}>
            <p className="flex flex-wrap items-center gap-x-2 gap-y-1 text-sm">
              <span className="font-semibold text-ink">{rev.actor?.name ?? 'Understudy'}</span>
              <time dateTime={rev.createdAt} title={formatDateTime(rev.createdAt)} className="text-ink-soft">
                {formatRelative(rev.createdAt)}
              </time>
              {/* The datasheet line below says where the change came from; the badge would repeat it. */}
              {!rev.datasheet && <Badge>{sourceLabel(rev.source)}</Badge>}
              <span className="text-xs text-ink-faint">version {rev.version}</span>
            </p>
            {rev.datasheet && (
              <p className="text-sm text-ink-soft">
                From datasheet{' '}
                <Link
                  to={`/datasheets/${rev.datasheet.id}`}
                  className="font-semibold break-all text-copper-deep underline-offset-2 hover:underline"
                >
                  {rev.datasheet.fileName}
                </Link>
              </p>
            )}
            {lines.length === 0 ? (
              <p className="text-sm text-ink-soft">{rev.version === 1 ? 'Added to the catalog.' : 'No field changes recorded.'}</p>
            ) : (
              <ul className="flex flex-col gap-1.5">
                {lines.map((line) => (
                  <li key={line.field} className="text-sm" data-field={line.field}>
                    <span className="font-semibold text-ink">{line.label}:</span>{' '}
                    <del className="break-words text-ink-soft decoration-danger/60">{line.before}</del>
                    <span aria-hidden="true" className="px-1.5 text-copper">
                      →
                    </span>
                    <span className="sr-only"> changed to </span>
                    <ins className="break-words text-ink no-underline">{line.after}</ins>
                  </li>
                ))}
              </ul>
            )}
          </li>
        );
      })}
    </ol>
  );
}
