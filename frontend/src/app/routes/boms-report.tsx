import { useParams } from 'react-router';
import { BomReport } from '../../features/boms/components/bom-report';
import { RequireAbility } from './require-ability';

export function BomsReportRoute() {
  const { id = '' } = useParams();
  return (
    <RequireAbility action="read" subject="Bom">
      <title>BOM report · Understudy</title>
      <BomReport key={id} bomId={id} />
    </RequireAbility>
  );
}
