import { INVITATION_LIFETIME_HOURS, InvitationCreateBodySchema, ROLES, ROLE_DESCRIPTIONS, ROLE_LABELS, RoleSchema } from '@understudy/shared-types';
import { useState, type FormEvent } from 'react';
import { Alert, Button, SelectField, TextField } from '../../../components/ui';
import { isApiClientError } from '../../../lib/api-client';
import { useSchemaForm } from '../../../lib/form';
import { useCreateInvitation } from '../api/create-invitation';

const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export function InviteForm() {
  const form = useSchemaForm(InvitationCreateBodySchema, { email: '', role: 'viewer' });
  const create = useCreateInvitation();
  const [sentTo, setSentTo] = useState<string | null>(null);

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setSentTo(null);
    create.reset();
    const body = form.validate();
    if (!body) return;
    create.mutate(body, {
      onSuccess: (invitation) => {
        setSentTo(invitation.email);
        form.reset({ email: '', role: body.role });
      },
      onError: (error) => form.applyServerError(error),
    });
  }

  const failure = create.isError && !(isApiClientError(create.error) && create.error.issues.length > 0);
  const role = RoleSchema.safeParse(form.values.role);

  return (
    <form noValidate onSubmit={handleSubmit} className="flex flex-col gap-4 p-5" aria-label="Invite someone">
      {sentTo && (
        <Alert tone="success" title="Invitation sent">
          {sentTo} has an e-mail with a link to join. It works once, for {INVITATION_LIFETIME_HOURS} hours.
        </Alert>
      )}
      {failure && <Alert tone="error">{create.error instanceof Error ? create.error.message : 'The invitation was not sent.'}</Alert>}
      <div className="grid gap-4 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_auto] sm:items-start">
        <TextField
          label="E-mail"
          type="email"
          name="email"
          autoComplete="off"
          inputMode="email"
          placeholder="name@example.com"
          value={form.values.email}
          onValueChange={(value) => {
            setSentTo(null);
            form.setValue('email', value);
          }}
          error={form.errors.email}
        />
        <SelectField
          label="Role"
          name="role"
          value={form.values.role}
          options={ROLE_OPTIONS}
          onValueChange={(value) => form.setValue('role', RoleSchema.parse(value))}
          error={form.errors.role}
        />
        <Button type="submit" loading={create.isPending} className="sm:mt-[1.625rem]">
          Send invitation
        </Button>
      </div>
      {role.success && <p className="text-xs text-ink-soft">{ROLE_LABELS[role.data]}: {ROLE_DESCRIPTIONS[role.data]}</p>}
    </form>
  );
}
