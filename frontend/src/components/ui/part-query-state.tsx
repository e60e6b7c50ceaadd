import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { isApiClientError } from '../../lib/api-client';
import { buttonClasses } from './button';
import { EmptyState, ErrorState, LoadingState } from './states';

/** Loading, "no such part" and error states for a page built on one part; renders `children` once it has loaded. */
export function PartQueryState<T>({ query, children }: { query: UseQueryResult<T>; children: (part: T) => ReactNode }) {
  if (query.isPending) return <LoadingState label="Loading part…" />;
  if (query.isError) {
    if (isApiClientError(query.error) && query.error.status === 404) {
      return (
        <EmptyState
          title="There is no such part"
          action={
            <Link to="/parts" className={buttonClasses('secondary')}>
              Back to the catalog
            </Link>
          }
        >
          It may have been mistyped, or the link may be from another catalog.
        </EmptyState>
      );
    }
    return <ErrorState message={query.error.message} onRetry={() => void query.refetch()} />;
  }
  return <>{children(query.data)}</>;
}
