import { useParams } from 'react-router';
import { AlternatesPage } from '../../features/alternates/components/alternates-page';
import { RequireAbility } from './require-ability';

export function PartAlternatesRoute() {
  const { id = '' } = useParams();
  return (
    <RequireAbility action="read" subject="Part">
      <title>Alternates · Understudy</title>
      <AlternatesPage key={id} partId={id} />
    </RequireAbility>
  );
}
