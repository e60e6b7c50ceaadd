import { DatasheetsPage } from '../../features/datasheets/components/datasheets-page';
import { RequireAbility } from './require-ability';

export function DatasheetsRoute() {
  return (
    <RequireAbility action="read" subject="Datasheet">
      <title>Datasheets · Understudy</title>
      <DatasheetsPage />
    </RequireAbility>
  );
}
