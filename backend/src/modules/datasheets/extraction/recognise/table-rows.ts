import type { FamilyKey, ParameterValue } from '@understudy/shared-types';
import { boxesOf } from '../layout';
import { cellText, isConditionsText, type ColumnRole, type Table, type TableRow } from '../tables';
import { clampConfidence, type Candidate } from './candidate';
import { matchLabel } from './synonyms';
import {
  definitionOf,
  enumValue,
  finishValue,
  isOffNominal,
  quiescentBasis,
  readSlots,
  readSupplySlots,
  wrongIlluminance,
  type Slots,
  type SlotTexts,
} from './values';

const READ_KINDS = new Set(['characteristics', 'absolute-maximum']);

function rowSnippet(row: TableRow): string {
  return row.lines
    .map((l) =>
      l.cells
        .filter((c) => Object.values(row.cells).some((cs) => cs?.includes(c)))
        .map((c) => c.text)
        .join('  '),
    )
    .filter(Boolean)
    .join(' ')
    .trim();
}

function rowItems(row: TableRow, roles: ColumnRole[]) {
  return roles.flatMap((r) => row.cells[r] ?? []).flatMap((c) => c.items);
}

export interface TableContext {
  family: FamilyKey;
  /** The whole document's text, for hints such as which taper letter code a maker uses. */
  documentText: string;
}

/** Slots of a number row, with the unit printed and how sure the reading is. */
function readNumberRow(
  def: ReturnType<typeof definitionOf>,
  texts: SlotTexts,
  unitText: string | null,
  limits: boolean,
  label: string,
): { slots: Slots; statedUnit: string | null; unitGuessed: boolean } | null {
  if (def.key === 'supplyVoltage') {
    const slots = readSupplySlots(texts, unitText);
    return slots ? { slots, statedUnit: unitText ?? 'V', unitGuessed: false } : null;
  }
  return readSlots(def, texts, unitText, { limitTable: limits, label });
}

function readRow(table: Table, row: TableRow, ctx: TableContext): Candidate | null {
  const limits = table.kind === 'absolute-maximum';
  const label = table.columns.some((c) => c.role === 'label') ? cellText(row, 'label') : '';
  const match = matchLabel(ctx.family, label, cellText(row, 'symbol'));
  if (!match || (limits && !match.synonym.limit)) return null;
  const key = match.synonym.key;
  const def = definitionOf(ctx.family, key);
  const rowConditions = cellText(row, 'conditions');
  const group = row.group && isConditionsText(row.group) ? row.group : null;
  const tableConditions = table.conditionsText ?? table.inheritedConditions;
  const conditionTexts = [rowConditions, label, group, tableConditions, table.heading];
  if (wrongIlluminance(key, [rowConditions, label])) return null;
  const unitText = cellText(row, 'unit') || null;
  const texts: SlotTexts = {};
  for (const role of ['min', 'typ', 'max', 'value'] as const) {
    const t = cellText(row, role);
    if (t) texts[role] = t;
  }

  let value: ParameterValue | null;
  let statedUnit: string | null = null;
  let confidence = match.by === 'name' ? 0.95 : 0.8;
  if (def.kind === 'number') {
    const reading = readNumberRow(def, texts, unitText, limits, label);
    if (!reading) return null;
    statedUnit = reading.statedUnit;
    if (reading.unitGuessed) confidence -= 0.35;
    value = finishValue(def, reading.slots, conditionTexts);
  } else {
    const text = texts.value ?? texts.typ ?? texts.min ?? texts.max ?? rowConditions;
    value = text ? enumValue(def, text, ctx.documentText) : null;
  }
  if (!value) return null;
  if (row.continuation) confidence -= 0.05;
  let perPackage: boolean | undefined;
  if (key === 'quiescentCurrent') {
    const basis = quiescentBasis([label, rowConditions, row.group]);
    perPackage = basis !== 'per-channel';
    if (basis === 'unstated') confidence -= 0.15;
  }
  const items = rowItems(row, ['label', 'symbol', 'conditions', 'min', 'typ', 'max', 'value', 'unit']);
  return {
    key,
    value,
    statedUnit,
    origin: limits ? 'absolute-maximum' : 'table',
    conditionsText: [tableConditions, group, rowConditions].filter(Boolean).join('; ') || null,
    confidence: clampConfidence(confidence),
    source: { page: table.page, snippet: rowSnippet(row), boxes: boxesOf(items) },
    order: row.lines[0]!.index,
    offNominal: isOffNominal(key, conditionTexts),
    rank: match.synonym.rank ?? 0,
    // A table titled with its conditions repeats parameters under other conditions than the main one.
    ...(table.heading && isConditionsText(table.heading) ? { variant: true } : {}),
    ...(perPackage === undefined ? {} : { perPackage }),
  };
}

/** Reads every characteristics and limits row that names a parameter of the family. */
export function candidatesFromTables(tables: Table[], ctx: TableContext): Candidate[] {
  return tables
    .filter((t) => READ_KINDS.has(t.kind))
    .flatMap((table) => {
      const found = table.rows.map((row) => readRow(table, row, ctx)).filter((c): c is Candidate => c !== null);
      const weight = table.kind === 'absolute-maximum' ? 0 : new Set(found.map((c) => c.key)).size;
      return found.map((c) => ({ ...c, tableWeight: weight }));
    });
}
