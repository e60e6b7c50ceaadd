import type { PartDto } from '@understudy/shared-types';
import { useEffect, useRef } from 'react';
import { Button, cx } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import type { Choice, ConflictField } from '../lib/part-form-values';

/**
 * Someone saved the part while this edit was open. Each field they changed is shown with both values; the person
 * picks per field, and saving again goes against the version that is current now. The boxes keep what was typed.
 */
export function ConflictPanel({
  current,
  conflicts,
  choices,
  onChoose,
  onSave,
  saving,
}: {
  current: PartDto;
  conflicts: ConflictField[];
  choices: Record<string, Choice>;
  onChoose: (field: string, choice: Choice) => void;
  onSave: () => void;
  saving: boolean;
}) {
  const ref = useRef<HTMLElement>(null);
  // The save button is at the foot of a long form; bring the news to where the person is looking.
  useEffect(() => {
    ref.current?.focus();
    ref.current?.scrollIntoView?.({ block: 'start', behavior: 'smooth' });
  }, [current.version]);
  return (
    <section
      ref={ref}
      tabIndex={-1}
      aria-labelledby="conflict-title"
      role="region"
      className="flex scroll-mt-20 flex-col gap-3 rounded-lg border-2 border-warn/40 bg-warn-wash/70 p-4 text-sm outline-none focus-visible:outline-2"
      data-testid="conflict-panel"
    >
      <div>
        <h2 id="conflict-title" className="text-base font-bold text-warn">
          Someone else saved this part while you were editing
        </h2>
        <p className="mt-1 text-ink">
          Version {current.version} was saved {formatDateTime(current.updatedAt)}. Your changes are still in the form.
          {conflicts.length > 0
            ? ' For each field below, keep yours or take the current value, then save again.'
            : ' None of their changes touch the fields you changed; save again to apply yours on top.'}
        </p>
      </div>
      {conflicts.length > 0 && (
        <div className="overflow-x-auto rounded-md border border-warn/25 bg-card">
          <table className="w-full border-collapse text-left text-sm">
            <caption className="sr-only">Fields changed meanwhile</caption>
            <thead>
              <tr className="border-b border-rule">
                <th scope="col" className="px-3 py-2 text-xs font-semibold text-ink-soft">
                  Field
                </th>
                <th scope="col" className="px-3 py-2 text-xs font-semibold text-ink-soft">
                  Current (theirs)
                </th>
                <th scope="col" className="px-3 py-2 text-xs font-semibold text-ink-soft">
                  Yours
                </th>
                <th scope="col" className="px-3 py-2 text-xs font-semibold text-ink-soft">
                  Keep
                </th>
              </tr>
            </thead>
            <tbody>
              {conflicts.map((c) => {
                const choice = choices[c.field] ?? 'mine';
                return (
                  <tr key={c.field} className="border-b border-rule last:border-b-0 align-top" data-field={c.field}>
                    <th scope="row" className="px-3 py-2 font-semibold text-ink">
                      {c.label}
                      {!c.yoursChanged && <span className="block text-xs font-normal text-ink-faint">you did not change this</span>}
                    </th>
                    <td className={cx('px-3 py-2 break-words', choice === 'theirs' ? 'text-ink' : 'text-ink-soft')} data-side="theirs">
                      {c.theirs}
                    </td>
                    <td className={cx('px-3 py-2 break-words', choice === 'mine' ? 'text-ink' : 'text-ink-soft')} data-side="yours">
                      {c.yours}
                    </td>
                    <td className="px-3 py-2 whitespace-nowrap">
                      <fieldset className="flex flex-col gap-1">
                        <legend className="sr-only">Which value to keep for {c.label}</legend>
                        <label className="flex items-center gap-1.5">
                          <input
                            type="radio"
                            name={`conflict-${c.field}`}
                            checked={choice === 'mine'}
                            onChange={() => onChoose(c.field, 'mine')}
                            className="accent-copper"
                          />
                          Keep mine
                        </label>
                        <label className="flex items-center gap-1.5">
                          <input
                            type="radio"
                            name={`conflict-${c.field}`}
                            checked={choice === 'theirs'}
                            onChange={() => onChoose(c.field, 'theirs')}
                            className="accent-copper"
                          />
                          Take current
                        </label>
                      </fieldset>
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
      <div>
        <Button onClick={onSave} loading={saving}>
          Save against version {current.version}
        </Button>
      </div>
    </section>
  );
}
