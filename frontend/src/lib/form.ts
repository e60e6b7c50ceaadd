import { useState } from 'react';
import type { z } from 'zod';
import { isApiClientError } from './api-client';

export type FieldErrors<T> = Partial<Record<keyof T & string, string>>;

/** First message per top-level field, from a zod error or from a server 400's issues. */
export function fieldErrorsFrom<T>(issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey> | string; message: string }>): FieldErrors<T> {
  const errors: Record<string, string> = {};
  for (const issue of issues) {
    const key = typeof issue.path === 'string' ? issue.path.split('.')[0] : issue.path[0];
    const field = key === undefined || key === '' ? '_form' : String(key);
    if (!(field in errors)) errors[field] = issue.message;
  }
  return errors as FieldErrors<T>;
}

/**
 * Holds form values and field errors, validating with the same zod schema the server uses.
 * `validate` returns the parsed body, or null after recording the errors.
 */
export function useSchemaForm<S extends z.ZodObject>(schema: S, initial: z.input<S>) {
  type Values = z.input<S>;
  const [values, setValues] = useState<Values>(initial);
  const [errors, setErrors] = useState<FieldErrors<Values>>({});

  function setValue<K extends keyof Values & string>(key: K, value: Values[K]) {
    setValues((current) => ({ ...current, [key]: value }));
    // Clear a field's complaint as soon as it is edited; it is re-checked on submit.
    setErrors((current) => (current[key] ? { ...current, [key]: undefined } : current));
  }

  function validate(): z.output<S> | null {
    const result = schema.safeParse(values);
    if (result.success) {
      setErrors({});
      return result.data;
    }
    setErrors(fieldErrorsFrom<Values>(result.error.issues));
    return null;
  }

  /** Moves a server 400's field issues onto the form; returns true if there were any. */
  function applyServerError(error: unknown): boolean {
    if (!isApiClientError(error) || error.issues.length === 0) return false;
    setErrors(fieldErrorsFrom<Values>(error.issues));
    return true;
  }

  function reset(next: Values = initial) {
    setValues(next);
    setErrors({});
  }

  return { values, errors, setValue, validate, applyServerError, reset };
}
