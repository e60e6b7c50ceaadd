import type { CandidatePart } from '../alternates';
import { CELL_RESPONSE_FWHM_M, spectralResponse } from './curves';
import { definition, show, TYP_FIRST, pick } from './values';

export interface OptoEstimateInput {
  led: CandidatePart;
  cell: CandidatePart;
  ledCurrentA: number;
  spacingM: number;
}

export interface OptoEstimate {
  resistanceOhms: { low: number; typical: number; high: number };
  /** On-axis illuminance at the cell, before the spectral correction. */
  illuminanceLux: number;
  /** The cell's relative response at the LED's peak, 0..1. */
  spectralFactor: number;
  assumptions: string[];
  note: string;
}

const ASSUMED_TEST_CURRENT_A = 20e-3;
const ASSUMED_GAMMA = 0.7;
/** Coupling through a home-made enclosure is uncertain both ways: ±50 % on the light reaching the cell. */
const COUPLING_SPREAD = 0.5;

export const OPTO_ESTIMATE_NOTE =
  'An estimate from datasheet figures and the assumptions listed, to confirm on the bench before building on it.';

/** What an estimate needs that the two parts do not state; empty when one can be made. */
export function optoEstimateGaps(led: CandidatePart, cell: CandidatePart): string[] {
  const gaps: string[] = [];
  if (led.family !== 'led') gaps.push(`${led.partNumber} is not an LED`);
  else if (!(pick(led, 'luminousIntensity', TYP_FIRST)! > 0)) gaps.push(`${led.partNumber} states no luminous intensity`);
  if (cell.family !== 'photoresistor') gaps.push(`${cell.partNumber} is not a photoresistor`);
  else if (!(pick(cell, 'lightResistance', ['min', 'max']) ?? 0)) gaps.push(`${cell.partNumber} states no light resistance at 10 lx`);
  return gaps;
}

function statedTestCurrent(led: CandidatePart): number | undefined {
  const stated = led.parameters.luminousIntensity?.conditions?.current ?? led.parameters.forwardCurrent?.typ;
  return stated !== undefined && stated > 0 ? stated : undefined;
}

/**
 * On-axis illuminance an LED gives at `spacingM` and `ledCurrentA`: E = Iv·(I/Itest)/d² (inverse-square law, the
 * intensity taken as proportional to current from its test current, else 20 mA). 0 for an LED stating no intensity.
 */
export function ledIlluminance(led: CandidatePart, ledCurrentA: number, spacingM: number): number {
  const iv = pick(led, 'luminousIntensity', TYP_FIRST) ?? 0;
  return (iv * (ledCurrentA / (statedTestCurrent(led) ?? ASSUMED_TEST_CURRENT_A))) / spacingM ** 2;
}

/** The figures of an estimate without the words: what a ranking of many pairs needs before it shows a few. */
export type OptoEstimateFigures = Omit<OptoEstimate, 'assumptions' | 'note'>;

/**
 * The estimate's arithmetic, saying what it assumed through `say` when one is given; the words are built only then,
 * since formatting them costs more than the sums.
 */
function estimate(input: OptoEstimateInput, say: ((text: () => string) => void) | null): OptoEstimateFigures {
  const { led, cell, ledCurrentA, spacingM } = input;
  const gaps = optoEstimateGaps(led, cell);
  if (gaps.length > 0) throw new RangeError(`No estimate: ${gaps.join('; ')}.`);
  if (!(spacingM > 0)) throw new RangeError('No estimate: the spacing between LED and cell must be above zero.');
  if (!(ledCurrentA >= 0)) throw new RangeError('No estimate: the LED current must not be negative.');
  const tell = say ?? (() => {});

  const mA = definition('led', 'forwardCurrent');
  const nm = definition('led', 'peakWavelength');
  const ohms = definition('photoresistor', 'lightResistance');

  const stated = statedTestCurrent(led);
  const testCurrent = stated ?? ASSUMED_TEST_CURRENT_A;
  if (stated === undefined) {
    tell(() => `The LED states no test current for its intensity; ${show(mA, testCurrent)} is assumed, a common test current.`);
  }
  tell(() => `Luminous intensity is taken as proportional to current, from ${show(mA, testCurrent)}; real LEDs fall short of that at high currents.`);
  tell(() => 'The LED is treated as a point source with the cell on its axis (inverse-square law); a lens, an off-axis cell or reflections inside an enclosure change the light reaching it.');
  const rated = led.parameters.forwardCurrent?.max;
  if (rated !== undefined && ledCurrentA > rated) {
    tell(() => `${show(mA, ledCurrentA)} is above the LED's rated ${show(mA, rated)}: the LED may not survive it.`);
  }

  const illuminanceLux = ledIlluminance(led, ledCurrentA, spacingM);

  const ledPeak = pick(led, 'peakWavelength', TYP_FIRST);
  const cellPeak = pick(cell, 'peakWavelength', TYP_FIRST);
  let spectralFactor = 1;
  if (ledPeak === undefined) {
    tell(() => 'The LED states no peak wavelength (a white LED has none to speak of); its light is taken as fully effective on the cell.');
  } else if (cellPeak === undefined) {
    tell(() => 'The cell states no peak response; the LED light is taken as fully effective on it.');
  } else {
    const factor = spectralResponse(ledPeak - cellPeak, CELL_RESPONSE_FWHM_M);
    spectralFactor = factor;
    tell(
      () =>
        `The cell's response around its ${show(nm, cellPeak)} peak is taken as a bell curve about 100 nm wide at half response (from memory, not from this cell's datasheet), giving ${Math.round(factor * 100)} % at the LED's ${show(nm, ledPeak)}.`,
    );
    tell(() => "The cell's 10 lx rating is treated as if measured with light at its peak; datasheets usually rate it under a tungsten lamp (from memory), which this ignores.");
  }

  const lr = cell.parameters.lightResistance!;
  const r10Low = lr.min ?? lr.max!;
  const r10High = lr.max ?? lr.min!;
  const r10Typical = Math.sqrt(r10Low * r10High);
  let gamma = cell.parameters.gamma?.typ;
  if (!(gamma! > 0)) {
    gamma = ASSUMED_GAMMA;
    tell(() => `The cell states no gamma; ${ASSUMED_GAMMA} is assumed, usual for CdS cells (from memory).`);
  }
  const g = gamma!;
  const dark = pick(cell, 'darkResistance', TYP_FIRST);
  if (dark === undefined) tell(() => 'The cell states no dark resistance, so the estimate is not limited by it.');
  tell(() => `Resistance follows R = R10·(E/10 lx)^(−${g}) from the light resistance at 10 lx (${show(ohms, r10Low)}${r10High !== r10Low ? ` to ${show(ohms, r10High)}` : ''}).`);
  tell(() => 'Low and high carry the spread of the light resistance and ±50 % on the light reaching the cell.');

  const effective = illuminanceLux * spectralFactor;
  const at = (r10: number, lux: number): number => {
    const r = lux > 0 ? r10 * (lux / 10) ** -g : Infinity;
    return dark === undefined ? r : Math.min(r, dark);
  };
  return {
    resistanceOhms: {
      low: at(r10Low, effective * (1 + COUPLING_SPREAD)),
      typical: at(r10Typical, effective),
      high: at(r10High, effective * (1 - COUPLING_SPREAD)),
    },
    illuminanceLux,
    spectralFactor,
  };
}

/**
 * The resistance a photoresistor reaches when an LED at `spacingM` on axis runs at `ledCurrentA`:
 * E = Iv·(I/Itest)/d² (inverse-square law), times the cell's relative response at the LED's peak, then
 * R = R10·(E/10 lx)^(−γ), never above the dark resistance. Low and high carry the cell's light-resistance spread
 * and ±50 % on coupling. Throws a RangeError naming what is missing when no estimate can be made.
 */
export function estimateOptocoupler(input: OptoEstimateInput): OptoEstimate {
  const assumptions: string[] = [];
  const figures = estimate(input, (text) => assumptions.push(text()));
  return { ...figures, assumptions, note: OPTO_ESTIMATE_NOTE };
}

/** estimateOptocoupler's figures alone, the same numbers without the words: for ranking many pairs. */
export function estimateOptocouplerFigures(input: OptoEstimateInput): OptoEstimateFigures {
  return estimate(input, null);
}

/**
 * The gain magnitude an inverting stage reaches with the estimated cell as its input resistor: |G| = Rf/R,
 * so the lowest resistance gives the highest gain.
 */
export function gainRangeFor(estimate: OptoEstimate, feedbackOhms: number): { low: number; typical: number; high: number } {
  const r = estimate.resistanceOhms;
  return { low: feedbackOhms / r.high, typical: feedbackOhms / r.typical, high: feedbackOhms / r.low };
}
