import type { CandidatePart, EquivalentDto, EquivalentStatus } from '@understudy/shared-types';
import { useState, type ReactNode } from 'react';
import { ConfirmDialog, cx, EquivalentFlag } from '../../../components/ui';
import { Can } from '../../../lib/ability';
import { useDeleteEquivalent } from '../api/delete-equivalent';
import { RulingDialog } from './ruling-dialog';

/** A small text button that fits a table cell. */
function CellButton({ tone, onClick, children }: { tone: 'ok' | 'danger' | 'accent'; onClick: () => void; children: ReactNode }) {
  return (
    <button
      type="button"
      onClick={onClick}
      className={cx(
        'rounded px-1 py-0.5 text-xs font-semibold whitespace-nowrap underline-offset-2 hover:underline',
        tone === 'ok' ? 'text-ok' : tone === 'danger' ? 'text-danger' : 'text-copper-deep',
      )}
    >
      {children}
    </button>
  );
}

/**
 * The ruling on one pair: everyone sees the flag; editors may record one, or change or remove the one there is.
 */
export function RulingControls({
  original,
  candidate,
  equivalent,
}: {
  original: CandidatePart;
  candidate: CandidatePart;
  equivalent: EquivalentDto | null;
}) {
  const [editing, setEditing] = useState<EquivalentStatus | null>(null);
  const [removing, setRemoving] = useState(false);
  const remove = useDeleteEquivalent();
  const name = <span className="sr-only"> {candidate.partNumber}</span>;

  return (
    <div className="flex flex-col items-start gap-1.5">
      {equivalent && <EquivalentFlag equivalent={equivalent} />}
      {equivalent ? (
        <span className="-mx-1 flex flex-wrap gap-x-1">
          <Can I="update" a="Equivalent">
            <CellButton tone="accent" onClick={() => setEditing(equivalent.status)}>
              Edit ruling{name}
            </CellButton>
          </Can>
          <Can I="delete" a="Equivalent">
            <CellButton
              tone="danger"
              onClick={() => {
                remove.reset();
                setRemoving(true);
              }}
            >
              Remove ruling{name}
            </CellButton>
          </Can>
        </span>
      ) : (
        <Can I="create" a="Equivalent">
          <span className="-mx-1 flex flex-col items-start">
            <CellButton tone="ok" onClick={() => setEditing('approved')}>
              Mark approved…{name}
            </CellButton>
            <CellButton tone="danger" onClick={() => setEditing('rejected')}>
              Mark rejected…{name}
            </CellButton>
          </span>
        </Can>
      )}
      {editing && (
        <RulingDialog original={original} candidate={candidate} existing={equivalent} status={editing} onClose={() => setEditing(null)} />
      )}
      {equivalent && (
        <ConfirmDialog
          open={removing}
          tone="danger"
          title={`Remove the ruling on ${candidate.partNumber}?`}
          confirmLabel="Remove ruling"
          busy={remove.isPending}
          error={remove.isError ? remove.error.message : undefined}
          onCancel={() => setRemoving(false)}
          onConfirm={() => remove.mutate(equivalent.id, { onSuccess: () => setRemoving(false) })}
        >
          {candidate.partNumber} will rank on its figures alone again, without the “{equivalent.status === 'approved' ? 'Approved' : 'Rejected'} for{' '}
          {equivalent.use}” flag.
        </ConfirmDialog>
      )}
    </div>
  );
}
