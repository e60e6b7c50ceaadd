import { useEffect, useId, useRef, type ReactNode } from 'react';
import { Button } from './button';

export interface ConfirmDialogProps {
  open: boolean;
  title: ReactNode;
  children?: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  tone?: 'primary' | 'danger';
  busy?: boolean;
  /** Shown inside the dialog, e.g. a 409 from the server, so the person sees why nothing happened. */
  error?: ReactNode;
  onConfirm: () => void;
  onCancel: () => void;
}

/** A modal confirmation on the native <dialog>: focus trapping and Escape come from the browser. */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  cancelLabel = 'Cancel',
  tone = 'primary',
  busy = false,
  error,
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const bodyId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) {
      if (typeof dialog.showModal === 'function') dialog.showModal();
      else dialog.setAttribute('open', '');
    } else if (!open && dialog.open) {
      if (typeof dialog.close === 'function') dialog.close();
      else dialog.removeAttribute('open');
    }
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={children ? bodyId : undefined}
      onCancel={(event) => {
        event.preventDefault();
        if (!busy) onCancel();
      }}
      className="m-auto w-[min(28rem,calc(100vw-2rem))] rounded-lg border border-rule bg-card p-0 text-ink shadow-2xl backdrop:bg-ink/40"
    >
      {open && (
        <form
          method="dialog"
          onSubmit={(event) => {
            event.preventDefault();
            onConfirm();
          }}
          className="flex flex-col gap-4 p-5"
        >
          <h2 id={titleId} className="text-lg font-semibold">
            {title}
          </h2>
          {children && (
            <div id={bodyId} className="text-sm text-ink-soft">
              {children}
            </div>
          )}
          {error && (
            <div role="alert" className="rounded-md border border-danger/30 bg-danger-wash px-3 py-2 text-sm text-danger">
              {error}
            </div>
          )}
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={onCancel} disabled={busy} autoFocus>
              {cancelLabel}
            </Button>
            <Button type="submit" variant={tone === 'danger' ? 'danger' : 'primary'} loading={busy}>
              {confirmLabel}
            </Button>
          </div>
        </form>
      )}
    </dialog>
  );
}
