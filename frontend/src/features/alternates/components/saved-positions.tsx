import { subject } from '@casl/ability';
import { FAMILIES, type RequirementSetDto } from '@understudy/shared-types';
import { Link } from 'react-router';
import { Card, EmptyState, ErrorState, LoadingState, SectionHeading, cx } from '../../../components/ui';
import { useAppAbility } from '../../../lib/ability';
import { formatDate } from '../../../lib/format';
import { useRequirementSets } from '../api/get-requirement-sets';

export function canChange(ability: ReturnType<typeof useAppAbility>, set: Pick<RequirementSetDto, 'owner'>): boolean {
  return ability.can('update', subject('Requirement', { ownerId: set.owner.id }));
}

/** Saved positions to reopen: a viewer's own; editors see the team's too, marked with whose they are. */
export function SavedPositions({ currentId }: { currentId?: string }) {
  const sets = useRequirementSets();
  const ability = useAppAbility();
  return (
    <Card aria-labelledby="saved-title">
      <SectionHeading id="saved-title">Saved positions</SectionHeading>
      {sets.isPending ? (
        <LoadingState label="Loading positions…" className="py-6" />
      ) : sets.isError ? (
        <div className="p-4">
          <ErrorState message={sets.error.message} onRetry={() => void sets.refetch()} />
        </div>
      ) : sets.data.length === 0 ? (
        <div className="p-4">
          <EmptyState title="None saved yet" className="py-6">
            Save a position to rerun it when stock or the catalog changes.
          </EmptyState>
        </div>
      ) : (
        <ul aria-labelledby="saved-title" className="max-h-96 divide-y divide-rule overflow-y-auto">
          {sets.data.map((set) => {
            const current = set.id === currentId;
            return (
              <li key={set.id}>
                <Link
                  to={`/positions/${set.id}`}
                  aria-current={current ? 'page' : undefined}
                  className={cx('flex flex-col gap-0.5 px-5 py-2.5 hover:bg-paper/60', current && 'bg-copper-wash/50 shadow-[inset_3px_0_0_var(--color-copper)]')}
                >
                  <span className="font-semibold text-ink">{set.name}</span>
                  <span className="text-xs text-ink-soft">
                    {[set.design, FAMILIES[set.requirements.family].label].filter(Boolean).join(' · ')}
                  </span>
                  <span className="text-xs text-ink-faint">
                    {canChange(ability, set) ? 'Yours' : set.owner.name} · {formatDate(set.updatedAt)}
                  </span>
                </Link>
              </li>
            );
          })}
        </ul>
      )}
    </Card>
  );
}
