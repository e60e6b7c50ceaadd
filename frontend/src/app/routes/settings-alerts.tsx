import { AlertSettings } from '../../features/alerts/components/alert-settings';
import { RequireAbility } from './require-ability';

export function SettingsAlertsRoute() {
  return (
    <RequireAbility action="update" subject="Notification">
      <title>Alert settings · Understudy</title>
      <AlertSettings />
    </RequireAbility>
  );
}
