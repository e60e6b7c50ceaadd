import { FAMILIES, FAMILY_KEYS, isFamilyKey } from '@understudy/shared-types';
import { Link, useNavigate, useSearchParams } from 'react-router';
import { Card, PageHeader } from '../../components/ui';
import { PartForm, familyNoun } from '../../features/parts/components/part-form';
import { RequireAbility } from './require-ability';

function FamilyPicker() {
  return (
    <Card aria-labelledby="family-pick-title">
      <h2 id="family-pick-title" className="border-b border-rule px-5 py-3 text-base font-semibold text-ink">
        What kind of part?
      </h2>
      <ul className="grid gap-3 p-5 sm:grid-cols-2 lg:grid-cols-3">
        {FAMILY_KEYS.map((key) => (
          <li key={key}>
            <Link
              to={`/parts/new?family=${key}`}
              className="flex h-full flex-col gap-1 rounded-md border border-rule-strong bg-card px-4 py-3 hover:border-copper hover:bg-copper-wash/40"
            >
              <span className="font-semibold text-ink">{FAMILIES[key].label}</span>
              <span className="text-sm text-ink-soft">{FAMILIES[key].description}</span>
            </Link>
          </li>
        ))}
      </ul>
    </Card>
  );
}

export function PartNewRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const key = params.get('family');
  const family = isFamilyKey(key) ? FAMILIES[key] : undefined;
  return (
    <RequireAbility action="create" subject="Part">
      <title>Add a part · Understudy</title>
      <PageHeader
        title={family ? `Add ${familyNoun(family)}` : 'Add a part'}
        description={family ? family.description : 'Choose the family first; its parameters shape the form.'}
      />
      {family ? (
        <PartForm
          key={family.key}
          family={family}
          cancelTo={`/parts?family=${family.key}`}
          onSaved={(part) => void navigate(`/parts/${part.id}`)}
        />
      ) : (
        <FamilyPicker />
      )}
    </RequireAbility>
  );
}
