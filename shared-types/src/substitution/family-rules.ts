import type { CandidatePart } from '../alternates';
import { nearestPreferredValue } from '../units';
import { CELL_RESPONSE_FWHM_M, closenessLog, logRangeMatch, NOT_STATED, spectralResponse } from './curves';
import { skipped, type Rule } from './rules';
import { choice, choiceLabel, definition, pick, show, showRange, TYP_FIRST } from './values';

// Rules that need more than one parameter or a family's own reading of a value.

type Meta = { key: string; defaultWeight: number; description: string; label?: string };

function lightRange(c: CandidatePart): { min: number; max: number } | undefined {
  const v = c.parameters.lightResistance;
  const min = v?.min ?? v?.max;
  const max = v?.max ?? v?.min;
  return min !== undefined && max !== undefined && min > 0 && max > 0 ? { min, max } : undefined;
}

/** Light resistance at 10 lx, a min..max range: compared as ranges on a log scale. */
export function lightResistanceRule(meta: Meta): Rule {
  const def = definition('photoresistor', 'lightResistance');
  const showOf = (c: CandidatePart) => {
    const r = lightRange(c);
    return r ? showRange(def, r.min, r.max) : null;
  };
  return {
    ...meta,
    label: meta.label ?? def.label,
    family: 'photoresistor',
    prepare(original) {
      const o = lightRange(original);
      if (!o) return skipped('the original states no light resistance, so it is not compared', showOf);
      const os = showRange(def, o.min, o.max);
      return {
        originalText: os,
        score(c) {
          const r = lightRange(c);
          return r ? logRangeMatch(o.min, o.max, r.min, r.max).s : NOT_STATED;
        },
        explain(c) {
          const r = lightRange(c)!;
          const m = logRangeMatch(o.min, o.max, r.min, r.max);
          const cs = showRange(def, r.min, r.max);
          const apart = m.centreRatio < 1.05 ? 'centred on it' : `centred ${Number(m.centreRatio.toPrecision(2))}× away`;
          return { candidate: cs, text: `light resistance ${cs} covers ${Math.round(m.covered * 100)} % of the original's ${os}, ${apart}` };
        },
      };
    },
  };
}

/**
 * Spectral peak: the cell's relative response at the paired LED's peak when an LED is given, else at the
 * original's peak, on the same bell curve the optocoupler estimate uses.
 */
export function spectralPeakRule(meta: Meta): Rule {
  const def = definition('photoresistor', 'peakWavelength');
  const showOf = (c: CandidatePart) => {
    const v = pick(c, 'peakWavelength', TYP_FIRST);
    return v === undefined ? null : show(def, v);
  };
  return {
    ...meta,
    label: meta.label ?? def.label,
    family: 'photoresistor',
    prepare(original, options) {
      const own = pick(original, 'peakWavelength', TYP_FIRST);
      const led = options.pairedLed ? pick(options.pairedLed, 'peakWavelength', TYP_FIRST) : undefined;
      const reference = led ?? own;
      const against = led !== undefined ? "the paired LED's" : "the original's";
      const note = options.pairedLed && led === undefined ? ' (the paired LED states no peak)' : '';
      if (reference === undefined) {
        return skipped('neither the original nor a paired LED states a peak wavelength, so it is not compared', showOf);
      }
      const rs = show(def, reference);
      return {
        originalText: own === undefined ? null : show(def, own),
        score(c) {
          const v = pick(c, 'peakWavelength', TYP_FIRST);
          return v === undefined ? NOT_STATED : spectralResponse(v - reference, CELL_RESPONSE_FWHM_M);
        },
        explain(c, _p, s) {
          const v = pick(c, 'peakWavelength', TYP_FIRST)!;
          const vs = show(def, v);
          const text =
            vs === rs
              ? `peak response ${vs} matches ${against} ${rs}${note}`
              : `peak response ${vs} is ${show(def, Math.abs(v - reference))} from ${against} ${rs}${note}, about ${Math.round(s * 100)} % response there`;
          return { candidate: vs, text };
        },
      };
    },
  };
}

function testCurrent(c: CandidatePart): number | undefined {
  return c.parameters.luminousIntensity?.conditions?.current ?? c.parameters.forwardCurrent?.typ;
}

/** Luminous intensity on a log scale, brought to the original's test current when both state one. */
export function luminousIntensityRule(meta: Meta): Rule {
  const def = definition('led', 'luminousIntensity');
  const amps = definition('led', 'forwardCurrent');
  const showOf = (c: CandidatePart) => {
    const v = pick(c, 'luminousIntensity', TYP_FIRST);
    return v === undefined ? null : show(def, v);
  };
  return {
    ...meta,
    label: meta.label ?? def.label,
    family: 'led',
    prepare(original) {
      const o = pick(original, 'luminousIntensity', TYP_FIRST);
      if (o === undefined || o <= 0) {
        return skipped('the original states no luminous intensity, so it is not compared', showOf);
      }
      const oi = testCurrent(original);
      const os = show(def, o);
      const scaled = (c: CandidatePart, v: number): number => {
        const ci = testCurrent(c);
        return oi !== undefined && ci !== undefined && ci > 0 && oi > 0 ? (v * oi) / ci : v;
      };
      return {
        originalText: oi === undefined ? os : `${os} at ${show(amps, oi)}`,
        score(c) {
          const v = pick(c, 'luminousIntensity', TYP_FIRST);
          return v === undefined ? NOT_STATED : closenessLog(o, scaled(c, v), 1);
        },
        explain(c) {
          const v = pick(c, 'luminousIntensity', TYP_FIRST)!;
          const ci = testCurrent(c);
          const vs = show(def, v);
          const w = scaled(c, v);
          const ratio = Number((w / o).toPrecision(2));
          if (oi !== undefined && ci !== undefined && Math.abs(ci - oi) > 1e-12 * oi) {
            return {
              candidate: `${vs} at ${show(amps, ci)}`,
              text: `luminous intensity ${vs} at ${show(amps, ci)} is about ${show(def, w)} at the original's ${show(amps, oi)} (taken as proportional to current), ${ratio}× the original's ${os}`,
            };
          }
          return { candidate: ci === undefined ? vs : `${vs} at ${show(amps, ci)}`, text: `luminous intensity ${vs} is ${ratio}× the original's ${os}` };
        },
      };
    },
  };
}

const LED_PACKAGE_OF: Record<string, string> = { 'led-3mm': '3mm', 'led-5mm': '5mm', '0603': '0603', '0805': '0805', '1206': '1206' };
const LED_MOUNTING: Record<string, 'through-hole' | 'surface-mount'> = {
  '3mm': 'through-hole',
  '5mm': 'through-hole',
  '0603': 'surface-mount',
  '0805': 'surface-mount',
  '1206': 'surface-mount',
};

function ledPackage(c: CandidatePart): string | undefined {
  return choice(c, 'ledPackage') ?? LED_PACKAGE_OF[c.package.trim().toLowerCase()];
}

/** LED package: the same key fits; another of the same mounting half fits; through-hole for surface-mount does not. */
export function ledPackageRule(meta: Meta): Rule {
  const def = definition('led', 'ledPackage');
  const showOf = (c: CandidatePart) => {
    const v = ledPackage(c);
    return v === undefined ? null : choiceLabel(def, v);
  };
  return {
    ...meta,
    label: meta.label ?? def.label,
    family: 'led',
    prepare(original) {
      const o = ledPackage(original);
      if (o === undefined) {
        return skipped('the original states no package, so it is not compared', showOf);
      }
      const os = choiceLabel(def, o);
      return {
        originalText: os,
        score(c) {
          const v = ledPackage(c);
          if (v === undefined) return NOT_STATED;
          if (v === o) return 1;
          return LED_MOUNTING[v] !== undefined && LED_MOUNTING[v] === LED_MOUNTING[o] ? 0.5 : 0;
        },
        explain(c, _p, s) {
          const vs = showOf(c)!;
          const text =
            s >= 1 ? `package ${vs}, as the original` : s > 0 ? `package ${vs}, the same mounting as the original's ${os} but another size` : `package ${vs} does not fit the original's ${os}`;
          return { candidate: vs, text };
        },
      };
    },
  };
}

/**
 * Pot resistance: the same value scores fully; the nearest E6 value to the original (50 kΩ → 47 kΩ) or a value
 * inside the original's tolerance scores 0.8; anything else 0.8 − 2·|log10(ratio)|, so 2× off scores 0.2.
 */
export function potResistanceRule(meta: Meta): Rule {
  const def = definition('potentiometer', 'resistance');
  const showOf = (c: CandidatePart) => {
    const v = pick(c, 'resistance', TYP_FIRST);
    return v === undefined ? null : show(def, v);
  };
  return {
    ...meta,
    label: meta.label ?? def.label,
    family: 'potentiometer',
    prepare(original) {
      const o = pick(original, 'resistance', TYP_FIRST);
      if (o === undefined || o <= 0) {
        return skipped('the original states no resistance, so it is not compared', showOf);
      }
      const tol = pick(original, 'tolerance', TYP_FIRST);
      const nearest = nearestPreferredValue(o, 'E6');
      const os = show(def, o);
      const same = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * b;
      const kind = (v: number): 'exact' | 'nearest' | 'tolerance' | 'off' =>
        same(v, o) ? 'exact' : same(v, nearest) ? 'nearest' : tol !== undefined && Math.abs(v / o - 1) <= tol / 100 ? 'tolerance' : 'off';
      return {
        originalText: os,
        score(c) {
          const v = pick(c, 'resistance', TYP_FIRST);
          if (v === undefined) return NOT_STATED;
          const k = kind(v);
          return k === 'exact' ? 1 : k === 'off' ? Math.max(0, 0.8 - 2 * Math.abs(Math.log10(v / o))) : 0.8;
        },
        explain(c) {
          const v = pick(c, 'resistance', TYP_FIRST)!;
          const vs = show(def, v);
          const k = kind(v);
          const text =
            k === 'exact'
              ? `resistance ${vs}, as the original`
              : k === 'nearest'
                ? `resistance ${vs} is the nearest E6 value to the original's ${os}`
                : k === 'tolerance'
                  ? `resistance ${vs} is inside the original's ±${tol} % of ${os}`
                  : `resistance ${vs} is ${Number((v / o).toPrecision(2))}× the original's ${os}`;
          return { candidate: vs, text };
        },
      };
    },
  };
}
