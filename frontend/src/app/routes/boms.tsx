import { useMe } from '../../features/auth/api/get-me';
import { BomsPage } from '../../features/boms/components/boms-page';
import { RequireAbility } from './require-ability';

export function BomsRoute() {
  const { data: user } = useMe();
  return (
    <RequireAbility action="read" subject="Bom">
      <title>BOMs · Understudy</title>
      <BomsPage currentUserId={user?.id ?? ''} />
    </RequireAbility>
  );
}
