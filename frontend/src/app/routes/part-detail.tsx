import { useParams } from 'react-router';
import { PartView } from '../../features/parts/components/part-view';
import { RequireAbility } from './require-ability';

export function PartDetailRoute() {
  const { id = '' } = useParams();
  return (
    <RequireAbility action="read" subject="Part">
      <title>Part · Understudy</title>
      <PartView key={id} id={id} />
    </RequireAbility>
  );
}
