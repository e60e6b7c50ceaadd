import { SIGN_IN_FAILED_MESSAGE, SignInBodySchema, type CurrentUser } from '@understudy/shared-types';
import type { FormEvent } from 'react';
import { Link } from 'react-router';
import { Alert, Button, TextField } from '../../../components/ui';
import { isApiClientError } from '../../../lib/api-client';
import { useSchemaForm } from '../../../lib/form';
import { useSignIn } from '../api/sign-in';

function waitPhrase(seconds: number | null): string {
  if (!seconds) return 'Wait a few minutes';
  if (seconds < 90) return 'Wait a minute';
  return `Wait about ${Math.ceil(seconds / 60)} minutes`;
}

function describeFailure(error: unknown): string {
  if (!isApiClientError(error)) return 'Something went wrong. Try again.';
  if (error.status === 401) return error.message || SIGN_IN_FAILED_MESSAGE;
  if (error.status === 429) return `Too many sign-in attempts. ${waitPhrase(error.retryAfterSeconds)} and try again.`;
  return error.message;
}

export function SignInForm({ onSignedIn }: { onSignedIn: (user: CurrentUser) => void }) {
  const form = useSchemaForm(SignInBodySchema, { email: '', password: '' });
  const signIn = useSignIn();

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    signIn.reset();
    const body = form.validate();
    if (!body) return;
    signIn.mutate(body, {
      onSuccess: onSignedIn,
      onError: (error) => form.applyServerError(error),
    });
  }

  const failure = signIn.isError && !(isApiClientError(signIn.error) && signIn.error.issues.length > 0);

  return (
    <form noValidate onSubmit={handleSubmit} className="flex flex-col gap-4" aria-label="Sign in">
      {failure && (
        <Alert tone={isApiClientError(signIn.error) && signIn.error.status === 429 ? 'warning' : 'error'}>
          {describeFailure(signIn.error)}
        </Alert>
      )}
      <TextField
        label="E-mail"
        type="email"
        name="email"
        autoComplete="username"
        inputMode="email"
        value={form.values.email}
        onValueChange={(value) => form.setValue('email', value)}
        error={form.errors.email}
        autoFocus
      />
      <div className="flex flex-col gap-1.5">
        <TextField
          label="Password"
          type="password"
          name="password"
          autoComplete="current-password"
          value={form.values.password}
          onValueChange={(value) => form.setValue('password', value)}
          error={form.errors.password}
        />
        <Link to="/forgot-password" className="self-end text-sm font-medium text-copper-deep underline-offset-2 hover:underline">
          Forgot password?
        </Link>
      </div>
      <Button type="submit" loading={signIn.isPending} className="mt-1 w-full">
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
