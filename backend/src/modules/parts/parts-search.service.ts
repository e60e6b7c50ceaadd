import type { DataSource } from 'typeorm';
import { getFamily, partNumberKey, type PartListQuery, type PartListResponse } from '@understudy/shared-types';
import { ValidationError } from '../../middleware/validate';
import type { ParsedFilters } from './part-filters';
import { parameterSql } from './parameter-index-sql';
import { partFromRow, presentPart } from './parts.presenter';

/** Builds positional SQL parameters as the WHERE clause grows. */
class Params {
  readonly values: unknown[] = [];
  add(value: unknown): string {
    this.values.push(value);
    return `$${this.values.length}`;
  }
}



export interface SearchOptions {
  /** Skip the page and count; used by export to stream the whole result set. */
  all?: boolean;
  /** Manufacturers whose names match the free text, looked up first (see matchingManufacturers). */
  manufacturerIds?: string[];
}

/**
 * The manufacturers whose name contains the free text. Looked up on their own (a small table) so the main query's
 * OR of text matches stays a union of index scans instead of a scan of every part.
 */
export async function matchingManufacturers(db: DataSource, q: string | undefined): Promise<string[]> {
  if (!q?.trim()) return [];
  const rows: { id: string }[] = await db.query(`SELECT id FROM manufacturers WHERE lower(name) LIKE '%' || $1 || '%'`, [q.trim().toLowerCase()]);
  return rows.map((r) => r.id);
}

/**
 * The parametric, typo-tolerant search. Parameter keys come only from the shared definitions (checked by
 * parseFilters), so interpolating them is safe; every user value travels as a bound parameter.
 */
export async function searchParts(db: DataSource, query: PartListQuery, filters: ParsedFilters, options: SearchOptions = {}): Promise<PartListResponse> {
  const manufacturerIds = await matchingManufacturers(db, query.q);
  const { sql, values, countSql, countValues } = buildSearchSql(query, filters, { ...options, manufacturerIds });
  // The page and the count run side by side: the page can stop at LIMIT, the count never reads the JSONB documents.
  const [rows, counted] = await Promise.all([
    db.query(sql, values) as Promise<Record<string, unknown>[]>,
    options.all ? Promise.resolve(null) : (db.query(countSql, countValues) as Promise<{ count: number }[]>),
  ]);
  const total = counted ? counted[0]!.count : rows.length;
  return {
    items: rows.map((r) => presentPart(partFromRow(r), r.manufacturer_name as string)),
    total,
    page: query.page,
    pageSize: query.pageSize,
  };
}

/** The SQL behind a search, exposed so the benchmark can time the same statement without the API around it. */
export function buildSearchSql(query: PartListQuery, filters: ParsedFilters, options: SearchOptions = {}) {
  const params = new Params();
  const where: string[] = [];
  if (query.includeArchived !== '1' && query.includeArchived !== 'true') where.push('NOT p.archived');
  if (query.family) where.push(`p.family = ${params.add(query.family)}`);
  if (filters.lifecycles.length) where.push(`p.lifecycle = ANY(${params.add(filters.lifecycles)})`);
  if (filters.rohs.length) where.push(`p.rohs_status = ANY(${params.add(filters.rohs)})`);

  for (const f of filters.parameters) {
    const key = f.def.key;
    if (f.kind === 'choice') {
      const alternatives = f.values.map((v) => `p.parameters @> ${params.add(JSON.stringify({ [key]: { value: v } }))}::jsonb`);
      where.push(`(${alternatives.join(' OR ')})`);
    } else if (f.mode === 'covers') {
      // The part's range must hold the whole asked range.
      const low = f.min ?? f.max!;
      const high = f.max ?? f.min!;
      where.push(`${parameterSql(f.def, 'min')} <= ${params.add(low)} AND ${parameterSql(f.def, 'max')} >= ${params.add(high)}`);
    } else {
      // typ, else min, else max: the one number a column shows and a "between" filter compares.
      if (f.min !== undefined) where.push(`${parameterSql(f.def, 'rep')} >= ${params.add(f.min)}`);
      if (f.max !== undefined) where.push(`${parameterSql(f.def, 'rep')} <= ${params.add(f.max)}`);
    }
  }

  let rank = '';
  const q = query.q?.trim();
  if (q) {
    const key = partNumberKey(q);
    const words = q.toLowerCase();
    const keyParam = params.add(key);
    const wordsParam = params.add(words);
    const textMatch = [
      key ? `p.part_number_key LIKE '%' || ${keyParam} || '%'` : null,
      // Trigram similarity forgives a slipped or swapped character in a part number.
      key.length >= 3 ? `p.part_number_key % ${keyParam}` : null,
      `p.search_tsv @@ plainto_tsquery('simple', ${wordsParam})`,
      options.manufacturerIds?.length ? `p.manufacturer_id = ANY(${params.add(options.manufacturerIds)}::uuid[])` : null,
    ].filter(Boolean);
    where.push(`(${textMatch.join(' OR ')})`);
    rank = `(p.part_number_key = ${keyParam}) DESC, (p.part_number_key LIKE ${keyParam} || '%') DESC, similarity(p.part_number_key, ${keyParam}) DESC, ts_rank(p.search_tsv, plainto_tsquery('simple', ${wordsParam})) DESC, `;
  }

  const order = rank + orderBy(query);
  const whereSql = where.length ? `WHERE ${where.join(' AND ')}` : '';
  const page = query.page;
  const pageSize = query.pageSize;
  const countValues = [...params.values];
  const limit = options.all ? '' : `LIMIT ${params.add(pageSize)} OFFSET ${params.add((page - 1) * pageSize)}`;
  // Find the page's ids first from the narrow indexes, then read only those wide rows (a deep page stays cheap).
  const joinForSort = order.includes('m.name') ? 'JOIN manufacturers m ON m.id = p.manufacturer_id' : '';
  return {
    sql: `SELECT p.*, m.name AS manufacturer_name
       FROM (SELECT ids.id, row_number() OVER () AS ord
               FROM (SELECT p.id FROM parts p ${joinForSort} ${whereSql} ORDER BY ${order} ${limit}) ids) page
       JOIN parts p ON p.id = page.id
       JOIN manufacturers m ON m.id = p.manufacturer_id
      ORDER BY page.ord`,
    values: params.values,
    countSql: `SELECT count(*)::int AS count FROM parts p ${whereSql}`,
    countValues,
  };
}

function orderBy(query: PartListQuery): string {
  const raw = query.sort ?? 'partNumber';
  const descending = raw.startsWith('-');
  const column = descending ? raw.slice(1) : raw;
  const dir = descending ? 'DESC' : 'ASC';
  const tie = 'p.part_number_key ASC, p.id ASC';
  switch (column) {
    case 'partNumber':
      return `p.part_number_key ${dir}, p.id ASC`;
    case 'manufacturer':
      return `lower(m.name) ${dir}, ${tie}`;
    case 'lifecycle':
      return `array_position(ARRAY['active','nrnd','last-time-buy','obsolete']::varchar[], p.lifecycle) ${dir}, ${tie}`;
    case 'updatedAt':
      return `p.updated_at ${dir}, ${tie}`;
    default: {
      const def = query.family ? getFamily(query.family).parameters.find((p) => p.key === column) : undefined;
      if (!def) throw new ValidationError([{ path: 'query.sort', message: query.family ? `Cannot sort by "${column}".` : 'Choose a family to sort by a parameter.' }]);
      const expr = def.kind === 'number' ? parameterSql(def, 'rep') : `p.parameters->'${def.key}'->>'value'`;
      return `${expr} ${dir} NULLS LAST, ${tie}`;
    }
  }
}
