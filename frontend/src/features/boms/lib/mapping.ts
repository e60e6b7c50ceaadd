import { BOM_FIELDS, type BomField, type BomMapping, type BomPreview, type MAPPING_SOURCES } from '@understudy/shared-types';

/** What one column holds on the mapping screen; "ignore" leaves it out (it still comes back in the export). */
export type ColumnChoice = BomField | 'ignore';

export const MAPPING_SOURCE_NOTES: Record<(typeof MAPPING_SOURCES)[number], string> = {
  remembered: 'as last time',
  headers: 'from the header',
  content: 'from the values',
};

/** One choice per column, from the server's guess. */
export function choicesFrom(preview: Pick<BomPreview, 'columns' | 'mapping'>): ColumnChoice[] {
  const choices: ColumnChoice[] = preview.columns.map(() => 'ignore');
  for (const field of BOM_FIELDS) {
    const index = preview.mapping[field];
    if (index !== undefined && index < choices.length) choices[index] = field;
  }
  return choices;
}

/** A field lives in one column only: choosing it for one column takes it off any other. */
export function chooseColumn(choices: readonly ColumnChoice[], index: number, choice: ColumnChoice): ColumnChoice[] {
  return choices.map((current, i) => {
    if (i === index) return choice;
    return choice !== 'ignore' && current === choice ? 'ignore' : current;
  });
}

/** The mapping to save, or null while no column holds the part numbers. */
export function mappingFrom(choices: readonly ColumnChoice[]): BomMapping | null {
  const mapping: Partial<BomMapping> = {};
  choices.forEach((choice, index) => {
    if (choice !== 'ignore') mapping[choice] = index;
  });
  return mapping.partNumber === undefined ? null : (mapping as BomMapping);
}

/** Where the guess for a column came from, while the column still holds what was guessed. */
export function choiceNote(preview: Pick<BomPreview, 'mapping' | 'mappingSource'>, index: number, choice: ColumnChoice): string | null {
  if (choice === 'ignore' || preview.mapping[choice] !== index) return null;
  const source = preview.mappingSource[choice];
  return source ? MAPPING_SOURCE_NOTES[source] : null;
}

/** The sample rows without the header, whether or not the server included it. */
export function dataRows(preview: Pick<BomPreview, 'hasHeader' | 'columns' | 'sampleRows'>): string[][] {
  const [first, ...rest] = preview.sampleRows;
  if (preview.hasHeader && first && preview.columns.every((c, i) => c.header === (first[i] ?? null))) return rest;
  return preview.sampleRows;
}

/** "UTF-8", "Windows-1252"; a paste has no bytes to read. */
export function encodingLabel(encoding: string): string {
  if (encoding === 'text') return 'pasted text';
  if (/^utf-/i.test(encoding)) return encoding.toUpperCase();
  return encoding.charAt(0).toUpperCase() + encoding.slice(1);
}

/** The file name without its extension, as a BOM name. */
export function nameFromFile(fileName: string): string {
  return fileName.replace(/\.[^.]+$/, '').trim() || fileName;
}
