import { ROLES, ROLE_DESCRIPTIONS, ROLE_LABELS } from '@understudy/shared-types';
import { FAMILY_KEYS, FAMILIES } from '@understudy/shared-types';
import { Link } from 'react-router';
import { Card, RoleBadge, SectionHeading, buttonClasses } from '../../components/ui';
import { useMe } from '../../features/auth/api/get-me';
import { Can } from '../../lib/ability';

const COMING = [
  { title: 'Datasheets', body: 'One reviewed copy per part, with the pinout and the figures pulled out.' },
  { title: 'Substitutions', body: 'Stand-ins ranked by how closely they match, with the trade-offs spelled out.' },
  { title: 'BOM checks', body: 'Paste a bill of materials and see what is scarce, obsolete or better swapped.' },
];

function article(word: string): string {
  return /^[aeiou]/i.test(word) ? 'an' : 'a';
}

export function HomeRoute() {
  const { data: user } = useMe();
  if (!user) return null;

  // Role descriptions build on each other ("Also…"), so show every rung up to this person's role.
  const rungs = ROLES.slice(0, ROLES.indexOf(user.role) + 1);

  return (
    <div className="flex flex-col gap-8">
      <title>Home · Understudy</title>
      <header className="flex flex-col gap-2">
        <p className="text-sm font-semibold tracking-wider text-copper-deep uppercase">Welcome</p>
        <h1 className="text-3xl font-bold tracking-tight text-ink">Hello, {user.name}</h1>
        <p className="flex flex-wrap items-center gap-2 text-ink-soft">
          You are signed in as <RoleBadge role={user.role} />
        </p>
      </header>

      <Can I="read" a="Part">
        <section aria-labelledby="catalog-card-title" className="flex flex-col gap-4 rounded-lg bg-ink p-6 text-paper sm:flex-row sm:items-center sm:justify-between">
          <div className="flex flex-col gap-1">
            <h2 id="catalog-card-title" className="text-xl font-bold">
              Parts catalog
            </h2>
            <p className="max-w-prose text-sm text-paper/75">
              Search by what a part does — “runs on 9 V, slews at least 5 V/µs” — and compare up to six side by side.
            </p>
            <ul aria-label="Families" className="mt-2 flex flex-wrap gap-1.5">
              {FAMILY_KEYS.map((key) => (
                <li key={key}>
                  <Link
                    to={`/parts?family=${key}`}
                    className="inline-flex rounded-full border border-paper/25 px-2.5 py-0.5 text-xs font-semibold text-paper/90 hover:border-copper-bright hover:text-paper"
                  >
                    {FAMILIES[key].pluralLabel}
                  </Link>
                </li>
              ))}
            </ul>
          </div>
          <Link to="/parts" className={buttonClasses('primary', 'md', 'shrink-0 self-start sm:self-center')}>
            Open the catalog
          </Link>
        </section>
      </Can>

      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card aria-labelledby="role-card-title">
          <SectionHeading id="role-card-title">What you can do as {article(ROLE_LABELS[user.role])} {ROLE_LABELS[user.role]}</SectionHeading>
          <ul className="flex flex-col gap-3 px-5 py-4">
            {rungs.map((role) => (
              <li key={role} className="flex items-start gap-3">
                <span aria-hidden="true" className="mt-2 size-1.5 shrink-0 rounded-full bg-copper" />
                <span className="text-sm text-ink">{ROLE_DESCRIPTIONS[role]}</span>
              </li>
            ))}
          </ul>
          <Can I="create" a="Part">
            <p className="mx-5 mb-5 rounded-md border border-copper/25 bg-copper-wash/60 px-4 py-3 text-sm text-copper-deep">
              You can add and edit parts:{' '}
              <Link to="/parts/new" className="font-semibold underline-offset-2 hover:underline">
                add a part
              </Link>
              , or open any part and choose Edit. Datasheet review and approved equivalents come next.
            </p>
          </Can>
          <Can I="read" a="User">
            <p className="mx-5 mb-5 text-sm text-ink-soft">
              Manage accounts and invitations on the{' '}
              <Link to="/admin/people" className="font-semibold text-copper-deep underline-offset-2 hover:underline">
                People
              </Link>{' '}
              page.
            </p>
          </Can>
        </Card>

        <Card aria-labelledby="coming-title">
          <SectionHeading id="coming-title">Arriving next</SectionHeading>
          <ul className="divide-y divide-rule">
            {COMING.map((item) => (
              <li key={item.title} className="px-5 py-3">
                <p className="text-sm font-semibold text-ink">{item.title}</p>
                <p className="text-sm text-ink-soft">{item.body}</p>
              </li>
            ))}
          </ul>
        </Card>
      </div>
    </div>
  );
}
