import { useQueryClient } from '@tanstack/react-query';
import type { PartDto } from '@understudy/shared-types';
import { useParams } from 'react-router';
import { DatasheetReview } from '../../features/datasheets/components/datasheet-review';
import { partKeys } from '../../features/parts/keys';
import { RequireAbility } from './require-ability';

export function DatasheetReviewRoute() {
  const { id = '' } = useParams();
  const queryClient = useQueryClient();
  // Features do not know each other's caches: the app says what an apply makes stale in the catalog.
  const onApplied = (part: PartDto) => {
    queryClient.setQueryData(partKeys.detail(part.id), part);
    void queryClient.invalidateQueries({ queryKey: partKeys.revisions(part.id) });
    void queryClient.invalidateQueries({ queryKey: partKeys.lists() });
  };
  return (
    <RequireAbility action="read" subject="Datasheet">
      <title>Datasheet · Understudy</title>
      <DatasheetReview key={id} id={id} onApplied={onApplied} />
    </RequireAbility>
  );
}
