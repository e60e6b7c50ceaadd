import { useParams } from 'react-router';
import { BomPage } from '../../features/boms/components/bom-page';
import { RequireAbility } from './require-ability';

export function BomsDetailRoute() {
  const { id = '' } = useParams();
  return (
    <RequireAbility action="read" subject="Bom">
      <title>BOM · Understudy</title>
      <BomPage key={id} bomId={id} />
    </RequireAbility>
  );
}
