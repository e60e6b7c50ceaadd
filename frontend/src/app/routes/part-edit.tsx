import { FAMILIES } from '@understudy/shared-types';
import { Link, useNavigate, useParams } from 'react-router';
import { EmptyState, ErrorState, LoadingState, PageHeader, buttonClasses } from '../../components/ui';
import { usePart } from '../../features/parts/api/get-part';
import { PartForm } from '../../features/parts/components/part-form';
import { isApiClientError } from '../../lib/api-client';
import { RequireAbility } from './require-ability';

function EditPart({ id }: { id: string }) {
  const part = usePart(id);
  const navigate = useNavigate();
  if (part.isPending) return <LoadingState label="Loading part…" />;
  if (part.isError) {
    if (isApiClientError(part.error) && part.error.status === 404) {
      return (
        <EmptyState
          title="There is no such part"
          action={
            <Link to="/parts" className={buttonClasses('secondary')}>
              Back to the catalog
            </Link>
          }
        />
      );
    }
    return <ErrorState message={part.error.message} onRetry={() => void part.refetch()} />;
  }
  const p = part.data;
  return (
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
