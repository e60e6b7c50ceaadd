import { parseQuantity, parseSupplySpan, UNITS, type CanonicalUnit, type ParameterDefinition, type ValueSlot } from '@understudy/shared-types';

/**
 * Spellings datasheets print that the shared units parser does not take as they stand; rewritten here so there is
 * still only one units parser.
 */
export function normaliseUnitSpelling(text: string): string {
  return (
    text
      .normalize('NFKC')
      .replace(/\u03BC/g, '\u00B5')
      .replace(/\u2126/g, 'Ω')
      .replace(/[\u2212\u2013\u2012]/g, (_m, offset: number, all: string) =>
        // A dash between two numbers is a range; before a number it is a minus sign.
        /\d\s*$/.test(all.slice(0, offset)) ? ' to ' : '-',
      )
      .replace(/[\u00A0\u2009\u202F]/g, ' ')
      // Hz^1/2, Hz^½, Hz1/2, Hz½: root hertz.
      .replace(/Hz\s*(\^\s*)?(1[\/\u2044]2|½|0\.5)/gi, '√Hz')
      .replace(/√\s*\(?\s*Hz\s*\)?/gi, '√Hz')
      .replace(/\/\s*√Hz/g, '/√Hz')
      // V/µS and V/uS: nobody means siemens in a slew rate.
      .replace(/V\s*\/\s*([µu])S\b/g, 'V/$1s')
      .replace(/\b(deg|degs|degrees?)\.?\s*C\b/gi, '°C')
      .replace(/\bdeg\./gi, 'deg')
      .replace(/\bohms?\./gi, 'ohm')
      .replace(/\bmsec\b/gi, 'ms')
      .replace(/\busec\b/gi, 'µs')
      .replace(/\s+/g, ' ')
      .trim()
  );
}

export type Qualifier = ValueSlot;

export interface ReadValue {
  /** Slots read from one printed value: a plain number, "≥ 1 MΩ", "8 to 20 kΩ". */
  slots: Partial<Record<ValueSlot, number>>;
  /** Which slot a single number names by itself ("max 2 mV", "≤ 2 mV"), when it says so. */
  qualifier?: Qualifier;
  range: boolean;
  plusMinus: boolean;
  /** The unit as printed, when the text names one. */
  statedUnit: string | null;
  /** Nothing named the unit: the number was read in the definition's display unit. */
  unitGuessed: boolean;
}

// Bare numbers are read in the display unit; without one only these units are printed unprefixed in practice.
const BARE_OK = new Set(['', 'V', '°', '%', '°C']);

function parseIn(text: string, def: ParameterDefinition, bare: boolean): { value: number; plusMinus: boolean } | null {
  const unit = def.unit ?? '';
  let r;
  if (bare && UNITS[unit as CanonicalUnit]?.prefixable) {
    if (def.displayUnit) r = parseQuantity(text, { unit, displayUnit: def.displayUnit });
    else if (BARE_OK.has(unit)) r = parseQuantity(text, { unit });
    else return null;
  } else {
    r = parseQuantity(text, { unit });
  }
  return r.ok ? { value: r.value, plusMinus: Boolean(r.plusMinus) } : null;
}

const QUALIFIER_BEFORE: [RegExp, Qualifier][] = [
  [/^(≥|>=|>|min(imum)?\.?|at least|over|above|more than|greater than)\s*/i, 'min'],
  [/^(≤|<=|<|max(imum)?\.?|up to|below|under|less than|no more than|not more than)\s*/i, 'max'],
  [/^(typ(ical(ly)?)?\.?|approx(imately)?\.?|~|≈|about|around|nominal(ly)?|nom\.?)\s*/i, 'typ'],
];
const QUALIFIER_AFTER: [RegExp, Qualifier][] = [
  [/\s*\(?\s*(min(imum)?\.?|or more|or greater|minimum)\s*\)?$/i, 'min'],
  [/\s*\(?\s*(max(imum)?\.?|or less|maximum)\s*\)?$/i, 'max'],
  [/\s*\(?\s*(typ(ical)?\.?|nom(inal)?\.?)\s*\)?$/i, 'typ'],
];

const EMPTY = /^(—|–|-|−|n\/?a|tbd|\*|…|\.\.\.)?$/i;

/** The unit part of a printed value: everything after the number(s), or the unit column's text. */
function unitPart(text: string): string | null {
  const m = /^[±+\-]?\s*(\d+(?:[.,]\d+)?(?:[eE][+-]?\d+)?)\s*(.*)$/.exec(text);
  const rest = m?.[2]?.replace(/^(to|\.\.\.?|~)\s*[±+\-]?\s*\d+(?:[.,]\d+)?\s*/i, '').trim();
  return rest ? rest : null;
}

function withUnit(number: string, unitText: string | null): string {
  return unitText && !/[A-Za-zµΩ°%√]/.test(number.replace(/^[±+\-]/, '').replace(/[eE][+-]?\d+/, '')) ? `${number} ${unitText}` : number;
}

/**
 * Reads one printed value against a parameter's canonical unit: the value cell's text and, when the table has one,
 * the unit column's text. Returns null for blanks, dashes and anything that is not a value in that unit.
 */
export function readValue(valueText: string, unitText: string | null, def: ParameterDefinition): ReadValue | null {
  let text = normaliseUnitSpelling(valueText);
  const unitCol = unitText ? normaliseUnitSpelling(unitText).replace(/^\(|\)$/g, '') : null;
  if (EMPTY.test(text)) return null;
  let qualifier: Qualifier | undefined;
  for (const [re, q] of QUALIFIER_BEFORE) {
    if (re.test(text)) {
      qualifier = q;
      text = text.replace(re, '');
      break;
    }
  }
  for (const [re, q] of QUALIFIER_AFTER) {
    if (re.test(text)) {
      qualifier ??= q;
      text = text.replace(re, '');
      break;
    }
  }
  const unit = def.unit ?? '';
  const rangeMatch = /^(.+?)\s*(?:\bto\b|\.\.\.?|…|~)\s*(.+)$/i.exec(text);
  if (rangeMatch) {
    const [lo, hi] = [rangeMatch[1]!.trim(), rangeMatch[2]!.trim()];
    const hiUnit = unitPart(hi) ?? unitCol;
    const bare = hiUnit === null && unitPart(lo) === null;
    if (unit === '' && !bare) return null;
    const a = parseIn(withUnit(lo, unitPart(lo) ?? hiUnit), def, bare);
    const b = parseIn(withUnit(hi, hiUnit), def, bare);
    if (!a || !b || a.value > b.value) return null;
    return {
      slots: { min: a.value, max: b.value },
      range: true,
      plusMinus: a.plusMinus || b.plusMinus,
      statedUnit: hiUnit,
      unitGuessed: bare && unit !== '',
    };
  }
  const own = unitPart(text);
  const stated = own ?? unitCol;
  // A unitless parameter must not swallow a number that came with a unit of its own ("2 mm" as a gang count).
  if (unit === '' && stated && !/^[x×]$/i.test(stated)) return null;
  const bare = stated === null;
  const r = parseIn(unit === '' ? text.replace(/\s*[x×]$/i, '') : withUnit(text, own ? null : unitCol), def, bare);
  if (!r) return null;
  const slot: ValueSlot = qualifier ?? 'typ';
  return {
    slots: { [slot]: r.value },
    ...(qualifier ? { qualifier } : {}),
    range: false,
    plusMinus: r.plusMinus,
    statedUnit: stated,
    unitGuessed: bare && unit !== '' && UNITS[unit as CanonicalUnit]?.prefixable === true,
  };
}

/**
 * A supply range as the total span between the rails: "±1.5 V to ±16 V" → 3..32 V, "4.5 to 36 V" → 4.5..36 V.
 * Dual and single ends may come from separate Min and Max cells.
 */
export function readSupplySpan(text: string, unitText: string | null): { min: number; max: number } | null {
  let t = normaliseUnitSpelling(text);
  const unitCol = unitText ? normaliseUnitSpelling(unitText) : null;
  if (unitCol && !/V\b/.test(t)) t = t.replace(/(\d)(?=\s*(?:$|\bto\b|\.\.|…|or\b|\())/g, `$1 ${unitCol}`);
  const r = parseSupplySpan(t, { unit: 'V' });
  return r.ok ? { min: r.min, max: r.max } : null;
}

/** One supply end ("±15", "36", "5 V") as a total span. */
export function readSupplyEnd(text: string, unitText: string | null): number | null {
  const r = readSupplySpan(text, unitText);
  return r && r.min === r.max ? r.min : null;
}
