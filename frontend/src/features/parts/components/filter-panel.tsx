import {
  LIFECYCLES,
  LIFECYCLE_LABELS,
  ROHS_LABELS,
  ROHS_STATUSES,
  type FamilyDefinition,
  type ParameterDefinition,
} from '@understudy/shared-types';
import { useId, type ReactNode } from 'react';
import { cx } from '../../../components/ui';
import { inputUnit } from '../../../lib/part-display';
import { useDebouncedCommit } from '../hooks/use-debounced-value';
import {
  coversVerb,
  filterableParameters,
  isCoversParameter,
  numericParamKey,
  readList,
  readNumeric,
  type NumericBound,
} from '../lib/search-params';

export type UpdateSearch = (mutate: (next: URLSearchParams) => void, options?: { replace?: boolean }) => void;

interface PanelProps {
  family: FamilyDefinition | undefined;
  params: URLSearchParams;
  update: UpdateSearch;
  /** Unreadable boxes by address key, from the client's own parsing or the server's 400. */
  errors: Record<string, string>;
}

function Section({ title, children, className }: { title: string; children: ReactNode; className?: string }) {
  return (
    <fieldset className={cx('flex flex-col gap-2 border-t border-rule px-4 py-3 first:border-t-0', className)}>
      <legend className="float-left mb-1 w-full text-xs font-semibold tracking-wider text-ink-soft uppercase">{title}</legend>
      {children}
    </fieldset>
  );
}

function CheckList({
  name,
  options,
  selected,
  onToggle,
}: {
  name: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  selected: readonly string[];
  onToggle: (value: string, on: boolean) => void;
}) {
  return (
    <div className="flex flex-col gap-1.5">
      {options.map((option) => (
        <label key={option.value} className="flex cursor-pointer items-start gap-2 text-sm text-ink">
          <input
            type="checkbox"
            name={name}
            value={option.value}
            checked={selected.includes(option.value)}
            onChange={(event) => onToggle(option.value, event.target.checked)}
            className="mt-0.5 size-4 accent-copper"
          />
          <span>{option.label}</span>
        </label>
      ))}
    </div>
  );
}

function toggleListValue(next: URLSearchParams, key: string, value: string, on: boolean) {
  const values = new Set(readList(next, key));
  if (on) values.add(value);
  else values.delete(value);
  if (values.size > 0) next.set(key, [...values].join(','));
  else next.delete(key);
}

function NumericBox({
  def,
  bound,
  label,
  params,
  update,
  error,
  placeholder,
  className,
}: {
  def: ParameterDefinition;
  bound: NumericBound;
  label: string;
  params: URLSearchParams;
  update: UpdateSearch;
  error: string | undefined;
  placeholder: string;
  className?: string;
}) {
  const key = numericParamKey(def, bound);
  const id = useId();
  const unit = inputUnit(def);
  const [text, setText] = useDebouncedCommit(params.get(key) ?? '', (value) =>
    update(
      (next) => {
        if (value.trim()) next.set(key, value.trim());
        else next.delete(key);
      },
      { replace: true },
    ),
  );
  const reading = text.trim() ? readNumeric(def, bound, text.trim()) : undefined;
  const feedbackId = `${id}-feedback`;
  // The committed value's error is authoritative; while typing, only a readable value is echoed.
  const shownError = error && text.trim() === (params.get(key) ?? '').trim() ? error : undefined;

  return (
    <div className={cx('flex min-w-0 flex-col gap-1', className)}>
      <div
        className={cx(
          'flex h-9 items-center rounded-md border bg-card pr-2 transition-colors focus-within:border-copper hover:border-ink-soft',
          shownError ? 'border-danger' : 'border-rule-strong',
        )}
      >
        <input
          id={id}
          aria-label={label}
          value={text}
          onChange={(event) => setText(event.target.value)}
          placeholder={placeholder}
          inputMode="text"
          autoComplete="off"
          spellCheck={false}
          aria-invalid={shownError ? true : undefined}
          aria-describedby={feedbackId}
          className="h-full min-w-0 flex-1 rounded-md bg-transparent px-2.5 text-sm text-ink outline-none placeholder:text-ink-faint"
        />
        {unit && <span className="shrink-0 text-xs font-medium text-ink-faint">{unit}</span>}
      </div>
      <p id={feedbackId} aria-live="polite" className="min-h-4 text-xs">
        {shownError ? (
          <span className="font-medium text-danger">{shownError}</span>
        ) : reading?.ok ? (
          <span className="text-ink-soft tabular-nums">= {reading.shown}</span>
        ) : null}
      </p>
    </div>
  );
}

function NumericFilter({ def, params, update, errors }: { def: ParameterDefinition } & Omit<PanelProps, 'family'>) {
  if (isCoversParameter(def)) {
    const verb = coversVerb(def);
    const key = numericParamKey(def, 'covers');
    return (
      <div className="flex flex-col gap-1">
        <span className="text-sm font-semibold text-ink">
          {def.label} <span className="font-normal text-ink-soft">{verb}</span>
        </span>
        <NumericBox
          def={def}
          bound="covers"
          label={`${def.label} ${verb}`}
          params={params}
          update={update}
          error={errors[key]}
          placeholder={def.unit === 'V' ? '9, ±4.5 V, 9 to 18' : 'value or range'}
        />
      </div>
    );
  }
  return (
    <div className="flex flex-col gap-1">
      <span className="text-sm font-semibold text-ink">{def.label}</span>
      <div className="grid grid-cols-2 gap-2">
        <NumericBox def={def} bound="min" label={`${def.label} min`} params={params} update={update} error={errors[numericParamKey(def, 'min')]} placeholder="min" />
        <NumericBox def={def} bound="max" label={`${def.label} max`} params={params} update={update} error={errors[numericParamKey(def, 'max')]} placeholder="max" />
      </div>
    </div>
  );
}

function BooleanFilter({ def, params, update }: { def: ParameterDefinition } & Pick<PanelProps, 'params' | 'update'>) {
  const name = useId();
  const value = params.get(def.key);
  const current = value === 'true' || value === 'false' ? value : '';
  const options = [
    { value: '', label: 'Any' },
    { value: 'true', label: 'Yes' },
    { value: 'false', label: 'No' },
  ];
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-semibold text-ink">{def.label}</legend>
      <div className="inline-flex w-fit rounded-md border border-rule-strong bg-card p-0.5">
        {options.map((o) => (
          <label
            key={o.value}
            className={cx(
              'cursor-pointer rounded px-2.5 py-1 text-xs font-semibold transition-colors has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-copper',
              current === o.value ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-deep',
            )}
          >
            <input
              type="radio"
              name={name}
              value={o.value}
              checked={current === o.value}
              onChange={() =>
                update((next) => {
                  if (o.value) next.set(def.key, o.value);
                  else next.delete(def.key);
                })
              }
              className="sr-only"
            />
            {o.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}

function EnumFilter({ def, params, update }: { def: ParameterDefinition } & Pick<PanelProps, 'params' | 'update'>) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-sm font-semibold text-ink">{def.label}</legend>
      <CheckList
        name={def.key}
        options={def.choices ?? []}
        selected={readList(params, def.key)}
        onToggle={(value, on) => update((next) => toggleListValue(next, def.key, value, on))}
      />
    </fieldset>
  );
}

function ParameterFilter(props: { def: ParameterDefinition } & Omit<PanelProps, 'family'>) {
  switch (props.def.kind) {
    case 'number':
      return <NumericFilter {...props} />;
    case 'enum':
      return <EnumFilter {...props} />;
    case 'boolean':
      return <BooleanFilter {...props} />;
    default:
      return null;
  }
}

function isActive(def: ParameterDefinition, params: URLSearchParams): boolean {
  if (def.kind === 'number') return ['min', 'max', 'covers'].some((b) => params.get(`${def.key}.${b}`));
  return params.has(def.key);
}

/**
 * Filters generated from the family definition. The parameters shown as default columns come first; the rest wait
 * behind "More parameters", which opens by itself when one of them is in use.
 */
export function FilterPanel({ family, params, update, errors }: PanelProps) {
  const parameters = family ? filterableParameters(family) : [];
  const primary = parameters.filter((p) => p.columnByDefault);
  const secondary = parameters.filter((p) => !p.columnByDefault);
  const secondaryActive = secondary.some((p) => isActive(p, params));

  return (
    <div aria-label="Filters" role="group" className="flex flex-col">
      {family && primary.length > 0 && (
        <Section title={`${family.label} parameters`}>
          <div className="flex flex-col gap-3">
            {primary.map((def) => (
              <ParameterFilter key={def.key} def={def} params={params} update={update} errors={errors} />
            ))}
          </div>
        </Section>
      )}
      {family && secondary.length > 0 && (
        <div className="border-t border-rule px-4 py-3">
          <details open={secondaryActive || undefined} className="group">
            <summary className="cursor-pointer text-xs font-semibold tracking-wider text-ink-soft uppercase hover:text-ink">
              More parameters ({secondary.length})
            </summary>
            <div className="mt-3 flex flex-col gap-3">
              {secondary.map((def) => (
                <ParameterFilter key={def.key} def={def} params={params} update={update} errors={errors} />
              ))}
            </div>
          </details>
        </div>
      )}
      <Section title="Lifecycle">
        <CheckList
          name="lifecycle"
          options={LIFECYCLES.map((v) => ({ value: v, label: LIFECYCLE_LABELS[v] }))}
          selected={readList(params, 'lifecycle')}
          onToggle={(value, on) => update((next) => toggleListValue(next, 'lifecycle', value, on))}
        />
      </Section>
      <Section title="RoHS">
        <CheckList
          name="rohs"
          options={ROHS_STATUSES.map((v) => ({ value: v, label: ROHS_LABELS[v] }))}
          selected={readList(params, 'rohs')}
          onToggle={(value, on) => update((next) => toggleListValue(next, 'rohs', value, on))}
        />
      </Section>
      {!family && (
        <p className="border-t border-rule px-4 py-3 text-sm text-ink-soft">Choose a family to filter by its parameters.</p>
      )}
    </div>
  );
}
