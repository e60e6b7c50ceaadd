import { CatalogSearch } from '../../features/parts/components/catalog-search';
import { RequireAbility } from './require-ability';

export function PartsCatalogRoute() {
  return (
    <RequireAbility action="read" subject="Part">
      <title>Catalog · Understudy</title>
      <CatalogSearch />
    </RequireAbility>
  );
}
