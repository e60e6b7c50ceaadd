// Unit and prefix tables for engineering notation.
// Hand-rolled rather than a general unit library: those know SI units but not RKM codes (4K7, R47),
// "meg", "rtHz" or the "u for micro" habits engineers type, and we only need powers of ten.

/** Canonical unit symbols, as stored: SI base units except °C, ° and %, which are kept as written on datasheets. */
export type CanonicalUnit =
  | ''
  | 'Ω'
  | 'V'
  | 'A'
  | 'F'
  | 'Hz'
  | 'W'
  | 's'
  | 'lx'
  | 'cd'
  | 'm'
  | '°'
  | '%'
  | '°C'
  | 'V/s'
  | 'V/√Hz'
  | 'A/√Hz';

export interface UnitInfo {
  symbol: CanonicalUnit;
  /** What the unit measures, for messages: "expected a resistance in Ω". */
  quantity: string;
  article: 'a' | 'an';
  /** Whether SI prefixes apply (k%, m°C make no sense). */
  prefixable: boolean;
  /** Space between number and symbol when formatting; the SI writes 30° but 5 % and -40 °C. */
  spaced: boolean;
  /** Display unit used when the caller gives none; engineers quote slew rate per µs, never in MV/s. */
  defaultDisplay?: string;
  /** Example inputs for error hints. */
  examples: string[];
}

export const UNITS: Record<CanonicalUnit, UnitInfo> = {
  '': { symbol: '', quantity: 'plain number', article: 'a', prefixable: false, spaced: false, examples: ['2', '1.5e3'] },
  'Ω': { symbol: 'Ω', quantity: 'resistance', article: 'a', prefixable: true, spaced: true, examples: ['4k7', '4.7 kΩ'] },
  V: { symbol: 'V', quantity: 'voltage', article: 'a', prefixable: true, spaced: true, examples: ['15 V', '4.5 V'] },
  A: { symbol: 'A', quantity: 'current', article: 'a', prefixable: true, spaced: true, examples: ['2 mA', '20 mA'] },
  F: { symbol: 'F', quantity: 'capacitance', article: 'a', prefixable: true, spaced: true, examples: ['4n7', '470 nF'] },
  Hz: { symbol: 'Hz', quantity: 'frequency', article: 'a', prefixable: true, spaced: true, examples: ['1 MHz', '10 kHz'] },
  W: { symbol: 'W', quantity: 'power', article: 'a', prefixable: true, spaced: true, examples: ['500 mW', '0.25 W'] },
  s: { symbol: 's', quantity: 'time', article: 'a', prefixable: true, spaced: true, examples: ['10 ms', '2.5 s'] },
  lx: { symbol: 'lx', quantity: 'illuminance', article: 'an', prefixable: true, spaced: true, examples: ['10 lx'] },
  cd: { symbol: 'cd', quantity: 'luminous intensity', article: 'a', prefixable: true, spaced: true, examples: ['100 mcd'] },
  m: { symbol: 'm', quantity: 'length', article: 'a', prefixable: true, spaced: true, examples: ['630 nm', '16 mm'] },
  '°': { symbol: '°', quantity: 'angle', article: 'an', prefixable: false, spaced: false, examples: ['30°', '30 deg'] },
  '%': { symbol: '%', quantity: 'percentage', article: 'a', prefixable: false, spaced: true, examples: ['5 %'] },
  '°C': { symbol: '°C', quantity: 'temperature', article: 'a', prefixable: false, spaced: true, examples: ['-40 °C', '25 deg C'] },
  'V/s': {
    symbol: 'V/s',
    quantity: 'slew rate',
    article: 'a',
    prefixable: true,
    spaced: true,
    defaultDisplay: 'V/µs',
    examples: ['13 V/µs', '13 V/us'],
  },
  'V/√Hz': {
    symbol: 'V/√Hz',
    quantity: 'voltage noise density',
    article: 'a',
    prefixable: true,
    spaced: true,
    examples: ['10 nV/√Hz', '10 nV/rtHz'],
  },
  'A/√Hz': {
    symbol: 'A/√Hz',
    quantity: 'current noise density',
    article: 'a',
    prefixable: true,
    spaced: true,
    examples: ['1 pA/√Hz', '1 pA/rtHz'],
  },
};

export function isCanonicalUnit(unit: string): unit is CanonicalUnit {
  return Object.prototype.hasOwnProperty.call(UNITS, unit);
}

/** SI prefixes as powers of ten. "meg" is the SPICE habit; K is common practice for kilo; u stands in for µ. */
export const PREFIXES: Readonly<Record<string, number>> = {
  y: -24,
  z: -21,
  a: -18,
  f: -15,
  p: -12,
  n: -9,
  'µ': -6,
  u: -6,
  m: -3,
  k: 3,
  K: 3,
  M: 6,
  meg: 6,
  Meg: 6,
  MEG: 6,
  G: 9,
  T: 12,
};

/** Prefix symbols used when formatting, by power of ten. */
export const FORMAT_PREFIXES: Readonly<Record<number, string>> = {
  [-24]: 'y',
  [-21]: 'z',
  [-18]: 'a',
  [-15]: 'f',
  [-12]: 'p',
  [-9]: 'n',
  [-6]: 'µ',
  [-3]: 'm',
  0: '',
  3: 'k',
  6: 'M',
  9: 'G',
  12: 'T',
};

// Longest first, so "meg" wins over "m".
const PREFIX_SYMBOLS = Object.keys(PREFIXES).sort((a, b) => b.length - a.length);

interface Alias {
  unit: CanonicalUnit;
  /** Whether a prefix may precede this spelling ("kR" is not something anyone writes). */
  prefixable: boolean;
}

// Case-sensitive spellings: symbols, and lower-case letters that cannot be confused with a prefix.
const SYMBOL_ALIASES: Record<string, Alias> = {
  'Ω': { unit: 'Ω', prefixable: true },
  R: { unit: 'Ω', prefixable: false },
  V: { unit: 'V', prefixable: true },
  v: { unit: 'V', prefixable: true },
  A: { unit: 'A', prefixable: true },
  F: { unit: 'F', prefixable: true },
  f: { unit: 'F', prefixable: true },
  Hz: { unit: 'Hz', prefixable: true },
  W: { unit: 'W', prefixable: true },
  w: { unit: 'W', prefixable: true },
  s: { unit: 's', prefixable: true },
  lx: { unit: 'lx', prefixable: true },
  cd: { unit: 'cd', prefixable: true },
  m: { unit: 'm', prefixable: true },
  '°': { unit: '°', prefixable: false },
  '%': { unit: '%', prefixable: false },
  '°C': { unit: '°C', prefixable: false },
  '℃': { unit: '°C', prefixable: false },
};

// Words, matched case-insensitively ("kOhm", "KOHM", "MHZ").
const WORD_ALIASES: Record<string, Alias> = {
  ohm: { unit: 'Ω', prefixable: true },
  ohms: { unit: 'Ω', prefixable: true },
  volt: { unit: 'V', prefixable: true },
  volts: { unit: 'V', prefixable: true },
  amp: { unit: 'A', prefixable: true },
  amps: { unit: 'A', prefixable: true },
  ampere: { unit: 'A', prefixable: true },
  amperes: { unit: 'A', prefixable: true },
  farad: { unit: 'F', prefixable: true },
  farads: { unit: 'F', prefixable: true },
  hz: { unit: 'Hz', prefixable: true },
  hertz: { unit: 'Hz', prefixable: true },
  watt: { unit: 'W', prefixable: true },
  watts: { unit: 'W', prefixable: true },
  sec: { unit: 's', prefixable: true },
  secs: { unit: 's', prefixable: true },
  second: { unit: 's', prefixable: true },
  seconds: { unit: 's', prefixable: true },
  lux: { unit: 'lx', prefixable: true },
  candela: { unit: 'cd', prefixable: true },
  metre: { unit: 'm', prefixable: true },
  metres: { unit: 'm', prefixable: true },
  meter: { unit: 'm', prefixable: true },
  meters: { unit: 'm', prefixable: true },
  deg: { unit: '°', prefixable: false },
  degree: { unit: '°', prefixable: false },
  degrees: { unit: '°', prefixable: false },
  percent: { unit: '%', prefixable: false },
  '°c': { unit: '°C', prefixable: false },
  degc: { unit: '°C', prefixable: false },
  degreec: { unit: '°C', prefixable: false },
  degreesc: { unit: '°C', prefixable: false },
  celsius: { unit: '°C', prefixable: false },
};

// Denominators of the compound units: per second and per root hertz.
const ROOT_HERTZ = new Set(['√hz', '√(hz)', 'rthz', 'rt(hz)', 'sqrthz', 'sqrt(hz)', 'hz^0.5', 'hz^½']);

function lookupAlias(text: string): Alias | undefined {
  return SYMBOL_ALIASES[text] ?? (text.length > 1 ? WORD_ALIASES[text.toLowerCase()] : undefined);
}

export interface UnitCandidate {
  unit: CanonicalUnit;
  /** Power of ten to apply to the number. */
  exponent: number;
  /** exact: a unit with no prefix; prefixed: prefix + unit; prefix: a bare prefix, unit still to be decided. */
  kind: 'exact' | 'prefixed' | 'prefix';
  /** The prefix symbol, for kind 'prefix'. */
  prefix?: string;
}

function simpleCandidates(text: string): UnitCandidate[] {
  const out: UnitCandidate[] = [];
  const exact = lookupAlias(text);
  if (exact) out.push({ unit: exact.unit, exponent: 0, kind: 'exact' });
  for (const p of PREFIX_SYMBOLS) {
    if (text.length > p.length && text.startsWith(p)) {
      const alias = lookupAlias(text.slice(p.length));
      if (alias?.prefixable) out.push({ unit: alias.unit, exponent: PREFIXES[p]!, kind: 'prefixed' });
    }
  }
  return out;
}

function denominatorCandidates(text: string): { unit: string; exponent: number }[] {
  if (ROOT_HERTZ.has(text.toLowerCase())) return [{ unit: '√Hz', exponent: 0 }];
  // Only "per second" takes a prefix in the denominator (V/µs); anything else is not a unit we store.
  return simpleCandidates(text).filter((c) => c.unit === 's');
}

/**
 * Every reading of a unit suffix (already stripped of spaces, µ and Ω normalised), best first:
 * a plain unit, then prefix + unit, then a bare prefix.
 */
export function unitCandidates(suffix: string): UnitCandidate[] {
  if (suffix === '') return [{ unit: '', exponent: 0, kind: 'exact' }];
  const out: UnitCandidate[] = [];
  const slash = suffix.indexOf('/');
  if (slash > 0) {
    const nums = simpleCandidates(suffix.slice(0, slash));
    const dens = denominatorCandidates(suffix.slice(slash + 1));
    for (const n of nums) {
      for (const d of dens) {
        const unit = `${n.unit}/${d.unit}`;
        if (isCanonicalUnit(unit)) {
          const kind = n.kind === 'exact' && d.exponent === 0 ? 'exact' : 'prefixed';
          out.push({ unit, exponent: n.exponent - d.exponent, kind });
        }
      }
    }
  } else {
    out.push(...simpleCandidates(suffix));
    const prefix = PREFIXES[suffix];
    if (prefix !== undefined) out.push({ unit: '', exponent: prefix, kind: 'prefix', prefix: suffix });
  }
  const rank = { exact: 0, prefixed: 1, prefix: 2 } as const;
  return out.sort((a, b) => rank[a.kind] - rank[b.kind]);
}

/** Resolve a canonical unit or any accepted spelling ("ohm", "V/us" without prefix) to its canonical symbol. */
export function canonicalUnit(unit: string): CanonicalUnit | undefined {
  const norm = normaliseText(unit).replace(/\s+/g, '');
  if (isCanonicalUnit(norm)) return norm;
  const hit = unitCandidates(norm).find((c) => c.exponent === 0 && c.kind === 'exact');
  return hit?.unit;
}

/**
 * Power of ten between a display unit and its canonical unit: 'V/µs' → 6 for 'V/s', 'mcd' → -3 for 'cd'.
 * Returns undefined when the display unit does not measure the same thing.
 */
export function displayUnitExponent(displayUnit: string, unit: string): number | undefined {
  const target = canonicalUnit(unit);
  if (target === undefined) return undefined;
  const norm = normaliseText(displayUnit).replace(/\s+/g, '');
  const hit = unitCandidates(norm).find((c) => c.kind !== 'prefix' && c.unit === target);
  return hit?.exponent;
}

/** Display units as shown to people: micro sign U+00B5, Ω as U+03A9, √Hz. */
export function normaliseDisplayUnit(displayUnit: string): string {
  return normaliseText(displayUnit)
    .replace(/\s+/g, '')
    .replace(/\/(?:rt|sqrt)\(?Hz\)?$/i, '/√Hz')
    .replace(/\/us/, '/µs')
    .replace(/^u(?=[A-Za-zΩ])/, 'µ');
}

/** Normalise look-alike characters: Greek mu → micro sign, ohm sign → omega, minus sign → hyphen, odd spaces. */
export function normaliseText(input: string): string {
  return input
    .replace(/\u03BC/g, '\u00B5')
    .replace(/\u2126/g, '\u03A9')
    .replace(/[\u2212\u2012\u2010\u2011]/g, '-')
    .replace(/\u00BA/g, '°')
    .replace(/[\u00A0\u2009\u202F\u2007\u2002\u2003]/g, ' ')
    .trim();
}
