import type { CandidatePart, PinoutComparison } from '../alternates';
import type { FamilyKey } from '../families';
import { LIFECYCLE_LABELS, ROHS_LABELS, type RohsStatus } from '../parts';
import {
  closenessLinear,
  closenessLog,
  coverage,
  excessLog,
  LIFECYCLE_SCORES,
  NOT_STATED,
  ROHS_SCORES,
  shortfallLog,
} from './curves';
import type { Criterion, RankOptions } from './types';
import { choice, choiceLabel, definition, effectiveRohs, flag, lower, pick, rangeOf, show, showRange, type Slot } from './values';

/** What one criterion makes of one original, ready to score many candidates. */
export interface Prepared {
  originalText: string | null;
  /** Set when there is nothing to compare against: every candidate keeps the full share, with this reason. */
  skip?: string;
  /** s ∈ [0, 1], or NOT_STATED. Must not allocate: it runs once per candidate per criterion. */
  score(c: CandidatePart, pinout: PinoutComparison): number;
  /** Only for lines someone reads; never called with NOT_STATED. */
  explain(c: CandidatePart, pinout: PinoutComparison, s: number): { candidate: string | null; text: string };
}

export interface Rule extends Criterion {
  prepare(original: CandidatePart, options: RankOptions): Prepared;
}

type Meta = Omit<Criterion, 'family' | 'label'> & { label?: string };

/** Nothing to compare against: every candidate keeps the full share, and the line says why. */
export function skipped(text: string, candidateText: (c: CandidatePart) => string | null = () => null): Prepared {
  return { originalText: null, skip: text, score: () => 1, explain: (c) => ({ candidate: candidateText(c), text }) };
}

function times(ratio: number): string {
  return `${Number(ratio.toPrecision(2))}×`;
}

/**
 * A number compared on one of four curves:
 * 'more' — more is not worse, less loses over `scale` decades; 'less' — the mirror image;
 * 'near-log' — either way loses over `scale` decades; 'near-linear' — either way loses over `scale` units.
 */
export function numeric(
  family: FamilyKey,
  meta: Meta & { param: string; order: readonly Slot[]; curve: 'more' | 'less' | 'near-log' | 'near-linear'; scale: number },
): Rule {
  const def = definition(family, meta.param);
  const label = meta.label ?? def.label;
  const name = lower(label);
  const { order, curve, scale } = meta;
  const f =
    curve === 'more' ? shortfallLog : curve === 'less' ? excessLog : curve === 'near-log' ? closenessLog : closenessLinear;
  return {
    key: meta.key,
    label,
    family,
    defaultWeight: meta.defaultWeight,
    description: meta.description,
    prepare(original) {
      const o = pick(original, meta.param, order);
      const showCandidate = (c: CandidatePart) => {
        const v = pick(c, meta.param, order);
        return v === undefined ? null : show(def, v);
      };
      if (o === undefined) return skipped(`the original states no ${name}, so it is not compared`, showCandidate);
      const os = show(def, o);
      return {
        originalText: os,
        score(c) {
          const v = pick(c, meta.param, order);
          return v === undefined ? NOT_STATED : f(o, v, scale);
        },
        explain(c) {
          const v = pick(c, meta.param, order)!;
          const vs = show(def, v);
          let text: string;
          if (vs === os) text = `${name} ${vs} matches the original's`;
          else if (curve === 'more') text = `${name} ${vs} is ${v >= o ? 'above' : 'below'} the original's ${os}`;
          else if (curve === 'less') text = `${name} ${vs} is ${v <= o ? 'below' : 'above'} the original's ${os}`;
          else if (curve === 'near-log') text = `${name} ${vs} is ${times(v / o)} the original's ${os}`;
          else text = `${name} ${vs} is ${show(def, Math.abs(v - o))} from the original's ${os}`;
          return { candidate: vs, text };
        },
      };
    },
  };
}

/** A feature the original has (rail-to-rail output) and a candidate may lose; lacking it on both sides costs nothing. */
export function keepsFeature(family: FamilyKey, meta: Meta & { param: string; has: string; lacks: string }): Rule {
  const def = definition(family, meta.param);
  const yes = (c: CandidatePart) => {
    const v = flag(c, meta.param);
    return v === undefined ? null : v ? 'yes' : 'no';
  };
  return {
    key: meta.key,
    label: meta.label ?? def.label,
    family,
    defaultWeight: meta.defaultWeight,
    description: meta.description,
    prepare(original) {
      const o = flag(original, meta.param);
      if (o === undefined) return skipped(`the original does not say whether it is ${meta.has}, so it is not compared`, yes);
      if (!o) return skipped(`the original is ${meta.lacks}, so nothing can be lost`, yes);
      return {
        originalText: 'yes',
        score(c) {
          const v = flag(c, meta.param);
          return v === undefined ? NOT_STATED : v ? 1 : 0;
        },
        explain(c) {
          const v = flag(c, meta.param)!;
          return { candidate: v ? 'yes' : 'no', text: v ? `${meta.has}, as the original` : `${meta.lacks}; the original is` };
        },
      };
    },
  };
}

/** The same choice (shaft type, mounting) or not. */
export function sameChoice(family: FamilyKey, meta: Meta & { param: string }): Rule {
  const def = definition(family, meta.param);
  const name = lower(def.label);
  const labelOf = (c: CandidatePart) => {
    const v = choice(c, meta.param);
    return v === undefined ? null : choiceLabel(def, v);
  };
  return {
    key: meta.key,
    label: meta.label ?? def.label,
    family,
    defaultWeight: meta.defaultWeight,
    description: meta.description,
    prepare(original) {
      const o = choice(original, meta.param);
      if (o === undefined) return skipped(`the original states no ${name}, so it is not compared`, labelOf);
      const os = choiceLabel(def, o);
      return {
        originalText: os,
        score(c) {
          const v = choice(c, meta.param);
          return v === undefined ? NOT_STATED : v === o ? 1 : 0;
        },
        explain(c) {
          const vs = labelOf(c)!;
          return { candidate: vs, text: vs === os ? `${name} ${lower(vs)}, as the original` : `${name} ${lower(vs)}; the original's is ${lower(os)}` };
        },
      };
    },
  };
}

/** Supply: coverage of the operating supply when one is set, else of the original's own range. */
export function supplyCoverage(family: FamilyKey, meta: Meta): Rule {
  const def = definition(family, 'supplyVoltage');
  const showCandidate = (c: CandidatePart) => {
    const r = rangeOf(c, 'supplyVoltage');
    return r ? showRange(def, r.min, r.max) : null;
  };
  return {
    key: meta.key,
    label: meta.label ?? def.label,
    family,
    defaultWeight: meta.defaultWeight,
    description: meta.description,
    prepare(original, options) {
      const target = options.operatingSupply ?? rangeOf(original, 'supplyVoltage');
      if (!target) return skipped('the original states no supply range and no operating supply is set, so it is not compared', showCandidate);
      const ts = showRange(def, target.min, target.max);
      const what = options.operatingSupply ? `the operating supply ${ts}` : `the original's ${ts}`;
      const own = rangeOf(original, 'supplyVoltage');
      return {
        originalText: own ? showRange(def, own.min, own.max) : null,
        score(c) {
          const v = c.parameters.supplyVoltage;
          if (v === undefined || typeof v.min !== 'number' || typeof v.max !== 'number') return NOT_STATED;
          return coverage(target.min, target.max, v.min, v.max);
        },
        explain(c, _p, s) {
          const cs = showCandidate(c)!;
          const text =
            s >= 1
              ? `supply range ${cs} covers ${what}`
              : s <= 0
                ? `supply range ${cs} does not cover ${what}`
                : `supply range ${cs} covers ${Math.round(s * 100)} % of ${what}`;
          return { candidate: cs, text };
        },
      };
    },
  };
}

/** "Same functions on the same pins." → "same functions on the same pins", to sit before ": −7". */
function sentenceToClause(text: string): string {
  const t = text.replace(/\.$/, '');
  return /^[A-Z][a-z]/.test(t) ? t[0]!.toLowerCase() + t.slice(1) : t;
}

const PINOUT_SCORES: Record<PinoutComparison['class'], number> = { 'drop-in': 1, adapter: 0.5, incompatible: 0, unknown: 0.5 };

function packageText(part: CandidatePart): string | null {
  return part.package.trim() || part.pinLayout || null;
}

export function pinoutRule(family: FamilyKey | 'any', meta: Meta): Rule {
  return {
    key: meta.key,
    label: meta.label ?? 'Pinout',
    family,
    defaultWeight: meta.defaultWeight,
    description: meta.description,
    prepare(original) {
      let recorded = false;
      for (const _ in original.pinMap) recorded = true;
      if (!recorded && !original.pinLayout) return skipped("the original's pin map is not recorded, so the pinout is not compared", packageText);
      return {
        originalText: packageText(original),
        score: (_c, pinout) => PINOUT_SCORES[pinout.class],
        explain: (c, pinout) => ({ candidate: packageText(c), text: sentenceToClause(pinout.summary) }),
      };
    },
  };
}

export function lifecycleRule(): Rule {
  return {
    key: 'lifecycle',
    label: 'Lifecycle',
    family: 'any',
    defaultWeight: 2,
    description: 'Active parts score fully; not recommended for new designs 0.6, last-time buy 0.3, obsolete 0.',
    prepare(original) {
      return {
        originalText: LIFECYCLE_LABELS[original.lifecycle],
        score: (c) => LIFECYCLE_SCORES[c.lifecycle],
        explain: (c) => ({ candidate: LIFECYCLE_LABELS[c.lifecycle], text: lower(LIFECYCLE_LABELS[c.lifecycle]) }),
      };
    },
  };
}

const ROHS_TEXT: Record<RohsStatus, string> = {
  compliant: 'RoHS compliant',
  exempt: 'under a RoHS exemption',
  unknown: 'RoHS status unknown',
  'non-compliant': 'not RoHS compliant',
};

export function rohsRule(): Rule {
  return {
    key: 'rohs',
    label: 'RoHS',
    family: 'any',
    defaultWeight: 1,
    description:
      'Compliant or exempt scores fully, unknown half, non-compliant nothing; a cadmium cell counts as non-compliant unless an exemption is recorded. Nothing is lost when the original is itself non-compliant.',
    prepare(original) {
      const o = effectiveRohs(original);
      const candidateText = (c: CandidatePart) => ROHS_LABELS[effectiveRohs(c)];
      if (o === 'non-compliant') return { ...skipped('the original is not RoHS compliant either, so nothing is lost', candidateText), originalText: ROHS_LABELS[o] };
      return {
        originalText: ROHS_LABELS[o],
        score: (c) => ROHS_SCORES[effectiveRohs(c)],
        explain(c) {
          const v = effectiveRohs(c);
          const cadmium = v !== c.rohsStatus || (v === 'exempt' && (c.family === 'photoresistor' || c.family === 'optocoupler'));
          const text =
            v === 'non-compliant' && cadmium
              ? 'a cadmium cell with no exemption recorded, taken as not RoHS compliant'
              : v === 'exempt' && cadmium
                ? 'a cadmium cell under a RoHS exemption: check that it still applies'
                : ROHS_TEXT[v];
          return { candidate: ROHS_LABELS[v], text };
        },
      };
    },
  };
}

