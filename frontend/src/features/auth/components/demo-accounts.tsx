const DEMO_ACCOUNTS = [
  { email: 'viewer@understudy.test', role: 'Viewer' },
  { email: 'editor@understudy.test', role: 'Editor' },
  { email: 'admin@understudy.test', role: 'Admin' },
] as const;

const DEMO_PASSWORD = 'understudy-demo';

/** The seeded accounts, so anyone trying the demo can sign in as each role. */
export function DemoAccounts() {
  return (
    <aside aria-labelledby="demo-accounts-title" className="rounded-md border border-dashed border-copper/40 bg-copper-wash/50 px-4 py-3 text-sm">
      <h2 id="demo-accounts-title" className="font-semibold text-copper-deep">
        Demo accounts (demo data only)
      </h2>
      <ul className="mt-2 flex flex-col gap-1">
        {DEMO_ACCOUNTS.map((account) => (
          <li key={account.email} className="flex flex-wrap items-baseline justify-between gap-x-3">
            <code className="font-mono text-[0.8125rem] text-ink">{account.email}</code>
            <span className="text-xs text-ink-soft">{account.role}</span>
          </li>
        ))}
      </ul>
      <p className="mt-2 text-xs text-ink-soft">
        Password for all three: <code className="font-mono text-ink">{DEMO_PASSWORD}</code>
      </p>
    </aside>
  );
}
