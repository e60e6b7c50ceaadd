import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LightResponseChart, lightChartLayout, referenceResistance, resistanceAt, type LightCell } from './light-response-chart';
import { px } from './scales';
import { SupplyRangeChart } from './supply-range-chart';

const cells: LightCell[] = [
  { id: 'a', label: 'LC-5516', lightMin: 8e3, lightMax: 20e3, gamma: 0.7 },
  { id: 'b', label: 'LC-0712', lightMin: 50e3, lightMax: 100e3, gamma: 0.85 },
];

/** The vertices of an SVG path written as "M x,y L x,y …". */
function vertices(d: string): Array<[number, number]> {
  return [...d.matchAll(/[ML]([\d.-]+),([\d.-]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

describe('resistance against light', () => {
  it('takes the geometric mean of the 10 lx spread as R10', () => {
    expect(referenceResistance({ lightMin: 8e3, lightMax: 20e3 })).toBeCloseTo(Math.sqrt(8e3 * 20e3), 6);
    expect(referenceResistance({ lightMin: 8e3 })).toBe(8e3);
  });

  it('follows R(E) = R10 · (E / 10 lx)^−γ: a decade more light divides R by 10^γ', () => {
    expect(resistanceAt(10e3, 0.7, 10)).toBe(10e3);
    expect(resistanceAt(10e3, 0.7, 100)).toBeCloseTo(10e3 / 10 ** 0.7, 6);
    expect(resistanceAt(10e3, 0.7, 1)).toBeCloseTo(10e3 * 10 ** 0.7, 6);
  });

  it('draws each line through R10 at 10 lux, on log–log axes from 0.1 to 1000 lux', () => {
    const layout = lightChartLayout(cells);
    render(<LightResponseChart cells={cells} />);
    const chart = screen.getByRole('img', { name: 'Resistance against light' });

    for (const s of layout.series) {
      const at10 = s.line.find((p) => p.lux === 10)!;
      expect(at10.ohms).toBeCloseTo(s.r10, 9);
      const path = chart.querySelector(`[data-testid="light-line-${s.id}"]`)!;
      const points = vertices(path.getAttribute('d')!);
      expect(points).toHaveLength(5);
      expect(points).toContainEqual([px(layout.x(10)), px(layout.y(s.r10))]);
      // The ends sit on the axis limits.
      expect(points[0]![0]).toBe(px(layout.x.range[0]));
      expect(points[4]![0]).toBe(px(layout.x.range[1]));
      // Straight on log–log: the slope in decades is −γ.
      const decadesOfR = Math.log10(s.line[4]!.ohms / s.line[0]!.ohms);
      expect(decadesOfR / 4).toBeCloseTo(-s.gamma, 9);
      // Equal pixel steps per decade of light.
      const steps = points.slice(1).map((p, i) => p[0] - points[i]![0]);
      for (const step of steps) expect(step).toBeCloseTo(steps[0]!, 1);
    }
    expect(layout.y.invert(layout.y(layout.series[0]!.r10))).toBeCloseTo(layout.series[0]!.r10, 3);
    // A band from min to max for each cell.
    expect(chart.querySelector('[data-testid="light-band-a"]')).not.toBeNull();
    // Decade grid lines and ticks on both axes.
    expect(within(chart as unknown as HTMLElement).getByText('0.1 lx')).toBeInTheDocument();
    expect(within(chart as unknown as HTMLElement).getByText('1000 lx')).toBeInTheDocument();
    expect(within(chart as unknown as HTMLElement).getByText('10 kΩ')).toBeInTheDocument();
  });

  it('has a legend and the numbers as a table', () => {
    render(<LightResponseChart cells={[...cells, { id: 'c', label: 'LC-NOGAMMA', lightMin: 1e3, lightMax: 2e3 }]} />);
    expect(within(screen.getByRole('list', { name: 'Legend' })).getAllByRole('listitem').map((li) => li.textContent)).toEqual([
      'LC-5516 (γ 0.7)',
      'LC-0712 (γ 0.85)',
    ]);
    expect(screen.getByText(/Not drawn \(needs light resistance and gamma\): LC-NOGAMMA/)).toBeInTheDocument();
    const table = screen.getByRole('table', { name: 'Light response per cell' });
    const row = within(table).getByRole('row', { name: /LC-5516/ });
    expect(row).toHaveTextContent('8 kΩ – 20 kΩ');
    expect(row).toHaveTextContent('12.6 kΩ');
  });
});

describe('supply range bars', () => {
  it('draws a bar per part and a marker, and says which run on it', () => {
    render(
      <SupplyRangeChart
        series={[
          { id: 'a', label: 'NW4580', min: 4, max: 36 },
          { id: 'b', label: 'NW-LV', min: 1.8, max: 5.5 },
          { id: 'c', label: 'NW-OLD' },
        ]}
        marker={9}
      />,
    );
    const chart = screen.getByRole('img', { name: 'Supply range' });
    expect(chart.querySelectorAll('[data-testid="supply-bar"]')).toHaveLength(3);
    expect(chart.querySelectorAll('[data-testid="supply-bar"] rect')).toHaveLength(2);
    expect(chart.querySelector('[data-testid="supply-marker"]')).toHaveTextContent('9 V');
    expect(chart).toHaveAccessibleDescription(/Marker at 9 V; 1 of 3 run on it/);
    const table = screen.getByRole('table', { name: 'Supply range per part' });
    expect(within(table).getByRole('row', { name: /NW4580/ })).toHaveTextContent('4 V36 VYes');
    expect(within(table).getByRole('row', { name: /NW-LV/ })).toHaveTextContent('1.8 V5.5 VNo');
  });

  it('draws a required span as a band and counts only the parts that cover all of it', () => {
    render(
      <SupplyRangeChart
        title="Supply range against 9 V to 18 V"
        series={[
          { id: 'a', label: 'NW4580', min: 4, max: 36 },
          { id: 'b', label: 'NW-MID', min: 5, max: 12 },
        ]}
        marker={undefined}
        markerSpan={{ min: 9, max: 18 }}
      />,
    );
    const chart = screen.getByRole('img', { name: 'Supply range against 9 V to 18 V' });
    expect(chart.querySelector('[data-testid="supply-marker"] rect')).not.toBeNull();
    expect(chart.querySelector('[data-testid="supply-marker"]')).toHaveTextContent('9 V to 18 V');
    expect(chart).toHaveAccessibleDescription(/Marker at 9 V to 18 V; 1 of 2 run on it/);
    const table = screen.getByRole('table', { name: 'Supply range per part' });
    expect(within(table).getByRole('row', { name: /NW-MID/ })).toHaveTextContent('5 V12 VNo');
  });
});
