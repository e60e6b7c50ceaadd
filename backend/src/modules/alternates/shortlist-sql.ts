import {
  CELL_RESPONSE_FWHM_M,
  getFamily,
  LIFECYCLE_SCORES,
  ROHS_SCORES,
  type CandidatePart,
  type DerivedNeed,
  type FamilyKey,
  type PositionRequirements,
  type Weights,
} from '@understudy/shared-types';
import { columnsFor } from '../parts/parameter-index-sql';

/**
 * The engine scores every candidate it is given exactly, but a family can hold 20,000 parts and reading all of their
 * JSON documents costs far more than the answer is worth. So SQL orders the candidates by their closeness to the
 * original in two steps, and the engine scores the best few hundred of that order:
 *  - `indexed` terms read only the generated columns and the plain columns the covering shortlist index holds, so
 *    every candidate is weighed by an index-only scan;
 *  - `heap` terms read the JSON document (features, choices, a taper the engine would refuse) and so are added only
 *    for the nearest couple of thousand.
 * The terms follow the engine's curves, in the engine's units (weight × loss), where the columns allow, and are
 * rougher where they do not (a slot the column does not read first, pin functions); the test beside this file checks
 * that the shortlist keeps the engine's own top of the list. A criterion with no hint is left to the engine.
 */

export interface Closeness {
  indexed: string;
  heap: string | null;
}

type Curve = 'more' | 'less' | 'near-log' | 'near-linear';

type Hint =
  /** `first`: the slot the engine reads first when it is not typ (the generated column reads typ first). */
  | { kind: 'numeric'; param: string; curve: Curve; scale: number; first?: 'min' | 'max' }
  /** A min..max range compared by its geometric centre on a log scale (light resistance). */
  | { kind: 'log-range'; param: string }
  | { kind: 'supply' }
  | { kind: 'spectral' }
  | { kind: 'pinout' }
  | { kind: 'lifecycle' }
  | { kind: 'rohs' }
  /** A feature the original has and a candidate may lose (a boolean parameter). Read from the document. */
  | { kind: 'feature'; param: string }
  /** The same choice or not (an enum parameter). Read from the document. */
  | { kind: 'choice'; param: string };

const COMMON = { lifecycle: { kind: 'lifecycle' }, rohs: { kind: 'rohs' } } as const satisfies Record<string, Hint>;

/** Criterion key → how SQL can approximate it. Keys are the engine's criteria (criteriaFor). */
const HINTS: Record<FamilyKey, Record<string, Hint>> = {
  'op-amp': {
    supply: { kind: 'supply' },
    singleSupply: { kind: 'feature', param: 'singleSupply' },
    railToRailInput: { kind: 'feature', param: 'railToRailInput' },
    railToRailOutput: { kind: 'feature', param: 'railToRailOutput' },
    slewRate: { kind: 'numeric', param: 'slewRate', curve: 'more', scale: 1 },
    gainBandwidth: { kind: 'numeric', param: 'gainBandwidth', curve: 'more', scale: 1 },
    noise: { kind: 'numeric', param: 'inputNoiseDensity', curve: 'less', scale: 1 },
    offsetVoltage: { kind: 'numeric', param: 'inputOffsetVoltage', curve: 'less', scale: 1 },
    biasCurrent: { kind: 'numeric', param: 'inputBiasCurrent', curve: 'less', scale: 3 },
    outputCurrent: { kind: 'numeric', param: 'outputCurrent', curve: 'more', scale: 1 },
    pinout: { kind: 'pinout' },
    ...COMMON,
  },
  photoresistor: {
    darkResistance: { kind: 'numeric', param: 'darkResistance', curve: 'more', scale: 1, first: 'min' },
    lightResistance: { kind: 'log-range', param: 'lightResistance' },
    gamma: { kind: 'numeric', param: 'gamma', curve: 'near-linear', scale: 0.5 },
    riseTime: { kind: 'numeric', param: 'riseTime', curve: 'near-log', scale: 1 },
    decayTime: { kind: 'numeric', param: 'decayTime', curve: 'near-log', scale: 1 },
    spectralPeak: { kind: 'spectral' },
    ...COMMON,
  },
  led: {
    peakWavelength: { kind: 'numeric', param: 'peakWavelength', curve: 'near-linear', scale: 50e-9 },
    forwardVoltage: { kind: 'numeric', param: 'forwardVoltage', curve: 'near-linear', scale: 1 },
    forwardCurrent: { kind: 'numeric', param: 'forwardCurrent', curve: 'more', scale: 1, first: 'max' },
    luminousIntensity: { kind: 'numeric', param: 'luminousIntensity', curve: 'near-log', scale: 1 },
    viewingAngle: { kind: 'numeric', param: 'viewingAngle', curve: 'near-linear', scale: 60 },
    ...COMMON,
  },
  potentiometer: {
    resistance: { kind: 'numeric', param: 'resistance', curve: 'near-log', scale: 0.5 },
    tolerance: { kind: 'numeric', param: 'tolerance', curve: 'less', scale: Math.log10(4) },
    powerRating: { kind: 'numeric', param: 'powerRating', curve: 'more', scale: Math.log10(4), first: 'max' },
    bodySize: { kind: 'numeric', param: 'bodySize', curve: 'near-linear', scale: 8e-3 },
    shaftType: { kind: 'choice', param: 'shaftType' },
    mounting: { kind: 'choice', param: 'mounting' },
    ...COMMON,
  },
  optocoupler: {
    onResistance: { kind: 'numeric', param: 'onResistance', curve: 'near-log', scale: 1 },
    offResistance: { kind: 'numeric', param: 'offResistance', curve: 'more', scale: 1, first: 'min' },
    turnOnTime: { kind: 'numeric', param: 'turnOnTime', curve: 'near-log', scale: 1 },
    turnOffTime: { kind: 'numeric', param: 'turnOffTime', curve: 'near-log', scale: 1 },
    ledMaxCurrent: { kind: 'numeric', param: 'ledMaxCurrent', curve: 'more', scale: 1, first: 'max' },
    pinout: { kind: 'pinout' },
    ...COMMON,
  },
};

/** A count that must match the original's (a hard requirement): it leads the family's shortlist index. */
export const COUNT_PARAMETER: Partial<Record<FamilyKey, string>> = { 'op-amp': 'channels', potentiometer: 'gangs' };

/** Adds a bound parameter and returns its placeholder; every number and text from a request travels this way. */
export type Bind = (value: unknown) => string;

function column(family: FamilyKey, param: string, role: 'rep' | 'min' | 'max'): string | undefined {
  const def = getFamily(family).parameters.find((p) => p.key === param);
  const c = def ? columnsFor(def).find((x) => x.role === role) : undefined;
  return c ? `p.${c.name}` : undefined;
}

/** The same reading as the generated column (typ, else min, else max), or the engine's when `first` is set. */
function representative(part: CandidatePart, param: string, first?: 'min' | 'max'): number | undefined {
  const v = part.parameters[param];
  if (first === 'min') return v?.min ?? v?.typ ?? v?.max;
  if (first === 'max') return v?.max ?? v?.typ ?? v?.min;
  return v?.typ ?? v?.min ?? v?.max;
}

/** Whether the generated column reads the slot the engine reads: always, unless the parameter has several slots. */
function columnReadsAsEngine(family: FamilyKey, hint: Extract<Hint, { kind: 'numeric' }>): boolean {
  const slots = getFamily(family).parameters.find((p) => p.key === hint.param)?.slots ?? [];
  return !hint.first || slots.length <= 1;
}

/** The engine's reading of a numeric parameter from the document, for a slot order the column does not follow. */
function documentValue(param: string, first: 'min' | 'max'): string {
  const slot = (name: string) => `(p.parameters->'${param}'->>'${name}')::float8`;
  const order = first === 'min' ? ['min', 'typ', 'max'] : ['max', 'typ', 'min'];
  return `coalesce(${order.map(slot).join(', ')})`;
}

/** A number as a float8 literal: numeric literals would drag every term into slow numeric arithmetic. */
const f8 = (n: number) => `${n}::float8`;

/** e^(−x) for x ≥ 0; PostgreSQL raises an underflow error past e^(−745), where this is 0 to any purpose anyway. */
const expNeg = (x: string) => `exp(-least(${x}, ${f8(50)}))`;

/** SQL for a lookup table (lifecycle or RoHS scores): weight × (1 − score). */
function tableLoss(columnSql: string, scores: Record<string, number>, weight: number): string {
  return `(CASE ${columnSql} ${Object.entries(scores).map(([k, s]) => `WHEN '${k}' THEN ${f8(weight * (1 - s))}`).join(' ')} ELSE ${f8(weight / 2)} END)`;
}

/**
 * A part that does not state a value loses half the weight, as in the engine. Tested first and explicitly: least()
 * and greatest() skip NULLs, so a NULL inside them would pass for a perfect match.
 */
const unlessMissing = (columns: string[], weight: number, loss: string) =>
  `(CASE WHEN ${columns.map((c) => `${c} IS NULL`).join(' OR ')} THEN ${f8(weight / 2)} ELSE ${loss} END)`;

/**
 * weight × the engine's loss on one curve, with the constants folded in, since this runs once per candidate per
 * criterion. log() of a value ≤ 0 is kept finite, and then scores as the engine scores it (all lost, or none for
 * 'less').
 */
function curveLoss(curve: Curve, c: string, o: number, scale: number, weight: number, bind: Bind): string {
  const k = bind(weight / scale);
  const w = f8(weight);
  const logC = `log(greatest(${c}, ${f8(1e-300)}))`;
  const capped = (x: string) => `least(${w}, greatest(${f8(0)}, ${x}))`;
  const loss =
    curve === 'more'
      ? capped(`(${bind(Math.log10(o))} - ${logC}) * ${k}`)
      : curve === 'less'
        ? capped(`(${logC} - ${bind(Math.log10(o))}) * ${k}`)
        : curve === 'near-log'
          ? `least(${w}, abs(${logC} - ${bind(Math.log10(o))}) * ${k})`
          : `least(${w}, abs(${c} - ${bind(o)}) * ${k})`;
  return unlessMissing([c], weight, loss);
}

export interface ShortlistContext {
  original: CandidatePart;
  weights: Weights;
  operatingSupply?: { min: number; max: number };
  pairedLed?: CandidatePart;
  requireDropIn: boolean;
}

/** Σ weight × loss over the criteria SQL can read; lower is closer. Terms the original cannot anchor drop out. */
export function alternatesCloseness(ctx: ShortlistContext, bind: Bind): Closeness {
  const { original } = ctx;
  const indexed: string[] = [];
  const heap: string[] = [];
  for (const [key, hint] of Object.entries(HINTS[original.family])) {
    const weight = ctx.weights[key] ?? 0;
    if (!(weight > 0)) continue;
    if (hint.kind === 'feature' || hint.kind === 'choice') {
      const term = documentLoss(original, hint, weight, bind);
      if (term) heap.push(term);
      continue;
    }
    if (hint.kind === 'numeric' && !columnReadsAsEngine(original.family, hint)) {
      // Read from the document in the engine's slot order; the indexed order simply leaves it out.
      const o = representative(original, hint.param, hint.first);
      if (o !== undefined && (hint.curve === 'near-linear' || o > 0)) heap.push(curveLoss(hint.curve, documentValue(hint.param, hint.first!), o, hint.scale, weight, bind));
      continue;
    }
    const term = lossFor(ctx, hint, weight, bind);
    if (term) indexed.push(term);
  }
  // The pinout: the shared layout is in the index; a pin map only in the document.
  const pinWeight = HINTS[original.family].pinout ? (ctx.weights.pinout ?? 0) : 0;
  // A drop-in requirement puts parts with the original's pins first (the engine still decides).
  for (const weight of [pinWeight, ctx.requireDropIn ? REFUSED * 2 : 0]) {
    if (!(weight > 0)) continue;
    const terms = pinTerms(original, weight, bind);
    if (terms.indexed) indexed.push(terms.indexed);
    if (terms.heap) heap.push(terms.heap);
  }
  // A pot of another taper is refused by the engine: last in the order, so it does not crowd the shortlist.
  const taper = original.family === 'potentiometer' ? original.parameters.taper?.value : undefined;
  if (typeof taper === 'string') heap.push(`(CASE WHEN coalesce(p.parameters->'taper'->>'value', ${bind(taper)}) = ${bind(taper)} THEN ${f8(0)} ELSE ${f8(REFUSED)} END)`);
  return { indexed: indexed.length ? indexed.join(' + ') : f8(0), heap: heap.length ? heap.join(' + ') : null };
}

/** Added for what the engine would refuse outright, so it sorts after everything it would rank. */
const REFUSED = 1000;

/** A feature lost costs the whole weight and one not stated half (keepsFeature); a choice likewise (sameChoice). */
function documentLoss(original: CandidatePart, hint: Extract<Hint, { kind: 'feature' | 'choice' }>, weight: number, bind: Bind): string | undefined {
  const value = original.parameters[hint.param]?.value;
  const field = `p.parameters->'${hint.param}'->>'value'`;
  if (hint.kind === 'feature') {
    if (value !== true) return undefined;
    return `(CASE ${field} WHEN 'true' THEN ${f8(0)} WHEN 'false' THEN ${f8(weight)} ELSE ${f8(weight / 2)} END)`;
  }
  if (typeof value !== 'string') return undefined;
  return `(CASE WHEN ${field} IS NULL THEN ${f8(weight / 2)} WHEN ${field} = ${bind(value)} THEN ${f8(0)} ELSE ${f8(weight)} END)`;
}

/**
 * weight × 0 for the original's pins, weight / 2 otherwise (the engine's "adapter or unknown"; it tells those apart
 * itself). The shared layout is compared in the index; a part that names none but records the same pin map is
 * given its half back from the document.
 */
function pinTerms(original: CandidatePart, weight: number, bind: Bind): { indexed?: string; heap?: string } {
  const map = Object.keys(original.pinMap).length ? `${bind(JSON.stringify(original.pinMap))}::jsonb` : undefined;
  const half = f8(weight / 2);
  if (original.pinLayout) {
    const layout = bind(original.pinLayout);
    return {
      indexed: `(CASE WHEN p.pin_layout = ${layout} THEN ${f8(0)} ELSE ${half} END)`,
      ...(map ? { heap: `(CASE WHEN p.pin_layout IS DISTINCT FROM ${layout} AND p.pin_map = ${map} THEN -${half} ELSE ${f8(0)} END)` } : {}),
    };
  }
  return map ? { heap: `(CASE WHEN p.pin_map = ${map} THEN ${f8(0)} ELSE ${half} END)` } : {};
}

function lossFor(ctx: ShortlistContext, hint: Hint, weight: number, bind: Bind): string | undefined {
  const { original } = ctx;
  const family = original.family;
  const w = f8(weight);
  switch (hint.kind) {
    case 'numeric': {
      const c = column(family, hint.param, 'rep');
      const o = representative(original, hint.param);
      if (!c || o === undefined || (hint.curve !== 'near-linear' && !(o > 0))) return undefined;
      return curveLoss(hint.curve, c, o, hint.scale, weight, bind);
    }
    case 'log-range': {
      const lo = column(family, hint.param, 'min');
      const hi = column(family, hint.param, 'max');
      const v = original.parameters[hint.param];
      const oMin = v?.min ?? v?.max;
      const oMax = v?.max ?? v?.min;
      if (!lo || !hi || !(oMin! > 0) || !(oMax! > 0)) return undefined;
      // The engine's logRangeMatch, in decades: half from how far apart the centres are (all of it at a decade),
      // half from how much of the original's range the candidate's covers.
      const oLo = Math.log10(oMin!);
      const oHi = Math.log10(oMax!);
      const cLo = `log(greatest(coalesce(${lo}, ${hi}), ${f8(1e-300)}))`;
      const cHi = `log(greatest(coalesce(${hi}, ${lo}), ${f8(1e-300)}))`;
      const apart = `least(${f8(1)}, abs((${cLo} + ${cHi}) / 2 - ${bind((oLo + oHi) / 2)}))`;
      const covered =
        oHi - oLo <= 1e-9 * Math.max(1, Math.abs(oHi))
          ? `(CASE WHEN ${cLo} <= ${bind(oLo + 1e-9)} AND ${cHi} >= ${bind(oHi - 1e-9)} THEN ${f8(1)} ELSE ${f8(0)} END)`
          : `least(${f8(1)}, greatest(${f8(0)}, (least(${cHi}, ${bind(oHi)}) - greatest(${cLo}, ${bind(oLo)})) * ${bind(1 / (oHi - oLo))}))`;
      return `(CASE WHEN ${lo} IS NULL AND ${hi} IS NULL THEN ${f8(weight / 2)} ELSE ${f8(weight / 2)} * (${apart} + ${f8(1)} - ${covered}) END)`;
    }
    case 'supply': {
      const own = original.parameters.supplyVoltage;
      const target = ctx.operatingSupply ?? (typeof own?.min === 'number' && typeof own.max === 'number' ? { min: own.min, max: own.max } : undefined);
      const lo = column(family, 'supplyVoltage', 'min');
      const hi = column(family, 'supplyVoltage', 'max');
      if (!target || !lo || !hi) return undefined;
      const width = target.max - target.min;
      if (width <= 1e-9) return unlessMissing([lo, hi], weight, `(CASE WHEN ${lo} <= ${bind(target.min)} AND ${hi} >= ${bind(target.max)} THEN ${f8(0)} ELSE ${w} END)`);
      // 1 − the share of the target range the candidate's range covers.
      const covered = `(least(${hi}, ${bind(target.max)}) - greatest(${lo}, ${bind(target.min)})) * ${bind(weight / width)}`;
      return unlessMissing([lo, hi], weight, `${w} - least(${w}, greatest(${f8(0)}, ${covered}))`);
    }
    case 'spectral': {
      const c = column(family, 'peakWavelength', 'rep');
      const reference = (ctx.pairedLed && representative(ctx.pairedLed, 'peakWavelength')) ?? representative(original, 'peakWavelength');
      if (!c || reference === undefined) return undefined;
      // weight × (1 − the engine's bell curve), exp(−4·ln2·(Δ/FWHM)²).
      return unlessMissing([c], weight, `${w} * (1 - ${expNeg(`${f8(4 * Math.LN2)} * power((${c} - ${bind(reference)}) / ${f8(CELL_RESPONSE_FWHM_M)}, 2)`)})`);
    }
    case 'pinout':
      return undefined; // pinTerms
    case 'lifecycle':
      return tableLoss('p.lifecycle', LIFECYCLE_SCORES, weight);
    case 'rohs':
      return original.rohsStatus === 'non-compliant' ? undefined : tableLoss('p.rohs_status', ROHS_SCORES, weight);
  }
}

// ---------------------------------------------------------------------------------------------------------------
// Positions: margins beyond each need, on the engine's saturating curve, which loses 0.5·e^(−margin/scale).

/** Need key → the column it reads, its weight and margin scale in the engine's position ranking. */
const NEED_HINTS: Record<string, { param: string; weight: number; scale: number }> = {
  slewRate: { param: 'slewRate', weight: 2, scale: 1 },
  outputCurrent: { param: 'outputCurrent', weight: 2, scale: 1 },
  forwardCurrent: { param: 'forwardCurrent', weight: 2, scale: 1 },
  maxVoltage: { param: 'maxVoltage', weight: 1, scale: 1 },
};

/** weight × 0.5·e^(−margin/scale), or half the weight for a value not stated. */
const saturatingLoss = (columns: string[], margin: string, scale: number, weight: number) =>
  unlessMissing(columns, weight, `${f8(weight / 2)} * ${expNeg(`greatest(${f8(0)}, ${margin}) * ${f8(1 / scale)}`)}`);

export function positionCloseness(req: PositionRequirements, needs: readonly DerivedNeed[], bind: Bind): Closeness {
  const family = req.family;
  const terms: string[] = [tableLoss('p.lifecycle', LIFECYCLE_SCORES, 1), tableLoss('p.rohs_status', ROHS_SCORES, 1)];
  const heap: string[] = [];
  for (const need of needs) {
    // Pass-or-fail needs on a feature: a part without it is refused, so it goes last.
    const feature = need.key === 'singleSupply' ? 'singleSupply' : need.key === 'outputSwing' && need.value.typ! > 0 ? 'railToRailOutput' : undefined;
    if (feature) {
      heap.push(`(CASE WHEN p.parameters->'${feature}'->>'value' = 'true' THEN ${f8(0)} ELSE ${f8(REFUSED)} END)`);
      continue;
    }
    if (need.key === 'supply' && family === 'op-amp') {
      const v = need.value;
      const margin = `least(${bind(v.min)} - p.n_supply_voltage_min, p.n_supply_voltage_max - ${bind(v.max)})`;
      terms.push(saturatingLoss(['p.n_supply_voltage_min', 'p.n_supply_voltage_max'], margin, 2, 2));
      continue;
    }
    if (need.key === 'resistanceRange' && family === 'photoresistor') {
      const lit = `coalesce(p.n_light_resistance_max, p.n_light_resistance_min)`;
      const margin = `least(${bind(need.value.min)} / nullif(${lit}, 0), p.n_dark_resistance / ${bind(need.value.max)}) - 1`;
      terms.push(saturatingLoss([lit, 'p.n_dark_resistance'], margin, 1, 3));
      continue;
    }
    const hint = NEED_HINTS[need.key];
    const c = hint && column(family, hint.param, 'rep');
    if (!hint || !c || !(need.value.min! > 0)) continue;
    terms.push(saturatingLoss([c], `${c} * ${bind(1 / need.value.min!)} - 1`, hint.scale, hint.weight));
  }
  return { indexed: terms.join(' + '), heap: heap.length ? heap.join(' + ') : null };
}
