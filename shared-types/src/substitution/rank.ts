import type { BreakdownLine, CandidatePart, EquivalentDto, PinoutComparison, RankedAlternate, Unsuitable } from '../alternates';
import { FAMILIES, type FamilyKey } from '../families';
import { NOT_STATED, round1 } from './curves';
import { rulesFor } from './criteria';
import { pinComparer, type PinComparer } from './pinout';
import type { Prepared, Rule } from './rules';
import { byPartNumber, sortByScore } from './sort';
import type { RankOptions } from './types';
import { resolveWeights } from './weights';
import { choice, choiceLabel, countOf, definition, lower, memoShow, pointsText, showRange } from './values';

/** What the hard requirements need to know about the original, worked out once for all candidates. */
interface HardPlan {
  original: CandidatePart;
  options: RankOptions;
  pins: PinComparer;
  channels: number | undefined;
  gangs: number | undefined;
  taper: string | undefined;
  supplyText: string | undefined;
  /** Formatting costs microseconds and unsuitable parts share a handful of supply limits, so they are memoised. */
  showSupply: (volts: number) => string;
}

/** Everything about the original a ranking needs. */
interface Plan extends HardPlan {
  rules: readonly Rule[];
  prepared: Prepared[];
  shares: number[];
}

function makeHardPlan(original: CandidatePart, options: RankOptions): HardPlan {
  const op = options.operatingSupply;
  const compared = pinComparer(original);
  const given = options.pinoutOf;
  return {
    original,
    options,
    pins: given ? { compare: (c) => given(c) ?? compared.compare(c) } : compared,
    channels: original.family === 'op-amp' ? countOf(original, 'channels') : undefined,
    gangs: original.family === 'potentiometer' ? countOf(original, 'gangs') : undefined,
    taper: original.family === 'potentiometer' ? choice(original, 'taper') : undefined,
    supplyText: op && original.family === 'op-amp' ? showRange(definition('op-amp', 'supplyVoltage'), op.min, op.max) : undefined,
    showSupply: memoShow(definition('op-amp', 'supplyVoltage')),
  };
}

function makePlan(original: CandidatePart, options: RankOptions): Plan {
  const rules = rulesFor(original.family);
  const weights = resolveWeights(options.weights, original.family);
  const total = weights.reduce((a, b) => a + b, 0);
  return {
    ...makeHardPlan(original, options),
    rules,
    prepared: rules.map((r) => r.prepare(original, options)),
    shares: weights.map((w) => (total > 0 ? (100 * w) / total : 0)),
  };
}

function cost(share: number, s: number): number {
  return round1(share * (1 - (s === NOT_STATED ? 0.5 : s)));
}

function scoreWith(plan: Plan, c: CandidatePart, pinout: PinoutComparison): number {
  let deducted = 0;
  for (let i = 0; i < plan.prepared.length; i++) {
    const share = plan.shares[i]!;
    const p = plan.prepared[i]!;
    if (share === 0 || p.skip !== undefined) continue;
    deducted += cost(share, p.score(c, pinout));
  }
  return round1(Math.max(0, 100 - deducted));
}

function explainWith(plan: Plan, c: CandidatePart, pinout: PinoutComparison): BreakdownLine[] {
  return plan.rules.map((rule, i) => {
    const p = plan.prepared[i]!;
    const share = plan.shares[i]!;
    const maxPoints = round1(share);
    const unweighted = share === 0 ? ' (weight 0, not counted)' : '';
    if (p.skip !== undefined) {
      return { criterion: rule.key, label: rule.label, original: p.originalText, candidate: p.explain(c, pinout, 1).candidate, points: 0, maxPoints, reason: `${p.skip}${unweighted}` };
    }
    const s = p.score(c, pinout);
    const points = share === 0 ? 0 : -cost(share, s) || 0;
    const suffix = points < 0 ? `: ${pointsText(points)}` : '';
    if (s === NOT_STATED) {
      return { criterion: rule.key, label: rule.label, original: p.originalText, candidate: null, points, maxPoints, reason: `${lower(rule.label)} not stated${suffix}${unweighted}` };
    }
    const { candidate, text } = p.explain(c, pinout, s);
    return { criterion: rule.key, label: rule.label, original: p.originalText, candidate, points, maxPoints, reason: `${text}${suffix}${unweighted}` };
  });
}

function article(word: string): string {
  return /^[aeiou]/i.test(word) || /^LED/.test(word) ? 'an' : 'a';
}

function familyName(family: FamilyKey): string {
  const name = lower(FAMILIES[family].label);
  return `${article(name)} ${name}`;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

// Most candidates pass, so the list of reasons is only made for the first one.
function add(reasons: string[] | null, reason: string): string[] {
  if (!reasons) return [reason];
  reasons.push(reason);
  return reasons;
}

/** The hard failures, or null when there are none; the pinout is only compared when a drop-in is required. */
function failuresWith(plan: HardPlan, c: CandidatePart, pinout: PinoutComparison | undefined): string[] | null {
  const { original, options } = plan;
  if (c.family !== original.family) return [`is ${familyName(c.family)}, not ${familyName(original.family)}`];
  let out: string[] | null = null;

  if (plan.channels !== undefined) {
    const n = countOf(c, 'channels');
    if (n !== undefined && n !== plan.channels) out = add(out, `has ${plural(n, 'channel')}; the original has ${plan.channels}`);
  }
  if (plan.supplyText !== undefined) {
    const op = options.operatingSupply!;
    const r = c.parameters.supplyVoltage;
    if (r === undefined || typeof r.min !== 'number' || typeof r.max !== 'number') {
      out = add(out, `states no supply range, so it cannot be shown to run on ${plan.supplyText}`);
    } else if (r.min > op.min + 1e-9 || r.max < op.max - 1e-9) {
      out = add(out, `supply range ${plan.showSupply(r.min)}${r.min === r.max ? '' : ` to ${plan.showSupply(r.max)}`} does not cover ${plan.supplyText}`);
    }
  }
  if (original.family === 'potentiometer') {
    const taper = choice(c, 'taper');
    if (plan.taper !== undefined && taper !== undefined && taper !== plan.taper) {
      const def = definition('potentiometer', 'taper');
      out = add(out, `taper is ${lower(choiceLabel(def, taper))}; the original's is ${lower(choiceLabel(def, plan.taper))}`);
    }
    const gangs = countOf(c, 'gangs');
    if (plan.gangs !== undefined && gangs !== undefined && gangs !== plan.gangs) out = add(out, `has ${plural(gangs, 'gang')}; the original has ${plan.gangs}`);
  }
  if (c.lifecycle === 'obsolete' && !options.allowObsolete) out = add(out, 'is obsolete');
  const ruling = options.equivalents?.get(c.id);
  if (ruling?.status === 'rejected') out = add(out, `an editor rejected this pair for ${ruling.use}${ruling.note ? `: ${ruling.note}` : ''}`);
  if (options.requireDropIn) {
    const p = pinout ?? plan.pins.compare(c);
    if (p.class !== 'drop-in') out = add(out, `not a drop-in: ${p.summary}`);
  }
  return out;
}

/** Hard requirements only: reasons a candidate must not be ranked (empty = suitable). Nothing is scored. */
export function hardRequirementFailures(original: CandidatePart, candidate: CandidatePart, options: RankOptions): string[] {
  return failuresWith(makeHardPlan(original, options), candidate, undefined) ?? [];
}

/**
 * Score = 100 − Σ deductions. Criterion i carries a share 100·wᵢ/Σw of the hundred and costs (1 − sᵢ) of it;
 * a value the candidate does not state costs half its share, one the original does not state nothing. Each
 * deduction is rounded to one decimal and the score is their sum, so the breakdown adds up to it exactly.
 */
export function scoreCandidate(original: CandidatePart, candidate: CandidatePart, options: RankOptions): RankedAlternate {
  const plan = makePlan(original, options);
  const pinout = plan.pins.compare(candidate);
  return {
    part: candidate,
    score: scoreWith(plan, candidate, pinout),
    breakdown: explainWith(plan, candidate, pinout),
    pinout,
    equivalent: options.equivalents?.get(candidate.id) ?? null,
  };
}

// Writing a breakdown formats two dozen numbers (about 3 µs each), and a page shows 25 of 20,000 candidates, so
// rankAlternates writes each item's breakdown the first time it is read, then keeps it as a plain data property.
// It is an own enumerable property throughout, so JSON, spreading and schema parsing see it like any other; the
// plan it is written from sits on the prototype of a class made per ranking, out of sight of keys and equality.
const PLAN = Symbol('plan');

interface LazyItem extends RankedAlternate {
  [PLAN]: Plan;
}

function settle(item: RankedAlternate, lines: BreakdownLine[]): void {
  Object.defineProperty(item, 'breakdown', { value: lines, writable: true, enumerable: true, configurable: true });
}

const LAZY_BREAKDOWN: PropertyDescriptor = {
  enumerable: true,
  configurable: true,
  get(this: LazyItem) {
    const lines = explainWith(this[PLAN], this.part, this.pinout);
    settle(this, lines);
    return lines;
  },
  set(this: RankedAlternate, lines: BreakdownLine[]) {
    settle(this, lines);
  },
};

type ItemClass = new (part: CandidatePart, score: number, pinout: PinoutComparison, equivalent: EquivalentDto | null) => RankedAlternate;

function itemClassFor(plan: Plan): ItemClass {
  class Item {
    declare part: CandidatePart;
    declare score: number;
    declare pinout: PinoutComparison;
    declare equivalent: EquivalentDto | null;
    constructor(part: CandidatePart, score: number, pinout: PinoutComparison, equivalent: EquivalentDto | null) {
      this.part = part;
      this.score = score;
      Object.defineProperty(this, 'breakdown', LAZY_BREAKDOWN);
      this.pinout = pinout;
      this.equivalent = equivalent;
    }
  }
  Object.defineProperty(Item.prototype, PLAN, { value: plan });
  return Item as unknown as ItemClass;
}

/**
 * Every candidate either ranked or listed as unsuitable with its reasons; the original itself is left out.
 * Approved equivalents come first (by score among themselves), then by score, ties by part number.
 */
export function rankAlternates(
  original: CandidatePart,
  candidates: readonly CandidatePart[],
  options: RankOptions,
): { items: RankedAlternate[]; unsuitable: Unsuitable[] } {
  const plan = makePlan(original, options);
  const Item = itemClassFor(plan);
  const items: RankedAlternate[] = [];
  const unsuitable: Unsuitable[] = [];
  for (let i = 0; i < candidates.length; i++) {
    const c = candidates[i]!;
    if (c.id === original.id) continue;
    let pinout = options.requireDropIn ? plan.pins.compare(c) : undefined;
    const reasons = failuresWith(plan, c, pinout);
    if (reasons) {
      unsuitable.push({ part: c, reasons });
      continue;
    }
    pinout ??= plan.pins.compare(c);
    items.push(new Item(c, scoreWith(plan, c, pinout), pinout, options.equivalents?.get(c.id) ?? null));
  }
  unsuitable.sort(byPartNumber);
  return { items: sortByScore(items, (item) => item.equivalent?.status === 'approved'), unsuitable };
}
