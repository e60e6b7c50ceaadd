import {
  estimateOptocoupler,
  formatQuantity,
  gainRangeFor,
  optoEstimateGaps,
  parseQuantity,
  type PartDto,
} from '@understudy/shared-types';
import { useId, useState } from 'react';
import { Alert, CadmiumCaution, Card, SectionHeading, TextField } from '../../../components/ui';
import { containsCadmium } from '../../../lib/part-display';
import { usePart } from '../api/get-part';
import { PartPicker } from './part-picker';

const ohms = (v: number) => (Number.isFinite(v) ? formatQuantity(v, 'Ω', { digits: 2 }) : 'open circuit');
// Light is read in plain lux (1600 lx), as meters and datasheets give it, not klx.
const lux = (v: number) => `${Number(v.toPrecision(2))} lx`;
const gain = (g: number) => Number(g.toPrecision(2)).toString();
const decibels = (g: number) => {
  const db = Math.round(20 * Math.log10(g) * 10) / 10;
  return `${db > 0 ? '+' : db < 0 ? '\u2212' : ''}${Math.abs(db)} dB`;
};

function read(text: string, unit: string, displayUnit?: string): { value?: number; error?: string } {
  const r = parseQuantity(text.trim(), { unit, displayUnit });
  if (!r.ok) return { error: r.error };
  if (!(r.value > 0)) return { error: 'Enter a value above zero' };
  return { value: r.value };
}

/**
 * A home-made optocoupler, estimated in the browser: an LED at some current and distance from a photocell gives
 * roughly this resistance, and through a feedback resistor roughly this gain. Always to be confirmed on the bench.
 */
export function OptocouplerPanel({
  initialLed = null,
  initialCell = null,
  cadmiumShownAbove = false,
}: {
  initialLed?: PartDto | string | null;
  initialCell?: PartDto | string | null;
  /** The page already carries the cadmium caution; once is enough. */
  cadmiumShownAbove?: boolean;
}) {
  const headingId = useId();
  const [led, setLed] = useState<PartDto | string | null>(initialLed);
  const [cell, setCell] = useState<PartDto | string | null>(initialCell);
  const [currentText, setCurrentText] = useState('10 mA');
  const [spacingText, setSpacingText] = useState('5 mm');
  const [feedbackText, setFeedbackText] = useState('100k');
  // A part named only by id (from an address) is loaded here; the picker shares the cache.
  const ledById = usePart(typeof led === 'string' ? led : undefined);
  const cellById = usePart(typeof cell === 'string' ? cell : undefined);
  const ledPart = typeof led === 'string' ? ledById.data : led;
  const cellPart = typeof cell === 'string' ? cellById.data : cell;

  const current = read(currentText, 'A', 'mA');
  const spacing = read(spacingText, 'm', 'mm');
  const feedback = read(feedbackText, 'Ω');

  let estimate: ReturnType<typeof estimateOptocoupler> | undefined;
  let problem: string | undefined;
  if (ledPart && cellPart) {
    const gaps = optoEstimateGaps(ledPart, cellPart);
    if (gaps.length > 0) problem = `No estimate: ${gaps.join('; ')}.`;
    else if (current.value !== undefined && spacing.value !== undefined) {
      try {
        estimate = estimateOptocoupler({ led: ledPart, cell: cellPart, ledCurrentA: current.value, spacingM: spacing.value });
      } catch (error) {
        problem = error instanceof Error ? error.message : String(error);
      }
    }
  }
  const gains = estimate && feedback.value !== undefined ? gainRangeFor(estimate, feedback.value) : undefined;

  return (
    <Card aria-labelledby={headingId}>
      <SectionHeading id={headingId}>Optocoupler estimate</SectionHeading>
      <div className="flex flex-col gap-4 px-5 py-4">
        <p className="text-sm text-ink-soft">
          An LED lighting a photocell, estimated from the two datasheets: pick both, set the LED current and how far apart they sit.
        </p>
        <div className="grid gap-4 md:grid-cols-2">
          <PartPicker label="LED" family="led" value={led} onChange={setLed} />
          <PartPicker label="Photoresistor" family="photoresistor" value={cell} onChange={setCell} />
        </div>
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField label="LED current" value={currentText} onValueChange={setCurrentText} error={current.error} hint="A bare number is mA." autoComplete="off" />
          <TextField label="Spacing" value={spacingText} onValueChange={setSpacingText} error={spacing.error} hint="LED to cell, on axis; a bare number is mm." autoComplete="off" />
          <TextField label="Feedback resistor Rf" value={feedbackText} onValueChange={setFeedbackText} error={feedback.error} hint="Rf of the inverting stage the cell feeds." autoComplete="off" />
        </div>
        {cellPart && containsCadmium(cellPart.parameters) && !cadmiumShownAbove && <CadmiumCaution />}
        {problem && <Alert tone="warning">{problem}</Alert>}
        {!ledPart || !cellPart ? (
          <p className="text-sm text-ink-soft">Choose an LED and a photoresistor to see the estimate.</p>
        ) : (
          estimate && (
            <section aria-label="Estimate" className="flex flex-col gap-3">
              <dl className="grid gap-3 sm:grid-cols-3">
                <div className="rounded-md border border-rule bg-paper/40 px-3 py-2">
                  <dt className="text-xs text-ink-faint">Typical resistance</dt>
                  <dd className="text-xl font-bold text-ink tabular-nums" data-testid="opto-typical">
                    {ohms(estimate.resistanceOhms.typical)}
                  </dd>
                  <dd className="text-xs text-ink-soft tabular-nums">
                    range {ohms(estimate.resistanceOhms.low)} to {ohms(estimate.resistanceOhms.high)}
                  </dd>
                </div>
                <div className="rounded-md border border-rule bg-paper/40 px-3 py-2">
                  <dt className="text-xs text-ink-faint">Light at the cell</dt>
                  <dd className="text-xl font-bold text-ink tabular-nums">{lux(estimate.illuminanceLux)}</dd>
                  <dd className="text-xs text-ink-soft">{Math.round(estimate.spectralFactor * 100)} % of it in the cell’s band</dd>
                </div>
                {gains && (
                  <div className="rounded-md border border-rule bg-paper/40 px-3 py-2">
                    <dt className="text-xs text-ink-faint">Gain |G| = Rf/R</dt>
                    <dd className="text-xl font-bold text-ink tabular-nums" data-testid="opto-gain">
                      {gain(gains.typical)}
                    </dd>
                    <dd className="text-xs text-ink-soft tabular-nums">
                      range {gain(gains.low)} to {gain(gains.high)} ({decibels(gains.low)} to {decibels(gains.high)})
                    </dd>
                  </div>
                )}
              </dl>
              <details className="rounded-md border border-rule text-sm">
                <summary className="cursor-pointer px-3 py-2 font-semibold text-ink-soft hover:text-ink">
                  Assumptions ({estimate.assumptions.length})
                </summary>
                <ul className="flex list-disc flex-col gap-1 border-t border-rule py-2 pr-3 pl-8 text-ink">
                  {estimate.assumptions.map((a) => (
                    <li key={a}>{a}</li>
                  ))}
                </ul>
              </details>
              <p className="text-sm font-semibold text-warn">{estimate.note}</p>
            </section>
          )
        )}
      </div>
    </Card>
  );
}
