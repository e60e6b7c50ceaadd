import type { FamilyKey, PageBox, ParameterValue, ValueSlot } from '@understudy/shared-types';
import { readConditions } from '../conditions';
import { boxesOf, type Cell } from '../layout';
import type { TextItem } from '../pdf-text';
import { normaliseUnitSpelling, readSupplySpan, readValue } from '../quantity';
import type { DocumentLayout } from '../tables';
import { clampConfidence, type Candidate, type Origin } from './candidate';
import { SYNONYMS, type Synonym } from './synonyms';
import { definitionOf, enumValue, finishValue, isOffNominal, quiescentBasis, wrongIlluminance, type Slots } from './values';

/** Running text: a paragraph or a bullet, with the items it was read from. */
export interface Passage {
  page: number;
  text: string;
  /** Character offset in `text` where each item's text starts. */
  spans: { start: number; end: number; item: TextItem }[];
  order: number;
  /** The heading the passage sits under. */
  section: DocumentLayout['sections'][number] | null;
  /** A line of cells set out like a two-column list ("Slew rate    9 V/µs"). */
  listLike: boolean;
}

const BULLET = /^[•·▪◦‣\-–*■●○]$/;

/** Groups the text outside tables into passages: wrapped lines of one paragraph join, each bullet starts anew. */
export function buildPassages(layout: DocumentLayout, taken: Set<Cell>): Passage[] {
  const passages: Passage[] = [];
  const open: { passage: Passage; x: number; bottom: number; size: number }[] = [];
  for (const line of layout.lines) {
    const free = line.cells.filter((c) => !taken.has(c));
    if (free.length === 0) continue;
    const section = layout.sectionOf[line.index] ?? null;
    if (section?.line === line) continue;
    // A label, then a value or two, set out in columns: a list without a header row.
    const listLike =
      free.length >= 2 &&
      free.length <= 4 &&
      /^[A-Za-z]/.test(free[0]!.text) &&
      free.slice(1).some((c) => /^(?:[±≥≤<>~]|(?:typ|max|min)\.?\s)?\s*[+\-−]?\d/i.test(c.text.trim()));
    if (listLike) {
      passages.push(makePassage(line.page, free, line.index, section, true));
      continue;
    }
    let bulletStart = false;
    for (const cell of free) {
      if (BULLET.test(cell.text.trim())) {
        bulletStart = true;
        continue;
      }
      const target = open.find(
        (o) =>
          o.passage.page === line.page &&
          Math.abs(o.x - cell.x) < 3 &&
          cell.top - o.bottom < 0.9 * cell.fontSize &&
          cell.top - o.bottom > -0.5 * cell.fontSize &&
          Math.abs(o.size - cell.fontSize) < 0.6 &&
          o.passage.section === section,
      );
      if (target && !bulletStart) {
        appendCell(target.passage, cell);
        target.bottom = cell.bottom;
      } else {
        const passage = makePassage(line.page, [cell], line.index, section, false);
        passages.push(passage);
        const slot = { passage, x: cell.x, bottom: cell.bottom, size: cell.fontSize };
        const i = open.findIndex((o) => Math.abs(o.x - cell.x) < 3 && o.passage.page === line.page);
        if (i >= 0) open[i] = slot;
        else open.push(slot);
      }
      bulletStart = false;
    }
  }
  return passages;
}

function makePassage(page: number, cells: Cell[], order: number, section: Passage['section'], listLike: boolean): Passage {
  const p: Passage = { page, text: '', spans: [], order, section, listLike };
  for (const c of cells) appendCell(p, c, listLike ? '  ' : ' ');
  return p;
}

function appendCell(p: Passage, cell: Cell, sep = ' '): void {
  // A line that ends in a hyphen continues the word ("gain-" / "bandwidth").
  if (p.text && !(/[A-Za-z]-$/.test(p.text) && /^[A-Za-z]/.test(cell.text))) p.text += sep;
  cell.items.forEach((item, i) => {
    const prev = cell.items[i - 1];
    if (prev && item.x - (prev.x + prev.width) > 0.12 * item.fontSize && !/\s$/.test(p.text)) p.text += ' ';
    const start = p.text.length;
    p.text += item.text.trim();
    p.spans.push({ start, end: p.text.length, item });
  });
}

function itemsIn(p: Passage, start: number, end: number): TextItem[] {
  return p.spans.filter((s) => s.end > start && s.start < end).map((s) => s.item);
}

/** Looser words that running text uses for a parameter; a number only counts when its unit fits. */
const PROSE_NAMES: Partial<Record<FamilyKey, Record<string, RegExp[]>>> = {
  'op-amp': {
    supplyVoltage: [/\b(split |dual |single |bipolar )?suppl(y|ies)\b/i, /\boperates from\b/i, /\bruns from\b/i],
    slewRate: [/\bslews?\b/i],
    gainBandwidth: [/\bbandwidth\b/i],
    inputNoiseDensity: [/\bnoise\b/i],
    inputOffsetVoltage: [/\boffset\b/i],
    inputBiasCurrent: [/\bbias\b/i],
  },
};

const QUALIFIERS: [RegExp, ValueSlot][] = [
  [/\b(typ(ical(ly)?)?|nominal(ly)?|about|approximately|around)\b\.?[\s,:]*(is|of|at|=)?\s*$/i, 'typ'],
  [/(\b(max(imum)?|at most|no more than|not more than|(?<!no |not )less than|below|under|up to|(does|must|should|shall|may) not exceed|never exceed|not to exceed|within|limited to)\b\.?[\s,:]*(is|of|=)?\s*|[≤<]\s*)$/i, 'max'],
  [/(\b(min(imum)?|at least|no less than|not less than|(?<!no |not )more than|above|over|exceeds?|guaranteed)\b\.?[\s,:]*(is|of|=)?\s*|[≥>]\s*)$/i, 'min'],
];
const LEAD_LIMIT = /\b((do|must|should|shall) not|never|not to) exceed\b|\b(maximum|max\.?|at most|up to)\s*$/i;
const AFTER_QUALIFIERS: [RegExp, ValueSlot][] = [
  [/^\s*\(?\s*(typ(ical(ly)?)?|nominal)\b/i, 'typ'],
  [/^\s*\(?\s*(max(imum)?|or less|at most)\b/i, 'max'],
  [/^\s*\(?\s*(min(imum)?|or more|at least|guaranteed)\b/i, 'min'],
];

const NUM = String.raw`[±+\-−]?\s?\d+(?:[.,]\d+)?`;
const UNIT = String.raw`(?:\s?(?:[kKMGmunpµμ]\s?)?(?:V\/\s?[µμu]?s(?:ec)?|V\/\s?(?:√|rt|sqrt)\s?\(?Hz\)?|A\/\s?(?:√|rt|sqrt)\s?\(?Hz\)?|Hz|V|A|W|Ω|ohms?|lux|lx|cd|m|s|sec|seconds)(?![A-Za-z/])|\s?°\s?C(?![A-Za-z])|\s?°|\s?%|\s(?:deg|degrees)(?![A-Za-z])|[kKM](?![A-Za-z0-9]))`;
const RKM = String.raw`\d+[kKMR]\d+(?![\d.])`;
// A number with its unit: "9 V/µs", "±1.5 V to ±16 V", "3 to 32 V", "30°", "4k7", "4.6K".
const QUANTITY = new RegExp(String.raw`(?<![\w.])(?:${RKM}|${NUM}${UNIT}?(?:\s?(?:to|–|—|…|\.\.\.?)\s?${NUM})?${UNIT}?)`, 'g');
const BETWEEN = new RegExp(String.raw`\bbetween\s+(${NUM}${UNIT}?)\s+and\s+(${NUM}${UNIT}?)`, 'gi');

function qualifierBefore(text: string): ValueSlot | null {
  for (const [re, slot] of QUALIFIERS) if (re.test(text)) return slot;
  return null;
}
function qualifierAfter(text: string): ValueSlot | null {
  for (const [re, slot] of AFTER_QUALIFIERS) if (re.test(text)) return slot;
  return null;
}

interface NameHit {
  key: string;
  start: number;
  end: number;
  synonym: Synonym | null;
  loose: boolean;
}

function findNames(family: FamilyKey, text: string): NameHit[] {
  const hits: NameHit[] = [];
  for (const synonym of SYNONYMS[family]) {
    for (const re of synonym.names) {
      const g = new RegExp(re.source.replace(/^\^|\$$/g, ''), re.flags.includes('g') ? re.flags : `${re.flags}g`);
      for (const m of text.matchAll(g)) {
        const phrase = text.slice(Math.max(0, m.index - 12), m.index + m[0].length + 12);
        if (synonym.reject?.test(phrase)) continue;
        hits.push({ key: synonym.key, start: m.index, end: m.index + m[0].length, synonym, loose: false });
      }
    }
  }
  for (const [key, res] of Object.entries(PROSE_NAMES[family] ?? {})) {
    for (const re of res) {
      const g = new RegExp(re.source, `${re.flags.replace('g', '')}g`);
      for (const m of text.matchAll(g)) hits.push({ key, start: m.index, end: m.index + m[0].length, synonym: null, loose: true });
    }
  }
  // Where names overlap, the longest one stands.
  hits.sort((a, b) => a.start - b.start || b.end - b.start - (a.end - a.start));
  const out: NameHit[] = [];
  for (const h of hits) {
    const last = out[out.length - 1];
    if (last && h.start < last.end) {
      if (h.end - h.start > last.end - last.start && !h.loose) out[out.length - 1] = h;
      continue;
    }
    out.push(h);
  }
  return out;
}

function sentences(text: string): { start: number; end: number }[] {
  const out: { start: number; end: number }[] = [];
  const re = /[.!?;](?=\s+[A-Z(•]|\s*$)/g;
  let start = 0;
  for (const m of text.matchAll(re)) {
    // "typ." and "e.g." end no sentence.
    const before = text.slice(Math.max(0, m.index - 4), m.index + 1);
    if (/\b(typ|max|min|approx|e\.g|i\.e|no|vs|fig|ref|nom)\.$/i.test(before)) continue;
    out.push({ start, end: m.index + 1 });
    start = m.index + 1;
  }
  if (start < text.length) out.push({ start, end: text.length });
  return out;
}

interface QuantityHit {
  start: number;
  end: number;
  /** As printed, with "between X and Y" rewritten as a range. */
  raw: string;
}

function findQuantities(sentence: string): QuantityHit[] {
  const hits: QuantityHit[] = [];
  for (const m of sentence.matchAll(BETWEEN)) hits.push({ start: m.index, end: m.index + m[0].length, raw: `${m[1]} to ${m[2]}` });
  for (const m of sentence.matchAll(QUANTITY)) {
    const start = m.index;
    const end = start + m[0].length;
    if (m[0].trim() === '' || hits.some((h) => start < h.end && end > h.start)) continue;
    // "VCM = 0 V", "f = 1 kHz": a number after an equals sign is a test condition, not the value.
    if (/[=@]\s*$/.test(sentence.slice(Math.max(0, start - 3), start))) continue;
    // Pieces of dates and document numbers: "2025-10-28", "03/2020".
    if (/^[-/.]\d/.test(sentence.slice(end, end + 2)) || /\d[-/.]$/.test(sentence.slice(Math.max(0, start - 2), start))) continue;
    hits.push({ start, end, raw: m[0].trim() });
  }
  return hits.sort((a, b) => a.start - b.start);
}

type Definition = ReturnType<typeof definitionOf>;

/** A quantity read in a parameter's unit, or null when it is no value of that parameter. */
function readFor(def: Definition, key: string, raw: string): { slots: Slots; qualifier?: ValueSlot; statedUnit: string | null } | null {
  if (def.kind !== 'number') return null;
  const text = normaliseUnitSpelling(raw);
  const hasUnit = /[A-Za-zΩ°%µ]/.test(text.replace(/\bto\b/g, ''));
  // Without a unit a number in running text is anything: a year, a count, a page.
  if ((def.unit ?? '') !== '' && !hasUnit) return null;
  if (key === 'supplyVoltage') {
    const span = readSupplySpan(text, null);
    return span && span.min < span.max ? { slots: { min: span.min, max: span.max }, statedUnit: 'V' } : null;
  }
  const r = readValue(text, null, def);
  if (!r || r.unitGuessed) return null;
  return { slots: r.slots, ...(r.qualifier ? { qualifier: r.qualifier } : {}), statedUnit: r.statedUnit };
}

function limitFor(family: FamilyKey, raw: string) {
  const fits = SYNONYMS[family]
    .filter((syn, i, all) => syn.limit && all.findIndex((o) => o.key === syn.key) === i)
    .map((synonym) => {
      const def = definitionOf(family, synonym.key);
      return { key: synonym.key, synonym, def, reading: readFor(def, synonym.key, raw) };
    })
    .filter((f) => f.reading);
  return fits.length === 1 ? fits[0]! : null;
}

export interface ProseContext {
  family: FamilyKey;
  documentText: string;
}

const SKIP_SECTIONS = new Set(['ordering', 'dimensions', 'revisions', 'pins']);

interface Assigned {
  slots: Slots;
  statedUnit: string | null;
  end: number;
}

/** The slot a lone number takes from the words around it: "typically 9", "2.5 V at most", "no less than 7.5". */
function slotOf(sentence: string, q: QuantityHit, name: NameHit, prevEnd: number, limits: boolean): ValueSlot {
  const from = Math.max(prevEnd, q.start - 40, name.end <= q.start ? name.end : 0);
  return (
    qualifierAfter(sentence.slice(q.end, q.end + 14)) ??
    qualifierBefore(sentence.slice(from, q.start)) ??
    // "Do not exceed a continuous forward current of 25 mA": the limit word leads the sentence.
    (LEAD_LIMIT.test(sentence.slice(Math.max(0, name.start - 40), name.start)) ? 'max' : null) ??
    (limits ? 'max' : 'typ')
  );
}

/**
 * Gives each number to the nearest name before it whose unit it fits ("the total resistance of 1 MΩ"), else to a
 * name right after it ("a 9 V/µs slew rate"), else, for a limit worded as one ("up to 320 V"), to the family's one
 * limit in that unit. Names found that way are added to `names`.
 */
function assignQuantities(sentence: string, names: NameHit[], defs: Definition[], family: FamilyKey, limits: boolean): Map<NameHit, Assigned> {
  const assigned = new Map<NameHit, Assigned>();
  let prevEnd = 0;
  for (const q of findQuantities(sentence)) {
    let target = -1;
    let reading: ReturnType<typeof readFor> = null;
    for (let i = names.length - 1; i >= 0 && target < 0; i--) {
      const n = names[i]!;
      if (n.end > q.start || q.start - n.end > 110) continue;
      reading = readFor(defs[i]!, n.key, q.raw);
      if (reading) target = i;
    }
    if (target < 0) {
      const i = names.findIndex((n) => n.start >= q.end && n.start - q.end <= 25 && !n.loose);
      reading = i >= 0 ? readFor(defs[i]!, names[i]!.key, q.raw) : null;
      if (reading) target = i;
    }
    if (target < 0 && qualifierBefore(sentence.slice(Math.max(prevEnd, q.start - 30), q.start)) === 'max') {
      const limit = limitFor(family, q.raw);
      if (limit) {
        names.push({ key: limit.key, start: q.start, end: q.start, synonym: limit.synonym, loose: true });
        defs.push(limit.def);
        target = names.length - 1;
        reading = limit.reading;
      }
    }
    if (target >= 0 && reading) {
      const name = names[target]!;
      const entry = assigned.get(name) ?? { slots: {}, statedUnit: reading.statedUnit, end: q.end };
      const lone = Object.keys(reading.slots).length === 1 && reading.slots.typ !== undefined;
      if (lone) entry.slots[reading.qualifier ?? slotOf(sentence, q, name, prevEnd, limits)] ??= reading.slots.typ!;
      else for (const [k, v] of Object.entries(reading.slots) as [ValueSlot, number][]) entry.slots[k] ??= v;
      entry.end = Math.max(entry.end, q.end);
      assigned.set(name, entry);
    }
    prevEnd = q.end;
  }
  return assigned;
}

/** The slots a definition keeps; a lone figure of a one-slot limit is that limit. */
function keptSlots(def: Definition, slots: Slots): Slots | null {
  const allowed = def.slots ?? ['min', 'typ', 'max'];
  const kept: Slots = {};
  for (const slot of allowed) if (slots[slot] !== undefined) kept[slot] = slots[slot];
  if (Object.keys(kept).length === 0 && allowed.length === 1 && allowed[0] === 'max' && slots.typ !== undefined) kept.max = slots.typ;
  return Object.keys(kept).length ? kept : null;
}

function sentenceCandidates(p: Passage, s: { start: number; end: number }, ctx: ProseContext): Candidate[] {
  const kind = p.section?.kind ?? 'other';
  const limits = kind === 'absolute-maximum';
  const origin: Origin = limits ? 'absolute-maximum' : p.listLike ? 'table' : 'prose';
  const sentence = p.text.slice(s.start, s.end);
  const names = findNames(ctx.family, sentence).filter(
    (n) => !limits || Boolean((n.synonym ?? SYNONYMS[ctx.family].find((x) => x.key === n.key))?.limit),
  );
  if (names.length === 0 && !/\d/.test(sentence)) return [];
  const defs = names.map((n) => definitionOf(ctx.family, n.key));
  const assigned = assignQuantities(sentence, names, defs, ctx.family, limits);
  const out: Candidate[] = [];
  names.forEach((name, i) => {
    const def = defs[i]!;
    const got = assigned.get(name);
    let value: ParameterValue | null = null;
    if (def.kind === 'number') {
      const kept = got ? keptSlots(def, got.slots) : null;
      if (!kept || wrongIlluminance(name.key, [sentence])) return;
      value = finishValue(def, kept, [sentence]);
    } else if (!name.loose) {
      // Words around the name say the value: "Taper: logarithmic", "follows a linear resistance law".
      const to = i + 1 < names.length ? names[i + 1]!.start : sentence.length;
      const from = i > 0 ? names[i - 1]!.end : 0;
      value =
        enumValue(def, sentence.slice(name.end, to).replace(/^[\s:=–-]+/, '').slice(0, 60), ctx.documentText) ??
        enumValue(def, sentence.slice(from, name.start).slice(-40), ctx.documentText);
    }
    if (!value) return;
    const synonym = name.synonym ?? SYNONYMS[ctx.family].find((x) => x.key === name.key) ?? null;
    const labelled = /^\s*[:=]/.test(sentence.slice(name.end));
    let confidence = p.listLike ? 0.8 : labelled ? 0.7 : 0.55;
    if (name.loose) confidence -= 0.15;
    let perPackage: boolean | undefined;
    if (name.key === 'quiescentCurrent') {
      const basis = quiescentBasis([sentence]);
      perPackage = basis !== 'per-channel';
      if (basis === 'unstated') confidence -= 0.1;
    }
    const boxes: PageBox[] = boxesOf(itemsIn(p, s.start + name.start, s.start + (got?.end ?? name.end)));
    out.push({
      key: name.key,
      value,
      statedUnit: got?.statedUnit ?? null,
      origin,
      conditionsText: readConditionsText(sentence),
      confidence: clampConfidence(confidence),
      source: { page: p.page, snippet: sentence.trim(), boxes },
      order: p.order,
      offNominal: isOffNominal(name.key, [sentence]),
      rank: (synonym?.rank ?? 0) - (name.loose ? 1 : 0),
      ...(perPackage === undefined ? {} : { perPackage }),
    });
  });
  return out;
}

/** Values stated in running text and in lists outside tables; lower confidence than a labelled table cell. */
export function candidatesFromProse(passages: Passage[], ctx: ProseContext): Candidate[] {
  return passages
    .filter((p) => !SKIP_SECTIONS.has(p.section?.kind ?? 'other'))
    .flatMap((p) => sentences(p.text).flatMap((s) => sentenceCandidates(p, s, ctx)));
}

function readConditionsText(sentence: string): string | null {
  const conds = readConditions([sentence], ['supply', 'temperature', 'current', 'time']);
  return Object.keys(conds).length ? sentence.trim() : null;
}
