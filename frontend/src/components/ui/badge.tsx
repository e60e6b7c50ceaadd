import { ROLE_LABELS, type Role } from '@understudy/shared-types';
import type { ReactNode } from 'react';
import { cx } from './cx';

type Tone = 'neutral' | 'accent' | 'ok' | 'warning' | 'danger' | 'ink';

const TONES: Record<Tone, string> = {
  neutral: 'bg-paper-deep text-ink-soft border-rule',
  accent: 'bg-copper-wash text-copper-deep border-copper/25',
  ok: 'bg-ok-wash text-ok border-ok/25',
  warning: 'bg-warn-wash text-warn border-warn/25',
  danger: 'bg-danger-wash text-danger border-danger/25',
  ink: 'bg-ink text-paper border-ink',
};

export function Badge({ tone = 'neutral', children, className }: { tone?: Tone; children: ReactNode; className?: string }) {
  return (
    <span
      className={cx(
        'inline-flex items-center rounded-full border px-2 py-0.5 text-xs font-semibold tracking-wide whitespace-nowrap',
        TONES[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}

const ROLE_TONES: Record<Role, Tone> = { viewer: 'neutral', editor: 'accent', admin: 'ink' };

export function RoleBadge({ role, className }: { role: Role; className?: string }) {
  return (
    <Badge tone={ROLE_TONES[role]} className={className}>
      {ROLE_LABELS[role]}
    </Badge>
  );
}
