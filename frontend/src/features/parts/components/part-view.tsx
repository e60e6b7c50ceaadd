import { FAMILIES, PACKAGES, type PartDto } from '@understudy/shared-types';
import { useState, type ReactNode } from 'react';
import { Link, useLocation } from 'react-router';
import {
  Alert,
  Button,
  CadmiumCaution,
  Card,
  ConfirmDialog,
  LifecycleBadge,
  PinoutDiagram,
  RohsBadge,
  SectionHeading,
  buttonClasses,
} from '../../../components/ui';
import { Can } from '../../../lib/ability';
import { PartQueryState } from '../../../components/ui/part-query-state';
import { formatDate } from '../../../lib/format';
import { containsCadmium, effectivePins, pinLayoutFor } from '../../../lib/part-display';
import { useArchivePart } from '../api/archive-part';
import { usePart } from '../api/get-part';
import { ParameterTable } from './parameter-table';
import { RevisionHistory } from './revision-history';

function ArchiveButton({ part }: { part: PartDto }) {
  const [open, setOpen] = useState(false);
  const archive = useArchivePart();
  return (
    <>
      <Button
        variant="danger"
        size="sm"
        onClick={() => {
          archive.reset();
          setOpen(true);
        }}
      >
        Archive
      </Button>
      <ConfirmDialog
        open={open}
        tone="danger"
        title={`Archive ${part.partNumber}?`}
        confirmLabel="Archive part"
        busy={archive.isPending}
        error={archive.isError ? archive.error.message : undefined}
        onCancel={() => setOpen(false)}
        onConfirm={() => archive.mutate(part.id, { onSuccess: () => setOpen(false) })}
      >
        It disappears from catalog searches and cannot be picked for new designs. Its page, history and every
        reference to it stay as they are.
      </ConfirmDialog>
    </>
  );
}

function PackageCard({ part }: { part: PartDto }) {
  const pins = effectivePins(part);
  const layout = pinLayoutFor(part.pinLayout);
  const pkg = PACKAGES.find((p) => p.key === part.package);
  return (
    <Card aria-labelledby="package-title">
      <SectionHeading id="package-title">Package and pinout</SectionHeading>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 px-5 pt-4 text-sm">
        <dt className="text-ink-faint">Package</dt>
        <dd className="text-ink">{pkg ? `${pkg.label} (${pkg.mounting.replace('-', ' ')})` : part.package || '—'}</dd>
        <dt className="text-ink-faint">Pin layout</dt>
        <dd className="text-ink">{layout?.label ?? (Object.keys(part.pinMap).length > 0 ? 'Own pin map' : '—')}</dd>
      </dl>
      <div className="px-5 py-4">
        {pins ? (
          <PinoutDiagram pins={pins} title={`Pinout of ${part.partNumber}${part.package ? `, ${part.package}` : ''}, top view`} />
        ) : (
          <p className="text-sm text-ink-soft">No pinout recorded.</p>
        )}
      </div>
    </Card>
  );
}

/**
 * `aside` is a slot for panels other features add to the side column, `actions` one for buttons beside Edit (the
 * app composes them, features stay apart).
 */
export function PartView({
  id,
  aside,
  actions,
}: {
  id: string;
  aside?: (part: PartDto) => ReactNode;
  actions?: (part: PartDto) => ReactNode;
}) {
  const part = usePart(id);
  const location = useLocation();
  const justSaved = !!(location.state && typeof location.state === 'object' && 'saved' in location.state);

  return (
    <PartQueryState query={part}>{(p) => <PartDetails part={p} justSaved={justSaved} aside={aside} actions={actions} />}</PartQueryState>
  );
}

function PartDetails({
  part: p,
  justSaved,
  aside,
  actions,
}: {
  part: PartDto;
  justSaved: boolean;
  aside?: (part: PartDto) => ReactNode;
  actions?: (part: PartDto) => ReactNode;
}) {
  const family = FAMILIES[p.family];
  const cadmium = containsCadmium(p.parameters);

  return (
    <div className="flex flex-col gap-6">
      <title>{`${p.partNumber} · Understudy`}</title>
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={`/parts?family=${p.family}`} className="font-semibold text-copper-deep underline-offset-2 hover:underline">
          ← {family.pluralLabel}
        </Link>
      </nav>
      {justSaved && <Alert tone="success">Saved. The change is listed in the history below.</Alert>}

      <header className="flex flex-wrap items-start justify-between gap-4 border-b border-rule pb-5">
        <div className="flex min-w-0 flex-col gap-1.5">
          <p className="text-xs font-semibold tracking-wider text-copper-deep uppercase">{family.label}</p>
          <h1 className="text-3xl font-bold tracking-tight break-words text-ink">{p.partNumber}</h1>
          <p className="text-ink-soft">{p.manufacturer.name}</p>
          <div className="mt-1 flex flex-wrap items-center gap-2">
            <LifecycleBadge lifecycle={p.lifecycle} />
            <RohsBadge status={p.rohsStatus} />
            {p.rohsNote && <span className="text-sm text-ink-soft">{p.rohsNote}</span>}
          </div>
        </div>
        <div className="flex flex-wrap items-center gap-2">
          {actions?.(p)}
          {!p.archived && (
            <>
              <Can I="update" a="Part">
                <Link to={`/parts/${p.id}/edit`} className={buttonClasses('primary', 'sm')}>
                  Edit
                </Link>
              </Can>
              <Can I="archive" a="Part">
                <ArchiveButton part={p} />
              </Can>
            </>
          )}
        </div>
      </header>

      {p.archived && (
        <Alert tone="warning" title="Archived">
          This part no longer appears in catalog searches. Last changed {formatDate(p.updatedAt)}.
        </Alert>
      )}
      {cadmium && <CadmiumCaution />}

      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex min-w-0 flex-col gap-6">
          <Card aria-labelledby="about-title">
            <SectionHeading id="about-title">About</SectionHeading>
            <div className="flex flex-col gap-3 px-5 py-4">
              <p className="text-sm whitespace-pre-line text-ink" data-testid="part-description">
                {p.description || <span className="text-ink-faint">No description yet.</span>}
              </p>
              {p.tags.length > 0 && (
                <ul aria-label="Tags" className="flex flex-wrap gap-1.5">
                  {p.tags.map((tag) => (
                    <li key={tag}>
                      <Link
                        to={`/parts?q=${encodeURIComponent(tag)}`}
                        className="inline-flex rounded-full border border-rule-strong bg-paper px-2.5 py-0.5 text-xs font-semibold text-ink-soft hover:border-ink hover:text-ink"
                      >
                        {tag}
                      </Link>
                    </li>
                  ))}
                </ul>
              )}
            </div>
          </Card>
          <Card aria-labelledby="parameters-title">
            <SectionHeading id="parameters-title">Parameters</SectionHeading>
            <ParameterTable family={family} part={p} />
          </Card>
        </div>
        <div className="flex min-w-0 flex-col gap-6">
          <PackageCard part={p} />
          {aside?.(p)}
          <Card aria-labelledby="history-title">
            <SectionHeading id="history-title" aside={<span className="text-xs text-ink-faint">version {p.version}</span>}>
              History
            </SectionHeading>
            <RevisionHistory partId={p.id} family={family} />
          </Card>
        </div>
      </div>
    </div>
  );
}
