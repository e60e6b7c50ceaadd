import { isCadmiumCell, type BomCheckDto, type BomDelimiter, type BomDto, type BomMapping, type BomPart, type BomSummary, type FamilyKey, type Lifecycle, type PersonRef, type RohsStatus } from '@understudy/shared-types';

export interface PartRow {
  id: string;
  family: FamilyKey;
  part_number: string;
  manufacturer: string;
  description: string;
  lifecycle: Lifecycle;
  rohs_status: RohsStatus;
  cell_material: string | null;
  archived: boolean;
}

/** The columns PartRow reads, from `parts p JOIN manufacturers m`. */
export const PART_COLUMNS = `p.id, p.family, p.part_number, m.name AS manufacturer, p.description, p.lifecycle, p.rohs_status,
  p.parameters->'cellMaterial'->>'value' AS cell_material, p.archived`;

export function presentPart(row: PartRow): BomPart {
  return {
    id: row.id,
    family: row.family,
    partNumber: row.part_number,
    manufacturer: row.manufacturer,
    description: row.description,
    lifecycle: row.lifecycle,
    rohsStatus: row.rohs_status,
    cadmium: (row.family === 'photoresistor' || row.family === 'optocoupler') && isCadmiumCell(row.cell_material),
  };
}

export interface BomRow {
  id: string;
  owner_id: string;
  owner_name: string;
  shared_with: PersonRef[];
  name: string;
  file_name: string | null;
  encoding: string;
  delimiter: BomDelimiter;
  has_header: boolean;
  columns: string[];
  mapping: BomMapping;
  watched: boolean;
  line_count: number;
  summary: BomSummary | null;
  last_checked_at: Date | null;
  created_at: Date;
  updated_at: Date;
}

/** A BOM with its owner's name and the people it is shared with. */
export const BOM_SELECT = `SELECT b.*, u.name AS owner_name,
    COALESCE((SELECT jsonb_agg(jsonb_build_object('id', s.user_id, 'name', su.name) ORDER BY lower(su.name), s.user_id)
                FROM bom_shares s JOIN users su ON su.id = s.user_id WHERE s.bom_id = b.id), '[]'::jsonb) AS shared_with
  FROM boms b JOIN users u ON u.id = b.owner_id`;

/** For a BOM never judged yet (written by other means than a save): no counts, and it says so. */
export function emptySummary(lines: number): BomSummary {
  const counts = { lines, ok: 0, obsolete: 0, nrnd: 0, lastTimeBuy: 0, nonCompliant: 0, cadmium: 0, unmatched: 0, toConfirm: 0, withProblems: 0, replaced: 0 };
  return { ...counts, text: `${lines.toLocaleString('en')} ${lines === 1 ? 'line' : 'lines'}, not checked yet` };
}

const iso = (d: Date | string) => new Date(d).toISOString();

export function presentBom(row: BomRow): BomDto {
  return {
    id: row.id,
    name: row.name,
    owner: { id: row.owner_id, name: row.owner_name },
    sharedWith: row.shared_with,
    fileName: row.file_name,
    watched: row.watched,
    lineCount: row.line_count,
    summary: row.summary ?? emptySummary(row.line_count),
    lastCheckedAt: row.last_checked_at ? iso(row.last_checked_at) : null,
    createdAt: iso(row.created_at),
    updatedAt: iso(row.updated_at),
  };
}

export interface CheckRow {
  id: string;
  checked_at: Date;
  checked_by: string | null;
  checker_name: string | null;
  trigger: BomCheckDto['trigger'];
  summary: BomSummary;
  changes: string[];
  duration_ms: number;
}

export const CHECK_SELECT = `SELECT c.id, c.checked_at, c.checked_by, u.name AS checker_name, c.trigger, c.summary, c.changes, c.duration_ms
  FROM bom_checks c LEFT JOIN users u ON u.id = c.checked_by`;

export function presentCheck(row: CheckRow): BomCheckDto {
  return {
    id: row.id,
    checkedAt: iso(row.checked_at),
    checkedBy: row.checked_by ? { id: row.checked_by, name: row.checker_name ?? '' } : null,
    trigger: row.trigger,
    summary: row.summary,
    changes: row.changes,
    durationMs: row.duration_ms,
  };
}
