import { EntitySchema } from 'typeorm';
import type { BomLineProblem, MatchKind } from '@understudy/shared-types';

/** A stored candidate: the part and how alike its number is; the part itself is read fresh every time. */
export interface StoredCandidate {
  partId: string;
  similarity: number;
}

/**
 * One data row of a BOM: its cells exactly as they came, what was read from them, and how it matched. Status and
 * risk are not stored: they are computed from the catalog as it is when the BOM is read.
 */
export interface BomLine {
  id: string;
  bomId: string;
  /** 0-based order of the line in the file. */
  position: number;
  /** The row as a spreadsheet numbers it (header = row 1). */
  rowNumber: number;
  cells: string[];
  partNumber: string;
  partNumberKey: string;
  manufacturer: string | null;
  quantity: number | null;
  designators: string[];
  notes: string;
  problems: BomLineProblem[];
  matchKind: MatchKind;
  /** The matched (or confirmed) catalog part. */
  partId: string | null;
  matchDetail: string | null;
  candidates: StoredCandidate[];
  replacementPartId: string | null;
  replacementNote: string;
  replacementChosenById: string | null;
  replacementChosenAt: Date | null;
  updatedAt: Date;
}

export const BomLineEntity = new EntitySchema<BomLine>({
  name: 'BomLine',
  tableName: 'bom_lines',
  columns: {
    id: { type: 'uuid', primary: true, generated: 'uuid' },
    bomId: { type: 'uuid', name: 'bom_id' },
    position: { type: 'int' },
    rowNumber: { type: 'int', name: 'row_number' },
    cells: { type: 'jsonb' },
    partNumber: { type: 'text', name: 'part_number' },
    partNumberKey: { type: 'text', name: 'part_number_key' },
    manufacturer: { type: 'text', nullable: true },
    quantity: { type: 'double precision', nullable: true },
    designators: { type: 'jsonb' },
    notes: { type: 'text' },
    problems: { type: 'jsonb' },
    matchKind: { type: 'varchar', length: 16, name: 'match_kind' },
    partId: { type: 'uuid', name: 'part_id', nullable: true },
    matchDetail: { type: 'text', name: 'match_detail', nullable: true },
    candidates: { type: 'jsonb' },
    replacementPartId: { type: 'uuid', name: 'replacement_part_id', nullable: true },
    replacementNote: { type: 'text', name: 'replacement_note' },
    replacementChosenById: { type: 'uuid', name: 'replacement_chosen_by', nullable: true },
    replacementChosenAt: { type: 'timestamptz', name: 'replacement_chosen_at', nullable: true },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
  },
});
