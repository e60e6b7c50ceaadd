import { ROLES, ROLE_DESCRIPTIONS, ROLE_LABELS } from '@understudy/shared-types';
import { Link } from 'react-router';
import { Card, RoleBadge, SectionHeading } from '../../components/ui';
import { useMe } from '../../features/auth/api/get-me';
import { Can } from '../../lib/ability';

const COMING = [
  { title: 'Parts catalog', body: 'Op-amps, transistors, pots and passives with the parameters that matter for audio.' },
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
              Catalog curation tools — adding parts, reviewing datasheets and approving equivalents — arrive with the catalog.
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
