import { PasswordResetCompleteBodySchema } from '@understudy/shared-types';
import type { FormEvent } from 'react';
import { Link } from 'react-router';
import { Alert, Button } from '../../../components/ui';
import { isApiClientError } from '../../../lib/api-client';
import { useSchemaForm } from '../../../lib/form';
import { useCompletePasswordReset } from '../api/complete-password-reset';
import { NewPasswordField } from './new-password-field';

function isBadLink(error: unknown): boolean {
  // 400 without field issues means the token itself was refused; 404/410 mean unknown, used or expired.
  return isApiClientError(error) && (error.status === 410 || error.status === 404 || (error.status === 400 && !error.issues.some((i) => i.path === 'password')));
}

export function ResetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const form = useSchemaForm(PasswordResetCompleteBodySchema, { token, password: '' });
  const complete = useCompletePasswordReset();

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    complete.reset();
    const body = form.validate();
    if (!body) return;
    complete.mutate(body, {
      onSuccess: onDone,
      onError: (error) => {
        if (!isBadLink(error)) form.applyServerError(error);
      },
    });
  }

  if (form.errors.token || (complete.isError && isBadLink(complete.error))) {
    const expired = isApiClientError(complete.error) && complete.error.status === 410;
    return (
      <div className="flex flex-col gap-4">
        <Alert tone="error" title={expired ? 'This reset link has expired' : 'This reset link cannot be used'}>
          {expired
            ? 'Reset links work once, for one hour. Ask for a fresh one and use it soon.'
            : 'It may have been used already, replaced by a newer link, or copied incompletely. Ask for a fresh one.'}
        </Alert>
        <Link to="/forgot-password" className="text-sm font-semibold text-copper-deep underline-offset-2 hover:underline">
          Request a new reset link
        </Link>
      </div>
    );
  }

  const failure = complete.isError && !(isApiClientError(complete.error) && complete.error.issues.length > 0);

  return (
    <form noValidate onSubmit={handleSubmit} className="flex flex-col gap-4" aria-label="Password reset">
      {failure && <Alert tone="error">{complete.error instanceof Error ? complete.error.message : 'Something went wrong.'}</Alert>}
      <NewPasswordField value={form.values.password} onValueChange={(value) => form.setValue('password', value)} error={form.errors.password} />
      <Button type="submit" loading={complete.isPending} className="w-full">
        Set new password
      </Button>
    </form>
  );
}
