import { PageHeader } from '../../components/ui';
import { OutboxView } from '../../features/outbox/components/outbox-view';
import { RequireAbility } from './require-ability';

export function AdminOutboxRoute() {
  return (
    <RequireAbility action="read" subject="Outbox">
      <title>Outbox · Understudy</title>
      <PageHeader
        title="Outbox"
        description="Development only: mail Understudy would have sent, caught here so you can follow invitation and reset links."
      />
      <OutboxView />
    </RequireAbility>
  );
}
