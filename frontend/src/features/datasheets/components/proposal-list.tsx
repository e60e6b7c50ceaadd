import type { ParameterValue } from '@understudy/shared-types';
import type { Ref } from 'react';
import { doublyDecided, type ProposalGroup } from '../lib/proposals';
import { ProposalItem } from './proposal-item';

export interface ProposalListProps {
  groups: ProposalGroup[];
  selectedId: string | undefined;
  editingId: string | null;
  editable: boolean;
  saveErrors: Record<string, string>;
  itemRef: (id: string) => Ref<HTMLElement>;
  onSelect: (id: string) => void;
  onDecide: (id: string, decision: 'accepted' | 'rejected' | 'pending') => void;
  onStartEdit: (id: string) => void;
  onSaveEdit: (id: string, value: ParameterValue) => void;
  onCancelEdit: () => void;
  ref?: Ref<HTMLDivElement>;
}

/** Proposals under their parameter's label, in the family's order. */
export function ProposalList({
  groups,
  selectedId,
  editingId,
  editable,
  saveErrors,
  itemRef,
  onSelect,
  onDecide,
  onStartEdit,
  onSaveEdit,
  onCancelEdit,
  ref,
}: ProposalListProps) {
  const twice = doublyDecided(groups.flatMap((g) => g.proposals));
  return (
    <div ref={ref} className="flex flex-col divide-y divide-rule">
      {groups.map((group) => {
        const headingId = `proposal-group-${group.key}`;
        return (
          <section key={group.key} aria-labelledby={headingId} className="flex flex-col gap-2 px-5 py-4" data-parameter={group.key}>
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h3 id={headingId} className="text-sm font-semibold text-ink">
                {group.label}
              </h3>
              {group.proposals.length > 1 && <span className="text-xs text-ink-faint">{group.proposals.length} readings</span>}
            </div>
            {!group.def && (
              <p className="text-xs text-warn">Not a parameter of this family; it cannot be written to a part of it.</p>
            )}
            {twice.has(group.key) && (
              <p role="status" className="text-xs font-medium text-warn">
                More than one reading is kept; only the last one is applied. Reject the others.
              </p>
            )}
            <ul className="flex flex-col gap-2">
              {group.proposals.map((p) => (
                <li key={p.id}>
                  <ProposalItem
                    ref={itemRef(p.id)}
                    proposal={p}
                    def={group.def}
                    label={group.label}
                    selected={p.id === selectedId}
                    editable={editable}
                    editing={p.id === editingId}
                    saveError={saveErrors[p.id]}
                    onSelect={() => onSelect(p.id)}
                    onDecide={(d) => onDecide(p.id, d)}
                    onStartEdit={() => onStartEdit(p.id)}
                    onSaveEdit={(v) => onSaveEdit(p.id, v)}
                    onCancelEdit={onCancelEdit}
                  />
                </li>
              ))}
            </ul>
          </section>
        );
      })}
    </div>
  );
}
