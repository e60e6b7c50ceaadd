import type { BreakdownLine, CandidatePart, PinoutComparison, RankedPair, RankedPairs } from '../alternates';
import type { ParameterValue } from '../families';
import { LIFECYCLES, type Lifecycle, type RohsStatus } from '../parts';
import { estimateOptocoupler, estimateOptocouplerFigures, optoEstimateGaps, type OptoEstimate, type OptoEstimateFigures } from './optocoupler-estimate';
import { rankAlternates } from './rank';
import type { RankOptions } from './types';
import { choice, definition, effectiveRohs, MIN_FIRST, pick, show, TYP_FIRST } from './values';

/**
 * A home-made pair: the LED faces the cell about 5 mm away, in a light-tight sleeve (common practice, no source).
 * The estimate is only as good as this guess, so it is named in every pair's assumptions.
 */
export const PAIR_SPACING_M = 5e-3;
/** The LED current when the original states neither an on-resistance test current nor an LED maximum (common practice, no source). */
export const ASSUMED_DRIVE_CURRENT_A = 10e-3;
/** How many pairs a ranking returns unless told otherwise. */
export const PAIRS_SHOWN = 10;

export interface PairOptions {
  driveCurrentA: number;
  spacingM: number;
}

export type PairResult = { ok: true; part: CandidatePart; estimate: OptoEstimate } | { ok: false; gaps: string[] };

export interface PairDrive {
  currentA: number;
  /** Where the current came from, as a clause: "the current the original's on resistance is stated at". */
  why: string;
  source: 'stated' | 'half-maximum' | 'assumed';
}

export interface UnsuitablePair {
  led: CandidatePart;
  cell: CandidatePart;
  reasons: string[];
}

export interface PairRanking extends RankedPairs {
  unsuitable: UnsuitablePair[];
  driveCurrentA: number;
  spacingM: number;
}

export type PairRankOptions = RankOptions & { limit?: number; spacingM?: number };

// The worse of two: LIFECYCLES runs from active to obsolete; for RoHS an exemption is a step down from compliance
// and an unknown status one more, short of non-compliance.
const ROHS_WORST_LAST: readonly RohsStatus[] = ['compliant', 'exempt', 'unknown', 'non-compliant'];

function worseLifecycle(a: Lifecycle, b: Lifecycle): Lifecycle {
  return LIFECYCLES.indexOf(a) >= LIFECYCLES.indexOf(b) ? a : b;
}

function worseRohs(a: RohsStatus, b: RohsStatus): RohsStatus {
  return ROHS_WORST_LAST.indexOf(a) >= ROHS_WORST_LAST.indexOf(b) ? a : b;
}

const mA = () => definition('led', 'forwardCurrent');
const mm = () => definition('photoresistor', 'cellDiameter');

/** The pair's id: it has no catalog id of its own. */
export function pairId(led: CandidatePart, cell: CandidatePart): string {
  return `${led.id}+${cell.id}`;
}

function describe(options: PairOptions): string {
  return `from ${show(mm(), options.spacingM)} at ${show(mA(), options.driveCurrentA)}`;
}

/** The figures unusable (no light in the cell's band and no dark resistance to stop at), as a gap; else null. */
function unusable(led: CandidatePart, cell: CandidatePart, figures: OptoEstimateFigures): string[] | null {
  const r = figures.resistanceOhms;
  if ([r.low, r.typical, r.high].every(Number.isFinite)) return null;
  return [`no light from ${led.partNumber} reaches the band ${cell.partNumber} responds to, and the cell states no dark resistance`];
}

function pairPart(led: CandidatePart, cell: CandidatePart, driveCurrentA: number, r: OptoEstimateFigures['resistanceOhms'], how: string): CandidatePart {
  const parameters: Record<string, ParameterValue> = {
    onResistance: { typ: r.typical, max: r.high, conditions: { current: driveCurrentA } },
  };
  const dark = pick(cell, 'darkResistance', MIN_FIRST);
  if (dark !== undefined) {
    const off: ParameterValue = { min: dark };
    const time = cell.parameters.darkResistance?.conditions?.time;
    if (time !== undefined) off.conditions = { time };
    parameters.offResistance = off;
  }
  const vf = led.parameters.forwardVoltage;
  if (vf && (vf.typ !== undefined || vf.max !== undefined)) {
    const v: ParameterValue = {};
    if (vf.typ !== undefined) v.typ = vf.typ;
    if (vf.max !== undefined) v.max = vf.max;
    const current = vf.conditions?.current;
    if (current !== undefined) v.conditions = { current };
    parameters.ledForwardVoltage = v;
  }
  const rated = led.parameters.forwardCurrent?.max;
  if (rated !== undefined) parameters.ledMaxCurrent = { max: rated };
  const rise = pick(cell, 'riseTime', TYP_FIRST);
  if (rise !== undefined) parameters.turnOnTime = { typ: rise };
  const decay = pick(cell, 'decayTime', TYP_FIRST);
  if (decay !== undefined) parameters.turnOffTime = { typ: decay };
  const material = choice(cell, 'cellMaterial');
  if (material !== undefined) parameters.cellMaterial = { value: material };

  const sameMaker = led.manufacturer.id === cell.manufacturer.id;
  return {
    id: pairId(led, cell),
    family: 'optocoupler',
    manufacturer: sameMaker ? led.manufacturer : { id: led.manufacturer.id, name: `${led.manufacturer.name} + ${cell.manufacturer.name}` },
    partNumber: `${led.partNumber} + ${cell.partNumber}`,
    description: `${led.partNumber} lighting ${cell.partNumber} ${how}: a home-made optocoupler.`,
    lifecycle: worseLifecycle(led.lifecycle, cell.lifecycle),
    rohsStatus: worseRohs(effectiveRohs(led), effectiveRohs(cell)),
    package: `${led.package.trim() || 'LED'} + ${cell.package.trim() || 'photoresistor'}`,
    pinLayout: null,
    pinMap: {},
    parameters,
  };
}

/**
 * The optocoupler an LED and a photoresistor make together, from their datasheets: on resistance from
 * estimateOptocoupler at the drive current (typical, and its high end as the maximum), off resistance from the
 * cell's dark resistance, turn-on and turn-off from the cell's rise and decay, the LED's ratings as the LED side.
 * Lifecycle and RoHS are the worse of the two parts'. The gaps instead when no estimate can be made.
 */
export function pairAsOptocoupler(led: CandidatePart, cell: CandidatePart, options: PairOptions): PairResult {
  const gaps = optoEstimateGaps(led, cell);
  if (gaps.length > 0) return { ok: false, gaps };
  const estimate = estimateOptocoupler({ led, cell, ledCurrentA: options.driveCurrentA, spacingM: options.spacingM });
  const bad = unusable(led, cell, estimate);
  if (bad) return { ok: false, gaps: bad };
  return { ok: true, part: pairPart(led, cell, options.driveCurrentA, estimate.resistanceOhms, describe(options)), estimate };
}

/**
 * The LED current a pair is estimated at: the current the original's on resistance is stated at, else half its LED
 * maximum (a usual working point, well inside the rating), else an assumed 10 mA.
 */
export function pairDriveCurrent(original: CandidatePart): PairDrive {
  const stated = original.parameters.onResistance?.conditions?.current;
  if (stated !== undefined && stated > 0) return { currentA: stated, source: 'stated', why: "the current the original's on resistance is stated at" };
  const max = original.parameters.ledMaxCurrent?.max;
  if (max !== undefined && max > 0) {
    return {
      currentA: max / 2,
      source: 'half-maximum',
      why: `half the original's ${show(mA(), max)} LED maximum, as it states no current for its on resistance`,
    };
  }
  return {
    currentA: ASSUMED_DRIVE_CURRENT_A,
    source: 'assumed',
    why: 'an assumed drive, as the original states neither a current for its on resistance nor an LED maximum (common practice, no source)',
  };
}

const LAYOUT_SUMMARY = 'Two parts in place of one package, so the board layout changes; never a drop-in.';
const LAYOUT_CLAUSE = 'two parts in place of one package, so the board layout changes; never a drop-in';

export const PAIRS_DROP_IN_NOTE =
  'Drop-in only is on: an LED and a photoresistor are two parts in place of one package, never a drop-in, so no pairs are offered.';

function pairPinout(original: CandidatePart, pair: CandidatePart): PinoutComparison {
  const from = original.package.trim();
  return { class: 'adapter', packageChange: from ? { from, to: pair.package } : null, differingPins: [], summary: LAYOUT_SUMMARY };
}

/** Reasons a pair's LED cannot carry the drive current, or null. */
function driveFailures(led: CandidatePart, driveA: number): string[] | null {
  const rated = led.parameters.forwardCurrent?.max;
  const drive = show(mA(), driveA);
  if (rated === undefined) return [`${led.partNumber} states no rated current, so it cannot be shown to carry the ${drive} drive`];
  if (rated < driveA * (1 - 1e-9)) return [`${led.partNumber} is rated for ${show(mA(), rated)}, below the ${drive} drive current`];
  return null;
}

/** The lines as written for one package, reworded where a pair differs: an estimated on resistance, no package. */
function pairBreakdown(lines: readonly BreakdownLine[]): BreakdownLine[] {
  return lines.map((line) => {
    if (line.criterion === 'pinout' && !line.reason.startsWith(LAYOUT_CLAUSE)) return { ...line, reason: `${LAYOUT_CLAUSE}; ${line.reason}` };
    if (line.criterion === 'onResistance' && line.original !== null && line.candidate !== null) return { ...line, reason: `estimated ${line.reason}` };
    return line;
  });
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/**
 * Every LED with every photoresistor, each pair scored as the optocoupler it would make against `original` with the
 * optocoupler criteria and weights in force (rankAlternates). A pair whose LED is not rated for the drive current,
 * or whose parts leave the estimate without a figure it needs, is turned down with the reason; obsolete pairs follow
 * allowObsolete. A pair is never a drop-in, so requireDropIn offers none. The best `limit` (10) are returned.
 */
export function rankPairs(original: CandidatePart, leds: readonly CandidatePart[], cells: readonly CandidatePart[], options: PairRankOptions): PairRanking {
  if (original.family !== 'optocoupler') throw new RangeError(`LED and photoresistor pairs stand in for an optocoupler, not for ${original.family}`);
  const drive = pairDriveCurrent(original);
  const spacingM = options.spacingM ?? PAIR_SPACING_M;
  const driveText = show(mA(), drive.currentA);
  const spacingText = show(mm(), spacingM);
  if (options.requireDropIn) return { items: [], considered: 0, note: PAIRS_DROP_IN_NOTE, unsuitable: [], driveCurrentA: drive.currentA, spacingM };

  const shared = [
    `The LED is driven at ${driveText}: ${drive.why}.`,
    `The LED sits ${spacingText} from the cell, facing it and shielded from outside light, as in a usual home-made pair (common practice, no source); light falls with the square of the distance, so about 1.4 times as far gives half.`,
  ];
  // Only the figures for every pair; the assumptions are written for the few that are shown.
  const made = new Map<string, { led: CandidatePart; cell: CandidatePart; part: CandidatePart }>();
  const unsuitable: UnsuitablePair[] = [];
  const how = describe({ driveCurrentA: drive.currentA, spacingM });
  let unrated = 0;
  let unestimated = 0;
  for (const led of leds) {
    const failures = led.family === 'led' ? driveFailures(led, drive.currentA) : null;
    for (const cell of cells) {
      const gaps = optoEstimateGaps(led, cell);
      if (failures || gaps.length) {
        unsuitable.push({ led, cell, reasons: [...(failures ?? []), ...gaps] });
        if (failures) unrated++;
        else unestimated++;
        continue;
      }
      const figures = estimateOptocouplerFigures({ led, cell, ledCurrentA: drive.currentA, spacingM });
      const bad = unusable(led, cell, figures);
      if (bad) {
        unsuitable.push({ led, cell, reasons: bad });
        unestimated++;
        continue;
      }
      const part = pairPart(led, cell, drive.currentA, figures.resistanceOhms, how);
      made.set(part.id, { led, cell, part });
    }
  }

  const { equivalents: _rulingsAreForCatalogParts, ...rest } = options;
  const ranked = rankAlternates(
    original,
    [...made.values()].map((m) => m.part),
    { ...rest, requireDropIn: false, pinoutOf: (c) => (made.has(c.id) ? pairPinout(original, c) : undefined) },
  );
  let obsolete = 0;
  for (const u of ranked.unsuitable) {
    const m = made.get(u.part.id)!;
    const old = [m.led, m.cell].filter((p) => p.lifecycle === 'obsolete').map((p) => p.partNumber);
    const reasons = u.reasons.map((r) => (r === 'is obsolete' && old.length ? `${old.join(' and ')} ${old.length === 1 ? 'is' : 'are'} obsolete` : r));
    if (u.reasons.includes('is obsolete')) obsolete++;
    unsuitable.push({ led: m.led, cell: m.cell, reasons });
  }

  const items: RankedPair[] = ranked.items.slice(0, options.limit ?? PAIRS_SHOWN).map((item) => {
    const m = made.get(item.part.id)!;
    const estimate = estimateOptocoupler({ led: m.led, cell: m.cell, ledCurrentA: drive.currentA, spacingM });
    return {
      id: item.part.id,
      led: m.led,
      cell: m.cell,
      partNumber: item.part.partNumber,
      lifecycle: item.part.lifecycle,
      rohsStatus: item.part.rohsStatus,
      score: item.score,
      breakdown: pairBreakdown(item.breakdown),
      pinout: item.pinout,
      driveCurrentA: drive.currentA,
      spacingM,
      estimate: { ...estimate, assumptions: [...shared, ...estimate.assumptions] },
    };
  });

  const considered = leds.length * cells.length;
  const turnedDown = [
    unrated && `${plural(unrated, 'pair')} with an LED not shown to carry ${driveText}`,
    unestimated && `${plural(unestimated, 'pair')} missing a figure the estimate needs`,
    obsolete && `${plural(obsolete, 'pair')} with an obsolete part`,
  ].filter((t): t is string => typeof t === 'string');
  const note = [
    `Each pair is scored as the optocoupler it would make: the LED ${spacingText} from the cell at ${driveText} (${drive.why}), its on resistance estimated from the two datasheets, to confirm on the bench.`,
    turnedDown.length ? `Turned down: ${turnedDown.join('; ')}.` : '',
  ]
    .filter(Boolean)
    .join(' ');
  return { items, considered, note, unsuitable, driveCurrentA: drive.currentA, spacingM };
}
