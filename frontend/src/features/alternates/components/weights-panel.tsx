import { criteriaFor, type FamilyKey, type Weights } from '@understudy/shared-types';
import { useId } from 'react';
import { Button, Card, SectionHeading, cx } from '../../../components/ui';

const WEIGHT_WORDS = ['ignored', 'minor', 'some', 'normal', 'strong', 'dominant'] as const;

function WeightSlider({
  label,
  description,
  value,
  defaultValue,
  onChange,
}: {
  label: string;
  description: string;
  value: number;
  defaultValue: number;
  onChange: (value: number) => void;
}) {
  const id = useId();
  const word = WEIGHT_WORDS[Math.round(value)] ?? '';
  return (
    <li className="flex flex-col gap-1 px-5 py-3">
      <div className="flex items-baseline justify-between gap-2">
        <label htmlFor={id} className="text-sm font-semibold text-ink">
          {label}
        </label>
        <output htmlFor={id} className={cx('text-sm tabular-nums', value === defaultValue ? 'text-ink-soft' : 'font-semibold text-copper-deep')}>
          {value} <span className="text-xs font-normal text-ink-faint">{word}</span>
        </output>
      </div>
      <input
        id={id}
        type="range"
        min={0}
        max={5}
        step={1}
        value={value}
        onChange={(event) => onChange(Number(event.target.value))}
        aria-describedby={`${id}-description`}
        aria-valuetext={`${value} of 5, ${word}`}
        className="w-full accent-copper"
      />
      <p id={`${id}-description`} className="text-xs text-ink-soft">
        {description}
        {value !== defaultValue && <span className="text-ink-faint"> Default {defaultValue}.</span>}
      </p>
    </li>
  );
}

/** One slider per criterion of the family; 0 leaves a criterion out, 5 lets it dominate the score. */
export function WeightsPanel({
  family,
  weights,
  onChange,
  onReset,
  isDefault,
  error,
}: {
  family: FamilyKey;
  weights: Weights;
  onChange: (key: string, value: number) => void;
  onReset: () => void;
  isDefault: boolean;
  error?: string;
}) {
  const criteria = criteriaFor(family);
  return (
    <Card aria-labelledby="weights-title">
      <SectionHeading
        id="weights-title"
        aside={
          <Button variant="secondary" size="sm" onClick={onReset} disabled={isDefault}>
            Reset<span className="sr-only"> weights</span>
          </Button>
        }
      >
        Weights
      </SectionHeading>
      <p className="px-5 pt-3 text-xs text-ink-soft">What matters in this position: 0 ignores a criterion, 5 makes it dominate. The link keeps your weights.</p>
      {error && (
        <p role="status" className="px-5 pt-2 text-xs text-warn">
          The link’s weights could not be read ({error}); the defaults are used.
        </p>
      )}
      <ul className="divide-y divide-rule">
        {criteria.map((c) => (
          <WeightSlider
            key={c.key}
            label={c.label}
            description={c.description}
            value={weights[c.key] ?? c.defaultWeight}
            defaultValue={c.defaultWeight}
            onChange={(v) => onChange(c.key, v)}
          />
        ))}
      </ul>
    </Card>
  );
}
