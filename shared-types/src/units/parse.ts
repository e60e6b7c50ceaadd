import { formatQuantity } from './format';
import {
  canonicalUnit,
  displayUnitExponent,
  normaliseText,
  PREFIXES,
  UNITS,
  unitCandidates,
  type CanonicalUnit,
  type UnitCandidate,
} from './units';

export type ParseResult =
  | {
      ok: true;
      /** In SI base units (°C, ° and % as written). */
      value: number;
      /** Canonical unit symbol; '' for a plain number. */
      unit: string;
      /** The input was written ±X; value holds the magnitude X. */
      plusMinus?: boolean;
    }
  | { ok: false; error: string };

export interface ParseOptions {
  /** The unit the field expects: bare numbers and bare prefixes take it, any other unit is an error. */
  unit?: string;
  /** A bare number is read in this unit, e.g. "13" in a field shown as V/µs means 13 V/µs. */
  displayUnit?: string;
}

// IEC 60062 RKM letters: the letter stands where the decimal point would be and sets the multiplier.
// R, F (and V, a common practice for zener voltages) name the unit itself; the rest are prefixes whose
// unit comes from the field, or by default from the letter's family (resistor or capacitor codes).
interface RkmLetter {
  exponent: number;
  /** The unit the letter names (R, F, V) or implies when nothing else says. */
  unit: CanonicalUnit;
  namesUnit: boolean;
}
const RKM_LETTERS: Record<string, RkmLetter> = {
  R: { exponent: 0, unit: 'Ω', namesUnit: true },
  K: { exponent: 3, unit: 'Ω', namesUnit: false },
  k: { exponent: 3, unit: 'Ω', namesUnit: false },
  M: { exponent: 6, unit: 'Ω', namesUnit: false },
  G: { exponent: 9, unit: 'Ω', namesUnit: false },
  T: { exponent: 12, unit: 'Ω', namesUnit: false },
  p: { exponent: -12, unit: 'F', namesUnit: false },
  n: { exponent: -9, unit: 'F', namesUnit: false },
  'µ': { exponent: -6, unit: 'F', namesUnit: false },
  u: { exponent: -6, unit: 'F', namesUnit: false },
  m: { exponent: -3, unit: 'F', namesUnit: false },
  F: { exponent: 0, unit: 'F', namesUnit: true },
  V: { exponent: 0, unit: 'V', namesUnit: true },
};

/** The unit a bare prefix implies when the field gives none: "47K" is a resistor, "470n" a capacitor. */
function impliedUnit(prefix: string): CanonicalUnit | undefined {
  if (prefix === 'meg' || prefix === 'Meg' || prefix === 'MEG') return 'Ω';
  return RKM_LETTERS[prefix]?.unit;
}

interface Head {
  /** Decimal mantissa as text, so that exponent shifts stay exact. */
  mantissa: string;
  exponent: number;
  negative: boolean;
  plusMinus: boolean;
  rkm?: { letter: string; info: RkmLetter; text: string };
  rest: string;
}

export interface CoreSuccess {
  ok: true;
  value: number;
  unit: CanonicalUnit;
  plusMinus: boolean;
  /** The input itself names the unit (a symbol, or an RKM letter R, F or V), rather than taking or implying it. */
  explicitUnit: boolean;
}
export type CoreResult = CoreSuccess | { ok: false; error: string };

const RKM_PATTERN = /^(\d*)([RKkMGTpnµumFV])(\d+)(?![\d.])/;
const NUMBER_PATTERN = /^(\d+(?:\.\d*)?|\.\d+)(?:[eE]([+-]?\d+))?/;

function toNumber(mantissa: string, exponent: number, negative: boolean): number {
  const n = Number(`${mantissa}e${exponent}`);
  return negative ? -n : n;
}

function readHead(text: string): Head | { error: 'no-number' | 'ambiguous-comma' | 'comma' } {
  let s = text.replace(/^[\u2013\u2014]/, '-');
  let negative = false;
  let plusMinus = false;
  const sign = /^(±|\+\/-|\+-|\+|-)\s*/.exec(s);
  if (sign) {
    plusMinus = sign[1] !== '+' && sign[1] !== '-';
    negative = sign[1] === '-';
    s = s.slice(sign[0].length);
  }
  // A comma is a decimal point (4,7k) unless it could be a thousands separator.
  if (/^\d*,\d/.test(s)) {
    if (/^\d+,\d{3}(?![\d.,])/.test(s)) return { error: 'ambiguous-comma' };
    if (/^\d*,\d+[.,]/.test(s)) return { error: 'comma' };
    s = s.replace(',', '.');
  }
  const rkm = RKM_PATTERN.exec(s);
  if (rkm) {
    const info = RKM_LETTERS[rkm[2]!]!;
    return {
      mantissa: `${rkm[1] || '0'}.${rkm[3]}`,
      exponent: info.exponent,
      negative,
      plusMinus,
      rkm: { letter: rkm[2]!, info, text: `${sign ? sign[1] : ''}${rkm[0]}` },
      rest: s.slice(rkm[0].length),
    };
  }
  const num = NUMBER_PATTERN.exec(s);
  if (!num) return { error: 'no-number' };
  return {
    mantissa: num[1]!,
    exponent: num[2] ? Number(num[2]) : 0,
    negative,
    plusMinus,
    rest: s.slice(num[0].length),
  };
}

function describe(unit: CanonicalUnit): string {
  const info = UNITS[unit];
  return unit === '' ? `${info.article} ${info.quantity}` : `${info.article} ${info.quantity} in ${unit}`;
}

function junk(input: string, suggestions: string[]): string {
  const tries = [...new Set(suggestions.filter((s) => s !== ''))];
  const hint = tries.length === 0 ? '' : `; try ${tries.join(' or ')}`;
  return `"${input}" is not a number engineers write${hint}`;
}

function examplesFor(unit: CanonicalUnit | undefined): string[] {
  return unit === undefined ? ['4k7', '4.7 kΩ'] : UNITS[unit].examples;
}

/** Suggestions for an input whose number was readable but whose unit was not. */
function suggestionsFor(head: Head, suffix: string, expected: CanonicalUnit | undefined): string[] {
  let guess = expected ?? (head.rkm ? head.rkm.info.unit : undefined);
  let exponent = head.exponent;
  const leading = Object.keys(PREFIXES)
    .sort((a, b) => b.length - a.length)
    .find((p) => suffix.startsWith(p));
  if (!head.rkm && leading !== undefined) {
    // "5 k%": the part after the prefix names the unit even though the pair is not valid.
    guess ??= unitCandidates(suffix.slice(leading.length)).find((c) => c.kind === 'exact')?.unit ?? impliedUnit(leading);
    if (guess !== undefined && (UNITS[guess].prefixable || guess === '')) exponent += PREFIXES[leading]!;
  }
  const value = toNumber(head.mantissa, exponent, head.negative);
  const sign = head.plusMinus ? '±' : '';
  if (guess === undefined) return [String(value), `a value with a unit, such as ${examplesFor(undefined)[1]}`];
  // Offer the RKM code back only when it was the unit after it that went wrong.
  const code = head.rkm && suffix !== '' && UNITS[guess].prefixable ? head.rkm.text : '';
  return [code, sign + formatQuantity(value, guess, { digits: 6 })];
}

/** Parsing with the bookkeeping ranges need (whether the unit was written); parseQuantity is the public face. */
export function parseCore(raw: unknown, opts: ParseOptions = {}): CoreResult {
  let expected: CanonicalUnit | undefined;
  if (opts.unit !== undefined) {
    expected = canonicalUnit(opts.unit);
    if (expected === undefined) throw new TypeError(`parseQuantity: unknown unit "${opts.unit}"`);
  }
  if (typeof raw !== 'string' || normaliseText(raw) === '') {
    return { ok: false, error: `Enter a value, such as ${examplesFor(expected)[0]}` };
  }
  const input = normaliseText(raw);
  const head = readHead(input);
  if ('error' in head) {
    if (head.error === 'ambiguous-comma') {
      return {
        ok: false,
        error: `"${input}" could be read two ways: the comma may separate thousands or mark the decimal; write it without the comma or with a point`,
      };
    }
    return { ok: false, error: junk(input, examplesFor(expected)) };
  }

  const suffix = head.rest.replace(/\s+/g, '');
  let exponent = head.exponent;
  let unit: CanonicalUnit | undefined;
  let explicitUnit = false;
  const fail = (): CoreResult => ({ ok: false, error: junk(input, suggestionsFor(head, suffix, expected)) });

  if (head.rkm?.info.namesUnit) {
    // 4R7, 4F7, 5V1: the letter is the unit; a repeated unit ("4R7 Ω") is tolerated.
    unit = head.rkm.info.unit;
    explicitUnit = true;
    if (suffix !== '' && !unitCandidates(suffix).some((c) => c.kind === 'exact' && c.unit === unit)) return fail();
  } else if (suffix === '') {
    if (head.rkm) {
      unit = expected ?? head.rkm.info.unit;
      // 4k7 in a percentage or plain-number field: the multiplier letter has nothing to scale.
      if (!UNITS[unit].prefixable) return fail();
    } else {
      unit = expected ?? '';
      if (expected !== undefined && opts.displayUnit !== undefined) {
        const shift = displayUnitExponent(opts.displayUnit, expected);
        if (shift === undefined) {
          throw new TypeError(`parseQuantity: "${opts.displayUnit}" is not a display unit for ${expected}`);
        }
        exponent += shift;
      }
    }
  } else {
    // An RKM code already carries its prefix, so only a plain unit may follow it ("4k7 Ω").
    const candidates: UnitCandidate[] = unitCandidates(suffix)
      .filter((c) => !head.rkm || c.kind === 'exact')
      .flatMap((c) => {
        if (c.kind !== 'prefix') return [c];
        const u = expected ?? impliedUnit(c.prefix!);
        return u === undefined || !UNITS[u].prefixable ? [] : [{ ...c, unit: u }];
      });
    if (candidates.length === 0) return fail();
    const chosen = expected === undefined ? candidates[0]! : candidates.find((c) => c.unit === expected);
    if (!chosen) {
      const got = candidates[0]!.unit;
      return { ok: false, error: `expected ${describe(expected!)}, got ${got === '' ? 'a plain number' : got}` };
    }
    unit = chosen.unit;
    exponent += chosen.exponent;
    explicitUnit = chosen.kind !== 'prefix';
  }

  if (expected !== undefined && unit !== expected) {
    return { ok: false, error: `expected ${describe(expected)}, got ${unit === '' ? 'a plain number' : unit}` };
  }
  // + 0 turns -0 into 0.
  const value = toNumber(head.mantissa, exponent, head.negative) + 0;
  if (!Number.isFinite(value)) return { ok: false, error: `"${input}" is too large to be a real value` };
  return { ok: true, value, unit, plusMinus: head.plusMinus, explicitUnit };
}

/**
 * Read a value as engineers type it: 4k7, 4.7 kΩ, 470n, R47, 13 V/µs, 10 nV/rtHz, -40 °C, 5 %, ±15 V.
 * Values come back in SI base units (13 V/µs → 13e6 V/s, 100 mcd → 0.1 cd); °C, ° and % stay as written.
 */
export function parseQuantity(input: string, opts?: ParseOptions): ParseResult {
  const r = parseCore(input, opts);
  if (!r.ok) return r;
  return r.plusMinus ? { ok: true, value: r.value, unit: r.unit, plusMinus: true } : { ok: true, value: r.value, unit: r.unit };
}
