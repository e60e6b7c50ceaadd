import { CompareView } from '../../features/compare/components/compare-view';
import { RequireAbility } from './require-ability';

export function CompareRoute() {
  return (
    <RequireAbility action="read" subject="Part">
      <title>Compare · Understudy</title>
      <CompareView />
    </RequireAbility>
  );
}
