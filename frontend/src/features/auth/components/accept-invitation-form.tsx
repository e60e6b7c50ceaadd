import {
  InvitationAcceptBodySchema,
  ROLE_DESCRIPTIONS,
  ROLE_LABELS,
  ROLES,
  TokenSchema,
  type CurrentUser,
} from '@understudy/shared-types';
import type { FormEvent } from 'react';
import { Alert, Button, LoadingState, RoleBadge, TextField } from '../../../components/ui';
import { isApiClientError } from '../../../lib/api-client';
import { useSchemaForm } from '../../../lib/form';
import { useAcceptInvitation } from '../api/accept-invitation';
import { useInvitationPreview } from '../api/get-invitation-preview';
import { useMe } from '../api/get-me';
import { NewPasswordField } from './new-password-field';

function InvitationProblem({ error }: { error: unknown }) {
  if (isApiClientError(error) && error.status === 410) {
    return (
      <Alert tone="error" title="This invitation has expired">
        Invitations work for three days. Ask the admin who invited you to send a new one.
      </Alert>
    );
  }
  if (isApiClientError(error) && (error.status === 404 || error.status === 400)) {
    return (
      <Alert tone="error" title="This invitation link cannot be used">
        It may have been accepted already, revoked, or copied incompletely. If you already set a password, sign in instead;
        otherwise ask an admin for a new invitation.
      </Alert>
    );
  }
  return (
    <Alert tone="error" title="The invitation could not be checked">
      {error instanceof Error ? error.message : 'Try again in a moment.'}
    </Alert>
  );
}

function AcceptForm({ token, onAccepted }: { token: string; onAccepted: (user: CurrentUser) => void }) {
  const form = useSchemaForm(InvitationAcceptBodySchema, { token, name: '', password: '' });
  const accept = useAcceptInvitation();

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    accept.reset();
    const body = form.validate();
    if (!body) return;
    accept.mutate(body, {
      onSuccess: onAccepted,
      onError: (error) => form.applyServerError(error),
    });
  }

  if (accept.isError && isApiClientError(accept.error) && [404, 410].includes(accept.error.status)) {
    return <InvitationProblem error={accept.error} />;
  }
  const failure = accept.isError && !(isApiClientError(accept.error) && accept.error.issues.length > 0);

  return (
    <form noValidate onSubmit={handleSubmit} className="flex flex-col gap-4" aria-label="Accept invitation">
      {failure && <Alert tone="error">{accept.error instanceof Error ? accept.error.message : 'Something went wrong.'}</Alert>}
      {form.errors.token && <Alert tone="error">{form.errors.token}</Alert>}
      <TextField
        label="Your name"
        name="name"
        autoComplete="name"
        value={form.values.name}
        onValueChange={(value) => form.setValue('name', value)}
        error={form.errors.name}
        hint="Shown to colleagues on the parts and BOMs you work on."
        autoFocus
      />
      <NewPasswordField label="Choose a password" value={form.values.password} onValueChange={(value) => form.setValue('password', value)} error={form.errors.password} />
      <Button type="submit" loading={accept.isPending} className="w-full">
        Join Understudy
      </Button>
    </form>
  );
}

export function AcceptInvitation({ token, onAccepted }: { token: string; onAccepted: (user: CurrentUser) => void }) {
  const wellFormed = TokenSchema.safeParse(token).success;
  const preview = useInvitationPreview(token, { enabled: wellFormed });
  const me = useMe();

  if (!wellFormed) {
    return (
      <Alert tone="error" title="This invitation link is incomplete">
        Open the link from your invitation e-mail again, or copy the whole address into the browser.
      </Alert>
    );
  }
  if (preview.isPending) return <LoadingState label="Checking your invitation…" />;
  if (preview.isError) return <InvitationProblem error={preview.error} />;

  const { email, role } = preview.data;
  return (
    <div className="flex flex-col gap-5">
      <dl className="grid grid-cols-[auto_1fr] items-center gap-x-4 gap-y-2 rounded-md border border-rule bg-paper px-4 py-3 text-sm">
        <dt className="text-ink-soft">E-mail</dt>
        <dd className="font-medium break-all text-ink">{email}</dd>
        <dt className="text-ink-soft">Role</dt>
        <dd>
          <RoleBadge role={role} />
        </dd>
        <dd className="col-span-2 mt-1 text-ink-soft">
          {/* Descriptions build on the role below ("Also…"), so read them together. */}
          {ROLES.slice(0, ROLES.indexOf(role) + 1)
            .map((rung) => ROLE_DESCRIPTIONS[rung])
            .join(' ')}
        </dd>
      </dl>
      {me.data && me.data.email !== email && (
        <Alert tone="warning" title={`You are signed in as ${me.data.name}`}>
          Accepting signs this browser in as {email} ({ROLE_LABELS[role]}) instead.
        </Alert>
      )}
      <AcceptForm token={token} onAccepted={onAccepted} />
    </div>
  );
}
