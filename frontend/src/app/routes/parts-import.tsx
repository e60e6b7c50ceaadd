import { PageHeader } from '../../components/ui';
import { ImportParts } from '../../features/parts/components/import-parts';
import { RequireAbility } from './require-ability';

export function PartsImportRoute() {
  return (
    <RequireAbility action="create" subject="Part">
      <title>Import parts · Understudy</title>
      <PageHeader
        title="Import parts"
        description="Add or update many parts at once from a CSV or JSON file. Check the file first; nothing changes until you import."
      />
      <ImportParts />
    </RequireAbility>
  );
}
