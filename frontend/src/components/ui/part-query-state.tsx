import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { isApiClientError } from '../../lib/api-client';
import { buttonClasses } from './button';
import { EmptyState, ErrorState, LoadingState } from './states';

export interface RecordQueryStateProps<T> {
  query: UseQueryResult<T>;
  loadingLabel: string;
  /** What a 404 shows: a title, a way back and, optionally, why it may be missing. */
  missing: { title: string; backTo: string; backLabel: string; text?: ReactNode };
  children: (record: T) => ReactNode;
}

/** Loading, "no such record" and error states for a page built on one record; renders `children` once it has loaded. */
export function RecordQueryState<T>({ query, loadingLabel, missing, children }: RecordQueryStateProps<T>) {
  if (query.isPending) return <LoadingState label={loadingLabel} />;
  if (query.isError) {
    if (isApiClientError(query.error) && query.error.status === 404) {
      return (
        <EmptyState
          title={missing.title}
          action={
            <Link to={missing.backTo} className={buttonClasses('secondary')}>
              {missing.backLabel}
            </Link>
          }
        >
          {missing.text}
        </EmptyState>
      );
    }
    return <ErrorState message={query.error.message} onRetry={() => void query.refetch()} />;
  }
  return <>{children(query.data)}</>;
}

const NO_SUCH_PART = {
  title: 'There is no such part',
  backTo: '/parts',
  backLabel: 'Back to the catalog',
  text: 'It may have been mistyped, or the link may be from another catalog.',
};

/** The same states for a page built on one part. */
export function PartQueryState<T>({ query, children }: { query: UseQueryResult<T>; children: (part: T) => ReactNode }) {
  return (
    <RecordQueryState query={query} loadingLabel="Loading part…" missing={NO_SUCH_PART}>
      {children}
    </RecordQueryState>
  );
}
