import { useId, useRef, useState, type DragEvent, type ReactNode } from 'react';
import { buttonClasses } from './button';
import { cx } from './cx';

export interface FileDropZoneProps {
  onFiles: (files: File[]) => void;
  /** As the file input's accept attribute; dropped files are passed on unfiltered, for the caller to judge. */
  accept?: string;
  multiple?: boolean;
  title: ReactNode;
  hint?: ReactNode;
  buttonLabel?: string;
  compact?: boolean;
  disabled?: boolean;
  className?: string;
}

function hasFiles(event: DragEvent): boolean {
  return Array.from(event.dataTransfer?.types ?? []).includes('Files');
}

/** Drop files here, or press the button to pick them: the button keeps the zone usable by keyboard alone. */
export function FileDropZone({
  onFiles,
  accept,
  multiple = true,
  title,
  hint,
  buttonLabel = 'Choose files',
  compact = false,
  disabled = false,
  className,
}: FileDropZoneProps) {
  const inputId = useId();
  const hintId = useId();
  const inputRef = useRef<HTMLInputElement>(null);
  const [dragging, setDragging] = useState(false);
  // dragenter/dragleave fire for every child crossed; count them so the highlight does not flicker.
  const depth = useRef(0);

  function onDrop(event: DragEvent<HTMLDivElement>) {
    event.preventDefault();
    depth.current = 0;
    setDragging(false);
    if (disabled) return;
    const files = Array.from(event.dataTransfer.files);
    if (files.length > 0) onFiles(multiple ? files : files.slice(0, 1));
  }

  return (
    <div
      onDragEnter={(event) => {
        if (!hasFiles(event)) return;
        event.preventDefault();
        depth.current += 1;
        setDragging(true);
      }}
      onDragOver={(event) => {
        if (!hasFiles(event)) return;
        event.preventDefault();
        event.dataTransfer.dropEffect = disabled ? 'none' : 'copy';
      }}
      onDragLeave={() => {
        depth.current = Math.max(0, depth.current - 1);
        if (depth.current === 0) setDragging(false);
      }}
      onDrop={onDrop}
      data-dragging={dragging || undefined}
      className={cx(
        'flex items-center rounded-lg border-2 border-dashed text-center transition-colors focus-within:border-copper',
        compact ? 'flex-wrap justify-center gap-x-3 gap-y-2 px-4 py-4' : 'flex-col gap-2 px-6 py-8',
        dragging ? 'border-copper bg-copper-wash/50' : 'border-rule-strong bg-paper/40',
        disabled && 'opacity-60',
        className,
      )}
    >
      {!compact && (
        <svg aria-hidden="true" viewBox="0 0 24 24" className="size-7 text-copper">
          <path
            d="M12 16V4m0 0-4.5 4.5M12 4l4.5 4.5M4 15v4a1 1 0 0 0 1 1h14a1 1 0 0 0 1-1v-4"
            fill="none"
            stroke="currentColor"
            strokeWidth="1.7"
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        </svg>
      )}
      <p className="text-sm font-semibold text-ink">{title}</p>
      {!compact && <p className="text-xs text-ink-faint">or</p>}
      <button
        type="button"
        disabled={disabled}
        aria-describedby={hint ? hintId : undefined}
        onClick={() => inputRef.current?.click()}
        className={buttonClasses('secondary', 'sm')}
      >
        {buttonLabel}
      </button>
      <input
        ref={inputRef}
        id={inputId}
        type="file"
        accept={accept}
        multiple={multiple}
        disabled={disabled}
        tabIndex={-1}
        aria-label={buttonLabel}
        className="sr-only"
        onChange={(event) => {
          const files = Array.from(event.target.files ?? []);
          // Picking the same file again (after a failed try) should count as a new choice.
          event.target.value = '';
          if (files.length > 0) onFiles(files);
        }}
      />
      {hint && (
        <p id={hintId} className={cx('text-xs text-ink-faint', compact && 'basis-full')}>
          {hint}
        </p>
      )}
    </div>
  );
}
