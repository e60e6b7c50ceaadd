import { useParams } from 'react-router';
import { PositionsPage } from '../../features/alternates/components/positions-page';
import { RequireAbility } from './require-ability';

/** Both /positions (a fresh one) and /positions/:id (a saved one, reopened). */
export function PositionsRoute() {
  const { id } = useParams();
  return (
    <RequireAbility action="read" subject="Requirement">
      <title>Positions · Understudy</title>
      <PositionsPage key={id ?? 'new'} setId={id} />
    </RequireAbility>
  );
}
