import { FAMILY_KEYS, getFamily, parametersSchemaFor, type DatasheetSummary } from '@understudy/shared-types';
import { PDFParse } from 'pdf-parse';
import { describe, expect, it } from 'vitest';
import { MANUFACTURER_NAMES } from '../catalog';
import { buildCorpus, CORPUS_FAMILIES, type CorpusEntry } from './corpus';
import type { Block, DatasheetSpec } from './datasheet-spec';
import { INVENTED_MAKERS } from './invented-names';
import { renderDatasheet } from './render-datasheet';

const corpus = buildCorpus();

function allText(spec: DatasheetSpec): string {
  const out: string[] = [spec.titleBlock.partNumber, spec.titleBlock.manufacturer, spec.titleBlock.description, ...(spec.titleBlock.details ?? [])];
  const walk = (b: Block): void => {
    if (b.kind === 'heading' || b.kind === 'paragraph') out.push(b.text);
    else if (b.kind === 'bullets') out.push(...b.items);
    else if (b.kind === 'columns') [...b.left, ...b.right].forEach(walk);
    else if (b.kind === 'table') {
      out.push(b.title ?? '', b.subtitle ?? '', b.note ?? '', ...b.columns.map((c) => c.header));
      for (const r of b.rows) out.push(...('section' in r ? [r.section] : r.cells));
    } else if (b.kind === 'figure') out.push(b.caption, b.xLabel ?? '', b.yLabel ?? '', ...(b.xTicks ?? []), ...(b.yTicks ?? []));
  };
  spec.pages.forEach((p) => p.blocks.forEach(walk));
  out.push(spec.footer.left ?? '', spec.footer.centre ?? '', spec.footer.right ?? '', spec.runningHeader ?? '');
  return out.join('\n');
}

/** The truth's parameters without the summary-only `unit` field, in the shape the part schema checks. */
function storedShape(truth: DatasheetSummary): Record<string, unknown> {
  return Object.fromEntries(Object.entries(truth.parameters).map(([k, { unit: _unit, ...rest }]) => [k, rest]));
}

describe('buildCorpus', () => {
  it('is deterministic for a seed and differs between seeds', () => {
    expect(buildCorpus()).toEqual(corpus);
    const other = buildCorpus({ seed: 7, count: 8 });
    expect(other.map((e) => e.truth)).not.toEqual(corpus.slice(0, 8).map((e) => e.truth));
    expect(buildCorpus({ count: 8 })).toEqual(corpus.slice(0, 8));
  });

  it('spreads about 120 documents evenly over the four families, mostly 4 pages long', () => {
    expect(corpus).toHaveLength(120);
    for (const family of CORPUS_FAMILIES) expect(corpus.filter((e) => e.family === family)).toHaveLength(30);
    const pages = new Map<number, number>();
    for (const e of corpus) pages.set(e.pageCount, (pages.get(e.pageCount) ?? 0) + 1);
    expect([...pages.keys()].sort()).toEqual([1, 2, 3, 4, 5, 6]);
    expect(Math.max(...pages.values())).toBe(pages.get(4));
    for (const e of corpus) expect(e.spec.pages).toHaveLength(e.pageCount);
  });

  it('gives every document a unique name and part number', () => {
    expect(new Set(corpus.map((e) => e.name)).size).toBe(corpus.length);
    expect(new Set(corpus.map((e) => e.truth.partNumber!.toUpperCase())).size).toBe(corpus.length);
  });

  it('states truth only in real parameter keys and the slots their definitions have', () => {
    for (const e of corpus) {
      expect(e.truth.family).toBe(e.family);
      const result = parametersSchemaFor(e.family).safeParse(storedShape(e.truth));
      expect(result.success, `${e.name}: ${result.error?.message}`).toBe(true);
      for (const [key, value] of Object.entries(e.truth.parameters)) {
        const def = getFamily(e.family).parameters.find((p) => p.key === key)!;
        expect(value.unit, `${e.name} ${key}`).toBe(def.unit);
      }
    }
  });

  it('always states the keys every datasheet of a family gives', () => {
    const always: Record<string, string[]> = {
      'op-amp': ['channels', 'supplyVoltage', 'slewRate', 'gainBandwidth', 'inputOffsetVoltage', 'inputBiasCurrent', 'inputNoiseDensity', 'outputCurrent', 'quiescentCurrent'],
      photoresistor: ['darkResistance', 'lightResistance', 'gamma', 'peakWavelength', 'riseTime', 'decayTime', 'maxVoltage', 'powerDissipation'],
      led: ['forwardVoltage', 'forwardCurrent', 'viewingAngle'],
      potentiometer: ['resistance', 'taper', 'tolerance', 'powerRating', 'gangs'],
    };
    for (const e of corpus) expect(Object.keys(e.truth.parameters), e.name).toEqual(expect.arrayContaining(always[e.family]!));
  });

  it('uses invented manufacturers only and no real part numbers or brands', () => {
    const invented = new Set([...INVENTED_MAKERS.map((m) => m.name), ...MANUFACTURER_NAMES]);
    const real = /\b(TL07\d|NE55\d\d|LM35\d|LM741|OPA\d{3,4}|VTL5C|Vactrol|Bourns|Alpha Taiwan|Alps|Texas Instruments|Analog Devices|Burr-Brown|Fairchild|Silonex|Advanced Photonix|Kingbright|Cree|Nichia|Vishay|Everlight|Piher|CTS)\b/;
    for (const e of corpus) {
      expect(invented.has(e.truth.manufacturer!), e.name).toBe(true);
      expect(allText(e.spec).match(real)?.[0], e.name).toBeUndefined();
    }
  });

  it('covers every variation the parser has to cope with', () => {
    const tags = new Set(corpus.flatMap((e) => e.variations));
    const required = [
      'columns:parameter-symbol-conditions-min-typ-max-unit',
      'columns:parameter-min-typ-max-unit',
      'columns:symbol-parameter-unit-min-max-typ',
      'columns:parameter-symbol-min-typ-max-unit-conditions',
      'columns:parameter-min-typ-max',
      'columns:list:parameter-value',
      'columns:list:parameter-conditions-value',
      'lone-values',
      'prose:slewRate',
      'prose:darkResistance',
      'alternate-conditions:supply',
      'alternate-conditions:temperature',
      'alternate-conditions:current',
      'alternate-table-first',
      'absolute-maximum-table',
      'truth-from-absolute-maximum',
      'limits-placement:absolute-maximum-only',
      'limits-placement:prose',
      'rating-placement:absolute-maximum',
      'micro:U+00B5',
      'micro:U+03BC',
      'micro:u',
      'ohm:symbol',
      'ohm:spaced',
      'ohm:word',
      'ohm:capital-letter',
      'ohm:letter',
      'root-hz:√Hz',
      'root-hz:rtHz',
      'degree:°',
      'degree:deg',
      'percent:spaced',
      'percent:tight',
      'tolerance-plus-minus',
      'supply-form:dual',
      'supply-form:single',
      'supply-form:both',
      'supply-placement:operating-table',
      'supply-placement:prose',
      'quiescent-total',
      'full-temperature-rows',
      'noise-at-two-frequencies',
      'slot-outside-definition',
      'plus-minus-values',
      'decoy:ordering-codes',
      'decoy:package-dimensions',
      'decoy:revision-history',
      'decoy:light-resistance-at-100-lx',
      'decoy:dominant-wavelength',
      'decoy:series-values',
      'date-format:iso',
      'date-format:month-year',
      'revision-format:Rev. C',
      'revision-format:Rev 1.2',
      'page-label:Page {n} of {total}',
      'table-continues-on-next-page',
      'taper-placement:prose',
      'test-current-placement:prose',
      ...[1, 2, 3, 4, 5, 6].map((n) => `page-count:${n}`),
    ];
    expect(required.filter((t) => !tags.has(t))).toEqual([]);
  });

  it('covers every family with the dual-supply spellings and ranges of the brief', () => {
    const text = corpus.filter((e) => e.family === 'op-amp').map((e) => allText(e.spec)).join('\n');
    expect(text).toMatch(/±\d+(\.\d+)? V to ±\d+(\.\d+)? V/);
    expect(text).toMatch(/\d(\.\d+)? V – \d+ V/);
    expect(text).toMatch(/\d(\.\d+)? to \d+ V/);
    expect(FAMILY_KEYS).toEqual(expect.arrayContaining([...CORPUS_FAMILIES]));
  });

  it('renders every document with its text and the stated page count', { timeout: 180_000 }, async () => {
    const check = async (e: CorpusEntry) => {
      const parser = new PDFParse({ data: new Uint8Array(await renderDatasheet(e.spec)) });
      try {
        const result = await parser.getText();
        expect(result.total, e.name).toBe(e.pageCount);
        const squashed = result.text.replace(/\s+/g, '');
        expect(squashed, e.name).toContain(e.truth.partNumber!.replace(/\s+/g, ''));
        expect(squashed, e.name).toContain(e.truth.manufacturer!.replace(/\s+/g, ''));
        expect(squashed, e.name).toContain(e.spec.titleBlock.description.replace(/\s+/g, ''));
      } finally {
        await parser.destroy();
      }
    };
    for (const e of corpus) await check(e);
  });
});
