import type { BomDetailDto } from '@understudy/shared-types';
import { useState } from 'react';
import { ConfirmDialog, Spinner } from '../../../components/ui';
import { useColleagues } from '../api/get-colleagues';
import { useShareBom } from '../api/share-bom';

/** The owner picks the colleagues who may read the BOM; they cannot change it. */
export function ShareDialog({ bom, open, onClose }: { bom: BomDetailDto; open: boolean; onClose: () => void }) {
  const colleagues = useColleagues({ enabled: open });
  const share = useShareBom();
  const [chosen, setChosen] = useState<Set<string>>(() => new Set(bom.sharedWith.map((p) => p.id)));
  const [wasOpen, setWasOpen] = useState(open);
  // Each opening starts from who has it now, not from an earlier, cancelled choice.
  if (open !== wasOpen) {
    setWasOpen(open);
    if (open) {
      setChosen(new Set(bom.sharedWith.map((p) => p.id)));
      share.reset();
    }
  }

  function toggle(id: string) {
    setChosen((current) => {
      const next = new Set(current);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  }

  return (
    <ConfirmDialog
      open={open}
      title={`Share ${bom.name}`}
      confirmLabel="Save sharing"
      busy={share.isPending}
      error={share.isError ? share.error.message : undefined}
      onCancel={onClose}
      onConfirm={() => share.mutate({ id: bom.id, body: { userIds: [...chosen] } }, { onSuccess: onClose })}
    >
      <p>Colleagues you pick can read the BOM and its report, read-only. Only you can change it.</p>
      {colleagues.isPending ? (
        <p className="mt-3 flex items-center gap-2">
          <Spinner className="text-copper" /> Loading colleagues…
        </p>
      ) : colleagues.isError ? (
        <p className="mt-3 text-danger">{colleagues.error.message}</p>
      ) : colleagues.data.length === 0 ? (
        <p className="mt-3">There is nobody else to share with yet.</p>
      ) : (
        <fieldset className="mt-3">
          <legend className="sr-only">Share with</legend>
          <ul className="flex max-h-64 flex-col overflow-y-auto rounded-md border border-rule">
            {colleagues.data.map((c) => (
              <li key={c.id} className="border-b border-rule last:border-b-0">
                <label className="flex cursor-pointer items-center gap-3 px-3 py-2 hover:bg-paper">
                  <input type="checkbox" checked={chosen.has(c.id)} onChange={() => toggle(c.id)} className="size-4 accent-copper" />
                  <span className="flex flex-col">
                    <span className="font-semibold text-ink">{c.name}</span>
                    <span className="text-xs text-ink-soft">{c.email}</span>
                  </span>
                </label>
              </li>
            ))}
          </ul>
        </fieldset>
      )}
    </ConfirmDialog>
  );
}
