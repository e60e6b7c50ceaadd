// Matching a BOM line's part number to the catalog, the pure half: normalising, setting packing and package
// suffixes aside, choosing between parts that share a number. The database half (bulk lookups) is in
// bom-matching.service.ts.
import { partNumberKey, type MatchKind } from '@understudy/shared-types';
import type { StoredCandidate } from '../../entities';

/** How alike a candidate's number must be: one slipped character in a six-character number is 0.4. */
export const CANDIDATE_SIMILARITY = 0.38;

type SuffixKind = 'packing' | 'lead-free' | 'package' | 'package-letter';

/**
 * Suffixes that name packing, lead-free finish or package rather than the part, as the key leaves them (case and
 * punctuation gone: "T&R" and "/TR" are "tr", "#PBF" is "pbf"). Common practice in distributors' and makers'
 * ordering codes, no source.
 */
const SUFFIXES: readonly { pattern: RegExp; kind: SuffixKind }[] = [
  { pattern: /(?:tr|reel|r7|r13|tube|bulk)$/, kind: 'packing' },
  { pattern: /(?:pbf|nopb|g4)$/, kind: 'lead-free' },
  { pattern: /(?:pdip|dip|soic|tssop|ssop|msop|sop|so)(?:\d{1,2})?$/, kind: 'package' },
  { pattern: /(?:sot23(?:\d)?|to92)$/, kind: 'package' },
];

/** One trailing package letter (DIP "N"/"P", SOIC "D", …) after a digit; used only when the rest matches exactly. */
const PACKAGE_LETTER = /(?<=\d)[dnpmsu]$/;

/** At most this many suffixes are set aside from one number ("-SOIC8-TR", "#PBF/TR"). */
const MAX_SUFFIXES = 3;

export interface KeyVariant {
  key: string;
  /** What was set aside, as written on the line: "-TR", "SOIC8". */
  removed: { text: string; kind: SuffixKind }[];
}

/**
 * The key itself, then the keys left after setting one, two or three suffixes aside, fewest first, then the same
 * with a trailing package letter dropped. The rest must stay at least three characters long.
 */
export function keyVariants(partNumber: string): KeyVariant[] {
  const key = partNumberKey(partNumber);
  const out: KeyVariant[] = [{ key, removed: [] }];
  const seen = new Set([key]);
  let frontier = out.slice();
  for (let depth = 0; depth < MAX_SUFFIXES && frontier.length; depth++) {
    const next: KeyVariant[] = [];
    for (const v of frontier) {
      for (const { pattern, kind } of SUFFIXES) {
        const m = pattern.exec(v.key);
        if (!m || v.key.length - m[0].length < 3) continue;
        const rest = v.key.slice(0, -m[0].length);
        if (seen.has(rest)) continue;
        seen.add(rest);
        next.push({ key: rest, removed: [{ text: rawTail(partNumber, v.key.length, m[0].length), kind }, ...v.removed] });
      }
    }
    out.push(...next);
    frontier = next;
  }
  for (const v of out.slice()) {
    const m = PACKAGE_LETTER.exec(v.key);
    if (!m || v.key.length - 1 < 3) continue;
    const rest = v.key.slice(0, -1);
    if (seen.has(rest)) continue;
    seen.add(rest);
    out.push({ key: rest, removed: [{ text: rawTail(partNumber, v.key.length, 1), kind: 'package-letter' }, ...v.removed] });
  }
  return out;
}

/**
 * The characters of the raw part number behind letters and digits number keyLength − count … keyLength − 1 of
 * it, with the separator written before them: in "OD4558-SOIC8/TR", the last 2 of 13 are "/TR", the last 5 of
 * the first 11 are "-SOIC8".
 */
function rawTail(raw: string, keyLength: number, count: number): string {
  const at: number[] = [];
  // Each character the key keeps, by position (the key keeps letters and digits only).
  for (let i = 0; i < raw.length; i++) if (partNumberKey(raw[i]!) !== '') at.push(i);
  let start = at[keyLength - count]!;
  const end = at[keyLength - 1]! + 1;
  while (start > 0 && /[-/#_.&+]/.test(raw[start - 1]!)) start--;
  return raw.slice(start, end);
}

const SUFFIX_WORDS: Record<SuffixKind, [string, string]> = {
  packing: ['packing suffix', 'packing suffixes'],
  'lead-free': ['lead-free mark', 'lead-free marks'],
  package: ['package code', 'package codes'],
  'package-letter': ['package letter', 'package letters'],
};

/** "packing suffix -TR set aside", "package code -SOIC8 and packing suffix /TR set aside". */
export function describeRemoved(removed: KeyVariant['removed']): string {
  const parts = removed.map((r) => `${SUFFIX_WORDS[r.kind][0]} ${r.text}`);
  const joined = parts.length > 1 ? `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}` : parts[0]!;
  return `${joined} set aside`;
}

// ---------------------------------------------------------------------------------------------------------------
// Makers

const COMPANY_WORDS = new Set(['inc', 'incorporated', 'ltd', 'limited', 'llc', 'gmbh', 'ag', 'co', 'corp', 'corporation', 'company', 'sa', 'srl', 'bv', 'nv', 'plc', 'kg', 'oy', 'ab', 'as', 'spa', 'pty']);

/** A maker's name without case, punctuation or company-form words: "Fixture Linear, Inc." → "fixture linear". */
export function makerKey(name: string): string {
  return name
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, ' ')
    .trim()
    .split(' ')
    .filter((w) => w && !COMPANY_WORDS.has(w))
    .join(' ');
}

/** The same maker, or one name the leading words of the other ("Fixture" for "Fixture Linear"). */
export function sameMaker(a: string, b: string): boolean {
  const x = makerKey(a);
  const y = makerKey(b);
  if (!x || !y) return false;
  return x === y || `${y} `.startsWith(`${x} `) || `${x} `.startsWith(`${y} `);
}

// ---------------------------------------------------------------------------------------------------------------
// Deciding

export interface CatalogHit {
  id: string;
  partNumber: string;
  key: string;
  manufacturer: string;
}

export interface MatchResult {
  kind: MatchKind;
  partId: string | null;
  detail: string | null;
  candidates: StoredCandidate[];
}

/**
 * The match from exact lookups alone, or null when no variant of the key is in the catalog (the line then needs
 * the similarity search). Several parts with one number: the one whose maker the line names, else all of them
 * as candidates to confirm.
 */
export function decideExact(partNumber: string, manufacturer: string | null, variants: KeyVariant[], hitsByKey: ReadonlyMap<string, CatalogHit[]>): MatchResult | null {
  for (const variant of variants) {
    const hits = hitsByKey.get(variant.key);
    if (!hits?.length) continue;
    let chosen: CatalogHit | null = hits.length === 1 ? hits[0]! : null;
    let makerNote: string | null = null;
    if (hits.length > 1 && manufacturer) {
      const same = hits.filter((h) => sameMaker(h.manufacturer, manufacturer));
      if (same.length === 1) chosen = same[0]!;
      else if (same.length > 1) return ambiguous(same);
    }
    if (!chosen) return ambiguous(hits);
    if (hits.length > 1) makerNote = `the maker named on the line (${chosen.manufacturer}) decided between ${hits.length} parts with this number`;
    else if (manufacturer && !sameMaker(chosen.manufacturer, manufacturer)) makerNote = `the catalog lists it under ${chosen.manufacturer}, the line says ${manufacturer}`;

    let removed = variant.removed;
    // partNumberKey already ignores a "+", but it is a lead-free mark, not part of the number.
    if (!removed.length && /\+\s*$/.test(partNumber) && !/\+\s*$/.test(chosen.partNumber)) removed = [{ text: '+', kind: 'lead-free' }];
    const notes = [removed.length ? describeRemoved(removed) : null, makerNote].filter(Boolean);
    return { kind: removed.length ? 'suffix' : 'exact', partId: chosen.id, detail: notes.length ? notes.join('; ') : null, candidates: [] };
  }
  return null;
}

function ambiguous(hits: CatalogHit[]): MatchResult {
  const sorted = [...hits].sort((a, b) => a.manufacturer.localeCompare(b.manufacturer) || a.id.localeCompare(b.id));
  return {
    kind: 'candidates',
    partId: null,
    detail: `${hits.length} makers use this part number; confirm which one`,
    candidates: sorted.map((h) => ({ partId: h.id, similarity: 1 })),
  };
}

/** From the similarity search's nearest parts (best first), the candidates to confirm, or unmatched. */
export function decideFuzzy(near: StoredCandidate[]): MatchResult {
  if (!near.length) return { kind: 'unmatched', partId: null, detail: null, candidates: [] };
  return {
    kind: 'candidates',
    partId: null,
    detail: near.length === 1 ? 'No exact match; one close part number' : `No exact match; ${near.length} close part numbers`,
    candidates: near,
  };
}
