import {
  canonicalUnit,
  displayUnitExponent,
  FORMAT_PREFIXES,
  normaliseDisplayUnit,
  UNITS,
  type CanonicalUnit,
} from './units';

export interface FormatOptions {
  /** Significant digits, default 3 (enough for E96 values); trailing zeros are dropped. */
  digits?: number;
  /** 'rkm' writes resistances and capacitances as IEC 60062 codes (4K7, R47, 4n7); other units ignore it. */
  style?: 'si' | 'rkm';
  /** Show the value in this unit instead of choosing a prefix: 'V/µs', 'nV/√Hz', 'mcd', 'nm', 'mA'. */
  displayUnit?: string;
}

const RKM_RESISTANCE: Record<number, string> = { 0: 'R', 3: 'K', 6: 'M', 9: 'G', 12: 'T' };
const RKM_CAPACITANCE: Record<number, string> = { [-12]: 'p', [-9]: 'n', [-6]: 'µ', [-3]: 'm', 0: 'F' };

function split(rounded: number): { mantissa: string; exponent: number } {
  const [m, e] = rounded.toExponential().split('e');
  return { mantissa: m!, exponent: Number(e) };
}

/** Shift a decimal by a power of ten through its text form, so 4.7e3 / 1e3 is exactly 4.7. */
function shifted(mantissa: string, exponent: number): string {
  return String(Number(`${mantissa}e${exponent}`));
}

function engineeringExponent(exponent: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, Math.floor(exponent / 3) * 3));
}

function formatRkm(value: number, unit: 'Ω' | 'F', digits: number): string | undefined {
  const letters = unit === 'Ω' ? RKM_RESISTANCE : RKM_CAPACITANCE;
  const [min, max] = unit === 'Ω' ? [0, 12] : [-12, 0];
  const rounded = Number(Math.abs(value).toPrecision(digits));
  const sign = value < 0 ? '-' : '';
  if (rounded === 0) return unit === 'Ω' ? '0R' : '0F';
  const { mantissa, exponent } = split(rounded);
  const exp3 = engineeringExponent(exponent, min, max);
  const text = shifted(mantissa, exponent - exp3);
  if (text.includes('e')) return undefined;
  const [int = '', frac = ''] = text.split('.');
  const letter = letters[exp3]!;
  const whole = int === '0' ? '' : int;
  if (frac === '') return `${sign}${whole}${letter}${whole.length === 1 ? '0' : ''}`;
  return `${sign}${whole}${letter}${frac}`;
}

/**
 * Write a value in engineering notation: "4.7 kΩ", "13 V/µs", "470 nF", "10 nV/√Hz", "-40 °C", "5 %", "30°".
 * Uses the micro sign U+00B5. Values are given in SI base units, as parseQuantity returns them.
 */
export function formatQuantity(value: number, unit: string, opts: FormatOptions = {}): string {
  const canonical: CanonicalUnit | undefined = canonicalUnit(unit);
  if (canonical === undefined) throw new TypeError(`formatQuantity: unknown unit "${unit}"`);
  if (!Number.isFinite(value)) return '—';
  const digits = Math.min(15, Math.max(1, Math.round(opts.digits ?? 3)));
  const info = UNITS[canonical];

  if (opts.style === 'rkm' && (canonical === 'Ω' || canonical === 'F')) {
    const code = formatRkm(value, canonical, digits);
    if (code !== undefined) return code;
  }

  const rounded = Number(value.toPrecision(digits));
  const { mantissa, exponent } = split(rounded);
  const display = opts.displayUnit ?? info.defaultDisplay;
  let shift: number;
  let label: string;
  if (display !== undefined) {
    const exp = displayUnitExponent(display, canonical);
    if (exp === undefined) throw new TypeError(`formatQuantity: "${display}" is not a display unit for ${canonical}`);
    shift = exp;
    label = normaliseDisplayUnit(display);
  } else if (info.prefixable) {
    shift = rounded === 0 ? 0 : engineeringExponent(exponent, -24, 12);
    label = FORMAT_PREFIXES[shift]! + canonical;
  } else {
    shift = 0;
    label = canonical;
  }
  const text = shifted(mantissa, exponent - shift);
  if (label === '') return text;
  return info.spaced ? `${text} ${label}` : `${text}${label}`;
}
