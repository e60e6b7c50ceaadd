import { EquivalentBodySchema, type CandidatePart, type EquivalentDto, type EquivalentStatus } from '@understudy/shared-types';
import { useEffect, useId, useRef } from 'react';
import { Button, TextField, cx } from '../../../components/ui';
import { useSchemaForm } from '../../../lib/form';
import { useCreateEquivalent } from '../api/create-equivalent';
import { useUpdateEquivalent } from '../api/update-equivalent';

export interface RulingDialogProps {
  original: CandidatePart;
  candidate: CandidatePart;
  /** The ruling being edited, or the status a new one starts from. */
  existing: EquivalentDto | null;
  status: EquivalentStatus;
  onClose: () => void;
}

/** An editor records whether a pair may stand in for each other, and for what use. Opened only while shown. */
export function RulingDialog({ original, candidate, existing, status, onClose }: RulingDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const noteId = useId();
  const create = useCreateEquivalent();
  const update = useUpdateEquivalent();
  const mutation = existing ? update : create;
  const form = useSchemaForm(EquivalentBodySchema, {
    partId: original.id,
    equivalentId: candidate.id,
    status: existing?.status ?? status,
    use: existing?.use ?? '',
    note: existing?.note ?? '',
  });

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog || dialog.open) return;
    if (typeof dialog.showModal === 'function') dialog.showModal();
    else dialog.setAttribute('open', '');
  }, []);

  function submit() {
    const body = form.validate();
    if (!body) return;
    const done = { onSuccess: onClose, onError: (error: unknown) => void form.applyServerError(error) };
    if (existing) update.mutate({ id: existing.id, body: { status: body.status, use: body.use, note: body.note } }, done);
    else create.mutate(body, done);
  }

  const approved = form.values.status === 'approved';
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={(event) => {
        event.preventDefault();
        if (!mutation.isPending) onClose();
      }}
      className="m-auto w-[min(30rem,calc(100vw-2rem))] rounded-lg border border-rule bg-card p-0 text-ink shadow-2xl backdrop:bg-ink/40"
    >
      <form
        noValidate
        onSubmit={(event) => {
          event.preventDefault();
          submit();
        }}
        className="flex flex-col gap-4 p-5"
      >
        <h2 id={titleId} className="text-lg font-semibold">
          {existing ? 'Change the ruling on' : approved ? 'Approve' : 'Reject'} {candidate.partNumber} for {original.partNumber}
        </h2>
        <fieldset className="flex flex-col gap-1.5">
          <legend className="text-sm font-semibold text-ink">Ruling</legend>
          <div className="flex gap-2">
            {(['approved', 'rejected'] as const).map((s) => (
              <label
                key={s}
                className={cx(
                  'inline-flex cursor-pointer items-center gap-2 rounded-md border px-3 py-1.5 text-sm font-semibold has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-copper',
                  form.values.status === s
                    ? s === 'approved'
                      ? 'border-ok bg-ok-wash text-ok'
                      : 'border-danger bg-danger-wash text-danger'
                    : 'border-rule-strong text-ink-soft',
                )}
              >
                <input
                  type="radio"
                  name="status"
                  value={s}
                  checked={form.values.status === s}
                  onChange={() => form.setValue('status', s)}
                  className="sr-only"
                />
                {s === 'approved' ? 'Approved equivalent' : 'Rejected'}
              </label>
            ))}
          </div>
        </fieldset>
        <TextField
          label="For what use"
          value={form.values.use}
          onValueChange={(v) => form.setValue('use', v)}
          error={form.errors.use}
          hint="“any”, or the position it was checked in, e.g. “fuzz gain stage”"
          autoFocus
          maxLength={200}
        />
        <div className="flex flex-col gap-1.5">
          <label htmlFor={noteId} className="text-sm font-semibold text-ink">
            Note <span className="font-normal text-ink-faint">(optional)</span>
          </label>
          <textarea
            id={noteId}
            value={form.values.note ?? ''}
            onChange={(event) => form.setValue('note', event.target.value)}
            rows={3}
            maxLength={2000}
            className="block w-full rounded-md border border-rule-strong bg-card px-3 py-2 text-sm text-ink hover:border-ink-soft"
          />
        </div>
        {mutation.isError && !form.errors.use && (
          <div role="alert" className="rounded-md border border-danger/30 bg-danger-wash px-3 py-2 text-sm text-danger">
            {mutation.error.message}
          </div>
        )}
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={onClose} disabled={mutation.isPending}>
            Cancel
          </Button>
          <Button type="submit" loading={mutation.isPending}>
            Save ruling
          </Button>
        </div>
      </form>
    </dialog>
  );
}
