import type { DatasheetSummary, FamilyKey } from '@understudy/shared-types';
import { composeDatasheet } from './compose-datasheet';
import type { DatasheetSpec } from './datasheet-spec';
import { buildLedSheet, inventLed } from './led-sheet';
import { buildOpAmpSheet, inventOpAmp } from './op-amp-sheet';
import { buildPhotoresistorSheet, inventPhotoresistor } from './photoresistor-sheet';
import { buildPotentiometerSheet, inventPotentiometer } from './potentiometer-sheet';
import { createRng } from './prng';
import type { SheetContent } from './sheet-model';
import { createVariationDecks, type Variations } from './variations';

/** One invented datasheet with the answer a perfect parser would give. */
export interface CorpusEntry {
  /** File name without extension, unique in the corpus: "007-led-lw512rc". */
  name: string;
  family: FamilyKey;
  spec: DatasheetSpec;
  truth: DatasheetSummary;
  pageCount: number;
  /** What this document exercises ("columns:symbol-parameter-unit-min-max-typ", "prose:slewRate", …). */
  variations: string[];
}

export const CORPUS_FAMILIES = ['op-amp', 'photoresistor', 'led', 'potentiometer'] as const satisfies readonly FamilyKey[];
export const DEFAULT_CORPUS_SEED = 20_250_314;
export const DEFAULT_CORPUS_SIZE = 120;

const SHEET_BUILDERS: Record<(typeof CORPUS_FAMILIES)[number], (v: Variations) => SheetContent> = {
  'op-amp': (v) => buildOpAmpSheet(inventOpAmp(v), v),
  photoresistor: (v) => buildPhotoresistorSheet(inventPhotoresistor(v), v),
  led: (v) => buildLedSheet(inventLed(v), v),
  potentiometer: (v) => buildPotentiometerSheet(inventPotentiometer(v), v),
};

const slug = (text: string) => text.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');

/**
 * Builds the test corpus: the same documents for the same seed and count, on any machine. Families take turns so
 * any prefix of the corpus is balanced; variations are dealt from per-family decks so each family sees each one.
 */
export function buildCorpus(options: { seed?: number; count?: number } = {}): CorpusEntry[] {
  const seed = options.seed ?? DEFAULT_CORPUS_SEED;
  const count = options.count ?? DEFAULT_CORPUS_SIZE;
  const root = createRng(seed);
  const decks = createVariationDecks(root.fork('decks'));
  const partNumbers = new Set<string>();
  const entries: CorpusEntry[] = [];
  for (let i = 0; i < count; i++) {
    const family = CORPUS_FAMILIES[i % CORPUS_FAMILIES.length]!;
    let sheet: SheetContent;
    let v: Variations;
    let attempt = 0;
    do {
      v = decks.forDocument(family, root.fork(`document-${i}-${attempt++}`));
      sheet = SHEET_BUILDERS[family](v);
    } while (partNumbers.has(sheet.partNumber.toUpperCase()));
    partNumbers.add(sheet.partNumber.toUpperCase());
    const composed = composeDatasheet(sheet, v);
    entries.push({
      name: `${String(i + 1).padStart(3, '0')}-${family}-${slug(sheet.partNumber)}`,
      family,
      spec: composed.spec,
      truth: composed.truth,
      pageCount: composed.pageCount,
      variations: composed.variations,
    });
  }
  return entries;
}
