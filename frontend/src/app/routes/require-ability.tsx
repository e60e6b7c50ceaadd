import type { Action, SubjectName } from '@understudy/shared-types';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { EmptyState, buttonClasses } from '../../components/ui';
import { useAppAbility } from '../../lib/ability';

/** Hides a page from people whose role cannot use it; the API refuses them regardless. */
export function RequireAbility({ action, subject, children }: { action: Action; subject: SubjectName; children: ReactNode }) {
  const ability = useAppAbility();
  if (ability.can(action, subject)) return <>{children}</>;
  return (
    <>
      <title>No access · Understudy</title>
      <EmptyState
        title="This page is not part of your role"
        action={
          <Link to="/" className={buttonClasses('secondary')}>
            Back to Home
          </Link>
        }
      >
        Ask an admin if you think you need it.
      </EmptyState>
    </>
  );
}
