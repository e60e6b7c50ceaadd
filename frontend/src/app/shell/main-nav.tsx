import type { Action, SubjectName } from '@understudy/shared-types';
import { NavLink } from 'react-router';
import { cx } from '../../components/ui';
import { useAppAbility } from '../../lib/ability';

interface NavItem {
  to: string;
  label: string;
  /** What the person must be able to do to see the entry; absent means everyone signed in. */
  requires?: { action: Action; subject: SubjectName };
  end?: boolean;
}

export const NAV_ITEMS: NavItem[] = [
  { to: '/', label: 'Home', end: true },
  { to: '/parts', label: 'Catalog', requires: { action: 'read', subject: 'Part' } },
  { to: '/positions', label: 'Positions', requires: { action: 'read', subject: 'Requirement' } },
  { to: '/datasheets', label: 'Datasheets', requires: { action: 'read', subject: 'Datasheet' } },
  { to: '/boms', label: 'BOMs', requires: { action: 'read', subject: 'Bom' } },
  { to: '/admin/people', label: 'People', requires: { action: 'read', subject: 'User' } },
  { to: '/admin/outbox', label: 'Outbox', requires: { action: 'read', subject: 'Outbox' } },
];

export function MainNav({ className }: { className?: string }) {
  const ability = useAppAbility();
  const items = NAV_ITEMS.filter((item) => !item.requires || ability.can(item.requires.action, item.requires.subject));

  return (
    <nav aria-label="Main" className={className}>
      <ul className="flex items-center gap-1">
        {items.map((item) => (
          <li key={item.to}>
            <NavLink
              to={item.to}
              end={item.end}
              className={({ isActive }) =>
                cx(
                  'relative inline-flex h-9 items-center rounded-md px-2.5 text-sm font-semibold whitespace-nowrap transition-colors',
                  isActive
                    ? 'bg-ink text-paper'
                    : 'text-ink-soft hover:bg-paper-deep hover:text-ink',
                )
              }
            >
              {item.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
