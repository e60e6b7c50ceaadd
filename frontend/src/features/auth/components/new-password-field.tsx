import { useState } from 'react';
import { TextField } from '../../../components/ui';

/** A new-password input with a reveal toggle; long passphrases are easier to get right when visible. */
export function NewPasswordField({
  value,
  onValueChange,
  error,
  label = 'New password',
}: {
  value: string;
  onValueChange: (value: string) => void;
  error?: string;
  label?: string;
}) {
  const [visible, setVisible] = useState(false);
  return (
    <div className="flex flex-col gap-1.5">
      <TextField
        label={label}
        type={visible ? 'text' : 'password'}
        name="password"
        autoComplete="new-password"
        value={value}
        onValueChange={onValueChange}
        error={error}
        hint="At least 10 characters. A few unrelated words make a strong, memorable passphrase."
      />
      <label className="inline-flex items-center gap-2 self-start text-sm text-ink-soft">
        <input type="checkbox" checked={visible} onChange={(event) => setVisible(event.target.checked)} className="size-4 accent-copper" />
        Show password
      </label>
    </div>
  );
}
