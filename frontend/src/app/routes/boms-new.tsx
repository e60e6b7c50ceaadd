import { BomNewPage } from '../../features/boms/components/bom-new-page';
import { RequireAbility } from './require-ability';

export function BomsNewRoute() {
  return (
    <RequireAbility action="create" subject="Bom">
      <title>Check a BOM · Understudy</title>
      <BomNewPage />
    </RequireAbility>
  );
}
