import { render, screen } from '@testing-library/react';
import { PIN_LAYOUTS } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { PinoutDiagram, placePins } from './pinout-diagram';

function pin(svg: Element, n: number): Element {
  const el = svg.querySelector(`[data-pin="${n}"]`);
  if (!el) throw new Error(`pin ${n} not drawn`);
  return el;
}

describe('pinout diagram', () => {
  it('draws the dual op amp: 8 pins, counter-clockwise from the notch, V+ on 8 and V− on 4', () => {
    render(<PinoutDiagram pins={PIN_LAYOUTS['dip8-dual-opamp'].pins} title="Dual op amp pinout" />);
    const svg = screen.getByRole('img', { name: 'Dual op amp pinout' });
    expect(svg.querySelectorAll('[data-pin]')).toHaveLength(8);

    // 1..4 down the left, 5..8 up the right: pin 8 faces pin 1, pin 5 faces pin 4.
    for (const n of [1, 2, 3, 4]) {
      expect(pin(svg, n)).toHaveAttribute('data-side', 'left');
      expect(pin(svg, n)).toHaveAttribute('data-row', String(n));
    }
    expect(pin(svg, 5)).toHaveAttribute('data-row', '4');
    expect(pin(svg, 8)).toHaveAttribute('data-row', '1');
    expect(pin(svg, 8)).toHaveAttribute('data-side', 'right');

    expect(pin(svg, 8)).toHaveAttribute('data-function', 'V+');
    expect(pin(svg, 8)).toHaveAttribute('data-kind', 'positive');
    expect(pin(svg, 4)).toHaveAttribute('data-function', 'V\u2212');
    expect(pin(svg, 4)).toHaveAttribute('data-kind', 'negative');
    expect(pin(svg, 1)).toHaveAttribute('data-kind', 'signal');
    expect(pin(svg, 1)).toHaveTextContent('OUT A');
    expect(svg).toHaveAccessibleDescription(/Pin 8: V\+/);
  });

  it('numbers a quad package and an odd lug count the same way', () => {
    const quad = placePins(PIN_LAYOUTS['dip14-quad-opamp'].pins);
    expect(quad.find((p) => p.pin === 14)).toMatchObject({ side: 'right', row: 1 });
    expect(quad.find((p) => p.pin === 4)).toMatchObject({ side: 'left', row: 4, kind: 'positive' });
    expect(quad.find((p) => p.pin === 11)).toMatchObject({ side: 'right', row: 4, kind: 'negative' });
    const pot = placePins(PIN_LAYOUTS['pot-3lug'].pins);
    expect(pot.map((p) => [p.pin, p.side, p.row])).toEqual([
      [1, 'left', 1],
      [2, 'left', 2],
      [3, 'right', 1],
    ]);
  });

  it('reads other spellings of the rails as power pins', () => {
    const placed = placePins({ 1: 'OUT', 2: 'IN-', 3: 'IN+', 4: 'VEE', 5: 'VCC' });
    expect(placed.find((p) => p.pin === 4)?.kind).toBe('negative');
    expect(placed.find((p) => p.pin === 5)?.kind).toBe('positive');
  });

  it('marks the pins it is asked to highlight and names them in the description', () => {
    render(<PinoutDiagram pins={PIN_LAYOUTS['dip8-single-opamp'].pins} title="Single op amp pinout" highlightPins={['1', 5, '8']} />);
    const svg = screen.getByRole('img', { name: 'Single op amp pinout' });
    expect([...svg.querySelectorAll('[data-highlighted]')].map((g) => g.getAttribute('data-pin'))).toEqual(['1', '5', '8']);
    expect(pin(svg, 2)).not.toHaveAttribute('data-highlighted');
    expect(svg).toHaveAccessibleDescription(/Marked as different: pins 1, 5, 8\./);
  });
});
