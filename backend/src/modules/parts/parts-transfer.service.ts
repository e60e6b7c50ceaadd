import Papa from 'papaparse';
import type { DataSource } from 'typeorm';
import {
  CONDITION_KEYS,
  FAMILIES,
  isFamilyKey,
  PartCreateBodySchema,
  partNumberKey,
  parseQuantity,
  VALUE_SLOTS,
  type ImportReport,
  type PartCreateBody,
  type PartDto,
} from '@understudy/shared-types';
import { BadRequestError, DomainError } from '../../errors';
import type { JobQueue } from '../../queue/job-queue';
import type { ExportedEquivalent } from '../equivalents/equivalents.service';
import { createPart, updatePart } from './parts.service';

/** The columns every export has, before the parameter columns. */
const BASE_COLUMNS = ['family', 'manufacturer', 'partNumber', 'description', 'lifecycle', 'rohsStatus', 'rohsNote', 'package', 'pinLayout', 'pinMap', 'tags', 'approvedEquivalents'] as const;

/**
 * A part as exported: the portable form plus its approved equivalents. The equivalents are for reading (a
 * purchaser's spreadsheet); import ignores them, since a ruling is an editor's decision made in the app.
 */
export type ExportedPart = PartCreateBody & { approvedEquivalents: ExportedEquivalent[] };

/** "Maker PN (use)", joined with "; " — the form a spreadsheet reader scans. */
export function equivalentsCell(list: readonly ExportedEquivalent[]): string {
  return list.map((e) => `${e.manufacturer} ${e.partNumber} (${e.use})`).join('; ');
}
const PARAM_PREFIX = 'param:';

/** The portable form of a part: what import takes, export gives, and the seed is written in. */
export function toPortable(part: PartDto): PartCreateBody {
  // Everything but the server's own bookkeeping; the manufacturer travels by name.
  const { id: _id, version: _version, archived: _archived, createdAt: _c, updatedAt: _u, manufacturer, ...fields } = part;
  return { ...fields, manufacturer: manufacturer.name };
}

/** Parameter columns in the shared definitions' order, so exports of the same catalog always line up. */
function parameterColumns(): string[] {
  const seen = new Set<string>();
  const columns: string[] = [];
  for (const family of Object.values(FAMILIES)) {
    for (const def of family.parameters) {
      const names =
        def.kind === 'number'
          ? [...(def.slots ?? VALUE_SLOTS).map((s) => `${def.key}.${s}`), ...(def.conditions ?? []).map((c) => `${def.key}.cond.${c}`)]
          : [`${def.key}.value`];
      for (const n of names) {
        if (seen.has(n)) continue;
        seen.add(n);
        columns.push(PARAM_PREFIX + n);
      }
    }
  }
  return columns;
}

export function partsToCsv(parts: ExportedPart[]): string {
  const columns = [...BASE_COLUMNS, ...parameterColumns()];
  const rows = parts.map((p) => {
    const row: Record<string, string> = {
      family: p.family,
      manufacturer: p.manufacturer,
      partNumber: p.partNumber,
      description: p.description ?? '',
      lifecycle: p.lifecycle ?? '',
      rohsStatus: p.rohsStatus ?? '',
      rohsNote: p.rohsNote ?? '',
      package: p.package ?? '',
      pinLayout: p.pinLayout ?? '',
      pinMap: p.pinMap && Object.keys(p.pinMap).length ? JSON.stringify(p.pinMap) : '',
      tags: (p.tags ?? []).join('; '),
      approvedEquivalents: equivalentsCell(p.approvedEquivalents),
    };
    for (const [key, v] of Object.entries(p.parameters ?? {})) {
      for (const slot of VALUE_SLOTS) if (v[slot] !== undefined) row[`${PARAM_PREFIX}${key}.${slot}`] = String(v[slot]);
      if (v.value !== undefined) row[`${PARAM_PREFIX}${key}.value`] = String(v.value);
      for (const c of CONDITION_KEYS) if (v.conditions?.[c] !== undefined) row[`${PARAM_PREFIX}${key}.cond.${c}`] = String(v.conditions[c]);
    }
    return columns.map((c) => row[c] ?? '');
  });
  // JavaScript's shortest round-trip number form keeps every double exact, so export → import is lossless.
  return Papa.unparse({ fields: columns, data: rows }, { newline: '\n' });
}

function csvRowToPart(row: Record<string, string>): { part?: unknown; error?: string } {
  const family = row.family?.trim();
  if (!family || !isFamilyKey(family)) return { error: `family must be one of ${Object.keys(FAMILIES).join(', ')}` };
  const defs = new Map(FAMILIES[family].parameters.map((d) => [d.key, d]));
  const parameters: Record<string, Record<string, unknown>> = {};
  for (const [column, raw] of Object.entries(row)) {
    const text = raw?.trim();
    if (!column.startsWith(PARAM_PREFIX) || !text) continue;
    const [key, slot, condition] = column.slice(PARAM_PREFIX.length).split('.') as [string, string, string | undefined];
    const def = defs.get(key);
    if (!def) return { error: `column ${column} is not a parameter of ${FAMILIES[family].pluralLabel.toLowerCase()}` };
    const entry = (parameters[key] ??= {});
    if (slot === 'value') {
      entry.value = def.kind === 'boolean' ? ['true', 'yes', '1'].includes(text.toLowerCase()) : text;
    } else {
      const parsed = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(text) ? { ok: true as const, value: Number(text) } : parseQuantity(text, { unit: slot === 'cond' ? undefined : def.unit });
      if (!parsed.ok) return { error: `${column}: ${parsed.error}` };
      if (slot === 'cond' && condition) ((entry.conditions ??= {}) as Record<string, number>)[condition] = parsed.value;
      else entry[slot] = parsed.value;
    }
  }
  let pinMap: unknown = {};
  if (row.pinMap?.trim()) {
    try {
      pinMap = JSON.parse(row.pinMap);
    } catch {
      return { error: 'pinMap must be JSON such as {"1":"OUT A","8":"V+"}' };
    }
  }
  return {
    part: {
      family,
      manufacturer: row.manufacturer ?? '',
      partNumber: row.partNumber ?? '',
      description: row.description ?? '',
      lifecycle: row.lifecycle?.trim() || undefined,
      rohsStatus: row.rohsStatus?.trim() || undefined,
      rohsNote: row.rohsNote ?? '',
      package: row.package ?? '',
      pinLayout: row.pinLayout?.trim() || null,
      pinMap,
      tags: (row.tags ?? '').split(';').map((t) => t.trim()).filter(Boolean),
      parameters,
    },
  };
}

export const MAX_IMPORT_ROWS = 20_000;

/** Reads the uploaded body (a JSON array, or CSV text with a header row) into raw rows. */
export function readImport(body: unknown, contentType: string | undefined): { rows: unknown[]; errors: ImportReport['errors'] } {
  const errors: ImportReport['errors'] = [];
  if (contentType?.includes('json')) {
    const items = Array.isArray(body) ? body : (body as { items?: unknown })?.items;
    if (!Array.isArray(items)) throw new BadRequestError('Send a JSON array of parts (or {"items": [...]}).', 'import_unreadable');
    return { rows: items, errors };
  }
  if (typeof body !== 'string' || !body.trim()) throw new BadRequestError('The file is empty.', 'import_empty');
  const parsed = Papa.parse<Record<string, string>>(body.replace(/^\uFEFF/, ''), { header: true, skipEmptyLines: 'greedy' });
  if (!parsed.meta.fields?.includes('partNumber') || !parsed.meta.fields.includes('family')) {
    throw new BadRequestError('The CSV needs a header row with at least the columns family, manufacturer and partNumber.', 'import_unreadable');
  }
  const rows: unknown[] = [];
  parsed.data.forEach((row, i) => {
    const converted = csvRowToPart(row);
    if (converted.error) {
      errors.push({ row: i + 2, partNumber: row.partNumber ?? null, message: converted.error });
      rows.push(undefined);
    } else rows.push(converted.part);
  });
  for (const e of parsed.errors) errors.push({ row: (e.row ?? 0) + 2, partNumber: null, message: e.message });
  return { rows, errors };
}

export class ImportRejectedError extends DomainError {
  constructor(readonly report: ImportReport) {
    super(422, 'import_rejected', `${report.errors.length} row(s) need fixing; nothing was imported.`, { report });
  }
}

/**
 * Validates every row, then — unless it is a dry run — applies them all in one transaction. Rows are numbered as a
 * spreadsheet shows them (header = row 1 for CSV; first element = row 1 for JSON). Existing parts (same manufacturer
 * and part number) are updated, with a revision whose source is "import".
 */
export async function importParts(db: DataSource, queue: JobQueue, actorId: string, input: { rows: unknown[]; errors: ImportReport['errors'] }, options: { dryRun: boolean; csv: boolean }): Promise<ImportReport> {
  if (input.rows.length > MAX_IMPORT_ROWS) throw new BadRequestError(`At most ${MAX_IMPORT_ROWS} rows per import.`, 'import_too_large');
  const errors = [...input.errors];
  const offset = options.csv ? 2 : 1;
  const valid: { row: number; part: ReturnType<typeof PartCreateBodySchema.parse> }[] = [];
  const seen = new Map<string, number>();
  input.rows.forEach((raw, i) => {
    if (raw === undefined) return;
    const result = PartCreateBodySchema.safeParse(raw);
    const pn = typeof (raw as { partNumber?: unknown })?.partNumber === 'string' ? (raw as { partNumber: string }).partNumber : null;
    if (!result.success) {
      errors.push({ row: i + offset, partNumber: pn, message: result.error.issues.map((x) => `${x.path.join('.') || 'row'}: ${x.message}`).join('; ') });
      return;
    }
    const identity = `${result.data.manufacturer.toLowerCase()}|${partNumberKey(result.data.partNumber)}`;
    if (seen.has(identity)) {
      errors.push({ row: i + offset, partNumber: pn, message: `the same part as row ${seen.get(identity)}` });
      return;
    }
    seen.set(identity, i + offset);
    valid.push({ row: i + offset, part: result.data });
  });
  errors.sort((a, b) => a.row - b.row);

  // Look up which rows already exist, in one query.
  const existing: { id: string; version: number; identity: string }[] = valid.length
    ? await db.query(
        `SELECT p.id, p.version, lower(m.name) || '|' || p.part_number_key AS identity
           FROM parts p JOIN manufacturers m ON m.id = p.manufacturer_id
          WHERE lower(m.name) || '|' || p.part_number_key = ANY($1)`,
        [[...seen.keys()]],
      )
    : [];
  const byIdentity = new Map(existing.map((e) => [e.identity, e]));
  const updated = valid.filter((v) => byIdentity.has(`${v.part.manufacturer.toLowerCase()}|${partNumberKey(v.part.partNumber)}`)).length;
  const report: ImportReport = { dryRun: options.dryRun, total: input.rows.length, created: valid.length - updated, updated, errors };
  if (options.dryRun) return report;
  if (errors.length) throw new ImportRejectedError(report);

  await db.transaction(async (tx) => {
    for (const { part } of valid) {
      const match = byIdentity.get(`${part.manufacturer.toLowerCase()}|${partNumberKey(part.partNumber)}`);
      if (match) {
        const { family: _family, ...changes } = part;
        await updatePart(tx, queue, actorId, match.id, { ...changes, version: match.version }, 'import');
      } else {
        await createPart(tx, actorId, part, 'import');
      }
    }
  });
  return report;
}
