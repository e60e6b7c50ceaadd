import { createColumnHelper, type SortingFn } from '@tanstack/react-table';
import { ROLES, ROLE_LABELS, RoleSchema, type Role, type UserDto } from '@understudy/shared-types';
import { useState } from 'react';
import {
  Badge,
  Button,
  DataTable,
  EmptyState,
  ErrorState,
  InlineSelect,
  LoadingState,
  ConfirmDialog,
} from '../../../components/ui';
import { formatDateTime, formatRelative } from '../../../lib/format';
import { useAppAbility } from '../../../lib/ability';
import { useUsers } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';

const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

function errorMessage(error: unknown): string {
  return error instanceof Error ? error.message : 'That change did not go through.';
}

function RoleCell({ user }: { user: UserDto }) {
  const update = useUpdateUser();
  const canUpdate = useAppAbility().can('update', 'User');
  // While the change is in flight, show what was picked; on failure fall back to what the server holds.
  const shown = update.isPending && update.variables.body.role ? update.variables.body.role : user.role;
  const errorId = `role-error-${user.id}`;

  return (
    <div className="flex flex-col gap-1">
      <InlineSelect
        aria-label={`Role for ${user.name}`}
        value={shown}
        options={ROLE_OPTIONS}
        disabled={!canUpdate || update.isPending}
        aria-invalid={update.isError || undefined}
        aria-describedby={update.isError ? errorId : undefined}
        onValueChange={(value) => {
          const role = RoleSchema.parse(value);
          if (role !== user.role) update.mutate({ id: user.id, body: { role } });
        }}
        className="w-28 min-w-28"
      />
      {update.isError && (
        <p id={errorId} role="alert" className="max-w-56 text-xs font-medium text-danger">
          {errorMessage(update.error)}
        </p>
      )}
    </div>
  );
}

function StatusCell({ user }: { user: UserDto }) {
  return user.disabled ? <Badge tone="danger">Disabled</Badge> : <Badge tone="ok">Active</Badge>;
}

function AccessAction({ user, isSelf }: { user: UserDto; isSelf: boolean }) {
  const [confirming, setConfirming] = useState(false);
  const update = useUpdateUser();
  const canUpdate = useAppAbility().can('update', 'User');
  const disabling = !user.disabled;

  if (!canUpdate) return null;

  return (
    <>
      <Button
        variant={disabling ? 'danger' : 'secondary'}
        size="sm"
        onClick={() => {
          update.reset();
          setConfirming(true);
        }}
        aria-label={`${disabling ? 'Disable' : 'Enable'} ${user.name}`}
      >
        {disabling ? 'Disable' : 'Enable'}
      </Button>
      <ConfirmDialog
        open={confirming}
        tone={disabling ? 'danger' : 'primary'}
        title={disabling ? `Disable ${user.name}?` : `Enable ${user.name}?`}
        confirmLabel={disabling ? 'Disable account' : 'Enable account'}
        busy={update.isPending}
        error={update.isError ? errorMessage(update.error) : undefined}
        onCancel={() => setConfirming(false)}
        onConfirm={() =>
          update.mutate({ id: user.id, body: { disabled: disabling } }, { onSuccess: () => setConfirming(false) })
        }
      >
        {disabling ? (
          <>
            {user.email} will be signed out everywhere and cannot sign in until re-enabled. Their parts, BOMs and history
            stay as they are.
            {isSelf && <strong className="mt-2 block text-danger">This is your own account.</strong>}
          </>
        ) : (
          <>{user.email} will be able to sign in again with their existing password.</>
        )}
      </ConfirmDialog>
    </>
  );
}

const byRoleRank: SortingFn<UserDto> = (a, b) =>
  ROLES.indexOf(a.original.role as Role) - ROLES.indexOf(b.original.role as Role);

const byOptionalDate: SortingFn<UserDto> = (a, b, columnId) => {
  const left = a.getValue<string | null>(columnId);
  const right = b.getValue<string | null>(columnId);
  return (left ? Date.parse(left) : 0) - (right ? Date.parse(right) : 0);
};

const column = createColumnHelper<UserDto>();

function buildColumns(currentUserId: string | undefined) {
  return [
    column.accessor('name', {
      header: 'Name',
      cell: (info) => (
        <span className="inline-flex items-center gap-2 font-semibold whitespace-nowrap text-ink">
          {info.getValue()}
          {info.row.original.id === currentUserId && <Badge tone="accent">You</Badge>}
        </span>
      ),
    }),
    column.accessor('email', {
      header: 'E-mail',
      cell: (info) => <span className="whitespace-nowrap text-ink-soft">{info.getValue()}</span>,
    }),
    column.accessor('role', {
      header: 'Role',
      sortingFn: byRoleRank,
      cell: (info) => <RoleCell user={info.row.original} />,
    }),
    column.accessor('disabled', {
      header: 'Status',
      cell: (info) => <StatusCell user={info.row.original} />,
    }),
    column.accessor('lastSignInAt', {
      header: 'Last sign-in',
      sortingFn: byOptionalDate,
      cell: (info) => {
        const value = info.getValue();
        return value ? (
          <time dateTime={value} title={formatDateTime(value)} className="whitespace-nowrap text-ink-soft">
            {formatRelative(value)}
          </time>
        ) : (
          <span className="text-ink-faint">Never</span>
        );
      },
    }),
    column.accessor('createdAt', {
      header: 'Created',
      sortingFn: byOptionalDate,
      cell: (info) => (
        <time dateTime={info.getValue()} className="whitespace-nowrap text-ink-soft">
          {formatDateTime(info.getValue())}
        </time>
      ),
    }),
    column.display({
      id: 'actions',
      header: () => <span className="sr-only">Actions</span>,
      cell: (info) => <AccessAction user={info.row.original} isSelf={info.row.original.id === currentUserId} />,
    }),
  ];
}

export function UsersTable({ currentUserId }: { currentUserId?: string }) {
  const users = useUsers();

  if (users.isPending) return <LoadingState label="Loading people…" />;
  if (users.isError) return <ErrorState className="m-5" message={errorMessage(users.error)} onRetry={() => void users.refetch()} />;
  if (users.data.length === 0) {
    return (
      <EmptyState className="m-5" title="No one here yet">
        Invite colleagues below; they appear here once they accept.
      </EmptyState>
    );
  }

  return (
    <DataTable
      caption="People with an Understudy account"
      data={users.data}
      columns={buildColumns(currentUserId)}
      getRowId={(user) => user.id}
      initialSorting={[{ id: 'name', desc: false }]}
      isRowHighlighted={(user) => user.id === currentUserId}
    />
  );
}
