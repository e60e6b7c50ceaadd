import { normalizePinFunction } from '@understudy/shared-types';
import { useId } from 'react';
import { cx } from './cx';

export interface PinPlacement {
  pin: number;
  label: string;
  side: 'left' | 'right';
  /** 1 at the top, counting down. */
  row: number;
  kind: 'positive' | 'negative' | 'nc' | 'signal';
}

function kindOf(label: string): PinPlacement['kind'] {
  const fn = normalizePinFunction(label);
  if (fn === 'V+') return 'positive';
  if (fn === 'V-') return 'negative';
  if (fn === 'NC') return 'nc';
  return 'signal';
}

/**
 * Dual-in-line numbering seen from above with the notch at the top: pin 1 top left, counting down the left side,
 * then up the right side, so the last pin sits opposite pin 1. Odd counts put the extra pin on the left.
 */
export function placePins(pins: Readonly<Record<number, string>>): PinPlacement[] {
  const numbers = Object.keys(pins)
    .map(Number)
    .filter((n) => Number.isInteger(n) && n > 0)
    .sort((a, b) => a - b);
  const count = numbers.length === 0 ? 0 : Math.max(numbers.length, numbers[numbers.length - 1]!);
  const leftCount = Math.ceil(count / 2);
  const out: PinPlacement[] = [];
  for (let n = 1; n <= count; n++) {
    const label = pins[n] ?? '';
    const side = n <= leftCount ? 'left' : 'right';
    out.push({ pin: n, label, side, row: side === 'left' ? n : count - n + 1, kind: kindOf(label) });
  }
  return out;
}

const PITCH = 30;
const BODY_W = 112;
const PIN_LEN = 22;
const LABEL_W = 112;
const PAD_Y = 14;

const KIND_CLASSES: Record<PinPlacement['kind'], { lead: string; text: string }> = {
  positive: { lead: 'fill-danger', text: 'fill-danger font-bold' },
  negative: { lead: 'fill-[#2f5d8a]', text: 'fill-[#2f5d8a] font-bold' },
  nc: { lead: 'fill-rule-strong', text: 'fill-ink-faint' },
  signal: { lead: 'fill-ink-soft', text: 'fill-ink' },
};

export function PinoutDiagram({
  pins,
  title,
  className,
  highlightPins,
}: {
  pins: Readonly<Record<number, string>>;
  /** What is drawn, e.g. "Pinout of UA-4558, DIP-8". */
  title: string;
  className?: string;
  /** Pins to mark, e.g. those whose function differs from another part's; named in the description too. */
  highlightPins?: ReadonlyArray<number | string>;
}) {
  const titleId = useId();
  const descId = useId();
  const placed = placePins(pins);
  const marked = new Set((highlightPins ?? []).map(Number).filter((n) => Number.isInteger(n)));
  const markedPins = placed.filter((p) => marked.has(p.pin)).map((p) => p.pin);
  const rows = Math.max(1, ...placed.map((p) => p.row));
  const bodyX = LABEL_W + PIN_LEN;
  const bodyY = PAD_Y;
  const bodyH = rows * PITCH + 12;
  const width = bodyX * 2 + BODY_W;
  const height = bodyH + PAD_Y * 2 + 22;
  const yOf = (row: number) => bodyY + 6 + PITCH * (row - 0.5);
  const hasPower = placed.some((p) => p.kind === 'positive' || p.kind === 'negative');

  return (
    <svg
      role="img"
      aria-labelledby={titleId}
      aria-describedby={descId}
      viewBox={`0 0 ${width} ${height}`}
      className={cx('h-auto w-full max-w-md', className)}
      data-testid="pinout"
    >
      <title id={titleId}>{title}</title>
      <desc id={descId}>
        {placed.length === 0
          ? 'No pins recorded.'
          : `Top view, pin 1 at the notch. ${placed.map((p) => `Pin ${p.pin}: ${p.label || 'unlabelled'}`).join('; ')}.${
              markedPins.length > 0 ? ` Marked as different: ${markedPins.length === 1 ? 'pin' : 'pins'} ${markedPins.join(', ')}.` : ''
            }`}
      </desc>
      <rect x={bodyX} y={bodyY} width={BODY_W} height={bodyH} rx="6" className="fill-ink stroke-ink" />
      {/* Pin-1 notch, cut into the top edge. */}
      <path d={`M ${bodyX + BODY_W / 2 - 11} ${bodyY} a 11 11 0 0 0 22 0 z`} className="fill-card" />
      <circle cx={bodyX + 30} cy={yOf(1)} r="3.5" className="fill-paper/70" />
      {placed.map((p) => {
        const y = yOf(p.row);
        const left = p.side === 'left';
        const leadX = left ? bodyX - PIN_LEN : bodyX + BODY_W;
        const k = KIND_CLASSES[p.kind];
        const highlighted = marked.has(p.pin);
        return (
          <g
            key={p.pin}
            data-pin={p.pin}
            data-side={p.side}
            data-row={p.row}
            data-kind={p.kind}
            data-function={p.label}
            data-highlighted={highlighted || undefined}
          >
            <title>{`Pin ${p.pin}: ${p.label || 'unlabelled'}${highlighted ? ' (differs)' : ''}`}</title>
            {highlighted && (
              <rect
                x={left ? 2 : leadX}
                y={y - PITCH / 2 + 2}
                width={LABEL_W + PIN_LEN - 2}
                height={PITCH - 4}
                rx="4"
                className="fill-warn-wash stroke-warn"
                strokeWidth="1.5"
                strokeDasharray="4 2"
              />
            )}
            <rect x={leadX} y={y - 4} width={PIN_LEN} height="8" rx="1.5" className={k.lead} />
            <text
              x={left ? bodyX + 10 : bodyX + BODY_W - 10}
              y={y}
              dominantBaseline="central"
              textAnchor={left ? 'start' : 'end'}
              className="fill-paper font-mono text-[11px]"
            >
              {p.pin}
            </text>
            <text
              x={left ? leadX - 6 : leadX + PIN_LEN + 6}
              y={y}
              dominantBaseline="central"
              textAnchor={left ? 'end' : 'start'}
              className={cx('text-[12px]', k.text)}
            >
              {p.label}
            </text>
          </g>
        );
      })}
      {(hasPower || markedPins.length > 0) && (
        <g aria-hidden="true" transform={`translate(${bodyX - PIN_LEN} ${bodyY + bodyH + 14})`} className="text-[11px]">
          {hasPower && (
            <>
              <rect width="10" height="6" y="-3" className="fill-danger" />
              <text x="14" dominantBaseline="central" className="fill-ink-soft">
                V+ supply
              </text>
              <rect x="86" width="10" height="6" y="-3" className="fill-[#2f5d8a]" />
              <text x="100" dominantBaseline="central" className="fill-ink-soft">
                V− supply
              </text>
            </>
          )}
          {markedPins.length > 0 && (
            <g transform={`translate(${hasPower ? 172 : 0} 0)`}>
              <rect width="10" height="8" y="-4" rx="2" className="fill-warn-wash stroke-warn" strokeDasharray="2 1" />
              <text x="14" dominantBaseline="central" className="fill-ink-soft">
                Differs
              </text>
            </g>
          )}
        </g>
      )}
    </svg>
  );
}
