import { formatQuantity } from '@understudy/shared-types';
import { useId } from 'react';
import { ChartFigure, ChartLegend, ChartTable } from './chart-figure';
import { decades, logScale, px, seriesStyle, type Scale } from './scales';

export interface LightCell {
  id: string;
  label: string;
  /** Resistance at 10 lx, lowest and highest of the spread, in ohms. */
  lightMin?: number;
  lightMax?: number;
  /** Slope of log R against log E. */
  gamma?: number;
}

export const REFERENCE_LUX = 10;
export const LUX_RANGE = [0.1, 1000] as const;
/** Sampled at every decade, so the reference point at 10 lx is one of the vertices. */
const LUX_SAMPLES = [0.1, 1, 10, 100, 1000] as const;

/** R(E) = R10 · (E / 10 lx)^(−γ) */
export function resistanceAt(r10: number, gamma: number, lux: number): number {
  return r10 * (lux / REFERENCE_LUX) ** -gamma;
}

/** The middle of a min–max spread on a log scale: the geometric mean, or the one end that is given. */
export function referenceResistance(cell: Pick<LightCell, 'lightMin' | 'lightMax'>): number | undefined {
  const { lightMin: lo, lightMax: hi } = cell;
  if (lo !== undefined && hi !== undefined && lo > 0 && hi > 0) return Math.sqrt(lo * hi);
  if (lo !== undefined && lo > 0) return lo;
  if (hi !== undefined && hi > 0) return hi;
  return undefined;
}

export interface LightPoint {
  lux: number;
  ohms: number;
}

export interface LightSeries {
  id: string;
  label: string;
  r10: number;
  gamma: number;
  line: LightPoint[];
  /** The spread between the cell's min and max light resistance, when both are given. */
  band?: { low: LightPoint[]; high: LightPoint[] };
}

export function lightSeries(cell: LightCell): LightSeries | undefined {
  const r10 = referenceResistance(cell);
  if (r10 === undefined || cell.gamma === undefined || !(cell.gamma > 0)) return undefined;
  const gamma = cell.gamma;
  const curve = (r: number) => LUX_SAMPLES.map((lux) => ({ lux, ohms: resistanceAt(r, gamma, lux) }));
  const hasBand = cell.lightMin !== undefined && cell.lightMax !== undefined && cell.lightMin > 0 && cell.lightMax > cell.lightMin;
  return {
    id: cell.id,
    label: cell.label,
    r10,
    gamma,
    line: curve(r10),
    ...(hasBand ? { band: { low: curve(cell.lightMin!), high: curve(cell.lightMax!) } } : {}),
  };
}

const WIDTH = 680;
const HEIGHT = 400;
const M = { left: 74, right: 24, top: 18, bottom: 52 };

export interface LightChartLayout {
  x: Scale;
  y: Scale;
  xTicks: number[];
  yTicks: number[];
  series: LightSeries[];
  skipped: LightCell[];
}

/** Scales and series for the chart; exported so the geometry can be checked without a browser. */
export function lightChartLayout(cells: readonly LightCell[]): LightChartLayout {
  const series: LightSeries[] = [];
  const skipped: LightCell[] = [];
  for (const cell of cells) {
    const s = lightSeries(cell);
    if (s) series.push(s);
    else skipped.push(cell);
  }
  const all = series.flatMap((s) => [...s.line, ...(s.band ? [...s.band.low, ...s.band.high] : [])].map((p) => p.ohms));
  const yTicks = all.length > 0 ? decades(Math.min(...all), Math.max(...all)) : [100, 1_000, 10_000, 100_000];
  const yDomain: [number, number] = [yTicks[0]!, yTicks[yTicks.length - 1]!];
  if (yDomain[0] === yDomain[1]) yDomain[1] = yDomain[0] * 10;
  return {
    x: logScale(LUX_RANGE, [M.left, WIDTH - M.right]),
    y: logScale(yDomain, [HEIGHT - M.bottom, M.top]),
    xTicks: decades(LUX_RANGE[0], LUX_RANGE[1]),
    yTicks: yDomain[1] === yTicks[yTicks.length - 1] ? yTicks : [...yTicks, yDomain[1]],
    series,
    skipped,
  };
}

export function pathThrough(points: readonly LightPoint[], x: Scale, y: Scale): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${px(x(p.lux))},${px(y(p.ohms))}`).join(' ');
}

function bandPath(band: NonNullable<LightSeries['band']>, x: Scale, y: Scale): string {
  const back = [...band.high].reverse();
  return `${pathThrough(band.low, x, y)} ${back.map((p) => `L${px(x(p.lux))},${px(y(p.ohms))}`).join(' ')} Z`;
}

const ohms = (v: number) => formatQuantity(v, 'Ω', { digits: 3 });
const lux = (v: number) => `${Number(v.toPrecision(3))} lx`;

/** Minor grid lines at 2…9 times each decade. */
function minors(ticks: readonly number[]): number[] {
  const out: number[] = [];
  for (let i = 0; i < ticks.length - 1; i++) for (let k = 2; k <= 9; k++) out.push(ticks[i]! * k);
  return out;
}

/**
 * Resistance against illuminance on log–log axes, from 0.1 to 1000 lx: a line through each cell's reference
 * resistance at 10 lx with slope −γ, and a band between its lowest and highest light resistance.
 */
export function LightResponseChart({ cells }: { cells: readonly LightCell[] }) {
  const clipId = `light-clip-${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const layout = lightChartLayout(cells);
  const { x, y, xTicks, yTicks, series, skipped } = layout;
  const [plotLeft, plotRight] = x.range;
  const [plotBottom, plotTop] = y.range;

  const description =
    series.length === 0
      ? 'No cell in this comparison gives both a light resistance and a gamma.'
      : `Log–log plot of resistance against illuminance from 0.1 to 1000 lux. ${series
          .map(
            (s) =>
              `${s.label}: ${ohms(s.r10)} at 10 lux, gamma ${s.gamma}, falling to ${ohms(resistanceAt(s.r10, s.gamma, 1000))} at 1000 lux`,
          )
          .join('; ')}.`;

  return (
    <ChartFigure
      testId="light-response-chart"
      title="Resistance against light"
      summary={
        <>
          R(E) = R<sub>10</sub> · (E / 10 lx)<sup>−γ</sup>, through the middle of each cell’s 10 lx spread; shading spans its
          min to max.
        </>
      }
      description={description}
      width={WIDTH}
      height={HEIGHT}
      legend={
        <div className="flex flex-col gap-1">
          <ChartLegend items={series.map((s, i) => ({ id: s.id, label: `${s.label} (γ ${s.gamma})`, ...seriesStyle(i) }))} />
          {skipped.length > 0 && (
            <p className="text-xs text-ink-faint">
              Not drawn (needs light resistance and gamma): {skipped.map((c) => c.label).join(', ')}
            </p>
          )}
        </div>
      }
      table={
        <ChartTable
          caption="Light response per cell"
          head={['Cell', 'At 10 lx (min – max)', 'R₁₀ (geometric mean)', 'Gamma', 'At 0.1 lx', 'At 1 lx', 'At 100 lx', 'At 1000 lx']}
          rows={series.map((s) => {
            const cell = cells.find((c) => c.id === s.id)!;
            return [
              s.label,
              cell.lightMin !== undefined && cell.lightMax !== undefined ? `${ohms(cell.lightMin)} – ${ohms(cell.lightMax)}` : ohms(s.r10),
              ohms(s.r10),
              String(s.gamma),
              ohms(resistanceAt(s.r10, s.gamma, 0.1)),
              ohms(resistanceAt(s.r10, s.gamma, 1)),
              ohms(resistanceAt(s.r10, s.gamma, 100)),
              ohms(resistanceAt(s.r10, s.gamma, 1000)),
            ];
          })}
        />
      }
    >
      <defs>
        <clipPath id={clipId}>
          <rect x={plotLeft} y={plotTop} width={plotRight - plotLeft} height={plotBottom - plotTop} />
        </clipPath>
      </defs>
      <rect x={plotLeft} y={plotTop} width={plotRight - plotLeft} height={plotBottom - plotTop} className="fill-card stroke-rule-strong" />
      <g aria-hidden="true">
        {minors(xTicks).map((t) => (
          <line key={`xm${t}`} x1={px(x(t))} x2={px(x(t))} y1={plotTop} y2={plotBottom} className="stroke-rule/60" strokeWidth="0.75" />
        ))}
        {minors(yTicks).map((t) => (
          <line key={`ym${t}`} x1={plotLeft} x2={plotRight} y1={px(y(t))} y2={px(y(t))} className="stroke-rule/60" strokeWidth="0.75" />
        ))}
        {xTicks.map((t) => (
          <g key={`x${t}`}>
            <line x1={px(x(t))} x2={px(x(t))} y1={plotTop} y2={plotBottom} className="stroke-rule-strong" strokeWidth="1" />
            <text x={px(x(t))} y={plotBottom + 18} textAnchor="middle" className="fill-ink-soft text-[12px] tabular-nums">
              {lux(t)}
            </text>
          </g>
        ))}
        {yTicks.map((t) => (
          <g key={`y${t}`}>
            <line x1={plotLeft} x2={plotRight} y1={px(y(t))} y2={px(y(t))} className="stroke-rule-strong" strokeWidth="1" />
            <text x={plotLeft - 8} y={px(y(t))} textAnchor="end" dominantBaseline="central" className="fill-ink-soft text-[12px] tabular-nums">
              {ohms(t)}
            </text>
          </g>
        ))}
        <line x1={px(x(REFERENCE_LUX))} x2={px(x(REFERENCE_LUX))} y1={plotTop} y2={plotBottom} className="stroke-ink-faint" strokeDasharray="3 3" />
        <text x={(plotLeft + plotRight) / 2} y={HEIGHT - 10} textAnchor="middle" className="fill-ink-soft text-[12px]">
          Illuminance (lx), log scale
        </text>
        <text
          transform={`translate(16 ${(plotTop + plotBottom) / 2}) rotate(-90)`}
          textAnchor="middle"
          className="fill-ink-soft text-[12px]"
        >
          Resistance (Ω), log scale
        </text>
      </g>
      <g clipPath={`url(#${clipId})`}>
        {series.map((s, i) => {
          const { colour } = seriesStyle(i);
          return s.band ? (
            <path key={`band-${s.id}`} d={bandPath(s.band, x, y)} fill={colour} fillOpacity="0.12" stroke="none" data-testid={`light-band-${s.id}`} />
          ) : null;
        })}
        {series.map((s, i) => {
          const { colour, dash } = seriesStyle(i);
          return (
            <g key={s.id}>
              <path
                d={pathThrough(s.line, x, y)}
                fill="none"
                stroke={colour}
                strokeWidth="2.5"
                strokeDasharray={dash || undefined}
                strokeLinecap="round"
                data-testid={`light-line-${s.id}`}
                data-r10={s.r10}
              />
              <circle cx={px(x(REFERENCE_LUX))} cy={px(y(s.r10))} r="4" fill={colour} stroke="#fffdf9" strokeWidth="1.5">
                <title>{`${s.label}: ${ohms(s.r10)} at 10 lx`}</title>
              </circle>
            </g>
          );
        })}
      </g>
    </ChartFigure>
  );
}
