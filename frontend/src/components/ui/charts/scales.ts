/** A mapping from data to pixels that can be run backwards (for clicks on a chart). */
export interface Scale {
  (value: number): number;
  invert(pixel: number): number;
  domain: readonly [number, number];
  range: readonly [number, number];
}

export function linearScale(domain: readonly [number, number], range: readonly [number, number]): Scale {
  const [d0, d1] = domain;
  const [r0, r1] = range;
  const span = d1 - d0 || 1;
  const scale = ((v: number) => r0 + ((v - d0) / span) * (r1 - r0)) as Scale;
  scale.invert = (p: number) => d0 + ((p - r0) / (r1 - r0 || 1)) * span;
  scale.domain = domain;
  scale.range = range;
  return scale;
}

/** Base-10 logarithmic scale; the domain must be positive. */
export function logScale(domain: readonly [number, number], range: readonly [number, number]): Scale {
  const inner = linearScale([Math.log10(domain[0]), Math.log10(domain[1])], range);
  const scale = ((v: number) => inner(Math.log10(v))) as Scale;
  scale.invert = (p: number) => 10 ** inner.invert(p);
  scale.domain = domain;
  scale.range = range;
  return scale;
}

/** A step of 1, 2 or 5 times a power of ten that gives about `count` ticks. */
export function niceStep(span: number, count = 5): number {
  if (!(span > 0)) return 1;
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const f = raw / power;
  const nice = f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10;
  return nice * power;
}

/** Ticks from 0-aligned multiples of a nice step, covering [min, max]. */
export function niceTicks(min: number, max: number, count = 5): number[] {
  const step = niceStep(max - min, count);
  const start = Math.floor(min / step) * step;
  const end = Math.ceil(max / step) * step;
  const ticks: number[] = [];
  // Rounding through toPrecision keeps 0.1 + 0.2 style noise out of the labels.
  for (let v = start; v <= end + step / 2; v += step) ticks.push(Number(v.toPrecision(12)));
  return ticks;
}

/** Powers of ten covering [min, max] inclusive. */
export function decades(min: number, max: number): number[] {
  const lo = Math.floor(Math.log10(min) + 1e-9);
  const hi = Math.ceil(Math.log10(max) - 1e-9);
  const out: number[] = [];
  for (let e = lo; e <= hi; e++) out.push(Number((10 ** e).toPrecision(12)));
  return out;
}

/** Two decimals are plenty for SVG coordinates and keep paths readable. */
export function px(value: number): number {
  return Math.round(value * 100) / 100;
}

/**
 * Colours for up to six series, distinct in hue and lightness; each series also gets its own dash
 * pattern so the chart reads without colour.
 */
export const SERIES_COLOURS = ['#b14f27', '#2f5d8a', '#2c6a4c', '#7a3f73', '#855700', '#1e2330'] as const;
export const SERIES_DASHES = ['', '6 3', '2 3', '8 3 2 3', '4 4', '1 2'] as const;

export function seriesStyle(index: number): { colour: string; dash: string } {
  return {
    colour: SERIES_COLOURS[index % SERIES_COLOURS.length]!,
    dash: SERIES_DASHES[index % SERIES_DASHES.length]!,
  };
}
