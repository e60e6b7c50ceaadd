import type { NotificationDto } from '@understudy/shared-types';
import { Link } from 'react-router';
import { Badge, Button, Card, EmptyState, ErrorState, LoadingState, PageHeader, buttonClasses, cx } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { useNotifications } from '../api/get-notifications';
import { useMarkAllNotificationsRead } from '../api/mark-all-notifications-read';
import { useMarkNotificationRead } from '../api/mark-notification-read';

const KIND_LABELS: Record<NotificationDto['kind'], string> = {
  lifecycle: 'Lifecycle change',
  'approved-equivalent': 'New approved equivalent',
};

function Notice({ notice }: { notice: NotificationDto }) {
  const markRead = useMarkNotificationRead();
  const unread = notice.readAt === null;
  return (
    <li
      data-unread={unread || undefined}
      className={cx('flex flex-col gap-2 px-5 py-4', unread && 'bg-copper-wash/40 shadow-[inset_3px_0_0_var(--color-copper)]')}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="flex min-w-0 flex-col gap-0.5">
          <div className="flex flex-wrap items-center gap-2">
            <h2 className="text-base font-semibold text-ink">{notice.title}</h2>
            <Badge tone={notice.kind === 'lifecycle' ? 'warning' : 'ok'}>{KIND_LABELS[notice.kind]}</Badge>
            {unread && <Badge tone="accent">Unread</Badge>}
          </div>
          <time dateTime={notice.createdAt} className="text-xs text-ink-faint">
            {formatDateTime(notice.createdAt)}
            {notice.emailedAt ? ' · also e-mailed' : ''}
          </time>
        </div>
        {unread && (
          <Button variant="ghost" size="sm" loading={markRead.isPending} onClick={() => markRead.mutate(notice.id)}>
            Mark as read<span className="sr-only"> ({notice.title})</span>
          </Button>
        )}
      </div>
      <p className="max-w-prose text-sm whitespace-pre-line text-ink">{notice.body}</p>
      <div className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
        <Link to={`/parts/${notice.part.id}`} className="font-semibold text-copper-deep underline-offset-2 hover:underline">
          {notice.part.partNumber}
        </Link>
        {notice.boms.map((bom) => (
          <Link key={bom.id} to={`/boms/${bom.id}`} className="text-ink underline underline-offset-2 hover:text-copper-deep">
            {bom.name} <span className="text-ink-soft">({bom.lines === 1 ? '1 line' : `${bom.lines} lines`})</span>
          </Link>
        ))}
      </div>
      {markRead.isError && (
        <p role="alert" className="text-sm text-danger">
          {markRead.error.message}
        </p>
      )}
    </li>
  );
}

/** Changes to parts one's watched BOMs use, newest first. */
export function NoticesPage() {
  const notices = useNotifications();
  const markAll = useMarkAllNotificationsRead();
  const items = notices.data ? [...notices.data.items].sort((a, b) => b.createdAt.localeCompare(a.createdAt)) : [];
  const unread = notices.data?.unread ?? 0;

  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title="Notices"
        description="When a part on one of your watched BOMs changes lifecycle or gains an approved equivalent, it is noted here."
        actions={
          <>
            <Link to="/settings/alerts" className={buttonClasses('ghost')}>
              Alert settings
            </Link>
            <Button variant="secondary" disabled={unread === 0} loading={markAll.isPending} onClick={() => markAll.mutate()}>
              Mark all as read
            </Button>
          </>
        }
      />
      {markAll.isError && (
        <p role="alert" className="text-sm text-danger">
          {markAll.error.message}
        </p>
      )}
      {notices.isPending ? (
        <LoadingState label="Loading notices…" />
      ) : notices.isError ? (
        <ErrorState message={notices.error.message} onRetry={() => void notices.refetch()} />
      ) : items.length === 0 ? (
        <EmptyState
          title="No notices"
          action={
            <Link to="/boms" className={buttonClasses('secondary')}>
              Your BOMs
            </Link>
          }
        >
          Watch a BOM to be told when one of its parts changes.
        </EmptyState>
      ) : (
        <Card>
          <p className="border-b border-rule px-5 py-2.5 text-sm text-ink-soft" aria-live="polite">
            {unread === 0 ? 'All read.' : `${unread} unread.`}
          </p>
          <ul aria-label="Notices, newest first" className="divide-y divide-rule">
            {items.map((n) => (
              <Notice key={n.id} notice={n} />
            ))}
          </ul>
        </Card>
      )}
    </div>
  );
}
