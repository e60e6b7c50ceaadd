import type { DataSource, EntityManager } from 'typeorm';
import type { CandidatePart } from '@understudy/shared-types';

/** Only what the scoring engine reads: no history, tags, RoHS note or bookkeeping. */
export const CANDIDATE_COLUMNS = `p.id, p.family, p.manufacturer_id, m.name AS manufacturer_name, p.part_number, p.description,
  p.lifecycle, p.rohs_status, p.package, p.pin_layout, p.pin_map, p.parameters`;

export interface CandidateRow {
  id: string;
  family: CandidatePart['family'];
  manufacturer_id: string;
  manufacturer_name: string;
  part_number: string;
  description: string;
  lifecycle: CandidatePart['lifecycle'];
  rohs_status: CandidatePart['rohsStatus'];
  package: string;
  pin_layout: string | null;
  pin_map: Record<string, string>;
  parameters: CandidatePart['parameters'];
}

export function candidateFromRow(row: CandidateRow): CandidatePart {
  return {
    id: row.id,
    family: row.family,
    manufacturer: { id: row.manufacturer_id, name: row.manufacturer_name },
    partNumber: row.part_number,
    description: row.description,
    lifecycle: row.lifecycle,
    rohsStatus: row.rohs_status,
    package: row.package,
    pinLayout: row.pin_layout,
    pinMap: row.pin_map,
    parameters: row.parameters,
  };
}

/** One part as a candidate, archived or not (an archived original can still be replaced); null when unknown. */
export async function loadCandidate(db: DataSource | EntityManager, id: string): Promise<(CandidatePart & { archived: boolean }) | null> {
  const rows: (CandidateRow & { archived: boolean })[] = await db.query(
    `SELECT ${CANDIDATE_COLUMNS}, p.archived FROM parts p JOIN manufacturers m ON m.id = p.manufacturer_id WHERE p.id = $1`,
    [id],
  );
  const row = rows[0];
  return row ? { ...candidateFromRow(row), archived: row.archived } : null;
}
