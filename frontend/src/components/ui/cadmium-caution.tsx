import { CADMIUM_CAUTION, CADMIUM_HANDLING_NOTE } from '@understudy/shared-types';
import { useId } from 'react';

/** Shown wherever a cadmium cell is specified: the caution and the handling note, deferring to local rules. */
export function CadmiumCaution() {
  const titleId = useId();
  return (
    <section
      role="note"
      aria-labelledby={titleId}
      className="flex gap-3 rounded-lg border-2 border-warn/40 bg-warn-wash px-4 py-3 text-sm text-ink"
    >
      <svg aria-hidden="true" viewBox="0 0 20 18" className="mt-0.5 h-5 w-6 shrink-0 text-warn">
        <path d="M10 1.2 19 16.8H1z" fill="currentColor" stroke="currentColor" strokeWidth="1.2" strokeLinejoin="round" />
        <path d="M10 6.5v4.6M10 13.4v.3" stroke="#fffdf9" strokeWidth="1.8" strokeLinecap="round" />
      </svg>
      <div className="flex flex-col gap-1">
        <h2 id={titleId} className="font-bold text-warn">
          Cadmium caution
        </h2>
        <p>{CADMIUM_CAUTION}</p>
        <p>{CADMIUM_HANDLING_NOTE}</p>
      </div>
    </section>
  );
}

