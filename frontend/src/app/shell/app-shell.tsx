import type { CurrentUser } from '@understudy/shared-types';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { Wordmark } from '../../components/ui';
import { NoticesBell } from '../../features/alerts/components/notices-bell';
import { QuickFind } from '../../features/quick-find/components/quick-find';
import { Can } from '../../lib/ability';
import { AccountMenu } from './account-menu';
import { MainNav } from './main-nav';

export function AppShell({ user, children }: { user: CurrentUser; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col bg-paper print:min-h-0 print:bg-white">
      <a
        href="#main"
        className="sr-only print:hidden focus:not-sr-only focus:fixed focus:top-2 focus:left-2 focus:z-50 focus:rounded-md focus:bg-ink focus:px-3 focus:py-2 focus:text-paper"
      >
        Skip to content
      </a>
      <header className="sticky top-0 z-10 border-b border-rule bg-paper/90 backdrop-blur supports-[backdrop-filter]:bg-paper/75 print:hidden">
        <div className="mx-auto flex h-16 max-w-6xl items-center gap-3 px-4 sm:gap-4 sm:px-6 lg:gap-5">
          <Link to="/" className="shrink-0 rounded-md" aria-label="Understudy home">
            <Wordmark compact />
          </Link>
          <MainNav className="min-w-0 flex-1 overflow-x-auto" />
          <Can I="read" a="Part">
            <QuickFind className="w-36 shrink-0 sm:w-44 xl:w-52" />
          </Can>
          <NoticesBell />
          <AccountMenu user={user} />
        </div>
      </header>
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 outline-none sm:px-6 print:max-w-none print:p-0">
        {children}
      </main>
      <footer className="border-t border-rule print:hidden">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-2 px-4 py-4 text-xs text-ink-faint sm:px-6">
          <span>Understudy — parts, datasheets and stand-ins for analog audio circuits.</span>
          <span>Foundation release</span>
        </div>
      </footer>
    </div>
  );
}
