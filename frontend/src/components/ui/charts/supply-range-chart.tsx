import { formatQuantity } from '@understudy/shared-types';
import type { MouseEvent, ReactNode } from 'react';
import { ChartFigure, ChartTable } from './chart-figure';
import { linearScale, niceTicks, px, seriesStyle } from './scales';

export interface SupplyRangeSeries {
  id: string;
  label: string;
  /** Total span between the rails, in volts. */
  min?: number;
  max?: number;
}

const WIDTH = 680;
const LABEL_W = 150;
const RIGHT = 24;
const TOP = 26;
const ROW = 34;
const AXIS = 44;

const volts = (v: number) => formatQuantity(v, 'V', { digits: 3 });

/** A required supply given as a span of its own ("9 V to 18 V"): a part must cover all of it. */
export interface SupplySpan {
  min: number;
  max: number;
}

export function coversMarker(s: SupplyRangeSeries, marker: number | SupplySpan | undefined): boolean | undefined {
  if (marker === undefined || s.min === undefined || s.max === undefined) return undefined;
  const [low, high] = typeof marker === 'number' ? [marker, marker] : [marker.min, marker.max];
  return s.min <= low && high <= s.max;
}

export function supplyRangeLayout(series: readonly SupplyRangeSeries[], marker: number | SupplySpan | undefined) {
  const top = marker === undefined ? 0 : typeof marker === 'number' ? marker : marker.max;
  const highest = Math.max(top, ...series.map((s) => s.max ?? s.min ?? 0), 5);
  const ticks = niceTicks(0, highest * 1.04, 6);
  const x = linearScale([0, ticks[ticks.length - 1]!], [LABEL_W, WIDTH - RIGHT]);
  const height = TOP + Math.max(1, series.length) * ROW + AXIS;
  return { x, ticks, height, plotBottom: TOP + Math.max(1, series.length) * ROW };
}

/**
 * Horizontal bars, one per part, from its lowest to highest total supply span, with a marker line at the supply the
 * circuit has (a 9 V battery by default). Clicking the plot moves the marker. A `markerSpan` (a supply that varies,
 * 9 V to 18 V) is drawn as a band instead, and a part runs on it only if it covers the whole band.
 */
export function SupplyRangeChart({
  series,
  marker,
  markerSpan,
  onMarkerChange,
  controls,
  title = 'Supply range',
}: {
  series: readonly SupplyRangeSeries[];
  marker: number | undefined;
  markerSpan?: SupplySpan;
  onMarkerChange?: (volts: number) => void;
  controls?: ReactNode;
  title?: string;
}) {
  const band = markerSpan && markerSpan.max > markerSpan.min ? markerSpan : undefined;
  const required: number | SupplySpan | undefined = band ?? markerSpan?.max ?? marker;
  const line = band ? undefined : typeof required === 'number' ? required : undefined;
  const requiredText = band ? `${volts(band.min)} to ${volts(band.max)}` : line !== undefined ? volts(line) : '';
  const { x, ticks, height, plotBottom } = supplyRangeLayout(series, required);
  const covered = series.filter((s) => coversMarker(s, required) === true);

  function handleClick(event: MouseEvent<SVGRectElement>) {
    if (!onMarkerChange) return;
    const svg = event.currentTarget.ownerSVGElement;
    const box = svg?.getBoundingClientRect();
    if (!box || box.width === 0) return;
    const userX = ((event.clientX - box.left) / box.width) * WIDTH;
    const value = Math.max(0, Math.round(x.invert(userX) * 2) / 2);
    onMarkerChange(value);
  }

  const description =
    series.length === 0
      ? 'No part in this comparison states a supply range.'
      : `${series
          .map((s) =>
            s.min !== undefined && s.max !== undefined ? `${s.label}: ${volts(s.min)} to ${volts(s.max)}` : `${s.label}: not given`,
          )
          .join('; ')}.${required !== undefined ? ` Marker at ${requiredText}; ${covered.length} of ${series.length} run on it.` : ''}`;

  return (
    <ChartFigure
      testId="supply-range-chart"
      title={title}
      summary={
        required !== undefined
          ? `Total span between the rails. ${covered.length} of ${series.length} run on ${requiredText}.`
          : 'Total span between the rails.'
      }
      description={description}
      width={WIDTH}
      height={height}
      controls={controls}
      table={
        <ChartTable
          caption="Supply range per part"
          head={['Part', 'Lowest supply', 'Highest supply', required !== undefined ? `Runs on ${requiredText}` : 'Runs on marker']}
          rows={series.map((s) => [
            s.label,
            s.min !== undefined ? volts(s.min) : '—',
            s.max !== undefined ? volts(s.max) : '—',
            coversMarker(s, required) === undefined ? '—' : coversMarker(s, required) ? 'Yes' : 'No',
          ])}
        />
      }
    >
      {ticks.map((t) => (
        <g key={t}>
          <line x1={px(x(t))} x2={px(x(t))} y1={TOP - 8} y2={plotBottom} className="stroke-rule" strokeWidth="1" />
          <text x={px(x(t))} y={plotBottom + 18} textAnchor="middle" className="fill-ink-soft text-[12px] tabular-nums">
            {volts(t)}
          </text>
        </g>
      ))}
      <line x1={LABEL_W} x2={WIDTH - RIGHT} y1={plotBottom} y2={plotBottom} className="stroke-ink-soft" />
      <text x={(LABEL_W + WIDTH - RIGHT) / 2} y={plotBottom + 38} textAnchor="middle" className="fill-ink-soft text-[12px]">
        Total supply span (V)
      </text>
      {series.map((s, i) => {
        const y = TOP + i * ROW + ROW / 2;
        const { colour } = seriesStyle(i);
        const fits = coversMarker(s, required);
        return (
          <g key={s.id} data-testid="supply-bar" data-part={s.id}>
            <text x={LABEL_W - 10} y={y} textAnchor="end" dominantBaseline="central" className="fill-ink text-[13px] font-semibold">
              {s.label.length > 18 ? `${s.label.slice(0, 17)}…` : s.label}
            </text>
            {s.min !== undefined && s.max !== undefined ? (
              <rect
                x={px(x(s.min))}
                y={y - 8}
                width={Math.max(3, px(x(s.max) - x(s.min)))}
                height="16"
                rx="3"
                fill={colour}
                fillOpacity={fits === false ? 0.35 : 0.9}
                stroke={colour}
                strokeWidth="1.5"
              >
                <title>{`${s.label}: ${volts(s.min)} to ${volts(s.max)}`}</title>
              </rect>
            ) : (
              <text x={LABEL_W + 8} y={y} dominantBaseline="central" className="fill-ink-faint text-[12px] italic">
                supply range not given
              </text>
            )}
          </g>
        );
      })}
      {onMarkerChange && (
        <rect
          x={LABEL_W}
          y={TOP - 8}
          width={WIDTH - RIGHT - LABEL_W}
          height={plotBottom - TOP + 8}
          fill="transparent"
          className="cursor-crosshair"
          onClick={handleClick}
        />
      )}
      {band && (
        <g data-testid="supply-marker" pointerEvents="none">
          <rect
            x={px(x(band.min))}
            y={TOP - 12}
            width={Math.max(2, px(x(band.max) - x(band.min)))}
            height={plotBottom - TOP + 12}
            className="fill-ink/10 stroke-ink"
            strokeWidth="1.5"
            strokeDasharray="5 3"
          />
          <text x={px((x(band.min) + x(band.max)) / 2)} y={TOP - 16} textAnchor="middle" className="fill-ink text-[12px] font-bold">
            {requiredText}
          </text>
        </g>
      )}
      {line !== undefined && (
        <g data-testid="supply-marker" pointerEvents="none">
          <line
            x1={px(x(line))}
            x2={px(x(line))}
            y1={TOP - 12}
            y2={plotBottom}
            className="stroke-ink"
            strokeWidth="2"
            strokeDasharray="5 3"
          />
          <text x={px(x(line))} y={TOP - 16} textAnchor="middle" className="fill-ink text-[12px] font-bold">
            {volts(line)}
          </text>
        </g>
      )}
    </ChartFigure>
  );
}
