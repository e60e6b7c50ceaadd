import { NoticesPage } from '../../features/alerts/components/notices-page';
import { RequireAbility } from './require-ability';

export function NoticesRoute() {
  return (
    <RequireAbility action="read" subject="Notification">
      <title>Notices · Understudy</title>
      <NoticesPage />
    </RequireAbility>
  );
}
