import { createColumnHelper } from '@tanstack/react-table';
import type { InvitationDto, InvitationStatus } from '@understudy/shared-types';
import { useState } from 'react';
import { Badge, Button, ConfirmDialog, DataTable, EmptyState, ErrorState, LoadingState, RoleBadge } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { useAppAbility } from '../../../lib/ability';
import { useInvitations } from '../api/get-invitations';
import { useRevokeInvitation } from '../api/revoke-invitation';

const STATUS: Record<InvitationStatus, { label: string; tone: 'accent' | 'ok' | 'neutral' | 'danger' }> = {
  pending: { label: 'Pending', tone: 'accent' },
  accepted: { label: 'Accepted', tone: 'ok' },
  expired: { label: 'Expired', tone: 'neutral' },
  revoked: { label: 'Revoked', tone: 'danger' },
};

function errorMessage(error: unknown): string {
  return error instanceof Error ? error.message : 'That did not go through.';
}

function RevokeAction({ invitation }: { invitation: InvitationDto }) {
  const [confirming, setConfirming] = useState(false);
  const revoke = useRevokeInvitation();
  const canRevoke = useAppAbility().can('delete', 'Invitation');
  if (!canRevoke || invitation.status !== 'pending') return null;

  return (
    <>
      <Button
        variant="danger"
        size="sm"
        aria-label={`Revoke invitation for ${invitation.email}`}
        onClick={() => {
          revoke.reset();
          setConfirming(true);
        }}
      >
        Revoke
      </Button>
      <ConfirmDialog
        open={confirming}
        tone="danger"
        title="Revoke this invitation?"
        confirmLabel="Revoke invitation"
        busy={revoke.isPending}
        error={revoke.isError ? errorMessage(revoke.error) : undefined}
        onCancel={() => setConfirming(false)}
        onConfirm={() => revoke.mutate(invitation.id, { onSuccess: () => setConfirming(false) })}
      >
        The link sent to {invitation.email} stops working straight away. You can invite them again later.
      </ConfirmDialog>
    </>
  );
}

const column = createColumnHelper<InvitationDto>();

const columns = [
  column.accessor('email', {
    header: 'E-mail',
    cell: (info) => <span className="font-medium whitespace-nowrap text-ink">{info.getValue()}</span>,
  }),
  column.accessor('role', { header: 'Role', cell: (info) => <RoleBadge role={info.getValue()} /> }),
  column.accessor('status', {
    header: 'Status',
    cell: (info) => <Badge tone={STATUS[info.getValue()].tone}>{STATUS[info.getValue()].label}</Badge>,
  }),
  column.accessor('invitedBy', {
    header: 'Invited by',
    cell: (info) => <span className="text-ink-soft">{info.getValue() ?? '—'}</span>,
  }),
  column.accessor('createdAt', {
    header: 'Sent',
    cell: (info) => <time dateTime={info.getValue()} className="whitespace-nowrap text-ink-soft">{formatDateTime(info.getValue())}</time>,
  }),
  column.accessor('expiresAt', {
    header: 'Expires',
    cell: (info) => <time dateTime={info.getValue()} className="whitespace-nowrap text-ink-soft">{formatDateTime(info.getValue())}</time>,
  }),
  column.display({
    id: 'actions',
    header: () => <span className="sr-only">Actions</span>,
    cell: (info) => <RevokeAction invitation={info.row.original} />,
  }),
];

export function InvitationsTable() {
  const invitations = useInvitations();

  if (invitations.isPending) return <LoadingState label="Loading invitations…" />;
  if (invitations.isError) {
    return <ErrorState className="m-5" message={errorMessage(invitations.error)} onRetry={() => void invitations.refetch()} />;
  }
  if (invitations.data.length === 0) {
    return (
      <EmptyState className="m-5" title="No invitations yet">
        Invitations you send appear here with their status until they are accepted, revoked or expire.
      </EmptyState>
    );
  }
  return (
    <DataTable
      caption="Invitations"
      data={invitations.data}
      columns={columns}
      getRowId={(invitation) => invitation.id}
      initialSorting={[{ id: 'createdAt', desc: true }]}
    />
  );
}
