import type { ParameterDefinition, ParameterProposal, ParameterValue, ValueSlot } from '@understudy/shared-types';
import { useId, useState } from 'react';
import { Button, SelectField, TextField } from '../../../components/ui';
import { SLOT_LABELS, inputUnit, slotsOf } from '../../../lib/part-display';
import { editInputsFor, effectiveValue, parseEdit, type EditInputs, type EditResult } from '../lib/proposals';

/**
 * The reviewer's correction, typed as engineers write it (4k7, 13 V/µs) in the parameter's unit and checked with
 * the shared rules before it is sent. Enter saves, Escape cancels.
 */
export function ProposalEditForm({
  def,
  proposal,
  onSave,
  onCancel,
}: {
  def: ParameterDefinition;
  proposal: ParameterProposal;
  onSave: (value: ParameterValue) => void;
  onCancel: () => void;
}) {
  const base = effectiveValue(proposal);
  const [inputs, setInputs] = useState<EditInputs>(() => editInputsFor(def, base));
  const [errors, setErrors] = useState<Extract<EditResult, { ok: false }>['errors']>({});
  const formErrorId = useId();
  const unit = inputUnit(def);
  // Start in the box that holds the reading; the others are there for a value the parser missed.
  const slots = slotsOf(def);
  const firstFilled = slots.find((s) => (inputs[s] ?? '') !== '') ?? slots[0];

  function set(field: ValueSlot | 'value', text: string) {
    setInputs((current) => ({ ...current, [field]: text }));
    setErrors((current) => ({ ...current, [field]: undefined, form: undefined }));
  }

  return (
    <form
      aria-label={`Edit ${def.label}`}
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        const result = parseEdit(def, inputs, proposal.value);
        if (result.ok) onSave(result.value);
        else setErrors(result.errors);
      }}
      onKeyDown={(event) => {
        if (event.key === 'Escape') {
          event.preventDefault();
          event.stopPropagation();
          onCancel();
        }
      }}
      className="flex flex-col gap-3 rounded-md border border-copper/30 bg-copper-wash/30 p-3"
    >
      <div className="flex flex-wrap gap-3">
        {def.kind === 'number' &&
          slots.map((slot) => (
            <TextField
              key={slot}
              label={unit ? `${SLOT_LABELS[slot]} (${unit})` : SLOT_LABELS[slot]}
              value={inputs[slot] ?? ''}
              onValueChange={(text) => set(slot, text)}
              error={errors[slot]}
              autoFocus={slot === firstFilled}
              autoComplete="off"
              spellCheck={false}
              className="w-40"
            />
          ))}
        {def.kind === 'enum' && (
          <SelectField
            label={def.label}
            value={inputs.value ?? ''}
            onValueChange={(v) => set('value', v)}
            options={[{ value: '', label: 'Choose…' }, ...(def.choices ?? [])]}
            error={errors.value}
            autoFocus
            className="w-48"
          />
        )}
        {def.kind === 'boolean' && (
          <SelectField
            label={def.label}
            value={inputs.value ?? ''}
            onValueChange={(v) => set('value', v)}
            options={[
              { value: '', label: 'Choose…' },
              { value: 'true', label: 'Yes' },
              { value: 'false', label: 'No' },
            ]}
            error={errors.value}
            autoFocus
            className="w-40"
          />
        )}
        {def.kind === 'text' && (
          <TextField label={def.label} value={inputs.value ?? ''} onValueChange={(v) => set('value', v)} error={errors.value} autoFocus className="w-64" />
        )}
      </div>
      {errors.form && (
        <p id={formErrorId} className="text-sm font-medium text-danger">
          {errors.form}
        </p>
      )}
      <div className="flex gap-2">
        <Button type="submit" size="sm">
          Save value
        </Button>
        <Button variant="secondary" size="sm" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
