import { FAMILIES } from '@understudy/shared-types';
import { useNavigate, useParams } from 'react-router';
import { PageHeader } from '../../components/ui';
import { usePart } from '../../features/parts/api/get-part';
import { PartForm } from '../../features/parts/components/part-form';
import { PartQueryState } from '../../components/ui/part-query-state';
import { RequireAbility } from './require-ability';

function EditPart({ id }: { id: string }) {
  const part = usePart(id);
  const navigate = useNavigate();
  return (
    <PartQueryState query={part}>
      {(p) => (
        <>
      <title>{`Edit ${p.partNumber} · Understudy`}</title>
      <PageHeader title={`Edit ${p.partNumber}`} description={`${p.manufacturer.name} · ${FAMILIES[p.family].label} · version ${p.version}`} />
      {/* Keyed by id only: a refetch of the part must not wipe what is being typed. */}
      <PartForm
        key={p.id}
        family={FAMILIES[p.family]}
        part={p}
        cancelTo={`/parts/${p.id}`}
        onSaved={(saved) => void navigate(`/parts/${saved.id}`, { state: { saved: true } })}
      />
        </>
      )}
    </PartQueryState>
  );
}

export function PartEditRoute() {
  const { id = '' } = useParams();
  return (
    <RequireAbility action="update" subject="Part">
      <EditPart id={id} />
    </RequireAbility>
  );
}
