/**
 * Printing quantities the way datasheets do. Content is written with canonical glyphs (µ, Ω, √Hz, °, −) and one
 * pass per document rewrites them to that document's habits (u, kohm, rtHz, deg, a plain hyphen), so the truth
 * never depends on the spelling.
 */

export const PREFIX_EXPONENTS = { f: -15, p: -12, n: -9, 'µ': -6, m: -3, '': 0, k: 3, M: 6 } as const;
export type Prefix = keyof typeof PREFIX_EXPONENTS;

export interface UnitStyle {
  micro: 'µ' | 'μ' | 'u';
  /** kΩ, k Ω, kohm, K (10K, KΩ in a unit column), k (10k). */
  ohm: 'symbol' | 'spaced' | 'word' | 'capital-letter' | 'letter';
  rootHz: '√Hz' | 'rtHz';
  degree: '°' | 'deg';
  /** "20 %" or "20%". */
  percent: 'spaced' | 'tight';
  minus: '−' | '-';
}

export const CANONICAL_STYLE: UnitStyle = {
  micro: 'µ',
  ohm: 'symbol',
  rootHz: '√Hz',
  degree: '°',
  percent: 'spaced',
  minus: '−',
};

/** A short tag per spelling, for the corpus's variation list. */
export function unitStyleTags(style: UnitStyle): string[] {
  return [`micro:${style.micro === 'µ' ? 'U+00B5' : style.micro === 'μ' ? 'U+03BC' : 'u'}`, `ohm:${style.ohm}`, `root-hz:${style.rootHz}`, `degree:${style.degree}`, `percent:${style.percent}`, `minus:${style.minus === '-' ? 'hyphen' : 'U+2212'}`];
}

/** Number text with at most four significant digits and no trailing zeros: 0.5, 3.3, 100, 2856. */
export function numberText(n: number): string {
  const text = Number(n.toPrecision(4)).toString();
  if (/e/.test(text)) throw new Error(`${n} needs another prefix to print plainly`);
  return text;
}

/** Picks the prefix that prints every value as a plain number between 0.1 and 9999 where possible. */
export function choosePrefix(values: readonly number[], candidates: readonly Prefix[], prefer?: Prefix, invert = false): Prefix {
  const scale = (p: Prefix) => 10 ** (invert ? -PREFIX_EXPONENTS[p] : PREFIX_EXPONENTS[p]);
  const fits = (p: Prefix) =>
    values.every((v) => {
      const d = Math.abs(v) / scale(p);
      return d === 0 || (d >= 0.1 && d < 10_000 && Math.abs(Number(d.toPrecision(4)) - d) <= d * 1e-9);
    });
  if (prefer !== undefined && fits(prefer)) return prefer;
  const ok = candidates.filter(fits);
  if (ok.length === 0) throw new Error(`No prefix of ${candidates.join(', ')} prints ${values.join(', ')} plainly`);
  // Smallest display number at least 1: "10 MHz" rather than "10000 kHz".
  return ok.find((p) => values.every((v) => v === 0 || Math.abs(v) / scale(p) >= 1)) ?? ok[ok.length - 1]!;
}

/** Prints an SI value in a prefix's display unit: 9e6 with 'µ' (V/µs) → "9". */
export function displayNumber(si: number, prefix: Prefix, invert = false): string {
  // Per-time units invert the prefix: V/µs holds 10^6 V/s.
  const exp = invert ? -PREFIX_EXPONENTS[prefix] : PREFIX_EXPONENTS[prefix];
  return numberText(si / 10 ** exp);
}

/** Rewrites canonical glyphs to a document's spelling habits. */
export function applyUnitStyle(text: string, style: UnitStyle): string {
  let out = text;
  if (style.micro !== 'µ') out = out.replaceAll('µ', style.micro);
  if (style.rootHz === 'rtHz') out = out.replaceAll('√Hz', 'rtHz');
  if (style.degree === 'deg') out = out.replace(/(\d) ?°(?!C)/g, '$1 deg').replace(/^°$/, 'deg');
  if (style.percent === 'tight') out = out.replace(/(\d) %/g, '$1%');
  if (style.minus === '-') out = out.replaceAll('−', '-');
  switch (style.ohm) {
    case 'spaced':
      out = out.replace(/([kM])Ω/g, '$1 Ω');
      break;
    case 'word':
      out = out.replace(/([kM]?)Ω/g, '$1ohm');
      break;
    case 'capital-letter':
      out = out
        .replace(/(\d) ?kΩ/g, '$1K')
        .replace(/(\d) ?MΩ/g, '$1M')
        .replace(/\bkΩ/g, 'KΩ');
      break;
    case 'letter':
      out = out.replace(/(\d) ?kΩ/g, '$1k').replace(/(\d) ?MΩ/g, '$1M').replace(/^kΩ$/, 'k').replace(/^MΩ$/, 'M');
      break;
    case 'symbol':
      break;
  }
  return out;
}
