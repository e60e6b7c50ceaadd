import type { CurrentUser } from '@understudy/shared-types';
import { useEffect, useId, useRef, useState, useCallback } from 'react';
import { useDismissable } from '../../hooks/use-dismissable';
import { Button, RoleBadge } from '../../components/ui';
import { useSignOut } from '../../features/auth/api/sign-out';

function initials(name: string): string {
  const letters = name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((word) => word[0]?.toUpperCase() ?? '');
  return letters.join('') || '?';
}

/** A disclosure: the button toggles a panel; Escape or a click elsewhere closes it and focus returns to the button. */
export function AccountMenu({ user }: { user: CurrentUser }) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const signOutRef = useRef<HTMLButtonElement>(null);
  const signOut = useSignOut();

  const close = useCallback(() => setOpen(false), []);
  useDismissable(open, close, rootRef, buttonRef);
  useEffect(() => {
    if (open) signOutRef.current?.focus();
  }, [open]);


  return (
    <div ref={rootRef} className="relative">
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((value) => !value)}
        className="flex h-10 items-center gap-2 rounded-full border border-rule bg-card py-1 pr-3 pl-1 text-sm font-semibold text-ink hover:border-ink-soft"
      >
        <span aria-hidden="true" className="flex size-8 items-center justify-center rounded-full bg-copper text-xs font-bold text-card">
          {initials(user.name)}
        </span>
        <span className="hidden max-w-40 truncate 2xl:inline">{user.name}</span>
        <span className="sr-only">Account menu</span>
        <svg aria-hidden="true" viewBox="0 0 12 12" className={open ? 'size-3 rotate-180' : 'size-3'}>
          <path d="M2.5 4.5 6 8l3.5-3.5" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
      </button>
      <div
        id={panelId}
        hidden={!open}
        className="absolute right-0 z-20 mt-2 w-72 rounded-lg border border-rule bg-card p-4 shadow-xl"
      >
        <p className="font-semibold break-words text-ink">{user.name}</p>
        <p className="text-sm break-all text-ink-soft">{user.email}</p>
        <div className="mt-2">
          <RoleBadge role={user.role} />
        </div>
        {signOut.isError && (
          <p role="alert" className="mt-3 text-sm text-danger">
            {signOut.error instanceof Error ? signOut.error.message : 'Signing out failed.'}
          </p>
        )}
        <Button ref={signOutRef} variant="secondary" className="mt-4 w-full" loading={signOut.isPending} onClick={() => signOut.mutate()}>
          Sign out
        </Button>
      </div>
    </div>
  );
}
