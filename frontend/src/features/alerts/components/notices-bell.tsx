import { NavLink } from 'react-router';
import { cx } from '../../../components/ui';
import { useNotifications } from '../api/get-notifications';

/** The header's way to the notices, with the unread count; a failed look-up just shows the bell. */
export function NoticesBell({ className }: { className?: string }) {
  const notices = useNotifications();
  const unread = notices.data?.unread ?? 0;
  const label = unread > 0 ? `Notices, ${unread} unread` : 'Notices';
  return (
    <NavLink
      to="/notices"
      aria-label={label}
      title={label}
      className={({ isActive }) =>
        cx(
          'relative inline-flex size-10 shrink-0 items-center justify-center rounded-full border text-ink transition-colors',
          isActive ? 'border-ink bg-ink text-paper' : 'border-rule bg-card hover:border-ink-soft',
          className,
        )
      }
    >
      <svg aria-hidden="true" viewBox="0 0 20 20" className="size-5">
        <path
          d="M10 2.5a5 5 0 0 0-5 5v3.2L3.5 13.5v1h13v-1L15 10.7V7.5a5 5 0 0 0-5-5Z"
          fill="none"
          stroke="currentColor"
          strokeWidth="1.6"
          strokeLinejoin="round"
        />
        <path d="M8 16.5a2 2 0 0 0 4 0" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
      </svg>
      {unread > 0 && (
        <span
          aria-hidden="true"
          data-testid="notices-count"
          className="absolute -top-1 -right-1 inline-flex h-5 min-w-5 items-center justify-center rounded-full bg-copper px-1 text-[11px] font-bold text-card tabular-nums"
        >
          {unread > 99 ? '99+' : unread}
        </span>
      )}
    </NavLink>
  );
}
