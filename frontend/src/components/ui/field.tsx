import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';
import { cx } from './cx';

const CONTROL =
  'block w-full rounded-md border bg-card px-3 text-ink shadow-[inset_0_1px_0_rgb(0_0_0/0.03)] placeholder:text-ink-faint ' +
  'transition-colors hover:border-ink-soft disabled:cursor-not-allowed disabled:bg-paper-deep';

function describedBy(...ids: Array<string | false | undefined>): string | undefined {
  const joined = ids.filter(Boolean).join(' ');
  return joined || undefined;
}

interface FieldShellProps {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  hintId: string;
  errorId: string;
  children: ReactNode;
  className?: string;
}

function FieldShell({ id, label, hint, error, hintId, errorId, children, className }: FieldShellProps) {
  return (
    <div className={cx('flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        {label}
      </label>
      {children}
      {hint && !error && (
        <p id={hintId} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-danger">
          <svg aria-hidden="true" viewBox="0 0 16 16" className="mt-0.5 size-3.5 shrink-0">
            <circle cx="8" cy="8" r="7" fill="currentColor" />
            <path d="M8 4.5v4.2M8 11.2v.3" stroke="#fff" strokeWidth="1.6" strokeLinecap="round" />
          </svg>
          {error}
        </p>
      )}
    </div>
  );
}

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'onChange' | 'value'> {
  label: ReactNode;
  value: string;
  onValueChange: (value: string) => void;
  hint?: ReactNode;
  error?: string;
}

export function TextField({ label, value, onValueChange, hint, error, className, id, ...rest }: TextFieldProps) {
  const generated = useId();
  const inputId = id ?? generated;
  const hintId = `${inputId}-hint`;
  const errorId = `${inputId}-error`;
  return (
    <FieldShell id={inputId} label={label} hint={hint} error={error} hintId={hintId} errorId={errorId} className={className}>
      <input
        id={inputId}
        value={value}
        onChange={(event) => onValueChange(event.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(!!hint && !error && hintId, error && errorId)}
        className={cx(CONTROL, 'h-10', error ? 'border-danger' : 'border-rule-strong')}
        {...rest}
      />
    </FieldShell>
  );
}

export interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'onChange' | 'value'> {
  label: ReactNode;
  value: string;
  onValueChange: (value: string) => void;
  options: ReadonlyArray<{ value: string; label: string }>;
  hint?: ReactNode;
  error?: string;
}

export function SelectField({ label, value, onValueChange, options, hint, error, className, id, ...rest }: SelectFieldProps) {
  const generated = useId();
  const selectId = id ?? generated;
  const hintId = `${selectId}-hint`;
  const errorId = `${selectId}-error`;
  return (
    <FieldShell id={selectId} label={label} hint={hint} error={error} hintId={hintId} errorId={errorId} className={className}>
      <select
        id={selectId}
        value={value}
        onChange={(event) => onValueChange(event.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(!!hint && !error && hintId, error && errorId)}
        className={cx(CONTROL, 'h-10 pr-8', error ? 'border-danger' : 'border-rule-strong')}
        {...rest}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </FieldShell>
  );
}

/** A bare select for tight spots such as table cells; the caller supplies an aria-label. */
export function InlineSelect({
  value,
  onValueChange,
  options,
  className,
  ...rest
}: Omit<SelectFieldProps, 'label' | 'hint' | 'error'>) {
  return (
    <select
      value={value}
      onChange={(event) => onValueChange(event.target.value)}
      className={cx(CONTROL, 'h-8 border-rule-strong py-0 pr-7 text-sm', className)}
      {...rest}
    >
      {options.map((option) => (
        <option key={option.value} value={option.value}>
          {option.label}
        </option>
      ))}
    </select>
  );
}
