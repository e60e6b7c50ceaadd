import type { ParameterDefinition, ParameterProposal, ParameterValue, ProposalDecision } from '@understudy/shared-types';
import type { Ref } from 'react';
import { Badge, Button, cx } from '../../../components/ui';
import { formatConditions } from '../../../lib/part-display';
import { effectiveValue, formatProposalValue } from '../lib/proposals';
import { ConfidenceMeter } from './confidence-meter';
import { ProposalEditForm } from './proposal-edit-form';

const DECISIONS = {
  pending: { label: 'Pending', tone: 'neutral' },
  accepted: { label: 'Accepted', tone: 'ok' },
  edited: { label: 'Edited', tone: 'accent' },
  rejected: { label: 'Rejected', tone: 'danger' },
} as const satisfies Record<ProposalDecision, { label: string; tone: string }>;

const ORIGINS = { table: 'Characteristics table', prose: 'Running text', 'absolute-maximum': 'Absolute maximum rating' } as const;

export interface ProposalItemProps {
  proposal: ParameterProposal;
  def: ParameterDefinition | undefined;
  label: string;
  selected: boolean;
  editable: boolean;
  editing: boolean;
  saveError?: string;
  onSelect: () => void;
  onDecide: (decision: 'accepted' | 'rejected' | 'pending') => void;
  onStartEdit: () => void;
  onSaveEdit: (value: ParameterValue) => void;
  onCancelEdit: () => void;
  ref?: Ref<HTMLElement>;
}

/** One proposed value with everything needed to judge it, and the reviewer's three answers. */
export function ProposalItem({
  proposal: p,
  def,
  label,
  selected,
  editable,
  editing,
  saveError,
  onSelect,
  onDecide,
  onStartEdit,
  onSaveEdit,
  onCancelEdit,
  ref,
}: ProposalItemProps) {
  const shown = effectiveValue(p);
  const valueText = formatProposalValue(def, shown);
  const conditions = formatConditions(shown.conditions);
  const decision = DECISIONS[p.decision];
  const absMax = p.origin === 'absolute-maximum';
  const name = `${label} ${valueText}`;

  return (
    <article
      ref={ref}
      id={`proposal-${p.id}`}
      tabIndex={selected ? 0 : -1}
      aria-label={name}
      aria-current={selected || undefined}
      data-decision={p.decision}
      onFocus={onSelect}
      onClick={onSelect}
      className={cx(
        'flex scroll-mt-24 flex-col gap-2 rounded-md border px-3 py-2.5 outline-none transition-colors focus-visible:outline-2',
        selected ? 'border-copper bg-copper-wash/40' : 'border-rule bg-card hover:border-rule-strong',
        p.decision === 'rejected' && !selected && 'opacity-70',
      )}
    >
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="flex min-w-0 flex-col">
          <p className={cx('text-base font-semibold text-ink tabular-nums', p.decision === 'rejected' && 'line-through decoration-danger/60')}>
            {valueText}
          </p>
          {p.decision === 'edited' && (
            <p className="text-xs text-ink-soft">
              Read as <del>{formatProposalValue(def, p.value)}</del>
            </p>
          )}
        </div>
        <div className="flex flex-wrap items-center gap-1.5">
          {absMax && (
            <Badge tone="warning" className="gap-1">
              <span aria-hidden="true">⚠</span> Absolute maximum
            </Badge>
          )}
          <Badge tone={decision.tone}>{decision.label}</Badge>
        </div>
      </div>

      <dl className="grid grid-cols-[auto_minmax(0,1fr)] gap-x-3 gap-y-0.5 text-xs">
        {conditions && (
          <>
            <dt className="text-ink-faint">Conditions</dt>
            <dd className="text-ink">{conditions}</dd>
          </>
        )}
        {p.conditionsText && (
          <>
            <dt className="text-ink-faint">As printed</dt>
            <dd className="text-ink">{p.conditionsText}</dd>
          </>
        )}
        <dt className="text-ink-faint">Unit printed</dt>
        <dd className="text-ink">{p.statedUnit ?? '—'}</dd>
        <dt className="text-ink-faint">From</dt>
        <dd className={cx(absMax ? 'font-semibold text-warn' : 'text-ink')}>
          {ORIGINS[p.origin]}, page {p.source.page}
        </dd>
        <dt className="text-ink-faint">Confidence</dt>
        <dd>
          <ConfidenceMeter confidence={p.confidence} />
        </dd>
      </dl>
      {absMax && (
        <p className="text-xs text-warn">A limit the part must never be taken to, not a value it works at. Accept it only as a limit.</p>
      )}
      {p.source.snippet && (
        <blockquote className="border-l-2 border-rule-strong pl-2 font-mono text-xs break-words whitespace-pre-line text-ink-soft">
          {p.source.snippet}
        </blockquote>
      )}

      {editing && def && <ProposalEditForm def={def} proposal={p} onSave={onSaveEdit} onCancel={onCancelEdit} />}

      {editable && !editing && (
        <div className="flex flex-wrap items-center gap-1.5">
          <Button
            size="sm"
            variant={p.decision === 'accepted' ? 'primary' : 'secondary'}
            aria-pressed={p.decision === 'accepted'}
            aria-keyshortcuts="a"
            onClick={(event) => {
              event.stopPropagation();
              onSelect();
              onDecide('accepted');
            }}
          >
            Accept<span className="sr-only"> {name}</span>
          </Button>
          <Button
            size="sm"
            variant="secondary"
            aria-keyshortcuts="e"
            disabled={!def}
            title={def ? undefined : 'This parameter is not part of the family, so it cannot be edited here'}
            onClick={(event) => {
              event.stopPropagation();
              onSelect();
              onStartEdit();
            }}
          >
            Edit<span className="sr-only"> {name}</span>
          </Button>
          <Button
            size="sm"
            variant={p.decision === 'rejected' ? 'danger' : 'secondary'}
            aria-pressed={p.decision === 'rejected'}
            aria-keyshortcuts="r"
            onClick={(event) => {
              event.stopPropagation();
              onSelect();
              onDecide('rejected');
            }}
          >
            Reject<span className="sr-only"> {name}</span>
          </Button>
          {p.decision !== 'pending' && (
            <Button
              size="sm"
              variant="ghost"
              aria-keyshortcuts="u"
              onClick={(event) => {
                event.stopPropagation();
                onDecide('pending');
              }}
            >
              Undo<span className="sr-only"> decision on {name}</span>
            </Button>
          )}
        </div>
      )}
      {saveError && (
        <p role="alert" className="text-sm font-medium text-danger">
          Not saved: {saveError}
        </p>
      )}
    </article>
  );
}
