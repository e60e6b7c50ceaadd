import type { ReactNode } from 'react';
import { cx } from './cx';

export function Card({ children, className, as: Tag = 'section', ...rest }: { children: ReactNode; className?: string; as?: 'section' | 'div' | 'article'; 'aria-labelledby'?: string }) {
  return (
    <Tag className={cx('rounded-lg border border-rule bg-card shadow-[0_1px_0_rgb(31_36_48/0.04),0_8px_24px_-16px_rgb(31_36_48/0.25)]', className)} {...rest}>
      {children}
    </Tag>
  );
}

export function PageHeader({ title, description, actions }: { title: ReactNode; description?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-4">
      <div>
        <h1 className="text-2xl font-bold tracking-tight text-ink">{title}</h1>
        {description && <p className="mt-1 max-w-prose text-sm text-ink-soft">{description}</p>}
      </div>
      {actions && <div className="flex items-center gap-2">{actions}</div>}
    </header>
  );
}

export function SectionHeading({ id, children, aside }: { id?: string; children: ReactNode; aside?: ReactNode }) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-2 border-b border-rule px-5 py-3">
      <h2 id={id} className="text-base font-semibold text-ink">
        {children}
      </h2>
      {aside}
    </div>
  );
}
