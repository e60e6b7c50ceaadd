import type {
  CandidatePart,
  DerivedNeed,
  EquivalentDto,
  Margin,
  PositionMatch,
  PositionRequirements,
  PositionResults,
  Unsuitable,
} from '../alternates';
import { FAMILIES, PIN_LAYOUTS, type ParameterDefinition } from '../families';
import { LIFECYCLE_LABELS, ROHS_LABELS } from '../parts';
import { formatQuantity } from '../units';
import { LIFECYCLE_SCORES, marginScore, round1, ROHS_SCORES } from './curves';
import { dividerVoltage, ledCurrent, requiredSlewRate, resistanceRangeForGain } from './formulas';
import { byPartNumber, sortByScore } from './sort';
import { definition, effectiveRohs, flag, lower, MAX_FIRST, memoShow, MIN_FIRST, pick, rangeOf, show, showRange, TYP_FIRST, type Slot } from './values';

/** Outputs that are not rail-to-rail usually stop this far short of each rail (common practice). */
export const NON_RAIL_TO_RAIL_HEADROOM_V = 1.5;

const volts = (v: number) => formatQuantity(v, 'V');
const amps = (v: number) => formatQuantity(v, 'A', { displayUnit: 'mA' });
const ohms = (v: number) => formatQuantity(v, 'Ω');
const slew = (v: number) => formatQuantity(v, 'V/s', { displayUnit: 'V/µs' });

function biasOf(req: PositionRequirements): number | undefined {
  const s = req.supply;
  if (!s) return undefined;
  // A dual supply's signal sits at ground, the middle of the span; a single one's only where a divider puts it.
  if (s.kind === 'dual' || s.halfSupplyBias) return dividerVoltage(s.volts, 1, 1);
  return undefined;
}

/** The quantities a position's requirements imply, each with its formula and a plain explanation. */
export function deriveNeeds(req: PositionRequirements): DerivedNeed[] {
  const needs: DerivedNeed[] = [];
  const { family, supply, signal, ledLoad, invertingGain } = req;

  if (family === 'op-amp' && supply) {
    const dual = supply.kind === 'dual';
    needs.push({
      key: 'supply',
      label: 'Supply span',
      value: { min: supply.volts, max: supply.volts },
      unit: 'V',
      formula: dual ? 'span = V+ − V−' : 'span = V+ − 0 V',
      explanation: dual
        ? `A ±${volts(supply.volts / 2)} supply is ${volts(supply.volts)} between the rails: the part's supply range must include ${volts(supply.volts)}.`
        : `A ${volts(supply.volts)} single supply: the part's supply range must include ${volts(supply.volts)}.`,
    });
    if (!dual) {
      needs.push({
        key: 'singleSupply',
        label: 'Single-supply operation',
        value: { value: true },
        unit: '',
        formula: 'V− = 0 V',
        explanation: 'The negative rail is ground, so the part must work from a single supply.',
      });
    }
    if (supply.halfSupplyBias) {
      const bias = biasOf(req)!;
      needs.push({
        key: 'bias',
        label: 'Bias point',
        value: { typ: bias },
        unit: 'V',
        formula: 'Vbias = Vs·R2 / (R1 + R2) = Vs / 2',
        explanation: `Two equal resistors bias the signal at ${volts(bias)}, half the supply; the inputs and output idle there.`,
      });
    }
  }

  if (family === 'op-amp' && signal) {
    const sr = requiredSlewRate(signal.peakVolts, signal.frequencyHz);
    needs.push({
      key: 'slewRate',
      label: 'Slew rate',
      value: { min: sr },
      unit: 'V/s',
      formula: 'SR = 2π·f·Vpeak',
      explanation: `${volts(signal.peakVolts)} peak at ${formatQuantity(signal.frequencyHz, 'Hz')} needs at least ${slew(sr)} to stay undistorted.`,
    });
    const bias = biasOf(req);
    if (supply && bias !== undefined) {
      const headroom = Math.min(bias, supply.volts - bias) - signal.peakVolts;
      if (headroom < NON_RAIL_TO_RAIL_HEADROOM_V) {
        needs.push({
          key: 'outputSwing',
          label: 'Output swing',
          value: { typ: headroom },
          unit: 'V',
          formula: 'headroom = Vbias − Vpeak',
          explanation:
            headroom <= 0
              ? `A ${volts(signal.peakVolts)} peak around ${volts(bias)} goes past the rails of a ${volts(supply.volts)} supply: no op amp swings beyond its rails.`
              : `The output comes within ${volts(headroom)} of each rail (${volts(bias)} − ${volts(signal.peakVolts)} peak); outputs that are not rail-to-rail usually stop ${volts(NON_RAIL_TO_RAIL_HEADROOM_V)} or more short, so it needs a rail-to-rail output.`,
        });
      }
    }
  }

  if (ledLoad && (family === 'op-amp' || family === 'led')) {
    const i = ledCurrent(ledLoad.outputVolts, ledLoad.forwardVolts, ledLoad.seriesOhms);
    const sum = `(${volts(ledLoad.outputVolts)} − ${volts(ledLoad.forwardVolts)}) / ${ohms(ledLoad.seriesOhms)}`;
    needs.push({
      key: family === 'op-amp' ? 'outputCurrent' : 'forwardCurrent',
      label: family === 'op-amp' ? 'Output current' : 'Rated current',
      value: { min: i },
      unit: 'A',
      formula: 'I = (Vout − Vf) / R',
      explanation:
        i === 0
          ? `The output (${volts(ledLoad.outputVolts)}) does not reach the LED's forward voltage (${volts(ledLoad.forwardVolts)}), so the LED stays dark and draws no current.`
          : family === 'op-amp'
            ? `${sum} = ${amps(i)}: the output must source at least that.`
            : `${sum} = ${amps(i)}: the LED must be rated for at least that.`,
    });
  }

  if (family === 'photoresistor' && invertingGain) {
    const r = resistanceRangeForGain(invertingGain.feedbackOhms, invertingGain.gainMin, invertingGain.gainMax);
    needs.push({
      key: 'resistanceRange',
      label: 'Resistance range',
      value: { min: r.min, max: r.max },
      unit: 'Ω',
      formula: 'R = Rf / |G|',
      explanation: `Gain ${invertingGain.gainMin} to ${invertingGain.gainMax} with ${ohms(invertingGain.feedbackOhms)} feedback needs the cell to reach ${ohms(r.min)} lit and ${ohms(r.max)} dark.`,
    });
  }

  if (family === 'photoresistor' && supply) {
    needs.push({
      key: 'maxVoltage',
      label: 'Maximum voltage',
      value: { min: supply.volts },
      unit: 'V',
      formula: 'Vmax ≥ Vs',
      explanation: `Across a ${volts(supply.volts)} supply the cell may see all of it, so it must be rated for at least ${volts(supply.volts)}.`,
    });
  }

  if (req.requirePinLayout) {
    const layout = (PIN_LAYOUTS as Record<string, { label: string }>)[req.requirePinLayout];
    needs.push({
      key: 'pinLayout',
      label: 'Pin layout',
      value: { value: req.requirePinLayout },
      unit: '',
      formula: 'as required',
      explanation: `The board takes the ${layout?.label ?? req.requirePinLayout} layout.`,
    });
  }
  return needs;
}

/** How a part meets a need, in numbers only; the words come later, for the lines someone reads. */
interface Measure {
  ok: boolean;
  /** actual/needed − 1, volts of headroom, a table score for lifecycle and RoHS; null where none applies. */
  margin: number | null;
}

/** One need, ready to check many candidates cheaply and to explain the few that are shown. */
interface Check {
  weight: number;
  /** Scale of margin that closes most of the gap to full marks (marginScore). */
  scale: number;
  /** Whether `margin` is already a 0..1 score (lifecycle, RoHS) rather than a margin to saturate. */
  tabled?: boolean;
  measure(c: CandidatePart): Measure;
  /** The reason alone, for the unsuitable list: cheaper than the whole line. */
  reason(c: CandidatePart, m: Measure): string;
  explain(c: CandidatePart, m: Measure): Margin;
}

const UNMET: Measure = { ok: false, margin: null };
const MET: Measure = { ok: true, margin: null };

function atLeast(need: DerivedNeed, param: string, order: readonly Slot[], def: ParameterDefinition, weight: number, verb: string): Check {
  const needed = need.value.min!;
  const neededText = show(def, needed);
  const name = lower(need.label);
  const reason = (c: CandidatePart, m: Measure): string => {
    const v = pick(c, param, order);
    if (v === undefined) return `states no ${name}, so it cannot be shown to ${verb} ${neededText}`;
    const vs = show(def, v);
    if (needed === 0) return `nothing is needed here; it has ${vs}`;
    return m.ok ? `${name} ${vs} is ${Number((v / needed).toPrecision(2))}× the ${neededText} needed` : `${name} ${vs} is short of the ${neededText} needed`;
  };
  return {
    weight,
    scale: 1,
    measure(c) {
      const v = pick(c, param, order);
      if (v === undefined) return UNMET;
      if (needed === 0) return MET;
      const margin = v / needed - 1;
      return { ok: margin >= 0, margin };
    },
    reason,
    explain(c, m) {
      const v = pick(c, param, order);
      const actual = v === undefined ? null : show(def, v);
      return { need: need.key, label: need.label, needed: `at least ${neededText}`, actual, margin: m.margin, ok: m.ok, reason: reason(c, m) };
    },
  };
}

function mustHave(need: DerivedNeed, param: string, has: string, lacks: string): Check {
  const unknown = `does not say whether it is ${has}`;
  const reason = (c: CandidatePart) => {
    const v = flag(c, param);
    return v === undefined ? unknown : v ? has : lacks;
  };
  return {
    weight: 0,
    scale: 1,
    measure: (c) => (flag(c, param) === true ? MET : UNMET),
    reason,
    explain(c, m) {
      const v = flag(c, param);
      return { need: need.key, label: need.label, needed: has, actual: v === undefined ? null : v ? 'yes' : 'no', margin: null, ok: m.ok, reason: reason(c) };
    },
  };
}

function supplyCheck(need: DerivedNeed): Check {
  const def = definition('op-amp', 'supplyVoltage');
  const min = need.value.min!;
  const max = need.value.max!;
  const neededText = showRange(def, min, max);
  // Supply limits repeat across a catalog (5 V, 36 V), so their text is memoised.
  const v = memoShow(def);
  const rangeText = (r: { min: number; max: number }) => (r.min === r.max ? v(r.min) : `${v(r.min)} to ${v(r.max)}`);
  const reason = (c: CandidatePart, m: Measure): string => {
    const r = rangeOf(c, 'supplyVoltage');
    if (!r) return `states no supply range, so it cannot be shown to run on ${neededText}`;
    const below = min - r.min;
    return m.ok
      ? `supply range ${rangeText(r)} covers ${neededText} with ${volts(below)} to spare below and ${volts(r.max - max)} above`
      : `supply range ${rangeText(r)} does not ${below < 0 ? 'reach down' : 'reach up'} to ${neededText}`;
  };
  return {
    weight: 2,
    scale: 2,
    measure(c) {
      const r = c.parameters.supplyVoltage;
      if (r === undefined || typeof r.min !== 'number' || typeof r.max !== 'number') return UNMET;
      const margin = Math.min(min - r.min, r.max - max);
      return { ok: margin >= -1e-9, margin };
    },
    reason,
    explain(c, m) {
      const r = rangeOf(c, 'supplyVoltage');
      return { need: need.key, label: need.label, needed: neededText, actual: r ? rangeText(r) : null, margin: m.margin, ok: m.ok, reason: reason(c, m) };
    },
  };
}

function resistanceRangeCheck(need: DerivedNeed): Check {
  const lo = need.value.min!;
  const hi = need.value.max!;
  const neededText = `${ohms(lo)} to ${ohms(hi)}`;
  const decades = (x: number) => {
    const d = Number(Math.abs(Math.log10(x)).toPrecision(2));
    return `${d} decade${d === 1 ? '' : 's'}`;
  };
  // Worst cases: the highest a cell may sit at 10 lx, the lowest it may fall to in the dark.
  const lit = (c: CandidatePart) => pick(c, 'lightResistance', MAX_FIRST);
  const dark = (c: CandidatePart) => pick(c, 'darkResistance', MIN_FIRST);
  const reason = (c: CandidatePart, m: Measure): string => {
    const l = lit(c);
    const d = dark(c);
    if (l === undefined || d === undefined) return `states no ${l === undefined ? 'light' : 'dark'} resistance, so its range cannot be checked`;
    if (!m.ok) {
      const why = lo / l < 1 ? `at 10 lx it sits at up to ${ohms(l)}, above the ${ohms(lo)} needed` : `in the dark it may fall to ${ohms(d)}, below the ${ohms(hi)} needed`;
      return `its range does not span ${neededText}: ${why}`;
    }
    return `spans ${neededText} with ${decades(lo / l)} to spare lit and ${decades(d / hi)} dark (light resistance at 10 lx; brighter light goes lower)`;
  };
  return {
    weight: 3,
    scale: 1,
    measure(c) {
      const l = lit(c);
      const d = dark(c);
      if (l === undefined || d === undefined) return UNMET;
      const margin = Math.min(lo / l, d / hi) - 1;
      return { ok: margin >= -1e-9, margin };
    },
    reason,
    explain(c, m) {
      const l = lit(c);
      const d = dark(c);
      const actual = l === undefined || d === undefined ? null : `${ohms(l)} at 10 lx to ${ohms(d)} dark`;
      return { need: need.key, label: need.label, needed: neededText, actual, margin: m.margin, ok: m.ok, reason: reason(c, m) };
    },
  };
}

function pinLayoutCheck(need: DerivedNeed): Check {
  const want = String(need.value.value);
  const label = (key: string) => (PIN_LAYOUTS as Record<string, { label: string }>)[key]?.label ?? key;
  const reason = (c: CandidatePart, m: Measure): string =>
    m.ok ? `${label(want)}, as required` : c.pinLayout ? `${label(c.pinLayout)}, not the ${label(want)} required` : 'records no shared pin layout';
  return {
    weight: 0,
    scale: 1,
    measure: (c) => (c.pinLayout === want ? MET : UNMET),
    reason,
    explain: (c, m) => ({
      need: need.key,
      label: need.label,
      needed: label(want),
      actual: c.pinLayout ? label(c.pinLayout) : null,
      margin: null,
      ok: m.ok,
      reason: reason(c, m),
    }),
  };
}

function checksFor(req: PositionRequirements, needs: readonly DerivedNeed[]): Check[] {
  const checks: Check[] = [];
  for (const need of needs) {
    switch (need.key) {
      case 'supply':
        checks.push(supplyCheck(need));
        break;
      case 'singleSupply':
        checks.push(mustHave(need, 'singleSupply', 'single-supply capable', 'not single-supply capable'));
        break;
      case 'slewRate':
        checks.push(atLeast(need, 'slewRate', TYP_FIRST, definition('op-amp', 'slewRate'), 2, 'reach'));
        break;
      case 'outputSwing': {
        const headroom = need.value.typ!;
        if (headroom <= 0) {
          checks.push({
            weight: 0,
            scale: 1,
            measure: () => UNMET,
            reason: () => need.explanation,
            explain: () => ({ need: need.key, label: need.label, needed: 'a swing beyond the rails', actual: null, margin: null, ok: false, reason: need.explanation }),
          });
        } else {
          checks.push(mustHave(need, 'railToRailOutput', 'rail-to-rail output', `not rail-to-rail at the output, and the signal comes within ${volts(headroom)} of the rails`));
        }
        break;
      }
      case 'outputCurrent':
        checks.push(atLeast(need, 'outputCurrent', TYP_FIRST, definition('op-amp', 'outputCurrent'), 2, 'deliver'));
        break;
      case 'forwardCurrent':
        checks.push(atLeast(need, 'forwardCurrent', MAX_FIRST, definition('led', 'forwardCurrent'), 2, 'take'));
        break;
      case 'maxVoltage':
        checks.push(atLeast(need, 'maxVoltage', MAX_FIRST, definition('photoresistor', 'maxVoltage'), 1, 'stand'));
        break;
      case 'resistanceRange':
        checks.push(resistanceRangeCheck(need));
        break;
      case 'pinLayout':
        checks.push(pinLayoutCheck(need));
        break;
      default:
        // The bias point is noted, not checked: the catalog holds no common-mode ranges to check it against.
        break;
    }
  }
  // Lifecycle and RoHS measures depend on the status alone, so each is made once.
  const lifecycle = Object.fromEntries(
    Object.entries(LIFECYCLE_SCORES).map(([k, v]) => [k, { ok: k !== 'obsolete' || req.allowObsolete === true, margin: v }]),
  ) as Record<string, Measure>;
  const rohs = Object.fromEntries(Object.entries(ROHS_SCORES).map(([k, v]) => [k, { ok: true, margin: v }])) as Record<string, Measure>;
  checks.push(
    {
      weight: 1,
      scale: 1,
      tabled: true,
      measure: (c) => lifecycle[c.lifecycle]!,
      reason: (c, m) => (m.ok ? lower(LIFECYCLE_LABELS[c.lifecycle]) : 'is obsolete'),
      explain: (c, m) => ({
        need: 'lifecycle',
        label: 'Lifecycle',
        needed: req.allowObsolete ? 'any' : 'not obsolete',
        actual: LIFECYCLE_LABELS[c.lifecycle],
        margin: m.margin,
        ok: m.ok,
        reason: m.ok ? lower(LIFECYCLE_LABELS[c.lifecycle]) : 'is obsolete',
      }),
    },
    {
      weight: 1,
      scale: 1,
      tabled: true,
      measure: (c) => rohs[effectiveRohs(c)]!,
      reason: (c) => ROHS_LABELS[effectiveRohs(c)],
      explain: (c, m) => {
        const v = effectiveRohs(c);
        return { need: 'rohs', label: 'RoHS', needed: 'compliant preferred', actual: ROHS_LABELS[v], margin: m.margin, ok: true, reason: ROHS_LABELS[v] };
      },
    },
  );
  return checks;
}

// As with the alternates' breakdowns: margins are written when first read, since a page shows 50 of thousands.
const CHECKS = Symbol('checks');

interface LazyMatch extends PositionMatch {
  [CHECKS]: readonly Check[];
}

function settleMargins(match: PositionMatch, margins: Margin[]): void {
  Object.defineProperty(match, 'margins', { value: margins, writable: true, enumerable: true, configurable: true });
}

const LAZY_MARGINS: PropertyDescriptor = {
  enumerable: true,
  configurable: true,
  get(this: LazyMatch) {
    const margins = this[CHECKS].map((check) => check.explain(this.part, check.measure(this.part)));
    settleMargins(this, margins);
    return margins;
  },
  set(this: PositionMatch, margins: Margin[]) {
    settleMargins(this, margins);
  },
};

type MatchClass = new (part: CandidatePart, score: number, equivalentOf: string[]) => PositionMatch;

function matchClassFor(checks: readonly Check[]): MatchClass {
  class Match {
    declare part: CandidatePart;
    declare score: number;
    declare equivalentOf: string[];
    constructor(part: CandidatePart, score: number, equivalentOf: string[]) {
      this.part = part;
      this.score = score;
      Object.defineProperty(this, 'margins', LAZY_MARGINS);
      this.equivalentOf = equivalentOf;
    }
  }
  Object.defineProperty(Match.prototype, CHECKS, { value: checks });
  return Match as unknown as MatchClass;
}

/**
 * Each candidate against the position's needs: any unmet need makes it unsuitable, with the reasons; among the
 * rest, margins rank them. Meeting a need exactly earns half its share and margin the rest, saturating
 * (supply headroom on a 2 V scale, ratios on a scale of 1, i.e. double what is needed earns about 82 %), with
 * lifecycle and RoHS scored as in the alternates. Each match's margins are written when first read.
 */
export function rankForPosition(
  req: PositionRequirements,
  candidates: readonly CandidatePart[],
  options: { equivalents?: ReadonlyMap<string, EquivalentDto[]> } = {},
): Omit<PositionResults, 'considered'> {
  const derived = deriveNeeds(req);
  const checks = checksFor(req, derived);
  const totalWeight = checks.reduce((a, c) => a + c.weight, 0);
  const shares = checks.map((c) => (100 * c.weight) / totalWeight);
  const familyLabel = lower(FAMILIES[req.family].label);
  const notFamily = `is not ${familyLabel === 'LED' || /^[aeiou]/.test(familyLabel) ? 'an' : 'a'} ${familyLabel}`;
  const Match = matchClassFor(checks);
  const measures: Measure[] = new Array<Measure>(checks.length);
  const items: PositionMatch[] = [];
  const unsuitable: Unsuitable[] = [];

  for (const c of candidates) {
    if (c.family !== req.family) {
      unsuitable.push({ part: c, reasons: [notFamily] });
      continue;
    }
    let failed = false;
    let deducted = 0;
    for (let i = 0; i < checks.length; i++) {
      const check = checks[i]!;
      const m = check.measure(c);
      measures[i] = m;
      if (!m.ok) failed = true;
      else if (check.weight > 0) {
        const s = check.tabled ? (m.margin ?? 0) : m.margin === null ? 0.5 : marginScore(m.margin, check.scale);
        deducted += round1(shares[i]! * (1 - s));
      }
    }
    if (failed) {
      const reasons: string[] = [];
      for (let i = 0; i < checks.length; i++) if (!measures[i]!.ok) reasons.push(checks[i]!.reason(c, measures[i]!));
      unsuitable.push({ part: c, reasons });
      continue;
    }
    const rulings = options.equivalents?.get(c.id);
    const equivalentOf = rulings ? rulings.filter((e) => e.status === 'approved').map((e) => (e.partId === c.id ? e.equivalentId : e.partId)) : [];
    items.push(new Match(c, round1(Math.max(0, 100 - deducted)), equivalentOf));
  }
  unsuitable.sort(byPartNumber);
  return { derived, items: sortByScore(items), unsuitable };
}
