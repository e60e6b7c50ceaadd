import { Card, PageHeader, SectionHeading } from '../../components/ui';
import { useMe } from '../../features/auth/api/get-me';
import { InvitationsTable } from '../../features/people/components/invitations-table';
import { InviteForm } from '../../features/people/components/invite-form';
import { UsersTable } from '../../features/people/components/users-table';
import { Can } from '../../lib/ability';
import { RequireAbility } from './require-ability';

export function AdminPeopleRoute() {
  const { data: me } = useMe();
  return (
    <RequireAbility action="read" subject="User">
      <title>People · Understudy</title>
      <PageHeader title="People" description="Who can sign in to Understudy, and what their role lets them do." />
      <div className="flex flex-col gap-8">
        <Card aria-labelledby="accounts-title">
          <SectionHeading id="accounts-title">Accounts</SectionHeading>
          <UsersTable currentUserId={me?.id} />
        </Card>
        <Can I="create" a="Invitation">
          <Card aria-labelledby="invite-title">
            <SectionHeading id="invite-title">Invite someone</SectionHeading>
            <InviteForm />
          </Card>
        </Can>
        <Can I="read" a="Invitation">
          <Card aria-labelledby="invitations-title">
            <SectionHeading id="invitations-title">Invitations</SectionHeading>
            <InvitationsTable />
          </Card>
        </Can>
      </div>
    </RequireAbility>
  );
}
