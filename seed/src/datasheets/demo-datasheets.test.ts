import { parametersSchemaFor } from '@understudy/shared-types';
import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { DEMO_PARTS } from '../catalog';
import { buildDemoDatasheets } from './demo-datasheets';
import { renderDatasheet } from './render-datasheet';

const demos = buildDemoDatasheets();

describe('buildDemoDatasheets', () => {
  it('makes an op amp, a photoresistor and an LED datasheet for parts of the seed catalog', () => {
    expect(demos.map((d) => d.truth.family)).toEqual(['op-amp', 'photoresistor', 'led']);
    for (const d of demos) {
      const part = DEMO_PARTS.find((p) => p.partNumber === d.partNumber && p.manufacturer === d.manufacturer);
      expect(part, d.partNumber).toBeDefined();
      expect(d.truth.partNumber).toBe(d.partNumber);
      const stored = Object.fromEntries(Object.entries(d.truth.parameters).map(([k, { unit: _unit, ...rest }]) => [k, rest]));
      expect(parametersSchemaFor(d.truth.family!).safeParse(stored).success).toBe(true);
    }
  });

  it('agrees with the catalog except where it says it was revised', () => {
    for (const d of demos) {
      const part = DEMO_PARTS.find((p) => p.partNumber === d.partNumber)!;
      const catalog = part.parameters as Record<string, Record<string, number>>;
      for (const [key, value] of Object.entries(d.truth.parameters)) {
        for (const slot of ['min', 'typ', 'max'] as const) {
          if (value[slot] === undefined || catalog[key]?.[slot] === undefined) continue;
          const revised = d.revisedFromCatalog.find((r) => r.key === `${key}.${slot}`);
          expect(value[slot], `${d.partNumber} ${key}.${slot}`).toBeCloseTo(revised ? revised.datasheet : catalog[key]![slot]!, 12);
          if (revised) expect(revised.datasheet).not.toBe(revised.catalog);
        }
      }
    }
    expect(demos.some((d) => d.revisedFromCatalog.length > 0)).toBe(true);
  });

  it('renders each demo to a readable multi-page PDF', { timeout: 30_000 }, async () => {
    for (const d of demos) {
      const parser = new PDFParse({ data: new Uint8Array(await renderDatasheet(d.spec)) });
      const { text, total } = await parser.getText();
      await parser.destroy();
      expect(total).toBe(d.spec.pages.length);
      expect(total).toBeGreaterThan(1);
      expect(text).toContain(d.partNumber);
      expect(text).toContain(d.manufacturer);
    }
  });
});
