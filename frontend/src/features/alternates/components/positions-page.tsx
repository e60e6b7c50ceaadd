import { PIN_LAYOUTS_BY_FAMILY, type RequirementSetDto } from '@understudy/shared-types';
import { useState } from 'react';
import { Link, useLocation } from 'react-router';
import { Alert, Card, EmptyState, ErrorState, LoadingState, PageHeader, SectionHeading, Spinner, buttonClasses } from '../../../components/ui';
import { useDebouncedValue } from '../../../hooks/use-debounced-value';
import { isApiClientError } from '../../../lib/api-client';
import { useRankPosition } from '../api/rank-position';
import { useRequirementSet } from '../api/get-requirement-set';
import { useRequirementSetResults } from '../api/get-requirement-set-results';
import {
  EMPTY_REQUIREMENTS,
  readRequirements,
  sameRequirements,
  valuesFromRequirements,
  type RequirementsField,
  type RequirementsFormValues,
} from '../lib/requirements-form';
import { OptocouplerPanel } from './optocoupler-panel';
import { OpenPositionCard, SavePositionForm } from './position-controls';
import { PositionResultsView } from './position-results';
import { RequirementsForm } from './requirements-form';
import { SavedPositions } from './saved-positions';

export const RANK_DEBOUNCE_MS = 300;

function Workbench({ set }: { set?: RequirementSetDto }) {
  const location = useLocation();
  const justSaved = !!(location.state && typeof location.state === 'object' && 'saved' in location.state);
  const [values, setValues] = useState<RequirementsFormValues>(() => (set ? valuesFromRequirements(set.requirements) : EMPTY_REQUIREMENTS));
  const read = readRequirements(values);
  const unchanged = !!set && !!read.requirements && sameRequirements(read.requirements, set.requirements);

  // Debounce text, not the object, so the timer only restarts when what would be sent changes.
  const sendText = read.requirements ? JSON.stringify(read.requirements) : '';
  const debouncedText = useDebouncedValue(sendText, RANK_DEBOUNCE_MS);
  const saved = useRequirementSetResults(set?.id, { enabled: unchanged });
  const live = useRankPosition(!unchanged && debouncedText ? JSON.parse(debouncedText) : null);
  const results = unchanged ? saved : live;
  const settling = results.isFetching || (!unchanged && sendText !== debouncedText);

  function change<K extends RequirementsField>(field: K, value: RequirementsFormValues[K]) {
    setValues((current) => {
      const next = { ...current, [field]: value };
      // A pin layout belongs to a family; switching family drops one that no longer fits.
      if (field === 'family' && !(PIN_LAYOUTS_BY_FAMILY[next.family] as readonly string[]).includes(next.pinLayout)) next.pinLayout = '';
      return next;
    });
  }

  return (
    // The form and the saved positions side by side; the results below them, full width, for their many columns.
    <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_18rem]">
      <div className="flex min-w-0 flex-col gap-6">
        {justSaved && set && <Alert tone="success">Saved as “{set.name}”. Reopen it from the list to rerun it later.</Alert>}
        <RequirementsForm values={values} onChange={change} read={read} />
      </div>
      <div className="flex min-w-0 flex-col gap-6">
        {set && (
          <OpenPositionCard
            key={set.updatedAt}
            set={set}
            requirements={read.requirements}
            changed={!unchanged}
            onRerun={() => void saved.refetch()}
            rerunning={saved.isFetching}
          />
        )}
        <SavePositionForm
          key={set?.id ?? 'new'}
          requirements={read.requirements}
          suggestedDesign={set?.design ?? ''}
          title={set ? 'Save as a new position' : 'Save as a position'}
        />
        <SavedPositions currentId={set?.id} />
      </div>
      <Card aria-labelledby="position-results-title" className="min-w-0 lg:col-span-2">
        <SectionHeading id="position-results-title" aside={settling && results.data ? <Spinner className="text-copper" /> : undefined}>
          Results
        </SectionHeading>
        <div className="py-4" aria-busy={settling || undefined}>
          {!read.requirements && !results.data ? (
            <p className="px-5 text-sm text-ink-soft">Fix the marked fields to rank the catalog.</p>
          ) : results.isPending && !results.data ? (
            <LoadingState label="Ranking the catalog…" />
          ) : results.isError && !results.data ? (
            <div className="px-5">
              <ErrorState title="The ranking could not be made" message={results.error.message} onRetry={() => void results.refetch()} />
            </div>
          ) : results.data ? (
            <>
              {results.isError && (
                <p role="alert" className="mx-5 mb-3 rounded-md border border-danger/30 bg-danger-wash px-3 py-2 text-sm text-danger">
                  {results.error.message} The ranking shown is from before the change.
                </p>
              )}
              {!read.requirements && <p className="mx-5 mb-3 text-sm text-warn">Fix the marked fields to update the ranking.</p>}
              <div className={settling ? 'opacity-70 transition-opacity' : 'transition-opacity'}>
                <PositionResultsView results={results.data} busy={settling} />
              </div>
            </>
          ) : null}
        </div>
      </Card>
      <div className="min-w-0 lg:col-span-2">
        <OptocouplerPanel />
      </div>
    </div>
  );
}

/**
 * Positions: the requirements of one place in a circuit, ranked against the catalog as they are typed, and saved by
 * name to rerun when stock or the catalog changes.
 */
export function PositionsPage({ setId }: { setId?: string }) {
  const set = useRequirementSet(setId);
  const header = (
    <PageHeader
      title={setId && set.data ? set.data.name : 'Positions'}
      description="Describe the place a part fills — its supply, the largest signal, the load it drives — and see which parts meet it, with the margin on each requirement."
      actions={
        setId ? (
          <Link to="/positions" className={buttonClasses('secondary', 'sm')}>
            New position
          </Link>
        ) : undefined
      }
    />
  );

  if (setId && set.isPending) {
    return (
      <>
        {header}
        <LoadingState label="Loading position…" />
      </>
    );
  }
  if (setId && set.isError) {
    return (
      <>
        {header}
        {isApiClientError(set.error) && (set.error.status === 404 || set.error.status === 403) ? (
          <EmptyState
            title="There is no such position"
            action={
              <Link to="/positions" className={buttonClasses('secondary')}>
                Back to positions
              </Link>
            }
          >
            It may have been deleted, or it belongs to someone else.
          </EmptyState>
        ) : (
          <ErrorState message={set.error.message} onRetry={() => void set.refetch()} />
        )}
      </>
    );
  }

  return (
    <>
      <title>{`${set.data?.name ?? 'Positions'} · Understudy`}</title>
      {setId && (
        <nav aria-label="Breadcrumb" className="mb-2 text-sm">
          <Link to="/positions" className="font-semibold text-copper-deep underline-offset-2 hover:underline">
            ← Positions
          </Link>
        </nav>
      )}
      {header}
      <Workbench key={set.data?.id ?? 'new'} set={set.data} />
    </>
  );
}
