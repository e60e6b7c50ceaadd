import {
  CONDITIONS,
  LIFECYCLES,
  LIFECYCLE_LABELS,
  PACKAGES,
  PIN_LAYOUTS_BY_FAMILY,
  ROHS_LABELS,
  ROHS_STATUSES,
  VALUE_SLOTS,
  isCadmiumCell,
  type ConditionKey,
  type FamilyDefinition,
  type Lifecycle,
  type ParameterDefinition,
  type PartDto,
  type RohsStatus,
  type ValueSlot,
} from '@understudy/shared-types';
import { useId, useRef, useState, type FormEvent, type ReactNode } from 'react';
import { Link } from 'react-router';
import {
  Alert,
  Button,
  CadmiumCaution,
  Card,
  PinoutDiagram,
  SectionHeading,
  SelectField,
  TextField,
  buttonClasses,
  cx,
} from '../../../components/ui';
import { isApiClientError } from '../../../lib/api-client';
import { formatParameterNumber, inputUnit, pinLayoutFor, slotsOf } from '../../../lib/part-display';
import { useCreatePart } from '../api/create-part';
import { isPartConflictError, useUpdatePart } from '../api/update-part';
import {
  buildCreateBody,
  buildUpdateBody,
  emptyFormValues,
  fieldLabel,
  findConflicts,
  formValuesFromPart,
  issueKey,
  parseCondition,
  parseSlot,
  resolveConflicts,
  type Choice,
  type FormErrors,
  type ParameterInput,
  type PartFormValues,
} from '../lib/part-form-values';
import { ConflictPanel } from './conflict-panel';

const SLOT_LABEL: Record<ValueSlot, string> = { min: 'min', typ: 'typ', max: 'max' };

function QuantityBox({
  label,
  value,
  onChange,
  unit,
  preview,
  error,
  className,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  unit: string;
  /** The value as read, when it reads differently from what was typed. */
  preview?: string;
  error?: string;
  className?: string;
}) {
  const id = useId();
  return (
    <div className={cx('flex min-w-0 flex-col gap-0.5', className)}>
      <div
        className={cx(
          'flex h-9 items-center rounded-md border bg-card pr-2 transition-colors focus-within:border-copper hover:border-ink-soft',
          error ? 'border-danger' : 'border-rule-strong',
        )}
      >
        <input
          id={id}
          aria-label={label}
          value={value}
          onChange={(event) => onChange(event.target.value)}
          autoComplete="off"
          spellCheck={false}
          aria-invalid={error ? true : undefined}
          aria-describedby={`${id}-note`}
          className="h-full w-full min-w-0 rounded-md bg-transparent px-2.5 text-sm text-ink tabular-nums outline-none placeholder:text-ink-faint"
        />
        {unit && <span className="shrink-0 text-xs font-medium text-ink-faint">{unit}</span>}
      </div>
      <p id={`${id}-note`} className="min-h-4 text-xs">
        {error ? <span className="font-medium text-danger">{error}</span> : preview ? <span className="text-ink-soft">= {preview}</span> : null}
      </p>
    </div>
  );
}

function previewOf(def: ParameterDefinition, text: string): string | undefined {
  if (!text.trim()) return undefined;
  const r = parseSlot(def, text);
  if (!r.ok || r.value === undefined) return undefined;
  const shown = formatParameterNumber(def, r.value, 6);
  return shown === text.trim() ? undefined : shown;
}

function ParameterRow({
  def,
  input,
  onChange,
  errors,
  showParseErrors,
}: {
  def: ParameterDefinition;
  input: ParameterInput;
  onChange: (next: ParameterInput) => void;
  errors: FormErrors;
  showParseErrors: boolean;
}) {
  const labelId = useId();
  const field = `parameters.${def.key}`;
  const allowed = slotsOf(def);
  const slotKeys = new Set([...VALUE_SLOTS.map((s) => `${field}.${s}`), ...(def.conditions ?? []).map((c) => `${field}.conditions.${c}`)]);
  const rowErrors = Object.entries(errors)
    .filter(([k]) => (k === field || k.startsWith(`${field}.`)) && !slotKeys.has(k))
    .map(([, m]) => m);

  const liveError = (key: string, parsed: { ok: boolean; error?: string }) =>
    errors[key] ?? (showParseErrors && !parsed.ok ? parsed.error : undefined);

  let control: ReactNode;
  if (def.kind === 'number') {
    control = (
      <div className="flex flex-col gap-1">
        <div className="grid grid-cols-3 gap-2">
          {VALUE_SLOTS.map((slot) =>
            allowed.includes(slot) ? (
              <QuantityBox
                key={slot}
                label={`${def.label} ${SLOT_LABEL[slot]}`}
                value={input[slot]}
                onChange={(v) => onChange({ ...input, [slot]: v })}
                unit={inputUnit(def)}
                preview={previewOf(def, input[slot])}
                error={liveError(`${field}.${slot}`, parseSlot(def, input[slot]) as { ok: boolean; error?: string })}
              />
            ) : (
              <span key={slot} aria-hidden="true" className="flex h-9 items-center justify-center text-xs text-ink-faint/70">
                not quoted
              </span>
            ),
          )}
        </div>
        {(def.conditions ?? []).length > 0 && (
          <div className="flex flex-wrap items-start gap-x-3 gap-y-1">
            <span className="pt-2 text-xs text-ink-faint">measured at</span>
            {(def.conditions ?? []).map((c: ConditionKey) => {
              const cond = CONDITIONS[c];
              const text = input.conditions[c] ?? '';
              return (
                <div key={c} className="flex items-start gap-1.5">
                  <span aria-hidden="true" className="pt-2 text-xs font-medium text-ink-soft">
                    {cond.label}
                  </span>
                  <QuantityBox
                    className="w-32"
                    label={`${def.label}, ${cond.label.toLowerCase()} condition`}
                    value={text}
                    onChange={(v) => onChange({ ...input, conditions: { ...input.conditions, [c]: v } })}
                    unit={cond.displayUnit ?? cond.unit}
                    error={liveError(`${field}.conditions.${c}`, parseCondition(c, text) as { ok: boolean; error?: string })}
                  />
                </div>
              );
            })}
          </div>
        )}
      </div>
    );
  } else if (def.kind === 'enum' || def.kind === 'boolean') {
    const options =
      def.kind === 'enum'
        ? [{ value: '', label: '(not stated)' }, ...(def.choices ?? [])]
        : [
            { value: '', label: '(not stated)' },
            { value: 'true', label: 'Yes' },
            { value: 'false', label: 'No' },
          ];
    control = (
      <select
        aria-labelledby={labelId}
        value={input.value}
        onChange={(event) => onChange({ ...input, value: event.target.value })}
        className="h-9 w-full max-w-xs rounded-md border border-rule-strong bg-card px-2.5 text-sm text-ink hover:border-ink-soft"
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    );
  } else {
    control = (
      <input
        aria-labelledby={labelId}
        value={input.value}
        onChange={(event) => onChange({ ...input, value: event.target.value })}
        className="h-9 w-full rounded-md border border-rule-strong bg-card px-2.5 text-sm text-ink"
      />
    );
  }

  return (
    <div role="group" aria-labelledby={labelId} className="grid gap-2 border-b border-rule px-5 py-3 last:border-b-0 md:grid-cols-[15rem_minmax(0,1fr)]" data-parameter={def.key}>
      <div>
        <p id={labelId} className="text-sm font-semibold text-ink">
          {def.label}
        </p>
        <p className="text-xs text-ink-faint">{def.description}</p>
      </div>
      <div className="flex flex-col gap-1">
        {control}
        {rowErrors.length > 0 && (
          <p className="text-sm font-medium text-danger" role="alert">
            {rowErrors.join(' ')}
          </p>
        )}
      </div>
    </div>
  );
}

function TextArea({ label, value, onChange, error, hint }: { label: string; value: string; onChange: (v: string) => void; error?: string; hint?: string }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        {label}
      </label>
      <textarea
        id={id}
        value={value}
        rows={4}
        onChange={(event) => onChange(event.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-note`}
        className={cx('block w-full rounded-md border bg-card px-3 py-2 text-ink hover:border-ink-soft', error ? 'border-danger' : 'border-rule-strong')}
      />
      <p id={`${id}-note`} className={cx('text-xs', error ? 'font-medium text-danger' : 'text-ink-soft')}>
        {error ?? hint}
      </p>
    </div>
  );
}

/** "an op amp", "an LED", "a photoresistor". */
export function familyNoun(family: FamilyDefinition): string {
  const acronym = /^[A-Z]{2}/.test(family.label);
  const noun = acronym ? family.label : family.label.toLowerCase();
  return `${/^[aeiou]/i.test(noun) || (acronym && /^[AEFHILMNORSX]/.test(noun)) ? 'an' : 'a'} ${noun}`;
}

export interface PartFormProps {
  family: FamilyDefinition;
  /** The part being edited; absent when adding one. */
  part?: PartDto;
  onSaved: (part: PartDto) => void;
  cancelTo: string;
}

/**
 * Adding or editing a part, generated from the family's parameter definitions. Numbers are typed in engineering
 * notation; a bare number is in the unit shown beside the box. The body is checked with the server's own schema
 * before it is sent, and the server's field complaints land beside the same boxes.
 */
export function PartForm({ family, part, onSaved, cancelTo }: PartFormProps) {
  const [values, setValues] = useState<PartFormValues>(() => (part ? formValuesFromPart(family, part) : emptyFormValues(family)));
  const [base, setBase] = useState(() => (part ? { part, values: formValuesFromPart(family, part) } : undefined));
  const [errors, setErrors] = useState<FormErrors>({});
  const [submitted, setSubmitted] = useState(false);
  const [failure, setFailure] = useState<string | null>(null);
  const [conflict, setConflict] = useState<{ current: PartDto; values: PartFormValues } | null>(null);
  const [choices, setChoices] = useState<Record<string, Choice>>({});
  const summaryRef = useRef<HTMLDivElement>(null);
  const create = useCreatePart();
  const update = useUpdatePart();
  const saving = create.isPending || update.isPending;

  const set = <K extends keyof PartFormValues>(key: K, value: PartFormValues[K]) => {
    setValues((v) => ({ ...v, [key]: value }));
    setErrors((e) => {
      if (!(key in e)) return e;
      const { [key]: _gone, ...rest } = e;
      return rest;
    });
  };
  const setParameter = (key: string, next: ParameterInput) => {
    setValues((v) => ({ ...v, parameters: { ...v.parameters, [key]: next } }));
    setErrors((e) => Object.fromEntries(Object.entries(e).filter(([k]) => !(k === `parameters.${key}` || k.startsWith(`parameters.${key}.`)))));
  };

  const conflicts = conflict && base ? findConflicts(family, base.values, values, conflict.values) : [];

  function report(nextErrors: FormErrors) {
    setErrors(nextErrors);
    requestAnimationFrame(() => summaryRef.current?.focus());
  }

  function handleError(error: unknown, attemptBase: typeof base, attemptValues: PartFormValues) {
    if (isPartConflictError(error) && attemptBase) {
      const theirs = formValuesFromPart(family, error.current);
      const found = findConflicts(family, attemptBase.values, attemptValues, theirs);
      // Where this edit left a field alone, the current value is the natural pick; otherwise keep what was typed.
      setChoices(Object.fromEntries(found.map((c) => [c.field, c.yoursChanged ? 'mine' : 'theirs'])));
      setConflict({ current: error.current, values: theirs });
      return;
    }
    if (isApiClientError(error) && error.code === 'part_exists') {
      report({ partNumber: error.message });
      return;
    }
    if (isApiClientError(error) && error.issues.length > 0) {
      report(Object.fromEntries(error.issues.map((i) => [issueKey(i.path), i.message])));
      return;
    }
    setFailure(error instanceof Error ? error.message : 'The part was not saved.');
  }

  function save(attemptValues: PartFormValues, attemptBase: typeof base) {
    setSubmitted(true);
    setFailure(null);
    if (!part || !attemptBase) {
      const { body, errors: found } = buildCreateBody(attemptValues, { family });
      if (!body) return report(found);
      setErrors({});
      create.mutate(body, { onSuccess: onSaved, onError: (e) => handleError(e, undefined, attemptValues) });
      return;
    }
    const { body, changed, errors: found } = buildUpdateBody(attemptValues, { family, base: attemptBase });
    if (!body) return report(found);
    setErrors({});
    if (changed.length === 0) {
      onSaved(attemptBase.part);
      return;
    }
    update.mutate(
      { id: part.id, body },
      {
        onSuccess: (saved) => {
          setConflict(null);
          onSaved(saved);
        },
        onError: (e) => handleError(e, attemptBase, attemptValues),
      },
    );
  }

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (conflict) return saveAfterConflict();
    save(values, base);
  }

  function saveAfterConflict() {
    if (!conflict) return;
    const resolved = resolveConflicts(values, conflict.values, choices);
    const nextBase = { part: conflict.current, values: conflict.values };
    setValues(resolved);
    setBase(nextBase);
    setConflict(null);
    save(resolved, nextBase);
  }

  const packages = PACKAGES.filter((p) => (p.families as readonly string[]).includes(family.key));
  const packageOptions = [
    { value: '', label: '(not stated)' },
    ...packages.map((p) => ({ value: p.key, label: p.label })),
    ...(values.package && !packages.some((p) => p.key === values.package) ? [{ value: values.package, label: values.package }] : []),
  ];
  const layouts = PIN_LAYOUTS_BY_FAMILY[family.key].map((k) => pinLayoutFor(k)!);
  const layoutOptions = [
    { value: '', label: '(none)' },
    ...layouts.map((l) => ({ value: l.key, label: l.label })),
    ...(values.pinLayout && !layouts.some((l) => l.key === values.pinLayout) ? [{ value: values.pinLayout, label: values.pinLayout }] : []),
  ];
  const layout = pinLayoutFor(values.pinLayout);
  const ownPins = base && values.pinLayout === base.values.pinLayout && Object.keys(base.part.pinMap).length > 0 ? base.part.pinMap : undefined;
  const previewPins = ownPins ? Object.fromEntries(Object.entries(ownPins).map(([n, f]) => [Number(n), f])) : layout?.pins;
  const packageMismatch = layout && values.package && !(layout.packages as readonly string[]).includes(values.package);
  const cadmium = isCadmiumCell(values.parameters.cellMaterial?.value);

  const errorList = Object.entries(errors);
  const title = part ? `Edit ${part.partNumber}` : `Add ${familyNoun(family)}`;

  return (
    <form noValidate onSubmit={handleSubmit} aria-label={title} className="flex flex-col gap-6">
      {conflict && (
        <ConflictPanel
          current={conflict.current}
          conflicts={conflicts}
          choices={choices}
          onChoose={(field, choice) => setChoices((c) => ({ ...c, [field]: choice }))}
          onSave={saveAfterConflict}
          saving={saving}
        />
      )}
      {failure && <Alert tone="error" title="Not saved">{failure}</Alert>}
      {errorList.length > 0 && (
        <div ref={summaryRef} tabIndex={-1} className="outline-none">
          <Alert tone="error" title={`${errorList.length === 1 ? 'One field needs' : `${errorList.length} fields need`} another look`}>
            <ul className="list-disc pl-5">
              {errorList.map(([key, message]) => (
                <li key={key}>
                  {key === '_form' ? message : `${fieldLabel(family, key.split('.').slice(0, 2).join('.'))}: ${message}`}
                </li>
              ))}
            </ul>
          </Alert>
        </div>
      )}

      <Card aria-labelledby="identity-title">
        <SectionHeading id="identity-title">Part</SectionHeading>
        <div className="grid gap-4 px-5 py-4 sm:grid-cols-2">
          <TextField label="Part number" value={values.partNumber} onValueChange={(v) => set('partNumber', v)} error={errors.partNumber} autoComplete="off" />
          <TextField label="Manufacturer" value={values.manufacturer} onValueChange={(v) => set('manufacturer', v)} error={errors.manufacturer} autoComplete="off" />
          <div className="sm:col-span-2">
            <TextArea label="Description" value={values.description} onChange={(v) => set('description', v)} error={errors.description} hint="What it is and where it shines, in a sentence or two." />
          </div>
          <TextField
            className="sm:col-span-2"
            label="Tags"
            value={values.tags}
            onValueChange={(v) => set('tags', v)}
            error={errors.tags ?? Object.entries(errors).find(([k]) => k.startsWith('tags.'))?.[1]}
            hint="Separate with commas, e.g. low noise, overdrive"
          />
        </div>
      </Card>

      <Card aria-labelledby="status-title">
        <SectionHeading id="status-title">Status</SectionHeading>
        <div className="grid gap-4 px-5 py-4 sm:grid-cols-3">
          <SelectField
            label="Lifecycle"
            value={values.lifecycle}
            onValueChange={(v) => set('lifecycle', v as Lifecycle)}
            options={LIFECYCLES.map((l) => ({ value: l, label: LIFECYCLE_LABELS[l] }))}
            error={errors.lifecycle}
          />
          <SelectField
            label="RoHS status"
            value={values.rohsStatus}
            onValueChange={(v) => set('rohsStatus', v as RohsStatus)}
            options={ROHS_STATUSES.map((r) => ({ value: r, label: ROHS_LABELS[r] }))}
            error={errors.rohsStatus}
          />
          <TextField label="RoHS note" value={values.rohsNote} onValueChange={(v) => set('rohsNote', v)} error={errors.rohsNote} hint="e.g. the exemption that applies" />
        </div>
        {cadmium && (
          <div className="px-5 pb-4">
            <CadmiumCaution />
          </div>
        )}
      </Card>

      <Card aria-labelledby="package-title">
        <SectionHeading id="package-title">Package and pins</SectionHeading>
        <div className="grid gap-5 px-5 py-4 md:grid-cols-[minmax(0,1fr)_minmax(0,1.3fr)]">
          <div className="flex flex-col gap-4">
            <SelectField label="Package" value={values.package} onValueChange={(v) => set('package', v)} options={packageOptions} error={errors.package} />
            <SelectField
              label="Pin layout"
              value={values.pinLayout}
              onValueChange={(v) => set('pinLayout', v)}
              options={layoutOptions}
              error={errors.pinLayout ?? errors.pinMap}
              hint={layout ? `Used by ${layout.packages.join(', ')}` : 'The numbering shared by parts in this package'}
            />
            {packageMismatch && (
              <Alert tone="warning">
                {layout.label} is drawn for {layout.packages.join(', ')}, not {values.package}. Check the datasheet.
              </Alert>
            )}
          </div>
          <div aria-live="polite" className="flex min-h-40 items-center justify-center rounded-md border border-dashed border-rule-strong bg-paper/50 p-3">
            {previewPins ? (
              <PinoutDiagram pins={previewPins} title={`Pinout preview: ${layout?.label ?? 'own pin map'}`} />
            ) : (
              <p className="text-sm text-ink-faint">Choose a pin layout to see the pinout.</p>
            )}
          </div>
        </div>
      </Card>

      <Card aria-labelledby="parameters-title">
        <SectionHeading
          id="parameters-title"
          aside={<span className="text-xs text-ink-faint">Engineering notation: 4k7, 13 V/µs, 2.2 mA, ±15 V; a bare number is in the unit shown</span>}
        >
          Parameters
        </SectionHeading>
        <div className="hidden grid-cols-[15rem_minmax(0,1fr)] gap-2 border-b border-rule bg-paper-deep/50 px-5 py-1.5 text-xs font-semibold tracking-wider text-ink-soft uppercase md:grid">
          <span>Parameter</span>
          <span className="grid grid-cols-3 gap-2">
            <span>Min</span>
            <span>Typ</span>
            <span>Max</span>
          </span>
        </div>
        {family.parameters.map((def) => (
          <ParameterRow
            key={def.key}
            def={def}
            input={values.parameters[def.key] ?? { min: '', typ: '', max: '', value: '', conditions: {} }}
            onChange={(next) => setParameter(def.key, next)}
            errors={errors}
            showParseErrors={submitted}
          />
        ))}
      </Card>

      <div className="sticky bottom-0 z-[2] -mx-4 flex items-center justify-end gap-2 border-t border-rule bg-paper/95 px-4 py-3 backdrop-blur sm:-mx-6 sm:px-6">
        <Link to={cancelTo} className={buttonClasses('ghost')}>
          Cancel
        </Link>
        <Button type="submit" loading={saving}>
          {part ? 'Save changes' : 'Add part'}
        </Button>
      </div>
    </form>
  );
}
