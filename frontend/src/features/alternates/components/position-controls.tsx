import { subject } from '@casl/ability';
import { RequirementSetBodySchema, type PositionRequirementsInput, type RequirementSetDto } from '@understudy/shared-types';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Alert, Button, Card, ConfirmDialog, SectionHeading, TextField } from '../../../components/ui';
import { useAppAbility } from '../../../lib/ability';
import { formatDateTime } from '../../../lib/format';
import { useSchemaForm } from '../../../lib/form';
import { useCreateRequirementSet } from '../api/create-requirement-set';
import { useDeleteRequirementSet } from '../api/delete-requirement-set';
import { useUpdateRequirementSet } from '../api/update-requirement-set';
import { canChange } from './saved-positions';

/** Name and design, then POST: the new position opens at its own address. */
export function SavePositionForm({
  requirements,
  suggestedDesign = '',
  title = 'Save as a position',
}: {
  requirements: PositionRequirementsInput | null;
  suggestedDesign?: string;
  title?: string;
}) {
  const navigate = useNavigate();
  const create = useCreateRequirementSet();
  const form = useSchemaForm(RequirementSetBodySchema.pick({ name: true, design: true }), { name: '', design: suggestedDesign });

  function submit() {
    const body = form.validate();
    if (!body || !requirements) return;
    create.mutate(
      { ...body, requirements },
      {
        onSuccess: (set) => navigate(`/positions/${set.id}`, { state: { saved: true } }),
        onError: (error) => void form.applyServerError(error),
      },
    );
  }

  return (
    <Card aria-labelledby="save-title">
      <SectionHeading id="save-title">{title}</SectionHeading>
      <form
        noValidate
        aria-labelledby="save-title"
        onSubmit={(event) => {
          event.preventDefault();
          submit();
        }}
        className="flex flex-col gap-3 px-5 py-4"
      >
        <TextField label="Position name" value={form.values.name} onValueChange={(v) => form.setValue('name', v)} error={form.errors.name} placeholder="Vibe LFO buffer" maxLength={120} />
        <TextField
          label="Design"
          value={form.values.design ?? ''}
          onValueChange={(v) => form.setValue('design', v)}
          error={form.errors.design}
          hint="Optional: the circuit it belongs to."
          placeholder="Photocell vibe, rev C"
          maxLength={120}
        />
        {!requirements && <p className="text-xs text-warn">Fix the marked requirements first.</p>}
        {create.isError && !form.errors.name && (
          <Alert tone="error">{create.error.message}</Alert>
        )}
        <Button type="submit" loading={create.isPending} disabled={!requirements} className="self-start">
          Save position
        </Button>
      </form>
    </Card>
  );
}

function RenameForm({ set, onDone }: { set: RequirementSetDto; onDone: () => void }) {
  const update = useUpdateRequirementSet();
  const form = useSchemaForm(RequirementSetBodySchema.pick({ name: true, design: true }), { name: set.name, design: set.design });
  return (
    <form
      noValidate
      aria-label={`Rename ${set.name}`}
      onSubmit={(event) => {
        event.preventDefault();
        const body = form.validate();
        if (!body) return;
        update.mutate({ id: set.id, body }, { onSuccess: onDone, onError: (error) => void form.applyServerError(error) });
      }}
      className="flex flex-col gap-3"
    >
      <TextField label="Position name" value={form.values.name} onValueChange={(v) => form.setValue('name', v)} error={form.errors.name} autoFocus maxLength={120} />
      <TextField label="Design" value={form.values.design ?? ''} onValueChange={(v) => form.setValue('design', v)} error={form.errors.design} maxLength={120} />
      {update.isError && !form.errors.name && <Alert tone="error">{update.error.message}</Alert>}
      <div className="flex gap-2">
        <Button type="submit" size="sm" loading={update.isPending}>
          Save name
        </Button>
        <Button variant="secondary" size="sm" onClick={onDone} disabled={update.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

/** The open position: save changed requirements over it, rerun it, rename or delete it (the owner only). */
export function OpenPositionCard({
  set,
  requirements,
  changed,
  onRerun,
  rerunning,
}: {
  set: RequirementSetDto;
  requirements: PositionRequirementsInput | null;
  changed: boolean;
  onRerun: () => void;
  rerunning: boolean;
}) {
  const ability = useAppAbility();
  const mine = canChange(ability, set);
  const mayDelete = ability.can('delete', subject('Requirement', { ownerId: set.owner.id }));
  const navigate = useNavigate();
  const update = useUpdateRequirementSet();
  const remove = useDeleteRequirementSet();
  const [renaming, setRenaming] = useState(false);
  const [deleting, setDeleting] = useState(false);

  return (
    <Card aria-labelledby="open-title">
      <SectionHeading id="open-title">This position</SectionHeading>
      <div className="flex flex-col gap-3 px-5 py-4 text-sm">
        {renaming ? (
          <RenameForm set={set} onDone={() => setRenaming(false)} />
        ) : (
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
            <dt className="text-ink-faint">Name</dt>
            <dd className="font-semibold text-ink">{set.name}</dd>
            <dt className="text-ink-faint">Design</dt>
            <dd className="text-ink">{set.design || '—'}</dd>
            <dt className="text-ink-faint">Owner</dt>
            <dd className="text-ink">{mine ? 'You' : set.owner.name}</dd>
            <dt className="text-ink-faint">Saved</dt>
            <dd className="text-ink">{formatDateTime(set.updatedAt)}</dd>
          </dl>
        )}
        {changed ? (
          <p className="text-xs text-warn">The requirements differ from the saved ones; the ranking shown is for the form.</p>
        ) : (
          <p className="text-xs text-ink-soft">The ranking shown is the saved position against today’s catalog.</p>
        )}
        {update.isError && <Alert tone="error">{update.error.message}</Alert>}
        <div className="flex flex-wrap gap-2">
          {mine && changed && (
            <Button
              size="sm"
              disabled={!requirements}
              loading={update.isPending}
              onClick={() => requirements && update.mutate({ id: set.id, body: { requirements } })}
            >
              Save changes
            </Button>
          )}
          {!changed && (
            <Button variant="secondary" size="sm" onClick={onRerun} loading={rerunning}>
              Rerun
            </Button>
          )}
          {mine && !renaming && (
            <Button variant="secondary" size="sm" onClick={() => setRenaming(true)}>
              Rename
            </Button>
          )}
          {mayDelete && (
            <Button
              variant="danger"
              size="sm"
              onClick={() => {
                remove.reset();
                setDeleting(true);
              }}
            >
              Delete
            </Button>
          )}
        </div>
      </div>
      <ConfirmDialog
        open={deleting}
        tone="danger"
        title={`Delete ${set.name}?`}
        confirmLabel="Delete position"
        busy={remove.isPending}
        error={remove.isError ? remove.error.message : undefined}
        onCancel={() => setDeleting(false)}
        onConfirm={() =>
          remove.mutate(set.id, {
            onSuccess: () => {
              setDeleting(false);
              navigate('/positions', { replace: true });
            },
          })
        }
      >
        The saved requirements go; the parts and their rulings stay as they are.
      </ConfirmDialog>
    </Card>
  );
}
