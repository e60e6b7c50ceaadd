import { FAMILIES, PIN_LAYOUTS, PIN_LAYOUTS_BY_FAMILY, formatQuantity } from '@understudy/shared-types';
import { useId, type ReactNode } from 'react';
import { Card, SectionHeading, SelectField, TextField, cx } from '../../../components/ui';
import {
  GROUPS_BY_FAMILY,
  POSITION_FAMILIES,
  type Derivations,
  type PositionFamily,
  type ReadResult,
  type RequirementsField,
  type RequirementsFormValues,
} from '../lib/requirements-form';

function Group({ title, hint, children, result }: { title: string; hint: string; children: ReactNode; result?: ReactNode }) {
  const id = useId();
  return (
    <fieldset aria-describedby={`${id}-hint`} className="flex flex-col gap-3 rounded-md border border-rule px-4 pt-2 pb-4">
      <legend className="px-1 text-sm font-semibold text-ink">{title}</legend>
      <p id={`${id}-hint`} className="-mt-1 text-xs text-ink-soft">
        {hint}
      </p>
      <div className="grid gap-3 sm:grid-cols-3">{children}</div>
      {result}
    </fieldset>
  );
}

/** A derived figure with the formula it came from, announced as it changes. */
function Formula({ label, children }: { label: string; children: ReactNode }) {
  return (
    <p role="status" aria-label={label} className="rounded-md bg-paper-deep/70 px-3 py-2 font-mono text-sm text-ink">
      {children}
    </p>
  );
}

const show = (value: number, unit: string, displayUnit?: string, digits = 2) => formatQuantity(value, unit, { displayUnit, digits });

function slewText(d: Derivations) {
  return d.slewRate === undefined ? 'SR = 2π·f·Vpeak' : `SR = 2π·f·Vpeak = ${show(d.slewRate, 'V/s', 'V/µs')}`;
}

function currentText(d: Derivations) {
  if (d.ledCurrent === undefined) return 'I = (Vout − Vf)/R';
  const text = `I = (Vout − Vf)/R = ${show(d.ledCurrent, 'A', 'mA')}`;
  return d.ledCurrent === 0 ? `${text}: the output does not reach the LED’s forward voltage` : text;
}

function resistanceText(d: Derivations) {
  if (!d.resistance) return 'R = Rf/|G|';
  const { min, max } = d.resistance;
  return min === max ? `R = Rf/|G| = ${show(min, 'Ω')}` : `R = Rf/|G| = ${show(min, 'Ω')} to ${show(max, 'Ω')}`;
}

/**
 * The position a part fills, in the designer's terms (the rail, the biggest signal, the load); the figures a part
 * must meet follow live underneath each group, with their formulas.
 */
export function RequirementsForm({
  values,
  onChange,
  read,
}: {
  values: RequirementsFormValues;
  onChange: <K extends RequirementsField>(field: K, value: RequirementsFormValues[K]) => void;
  read: ReadResult;
}) {
  const { errors, derived } = read;
  const groups = GROUPS_BY_FAMILY[values.family];
  const text = (field: RequirementsField) => ({
    value: String(values[field]),
    onValueChange: (v: string) => onChange(field, v as never),
    error: errors[field],
    autoComplete: 'off',
  });
  const layouts = PIN_LAYOUTS_BY_FAMILY[values.family];

  return (
    <Card aria-labelledby="requirements-title">
      <SectionHeading id="requirements-title">Requirements</SectionHeading>
      <form
        noValidate
        aria-labelledby="requirements-title"
        onSubmit={(event) => event.preventDefault()}
        className="flex flex-col gap-4 px-5 py-4"
      >
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField
            label="Family"
            value={values.family}
            onValueChange={(v) => onChange('family', v as PositionFamily)}
            options={POSITION_FAMILIES.map((f) => ({ value: f, label: FAMILIES[f].label }))}
          />
          {layouts.length > 0 && (
            <SelectField
              label="Pin layout"
              value={values.pinLayout}
              onValueChange={(v) => onChange('pinLayout', v)}
              options={[{ value: '', label: 'Any' }, ...layouts.map((k) => ({ value: k, label: PIN_LAYOUTS[k].label }))]}
              hint="Only parts that fit the board’s footprint."
            />
          )}
        </div>

        {groups.includes('supply') && (
          <fieldset className="flex flex-col gap-3 rounded-md border border-rule px-4 pt-2 pb-4">
            <legend className="px-1 text-sm font-semibold text-ink">Supply</legend>
            <div className="flex flex-wrap gap-2" role="radiogroup" aria-label="Supply kind">
              {(['single', 'dual'] as const).map((kind) => (
                <label
                  key={kind}
                  className={cx(
                    'inline-flex cursor-pointer items-center gap-2 rounded-md border px-3 py-1.5 text-sm font-semibold has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-copper',
                    values.supplyKind === kind ? 'border-ink bg-ink text-paper' : 'border-rule-strong text-ink-soft hover:border-ink',
                  )}
                >
                  <input
                    type="radio"
                    name="supplyKind"
                    value={kind}
                    checked={values.supplyKind === kind}
                    onChange={() => onChange('supplyKind', kind)}
                    className="sr-only"
                  />
                  {kind === 'single' ? 'Single supply' : 'Dual supply'}
                </label>
              ))}
            </div>
            <div className="grid items-start gap-3 sm:grid-cols-2">
              <TextField
                label={values.supplyKind === 'single' ? 'Supply voltage' : 'Each rail (±)'}
                placeholder={values.supplyKind === 'single' ? '9 V' : '±15 V'}
                hint={
                  derived.supplySpan !== undefined
                    ? `${show(derived.supplySpan, 'V', undefined, 3)} between the rails.`
                    : values.supplyKind === 'single'
                      ? 'Negative rail at ground, e.g. a 9 V battery.'
                      : '±15 V is 30 V between the rails.'
                }
                {...text('supplyVolts')}
              />
              {values.family === 'op-amp' && (
                <label className={cx('flex items-center gap-2 text-sm sm:mt-7', values.supplyKind === 'dual' ? 'text-ink-faint' : 'text-ink')}>
                  <input
                    type="checkbox"
                    checked={values.supplyKind === 'single' && values.halfSupplyBias}
                    disabled={values.supplyKind === 'dual'}
                    onChange={(e) => onChange('halfSupplyBias', e.target.checked)}
                    className="size-4 accent-copper"
                  />
                  Half-supply bias
                  <span className="text-xs text-ink-soft">(signal idles at Vs/2)</span>
                </label>
              )}
            </div>
          </fieldset>
        )}

        {groups.includes('signal') && (
          <Group
            title="Largest signal"
            hint="The biggest swing the output must follow without slew distortion."
            result={<Formula label="Needed slew rate">{slewText(derived)}</Formula>}
          >
            <TextField label="Peak voltage" placeholder="2 V" {...text('signalPeak')} />
            <TextField label="Frequency" placeholder="20 kHz" {...text('signalFrequency')} />
          </Group>
        )}

        {groups.includes('ledLoad') && (
          <Group
            title="LED to drive"
            hint={
              values.family === 'led'
                ? 'The output that lights the LED, through a series resistor.'
                : 'An LED lit from the output through a series resistor, e.g. an optocoupler’s.'
            }
            result={<Formula label="LED current">{currentText(derived)}</Formula>}
          >
            <TextField label="Output voltage" placeholder="9 V" {...text('ledOutput')} />
            <TextField label="LED forward voltage" placeholder="2 V" {...text('ledForward')} />
            <TextField label="Series resistor" placeholder="1k" {...text('ledSeries')} />
          </Group>
        )}

        {groups.includes('invertingGain') && (
          <Group
            title="Inverting stage"
            hint="The cell as the input resistor of an inverting stage; the gain it must reach sets its resistance."
            result={<Formula label="Needed cell resistance">{resistanceText(derived)}</Formula>}
          >
            <TextField label="Feedback resistor" placeholder="100k" {...text('feedback')} />
            <TextField label="Smallest gain |G|" placeholder="0.5" inputMode="decimal" {...text('gainMin')} />
            <TextField label="Largest gain |G|" placeholder="10" inputMode="decimal" {...text('gainMax')} />
          </Group>
        )}

        <label className="flex items-center gap-2 text-sm text-ink">
          <input type="checkbox" checked={values.allowObsolete} onChange={(e) => onChange('allowObsolete', e.target.checked)} className="size-4 accent-copper" />
          Include obsolete parts
        </label>
      </form>
    </Card>
  );
}
