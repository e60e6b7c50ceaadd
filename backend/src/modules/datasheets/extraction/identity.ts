import { PACKAGES, type DatasheetIdentity, type FamilyKey } from '@understudy/shared-types';
import { boxesOf, type Cell, type Line } from './layout';
import { cellText, type DocumentLayout, type Table } from './tables';

type Finding<T> = { value: T; confidence: number; source: { page: number; snippet: string; boxes: ReturnType<typeof boxesOf> } | null };

/** Words that say what a document describes, strongest first: a resistive optocoupler names an LED and a cell too. */
const FAMILY_WORDS: [FamilyKey, RegExp][] = [
  ['optocoupler', /\bopto[\s-]*(coupler|isolator)s?\b|\bphoto[\s-]*couplers?\b|\bresistive opto|\bLED[\s/-]+(LDR|photo(resistor|cell))\b|\blight[\s-]*coupled resistor/i],
  ['photoresistor', /\bphoto[\s-]*resistors?\b|\bphoto[\s-]*cells?\b|\bphotoconductive cells?\b|\blight[\s-]*dependent resistors?\b|\bLDRs?\b|\bCdSe? (photo)?cells?\b/i],
  ['potentiometer', /\bpotentiometers?\b|\bpots?\b|\brotary (volume |tone )?controls?\b|\bvariable resistors?\b/i],
  ['op-amp', /\bop(erational)?[\s-]*amp(lifier)?s?\b|\bopamps?\b/i],
  ['led', /\bLEDs?\b|\blight[\s-]*emitting diodes?\b/i],
];

/**
 * The title block: lines in the largest few sizes in the upper part of the first page. Not judged against the body
 * size alone, since a one-page sheet may have more title text than body text.
 */
function pageOneTitleLines(layout: DocumentLayout): Line[] {
  const first = layout.lines.filter((l) => l.page === 1);
  if (first.length === 0) return [];
  // A4 and Letter title blocks sit in the top third; without a page size, the top 280 pt.
  const limit = (layout.pageHeights[0] ?? 840) * 0.34;
  const sizes = [...new Set(first.map((l) => l.fontSize))].sort((a, b) => b - a);
  const big = sizes.filter((s) => s >= 10 && s > Math.min(layout.bodySize, 10) * 1.1).slice(0, 3);
  return first.filter((l) => big.includes(l.fontSize) && l.top < limit);
}

/** The family the title block names. */
export function detectFamily(layout: DocumentLayout): Finding<FamilyKey> | null {
  const title = pageOneTitleLines(layout);
  for (const [family, re] of FAMILY_WORDS) {
    const line = title.find((l) => re.test(l.text));
    if (line) return { value: family, confidence: 0.95, source: { page: line.page, snippet: line.text, boxes: boxesOf(line.items) } };
  }
  return null;
}

/** The family whose words the whole text uses most, when at least three times. */
export function familyFromWords(layout: DocumentLayout): Finding<FamilyKey> | null {
  const all = layout.lines.map((l) => l.text).join('\n');
  let best: FamilyKey | null = null;
  let bestCount = 0;
  for (const [family, re] of FAMILY_WORDS) {
    const count = [...all.matchAll(new RegExp(re.source, 'gi'))].length;
    if (count > bestCount) {
      best = family;
      bestCount = count;
    }
  }
  return best && bestCount >= 3 ? { value: best, confidence: 0.5, source: null } : null;
}

const PART_NUMBER = /^(?=.*\d)(?=.*[A-Z])[A-Z0-9][A-Z0-9\-./]{2,23}$/;
const NOT_PART = /^(DIP|SOIC|SO|MSOP|TSSOP|SOT|TO|PDIP|QFN|DFN|SIP|REV|DS|DOC|ISO|RoHS|AEC|IEC|JIS|T-?1)\b|^\d+(MM|V|MA|MW|NM)$/i;

function partTokens(text: string): string[] {
  return text
    .split(/[\s,;:()·|]+/)
    .map((t) => t.replace(/[.,]$/, ''))
    .filter((t) => PART_NUMBER.test(t) && !NOT_PART.test(t) && !/^\d{4}-\d{2}(-\d{2})?$/.test(t));
}

/** The title's most prominent token that reads as a part number. */
function findPartNumber(layout: DocumentLayout): Finding<string> | null {
  const first = layout.lines.filter((l) => l.page === 1);
  const cells: Cell[] = first.flatMap((l) => l.cells).sort((a, b) => b.fontSize - a.fontSize || a.top - b.top);
  for (const cell of cells.slice(0, 12)) {
    if (cell.fontSize < layout.bodySize * 1.15) break;
    // Some makers print a space inside the number ("OSL 1552"): a short all-capitals cell is taken whole.
    const whole = cell.text.trim();
    const token = /^[A-Z]{1,5} \d[A-Z0-9\-]{1,12}$/.test(whole) ? whole : partTokens(cell.text)[0];
    if (!token) continue;
    const repeated = layout.lines.filter((l) => l.text.includes(token)).length > 1;
    return { value: token, confidence: repeated ? 0.95 : 0.85, source: { page: 1, snippet: cell.text, boxes: boxesOf(cell.items) } };
  }
  const labelled = layout.lines.find((l) => /\b(part (number|no\.?)|type|device)\s*[:=]/i.test(l.text));
  const token = labelled && partTokens(labelled.text.split(/[:=]/)[1] ?? '')[0];
  return token ? { value: token, confidence: 0.6, source: { page: labelled!.page, snippet: labelled!.text, boxes: boxesOf(labelled!.items) } } : null;
}

const COPYRIGHT = /(?:©|\(c\)|copyright)\s*(?:(?:19|20)\d{2}(?:\s*[-–]\s*(?:19|20)\d{2})?,?\s*)?(?:by\s+)?([A-Z][A-Za-z0-9&'.,\- ]{1,80}?)\s*(?:[.,;]?\s*all rights.*|\s{2,}.*)?$/i;
const NOT_MAKER =
  /^(datasheet|data sheet|preliminary|product|advance|information|rev|revision|document|page|confidential|new|obsolete|all rights|features|description|general description|overview|applications?|pin |absolute|electrical|key )/i;
// Legal forms are not part of the name the catalog files a maker under.
const LEGAL_FORM = /[\s,]+(ltd|limited|inc|incorporated|corp|corporation|co|company|gmbh|ag|s\.?\s?a|s\.?r\.?l|b\.?v|n\.?v|plc|llc|llp|lp|k\.?k|oy|ab|pty|s\.?a\.?s)\.?$/i;

export function withoutLegalForm(name: string): string {
  let n = name.trim().replace(/[.,;]+$/, '');
  for (let i = 0; i < 3 && LEGAL_FORM.test(n); i++) n = n.replace(LEGAL_FORM, '').trim();
  return n;
}

function findManufacturer(layout: DocumentLayout, partNumber: string | null): Finding<string> | null {
  let copyright: Finding<string> | null = null;
  outer: for (const line of layout.lines) {
    for (const cell of line.cells) {
      const m = COPYRIGHT.exec(cell.text);
      const name = m?.[1] ? withoutLegalForm(m[1]) : '';
      if (name.length >= 2 && !NOT_MAKER.test(name)) {
        copyright = { value: name, confidence: 0.85, source: { page: line.page, snippet: cell.text, boxes: boxesOf(cell.items) } };
        break outer;
      }
    }
  }
  // The name in the title block: a short line of words set apart from the part number and its description.
  const titleCells = pageOneTitleLines(layout)
    .flatMap((l) => l.cells)
    .sort((a, b) => a.top - b.top)
    .filter((cell) => {
      const text = cell.text.trim();
      if (partNumber && text.includes(partNumber)) return false;
      if (NOT_MAKER.test(text) || text.split(/\s+/).length > 5 || !/^[A-Z]/.test(text) || /\d{3}/.test(text)) return false;
      return !FAMILY_WORDS.some(([, re]) => re.test(text));
    });
  if (copyright) {
    // The title block usually carries the trading name, the copyright line the full one: prefer the short one.
    const full = copyright.value.toLowerCase();
    const same = titleCells.find((c) => {
      const t = withoutLegalForm(c.text).toLowerCase();
      return t.length >= 3 && (full === t || full.startsWith(`${t} `));
    });
    if (same) {
      const value = withoutLegalForm(same.text);
      return { value, confidence: 0.95, source: { page: 1, snippet: same.text, boxes: boxesOf(same.items) } };
    }
    return copyright;
  }
  const labelled = layout.lines.find((l) => /\b(manufacturer|made by|vendor)\s*[:=]/i.test(l.text));
  if (labelled) {
    const value = labelled.text.split(/[:=]/)[1]?.trim().split(/\s{2,}/)[0];
    if (value) return { value: withoutLegalForm(value), confidence: 0.8, source: { page: labelled.page, snippet: labelled.text, boxes: boxesOf(labelled.items) } };
  }
  const cell = titleCells[0];
  return cell ? { value: withoutLegalForm(cell.text), confidence: 0.6, source: { page: 1, snippet: cell.text, boxes: boxesOf(cell.items) } } : null;
}

const PACKAGE_PATTERNS: [RegExp, string][] = [
  [/\b(P?DIP|DIL)[\s-]?8\b|\b8[\s-]*(pin|lead)?[\s-]*P?DIP\b/i, 'DIP-8'],
  [/\bSOIC[\s-]?8\b|\bSO[\s-]?8\b|\b8[\s-]*(pin|lead)?[\s-]*SOIC?\b/i, 'SOIC-8'],
  [/\bMSOP[\s-]?8\b|\bVSSOP[\s-]?8\b/i, 'MSOP-8'],
  [/\bTO[\s-]?99\b/i, 'TO-99'],
  [/\bSOT[\s-]?23[\s-]?5\b/i, 'SOT-23-5'],
  [/\b(P?DIP|DIL)[\s-]?14\b|\b14[\s-]*(pin|lead)?[\s-]*P?DIP\b/i, 'DIP-14'],
  [/\bSOIC[\s-]?14\b|\bSO[\s-]?14\b/i, 'SOIC-14'],
  [/\bTSSOP[\s-]?14\b/i, 'TSSOP-14'],
];

function findPackage(layout: DocumentLayout, family: FamilyKey | null): Finding<string> | null {
  const known = new Set<string>(PACKAGES.filter((p) => !family || (p.families as readonly string[]).includes(family)).map((p) => p.key));
  for (const line of layout.lines) {
    for (const [re, key] of PACKAGE_PATTERNS) {
      if (!known.has(key)) continue;
      if (re.test(line.text)) return { value: key, confidence: 0.75, source: { page: line.page, snippet: line.text, boxes: boxesOf(line.items) } };
    }
    const size = /\b(3|5|9|16|24)\s*mm\b/i.exec(line.text);
    if (size && line.page === 1) {
      const key = family === 'led' ? `led-${size[1]}mm` : family === 'potentiometer' ? `pot-${size[1]}mm` : '';
      if (known.has(key)) return { value: key, confidence: 0.7, source: { page: line.page, snippet: line.text, boxes: boxesOf(line.items) } };
    }
    if (family === 'photoresistor' && /\bradial\b|\b2[\s-]*lead\b|\bleaded\b/i.test(line.text)) {
      return { value: 'radial', confidence: 0.6, source: { page: line.page, snippet: line.text, boxes: boxesOf(line.items) } };
    }
  }
  return null;
}

/** Pin number → name from a Pin | Name | Function table. */
function findPinMap(tables: Table[]): Finding<Record<string, string>> | null {
  for (const table of tables) {
    if (table.kind !== 'pins') continue;
    const map: Record<string, string> = {};
    const items = [];
    for (const row of table.rows) {
      const pin = cellText(row, 'pin').replace(/^pin\s*/i, '');
      const name = cellText(row, 'name') || cellText(row, 'function');
      if (!/^\d{1,3}$/.test(pin) || !name) continue;
      map[pin] = name.slice(0, 24).trim();
      items.push(...Object.values(row.cells).flat().flatMap((c) => c!.items));
    }
    if (Object.keys(map).length >= 2) {
      return { value: map, confidence: 0.9, source: { page: table.page, snippet: table.heading ?? 'Pin table', boxes: boxesOf(items).slice(0, 40) } };
    }
  }
  return null;
}

export function readIdentity(
  layout: DocumentLayout,
  tables: Table[],
  family: Finding<FamilyKey> | null,
): DatasheetIdentity {
  const partNumber = findPartNumber(layout);
  return {
    family,
    partNumber,
    manufacturer: findManufacturer(layout, partNumber?.value ?? null),
    package: findPackage(layout, family?.value ?? null),
    pinMap: findPinMap(tables),
  };
}

export function titleText(layout: DocumentLayout): { text: string; lines: Line[] } {
  const lines = pageOneTitleLines(layout);
  return { text: lines.map((l) => l.text).join(' \n '), lines };
}
