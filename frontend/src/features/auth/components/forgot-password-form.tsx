import { PasswordResetRequestBodySchema } from '@understudy/shared-types';
import type { FormEvent } from 'react';
import { Alert, Button, TextField } from '../../../components/ui';
import { isApiClientError } from '../../../lib/api-client';
import { useSchemaForm } from '../../../lib/form';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ForgotPasswordForm() {
  const form = useSchemaForm(PasswordResetRequestBodySchema, { email: '' });
  const request = useRequestPasswordReset();

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    request.reset();
    const body = form.validate();
    if (!body) return;
    request.mutate(body, { onError: (error) => form.applyServerError(error) });
  }

  if (request.isSuccess) {
    return (
      <Alert tone="success" title="Check your inbox">
        {request.data}
      </Alert>
    );
  }

  const failure = request.isError && !(isApiClientError(request.error) && request.error.issues.length > 0);

  return (
    <form noValidate onSubmit={handleSubmit} className="flex flex-col gap-4" aria-label="Request a password reset">
      {failure && <Alert tone="error">{request.error instanceof Error ? request.error.message : 'Something went wrong.'}</Alert>}
      <TextField
        label="E-mail"
        type="email"
        name="email"
        autoComplete="email"
        inputMode="email"
        value={form.values.email}
        onValueChange={(value) => form.setValue('email', value)}
        error={form.errors.email}
        autoFocus
      />
      <Button type="submit" loading={request.isPending} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}
