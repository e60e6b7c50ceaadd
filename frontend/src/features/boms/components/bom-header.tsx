import { BOM_LIMITS, BomUpdateBodySchema, type BomDetailDto } from '@understudy/shared-types';
import { useId, useState, type FormEvent } from 'react';
import { Link, useNavigate } from 'react-router';
import { Alert, Badge, Button, ConfirmDialog, ProgressBar, TextField, buttonClasses } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { useCheckBom } from '../api/check-bom';
import { useDeleteBom } from '../api/delete-bom';
import { bomExportUrl } from '../api/export-bom';
import { useUpdateBom } from '../api/update-bom';
import { plural } from '../lib/lines';
import { ShareDialog } from './share-dialog';

function RenameForm({ bom, onDone }: { bom: BomDetailDto; onDone: () => void }) {
  const update = useUpdateBom();
  const [name, setName] = useState(bom.name);
  const [error, setError] = useState<string | undefined>();

  function submit(event: FormEvent) {
    event.preventDefault();
    const parsed = BomUpdateBodySchema.shape.name.safeParse(name);
    if (!parsed.success || parsed.data === undefined) {
      setError('Give the BOM a name (up to 120 characters).');
      return;
    }
    update.mutate({ id: bom.id, body: { name: parsed.data } }, { onSuccess: onDone, onError: (e) => setError(e.message) });
  }

  return (
    <form onSubmit={submit} className="flex flex-wrap items-end gap-2">
      <TextField
        label="Name"
        value={name}
        onValueChange={(value) => {
          setName(value);
          setError(undefined);
        }}
        error={error}
        maxLength={BOM_LIMITS.maxNameLength}
        autoFocus
        className="w-80 max-w-full"
        onKeyDown={(event) => {
          if (event.key === 'Escape') onDone();
        }}
      />
      <Button type="submit" loading={update.isPending}>
        Save name
      </Button>
      <Button variant="ghost" onClick={onDone} disabled={update.isPending}>
        Cancel
      </Button>
    </form>
  );
}

function WatchToggle({ bom }: { bom: BomDetailDto }) {
  const update = useUpdateBom();
  const hintId = useId();
  return (
    <div className="flex flex-col gap-1">
      <label className="inline-flex items-center gap-2 text-sm font-semibold text-ink">
        <input
          type="checkbox"
          checked={bom.watched}
          disabled={update.isPending}
          aria-describedby={hintId}
          onChange={(event) => update.mutate({ id: bom.id, body: { watched: event.target.checked } })}
          className="size-4 accent-copper"
        />
        Watch this BOM
      </label>
      <p id={hintId} className="text-xs text-ink-soft">
        You are told when one of its parts changes lifecycle or gains an approved equivalent.{' '}
        <Link to="/settings/alerts" className="font-semibold text-copper-deep underline-offset-2 hover:underline">
          How you are told
        </Link>
      </p>
      {update.isError && (
        <p role="alert" className="text-sm text-danger">
          {update.error.message}
        </p>
      )}
    </div>
  );
}

/** Name, owner and sharing, and what can be done with the BOM; controls the person may not use are not shown. */
export function BomHeader({ bom, canEdit, isOwner }: { bom: BomDetailDto; canEdit: boolean; isOwner: boolean }) {
  const navigate = useNavigate();
  const [renaming, setRenaming] = useState(false);
  const [sharing, setSharing] = useState(false);
  const [deleting, setDeleting] = useState(false);
  const check = useCheckBom();
  const remove = useDeleteBom();
  const latest = check.data?.checks.slice().sort((a, b) => b.checkedAt.localeCompare(a.checkedAt))[0];

  return (
    <header className="flex flex-col gap-4 border-b border-rule pb-5">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <div className="flex min-w-0 flex-col gap-1">
          <p className="text-sm font-semibold tracking-wider text-copper-deep uppercase">BOM check</p>
          {renaming ? (
            <RenameForm bom={bom} onDone={() => setRenaming(false)} />
          ) : (
            <div className="flex flex-wrap items-center gap-2">
              <h1 className="text-2xl font-bold tracking-tight break-words text-ink">{bom.name}</h1>
              {canEdit && (
                <Button variant="ghost" size="sm" onClick={() => setRenaming(true)}>
                  Rename
                </Button>
              )}
            </div>
          )}
          <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
            <dt className="text-ink-soft">Owner</dt>
            <dd className="text-ink">{isOwner ? `${bom.owner.name} (you)` : bom.owner.name}</dd>
            <dt className="text-ink-soft">Shared with</dt>
            <dd className="text-ink" data-testid="shared-with">
              {bom.sharedWith.length === 0 ? 'Nobody' : bom.sharedWith.map((p) => p.name).join(', ')}
            </dd>
            <dt className="text-ink-soft">Lines</dt>
            <dd className="text-ink">
              {bom.lineCount.toLocaleString()}
              {bom.fileName && <span className="text-ink-soft"> from {bom.fileName}</span>}
            </dd>
            <dt className="text-ink-soft">Last checked</dt>
            <dd className="text-ink">{formatDateTime(bom.lastCheckedAt, 'Not yet')}</dd>
          </dl>
          {!canEdit && (
            <p className="mt-1">
              <Badge tone="accent">Read-only: shared with you</Badge>
            </p>
          )}
        </div>
        <div className="flex flex-wrap items-center gap-2 print:hidden">
          {canEdit && (
            <Button onClick={() => check.mutate(bom.id)} loading={check.isPending}>
              Check again
            </Button>
          )}
          <a href={bomExportUrl(bom.id)} download className={buttonClasses('secondary')}>
            Export CSV
          </a>
          <Link to={`/boms/${bom.id}/report`} className={buttonClasses('secondary')}>
            Printable report
          </Link>
          {isOwner && (
            <Button variant="secondary" onClick={() => setSharing(true)}>
              Share…
            </Button>
          )}
          {isOwner && (
            <Button variant="danger" onClick={() => setDeleting(true)}>
              Delete
            </Button>
          )}
        </div>
      </div>

      {canEdit && <WatchToggle bom={bom} />}

      {check.isPending && (
        <div className="flex flex-col gap-1.5">
          <ProgressBar label="Checking the BOM again" valueText={`Checking ${plural(bom.lineCount, 'line')} against today's catalog…`} />
          <p className="text-sm text-ink-soft">Checking {plural(bom.lineCount, 'line')} against today's catalog…</p>
        </div>
      )}
      {check.isError && (
        <Alert tone="error" title="The check did not run">
          {check.error.message}
        </Alert>
      )}
      {check.isSuccess && latest && (
        <Alert tone="success" title="Checked again">
          {latest.summary.text}
          {latest.changes.length > 0 ? ` — ${plural(latest.changes.length, 'line')} changed status.` : ' — no line changed status.'}
        </Alert>
      )}

      {isOwner && <ShareDialog bom={bom} open={sharing} onClose={() => setSharing(false)} />}
      <ConfirmDialog
        open={deleting}
        title={`Delete ${bom.name}?`}
        confirmLabel="Delete BOM"
        tone="danger"
        busy={remove.isPending}
        error={remove.isError ? remove.error.message : undefined}
        onCancel={() => {
          setDeleting(false);
          remove.reset();
        }}
        onConfirm={() => remove.mutate(bom.id, { onSuccess: () => void navigate('/boms', { replace: true }) })}
      >
        The BOM, its lines, the replacements chosen and its check history go, for you and for everyone it is shared with.
        The catalog is not touched.
      </ConfirmDialog>
    </header>
  );
}
