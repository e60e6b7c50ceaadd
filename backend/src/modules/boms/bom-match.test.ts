import { describe, expect, it } from 'vitest';
import { decideExact, keyVariants, makerKey, sameMaker, type CatalogHit } from './bom-match';
import { editDistance, likeness, neighbourSwaps, TrigramIndex, trigramSimilarity, trigramsOf } from './bom-trigrams';

const hit = (partNumber: string, manufacturer: string, id = `${manufacturer}:${partNumber}`): CatalogHit => ({
  id,
  partNumber,
  key: partNumber.toLowerCase().replace(/[^a-z0-9]/g, ''),
  manufacturer,
});

function byKey(...hits: CatalogHit[]): Map<string, CatalogHit[]> {
  const out = new Map<string, CatalogHit[]>();
  for (const h of hits) out.set(h.key, [...(out.get(h.key) ?? []), h]);
  return out;
}

const decide = (pn: string, catalog: Map<string, CatalogHit[]>, maker: string | null = null) => decideExact(pn, maker, keyVariants(pn), catalog);

describe('packing and package suffixes (ordering-code conventions: common practice, no source)', () => {
  const catalog = byKey(hit('OD-4558X', 'Oddfellow Devices'), hit('CV2207', 'Fixture Linear'), hit('HV4558', 'Hollow Valley'));

  it.each([
    ['od-4558x', 'exact', null],
    ['OD 4558 X', 'exact', null],
    ['OD-4558X-TR', 'suffix', 'packing suffix -TR set aside'],
    ['OD-4558X/TR', 'suffix', 'packing suffix /TR set aside'],
    ['OD-4558XT&R', 'suffix', 'packing suffix T&R set aside'],
    ['OD-4558X-REEL', 'suffix', 'packing suffix -REEL set aside'],
    ['OD-4558XR13', 'suffix', 'packing suffix R13 set aside'],
    ['CV2207-TUBE', 'suffix', 'packing suffix -TUBE set aside'],
    ['CV2207#PBF', 'suffix', 'lead-free mark #PBF set aside'],
    ['CV2207/NOPB', 'suffix', 'lead-free mark /NOPB set aside'],
    ['CV2207G4', 'suffix', 'lead-free mark G4 set aside'],
    ['HV4558+', 'suffix', 'lead-free mark + set aside'],
    ['CV2207 DIP8', 'suffix', 'package code DIP8 set aside'],
    ['CV2207-SOIC8-TR', 'suffix', 'package code -SOIC8 and packing suffix -TR set aside'],
    ['CV2207PDIP', 'suffix', 'package code PDIP set aside'],
    ['CV2207-SO8', 'suffix', 'package code -SO8 set aside'],
    ['CV2207 TSSOP', 'suffix', 'package code TSSOP set aside'],
    ['CV2207-SOT23', 'suffix', 'package code -SOT23 set aside'],
    ['CV2207TO92', 'suffix', 'package code TO92 set aside'],
    ['CV2207P', 'suffix', 'package letter P set aside'],
    ['CV2207N-TR', 'suffix', 'package letter N and packing suffix -TR set aside'],
  ])('%s → %s (%s)', (pn, kind, detail) => {
    const result = decide(pn, catalog);
    expect(result).toMatchObject({ kind, detail });
    expect(result?.partId).toBeTruthy();
  });

  it('drops a trailing letter only when the rest is a catalog part: CV2207A stays its own part', () => {
    const withA = byKey(hit('CV2207', 'Fixture Linear'), hit('CV2207A', 'Fixture Linear'));
    expect(decide('CV2207A', withA)).toMatchObject({ kind: 'exact', partId: 'Fixture Linear:CV2207A' });
    expect(decide('CV2207X', catalog)).toBeNull();
    expect(decide('CV2208-TR', catalog)).toBeNull();
  });

  it('lists the variants fewest-removed first and never cuts a number below three characters', () => {
    expect(keyVariants('OD-4558X-SOIC8-TR').map((v) => v.key)).toEqual(['od4558xsoic8tr', 'od4558xsoic8', 'od4558x']);
    expect(keyVariants('CV2207N-TR').map((v) => v.key)).toEqual(['cv2207ntr', 'cv2207n', 'cv2207']);
    expect(keyVariants('TR').map((v) => v.key)).toEqual(['tr']);
  });
});

describe('makers', () => {
  it('compares names without case, punctuation or company forms (common practice, no source)', () => {
    expect(makerKey('Fixture Linear, Inc.')).toBe('fixture linear');
    expect(sameMaker('FIXTURE-LINEAR Ltd', 'Fixture Linear')).toBe(true);
    expect(sameMaker('Fixture', 'Fixture Linear GmbH')).toBe(true);
    expect(sameMaker('Fixture Lin', 'Fixture Linear')).toBe(false);
  });

  it('prefers the maker named on the line when several parts share a number, else offers all to confirm', () => {
    const catalog = byKey(hit('QX100', 'Quillon Semiconductor'), hit('QX-100', 'Brackenridge Audio'));
    expect(decide('QX100', catalog, 'Brackenridge Audio Ltd.')).toMatchObject({ kind: 'exact', partId: 'Brackenridge Audio:QX-100' });
    const unsure = decide('QX100', catalog);
    expect(unsure).toMatchObject({ kind: 'candidates', partId: null, detail: '2 makers use this part number; confirm which one' });
    expect(unsure!.candidates.map((c) => c.similarity)).toEqual([1, 1]);
  });

  it('says so when the only part with the number is listed under another maker', () => {
    const catalog = byKey(hit('CV2207', 'Fixture Linear'));
    expect(decide('CV2207', catalog, 'Oddfellow')).toMatchObject({ kind: 'exact', detail: 'the catalog lists it under Fixture Linear, the line says Oddfellow' });
  });
});

describe('trigram similarity', () => {
  it('counts shared trigrams of the padded word over the union, as pg_trgm does', () => {
    // Source: PostgreSQL documentation, pg_trgm — a word is padded with two spaces before and one after, and
    // similarity is shared trigrams / all distinct trigrams of both. "cv2207" has 7: "  c"," cv","cv2","v22","220","207","07 ".
    expect(trigramsOf('cv2207')).toHaveLength(7);
    // One slipped digit: 4 shared of 10 distinct.
    expect(trigramSimilarity('cv2207', 'cv2270')).toBeCloseTo(0.4, 10);
    expect(trigramSimilarity('cv2207', 'cv2207')).toBe(1);
    expect(trigramSimilarity('', 'cv2207')).toBe(0);
  });

  it('finds the nearest keys with the index, best first, the same as comparing with every key', () => {
    const keys = ['cv2207', 'cv2208', 'cv2270', 'od4558x', 'od10v', 'odldr5', 'hv4558', 'qs100', 'qs101', 'cv22071'];
    const index = new TrigramIndex(keys);
    for (const query of ['cv2270', 'od4585x', 'hv455', 'qs10', 'zzzz', 'cv22o7']) {
      const brute = keys
        .map((key) => ({ key, similarity: trigramSimilarity(query, key) }))
        .filter((n) => n.similarity >= 0.38)
        .sort((a, b) => b.similarity - a.similarity || (a.key < b.key ? -1 : 1))
        .slice(0, 3);
      expect(index.nearest(query, 3, 0.38)).toEqual(brute);
    }
  });
});

describe('edits', () => {
  it('counts insertions, deletions, substitutions and neighbour swaps (optimal string alignment)', () => {
    // Source: "Levenshtein distance" (Wikipedia): kitten → sitting is 3 edits.
    expect(editDistance('kitten', 'sitting')).toBe(3);
    // Source: "Damerau–Levenshtein distance" (Wikipedia): CA → ABC is 3 under optimal string alignment (2 unrestricted).
    expect(editDistance('ca', 'abc')).toBe(3);
    expect(editDistance('hv4850', 'hv4580')).toBe(1);
    expect(editDistance('', 'abc')).toBe(3);
  });

  it('rates a swap of neighbours as nearly the same number, which trigrams alone do not', () => {
    expect(trigramSimilarity('hv4850', 'hv4580')).toBeCloseTo(3 / 11, 10);
    expect(likeness('hv4850', 'hv4580')).toBeCloseTo(5 / 6, 10);
    expect(likeness('cv2207', 'cv2207')).toBe(1);
    expect(neighbourSwaps('hv4850')).toEqual(['vh4850', 'h4v850', 'hv8450', 'hv4580', 'hv4805']);
    expect(neighbourSwaps('aab')).toEqual(['aba']);
  });
});
