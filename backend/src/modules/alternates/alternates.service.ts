import type { DataSource } from 'typeorm';
import { z } from 'zod';
import {
  deriveNeeds,
  FAMILY_KEYS,
  getFamily,
  hardRequirementFailures,
  parseSupplySpan,
  parseWeights,
  rankAlternates,
  rankForPosition,
  type AlternatesQuerySchema,
  type AlternatesResponse,
  type CandidatePart,
  type FamilyKey,
  type PositionRequirements,
  type PositionResults,
  type RankOptions,
  type Unsuitable,
} from '@understudy/shared-types';
import { NotFoundError } from '../../errors';
import { ValidationError } from '../../middleware/validate';
import { approvedEquivalentsAmong, equivalentsByOtherPart } from '../equivalents/equivalents.service';
import { parameterSql } from '../parts/parameter-index-sql';
import { CANDIDATE_COLUMNS, candidateFromRow, loadCandidate, type CandidateRow } from './candidate-parts';
import { findPairs } from './pairs-shortlist';
import { alternatesCloseness, COUNT_PARAMETER, positionCloseness, type Closeness } from './shortlist-sql';

export type AlternatesInput = z.output<typeof AlternatesQuerySchema>;

/** How many parts that fail the SQL filters are fetched to be shown, with the engine's reasons, as unsuitable. */
export const UNSUITABLE_SAMPLE = 20;
/** The unsuitable list is bounded: with requireDropIn thousands may fail, and the page shows a handful. */
export const UNSUITABLE_SHOWN = 25;
/** A position's matches shown; `considered` says how many passed the filters. */
export const POSITION_SHOWN = 50;
/** The position closeness is the engine's own margin score over the columns, so twice what is shown is plenty. */
const POSITION_PAGE = 2 * POSITION_SHOWN;
/** The engine scores at least this many of the closest candidates (all of them in a smaller family). */
export const SHORTLIST = 200;
/** How many of the nearest by the indexed terms have their documents read for the rest of the closeness. */
const NEAR = 1500;
/** When the engine turns down much of a shortlist (a taper, a feature SQL cannot see), it reads further, this often. */
const MAX_PAGES = 5;

export interface Statement {
  sql: string;
  values: unknown[];
}

/** Builds positional SQL parameters as a WHERE clause grows. */
class Params {
  readonly values: unknown[] = [];
  readonly add = (value: unknown): string => {
    this.values.push(value);
    return `$${this.values.length}`;
  };
}

const invalid = (path: string, message: string) => new ValidationError([{ path, message }]);

function numberDefinition(family: FamilyKey, key: string) {
  const def = getFamily(family).parameters.find((p) => p.key === key);
  return def?.kind === 'number' ? def : undefined;
}

/** The family as a literal, so the planner always sees which per-family partial index applies. */
function familyLiteral(family: FamilyKey): string {
  if (!(FAMILY_KEYS as readonly string[]).includes(family)) throw new TypeError(`Unknown family ${family}`);
  return `'${family}'`;
}

const FROM = `FROM parts p JOIN manufacturers m ON m.id = p.manufacturer_id`;

interface Plan {
  /** One page of the candidates that pass, closest first, each row carrying how many pass in all. */
  shortlist: (limit: number, offset: number) => Statement;
  /** A bounded sample of the parts in scope that fail the conditions; null when there are no conditions. */
  failing: Statement | null;
}

interface Conditions {
  /**
   * An equality on the shortlist index's leading column (an op amp's channels, a pot's gangs): left in plain sight
   * of the planner, whose estimate for it is sound, so the scan reads only that part of the index. A part that
   * states no value is kept as well, through a second branch: the engine may read the count off its pin layout.
   */
  keyed?: { column: string; placeholder: string };
  /** Everything else, tested as one opaque boolean (see buildPlan). */
  rest: string[];
}

/**
 * The hard filters split the family in two: candidates, ordered by closeness for the engine, and a sample of the
 * rest, shown as unsuitable. A NULL condition counts as failing, so every part in scope lands in exactly one.
 *
 * The conditions other than the keyed one are tested as one opaque boolean on purpose: the planner multiplies the
 * selectivities of correlated ranges (a supply that covers 9 V, a slew rate above a floor), expects a few hundred
 * rows where there are thousands and fetches them from the heap. Every candidate is read to be ordered anyway, so
 * the covering index, read from end to end, is the plan that stays fast. The passing rows are kept once
 * (MATERIALIZED) so the count and the top of the order come from a single scan.
 */
function buildPlan(params: Params, scope: string, conditions: Conditions, closenessSql: () => Closeness): Plan {
  const { keyed } = conditions;
  const rest = conditions.rest.length ? conditions.rest.join(' AND ') : 'true';
  const all = [...(keyed ? [`(${keyed.column} IS NULL OR ${keyed.column} = ${keyed.placeholder})`] : []), ...conditions.rest];
  // The failing sample binds only what the scope and conditions use; the closeness adds its own values after.
  const conditionValues = [...params.values];
  const closeness = closenessSql();
  const branch = (where: string) =>
    `SELECT p.id, p.part_number_key, (${closeness.indexed}) AS closeness FROM parts p WHERE ${scope} AND ${where} AND (${rest}) IS TRUE`;
  const passing = keyed ? `${branch(`${keyed.column} = ${keyed.placeholder}`)} UNION ALL ${branch(`${keyed.column} IS NULL`)}` : branch('true');
  const count = `(SELECT count(*) FROM passing)::int AS considered`;
  return {
    shortlist: (limit, offset) => ({
      sql: closeness.heap
        ? // The nearest by the indexed terms, then their documents for the rest of the closeness.
          `WITH passing AS MATERIALIZED (${passing}),
                near AS (SELECT * FROM passing ORDER BY closeness, part_number_key, id LIMIT ${Math.max(NEAR, 2 * (offset + limit))})
           SELECT near.id, ${count} FROM near JOIN parts p ON p.id = near.id
            ORDER BY near.closeness + (${closeness.heap}), near.part_number_key, near.id LIMIT ${limit} OFFSET ${offset}`
        : `WITH passing AS MATERIALIZED (${passing})
           SELECT id, ${count} FROM passing ORDER BY closeness, part_number_key, id LIMIT ${limit} OFFSET ${offset}`,
      values: params.values,
    }),
    // In part-number order so the sample is the same from one call to the next.
    failing: all.length
      ? { sql: `SELECT ${CANDIDATE_COLUMNS} ${FROM} WHERE ${scope} AND (${all.join(' AND ')}) IS NOT TRUE ORDER BY p.part_number_key, p.id LIMIT ${UNSUITABLE_SAMPLE}`, values: conditionValues }
      : null,
  };
}

async function fetchCandidates(db: DataSource, ids: readonly string[]): Promise<CandidatePart[]> {
  if (!ids.length) return [];
  const rows: CandidateRow[] = await db.query(`SELECT ${CANDIDATE_COLUMNS} ${FROM} WHERE p.id = ANY($1::uuid[]) AND NOT p.archived`, [ids]);
  return rows.map(candidateFromRow);
}

/**
 * Reads the shortlist page by page, scoring each with `rank`, until `enough` says the list is full or the
 * candidates run out. `extraIds` (parts an editor ruled on) are scored whatever their closeness.
 */
async function rankShortlist<R>(
  db: DataSource,
  plan: Plan,
  pageSize: number,
  extraIds: readonly string[],
  rank: (candidates: CandidatePart[]) => R | Promise<R>,
  enough: (ranked: R) => boolean,
): Promise<{ ranked: R; considered: number }> {
  const pool = new Map<string, CandidatePart>();
  let considered = 0;
  let ranked: R | undefined;
  for (let page = 0; page < MAX_PAGES; page++) {
    const statement = plan.shortlist(pageSize, page * pageSize);
    const rows: { id: string; considered: number }[] = await db.query(statement.sql, statement.values);
    if (page === 0) considered = rows[0]?.considered ?? 0;
    const wanted = [...rows.map((r) => r.id), ...(page === 0 ? extraIds : [])].filter((id) => !pool.has(id));
    for (const c of await fetchCandidates(db, wanted)) pool.set(c.id, c);
    ranked = await rank([...pool.values()]);
    if (rows.length < pageSize || enough(ranked)) break;
  }
  return { ranked: ranked!, considered };
}

// ---------------------------------------------------------------------------------------------------------------
// A part's alternates

export interface AlternatesFilters {
  family: FamilyKey;
  /** The original's count (COUNT_PARAMETER): an op amp's channels, a pot's gangs. */
  count?: number;
  operatingSupply?: { min: number; max: number };
  allowObsolete: boolean;
}

/**
 * The engine's hard requirements that the generated columns can answer, each as the engine tests it: a part with
 * no channel count is left for the engine (it may read one off the pin layout), while a part with no supply range
 * fails once an operating supply is asked for, as the engine fails it.
 */
function alternatesConditions(filters: AlternatesFilters, bind: (v: unknown) => string): Conditions {
  const rest: string[] = [];
  const countKey = COUNT_PARAMETER[filters.family];
  const countDef = countKey ? numberDefinition(filters.family, countKey) : undefined;
  const keyed = countDef && filters.count !== undefined ? { column: parameterSql(countDef, 'rep'), placeholder: bind(filters.count) } : undefined;
  const supply = filters.family === 'op-amp' ? numberDefinition('op-amp', 'supplyVoltage') : undefined;
  if (supply && filters.operatingSupply) {
    rest.push(`${parameterSql(supply, 'min')} <= ${bind(filters.operatingSupply.min)}`, `${parameterSql(supply, 'max')} >= ${bind(filters.operatingSupply.max)}`);
  }
  if (!filters.allowObsolete) rest.push(`p.lifecycle <> 'obsolete'`);
  return keyed ? { keyed, rest } : { rest };
}

function readSupply(text: string | undefined): { min: number; max: number } | undefined {
  if (text === undefined || text.trim() === '') return undefined;
  const span = parseSupplySpan(text);
  if (!span.ok) throw invalid('query.supply', span.error);
  return { min: span.min, max: span.max };
}

interface AlternatesPlan {
  original: CandidatePart;
  options: RankOptions & { weights: NonNullable<RankOptions['weights']>; requireDropIn: boolean };
  plan: Plan;
  pageSize: number;
}

/** Reads and checks the query against the original: 404 for an unknown part, 400 naming the bad field. */
async function planAlternates(db: DataSource, partId: string, query: AlternatesInput): Promise<AlternatesPlan> {
  const found = await loadCandidate(db, partId);
  if (!found) throw new NotFoundError('No such part.');
  const { archived: _archived, ...original } = found;
  const family = original.family;

  const weights = parseWeights(query.weights, family);
  if (!weights.ok) throw invalid('query.weights', weights.error);
  const operatingSupply = readSupply(query.supply);

  let pairedLed: CandidatePart | undefined;
  if (query.pairedWith) {
    if (family !== 'photoresistor') throw invalid('query.pairedWith', 'Only a photoresistor is lit by a paired LED.');
    const led = await loadCandidate(db, query.pairedWith);
    if (!led || led.family !== 'led') throw invalid('query.pairedWith', 'pairedWith must name an LED in the catalog.');
    const { archived: _a, ...ledPart } = led;
    pairedLed = ledPart;
  }

  const options = {
    weights: weights.weights,
    requireDropIn: query.requireDropIn,
    allowObsolete: query.allowObsolete,
    ...(operatingSupply ? { operatingSupply } : {}),
    ...(pairedLed ? { pairedLed } : {}),
  };
  const countKey = COUNT_PARAMETER[family];
  const countValue = countKey ? original.parameters[countKey] : undefined;
  const params = new Params();
  const scope = `p.family = ${familyLiteral(family)} AND NOT p.archived AND p.id <> ${params.add(original.id)}`;
  const conditions = alternatesConditions(
    {
      family,
      count: countValue?.typ ?? countValue?.min ?? countValue?.max,
      ...(operatingSupply ? { operatingSupply } : {}),
      allowObsolete: query.allowObsolete,
    },
    params.add,
  );
  const closeness = () => alternatesCloseness({ original, ...options }, params.add);
  return { original, options, plan: buildPlan(params, scope, conditions, closeness), pageSize: Math.max(SHORTLIST, 4 * query.limit) };
}

/** The database half of a call (shortlist, candidate rows, rulings, failing sample), for the benchmark to time apart. */
export async function alternatesSqlOnly(db: DataSource, partId: string, query: AlternatesInput): Promise<number> {
  const { original, plan, pageSize } = await planAlternates(db, partId, query);
  const first = plan.shortlist(pageSize, 0);
  const [rows, failing] = await Promise.all([
    db.query(first.sql, first.values) as Promise<{ id: string }[]>,
    plan.failing ? db.query(plan.failing.sql, plan.failing.values) : Promise.resolve([]),
    equivalentsByOtherPart(db, original.id),
  ]);
  return (await fetchCandidates(db, rows.map((r) => r.id))).length + failing.length;
}

export async function findAlternates(db: DataSource, partId: string, query: AlternatesInput): Promise<AlternatesResponse> {
  const { original, options: base, plan, pageSize } = await planAlternates(db, partId, query);
  // For a resistive optocoupler, LED + photoresistor pairs too: their own shortlists, queried alongside the ranking.
  const [alternates, pairs] = await Promise.all([
    rankAlternatesOf(db, original, base, plan, pageSize, query.limit),
    original.family === 'optocoupler' ? findPairs(db, original, { ...base, allowObsolete: query.allowObsolete }) : null,
  ]);
  return { ...alternates, pairs };
}

async function rankAlternatesOf(
  db: DataSource,
  original: CandidatePart,
  base: AlternatesPlan['options'],
  plan: Plan,
  pageSize: number,
  limit: number,
): Promise<Omit<AlternatesResponse, 'pairs'>> {
  const [equivalents, failingRows] = await Promise.all([
    equivalentsByOtherPart(db, original.id),
    plan.failing ? (db.query(plan.failing.sql, plan.failing.values) as Promise<CandidateRow[]>) : Promise.resolve([]),
  ]);
  const options = { ...base, equivalents };
  const { ranked, considered } = await rankShortlist(
    db,
    plan,
    pageSize,
    [...equivalents.keys()],
    (candidates) => rankAlternates(original, candidates, options),
    (r) => r.items.length >= limit,
  );

  // The sample that failed in SQL is worded by the engine; one it would pass after all (it cannot know more than
  // SQL did, so this is a safeguard) is not shown as unsuitable.
  const failing: Unsuitable[] = [];
  for (const part of failingRows.map(candidateFromRow)) {
    const reasons = hardRequirementFailures(original, part, options);
    if (reasons.length) failing.push({ part, reasons });
  }
  const rejected = (u: Unsuitable) => (equivalents.get(u.part.id)?.status === 'rejected' ? 0 : 1);
  const seen = new Set<string>();
  const unsuitable = [...ranked.unsuitable.sort((a, b) => rejected(a) - rejected(b)), ...failing].filter((u) => !seen.has(u.part.id) && seen.add(u.part.id));
  return {
    original,
    weights: options.weights,
    considered,
    items: ranked.items.slice(0, limit),
    unsuitable: unsuitable.slice(0, UNSUITABLE_SHOWN),
  };
}

// ---------------------------------------------------------------------------------------------------------------
// Ranking against a position's own requirements

/**
 * The needs that are cheap and exact in SQL: family, lifecycle, supply coverage, and the "at least" needs whose
 * generated column reads the slot the engine reads (slew rate and output current, typ first). The engine fails a
 * part that does not state a needed value, so a NULL fails here too. The rest (single-supply operation, a
 * rail-to-rail output) the engine checks on the shortlist.
 */
export function buildPositionPlan(requirements: PositionRequirements): Plan {
  const params = new Params();
  const family = requirements.family;
  const scope = `p.family = ${familyLiteral(family)} AND NOT p.archived`;
  const passes: string[] = [];
  if (!requirements.allowObsolete) passes.push(`p.lifecycle <> 'obsolete'`);
  const needs = deriveNeeds(requirements);
  if (family === 'op-amp') {
    for (const need of needs) {
      if (need.key === 'supply') {
        passes.push(`p.n_supply_voltage_min <= ${params.add(need.value.min)}`, `p.n_supply_voltage_max >= ${params.add(need.value.max)}`);
      } else if ((need.key === 'slewRate' || need.key === 'outputCurrent') && typeof need.value.min === 'number') {
        passes.push(`${parameterSql(numberDefinition(family, need.key)!, 'rep')} >= ${params.add(need.value.min)}`);
      }
    }
  }
  if (requirements.requirePinLayout) passes.push(`p.pin_layout = ${params.add(requirements.requirePinLayout)}`);
  return buildPlan(params, scope, { rest: passes }, () => positionCloseness(requirements, needs, params.add));
}

/** The database half of a position ranking, for the benchmark. */
export async function positionSqlOnly(db: DataSource, requirements: PositionRequirements): Promise<number> {
  const plan = buildPositionPlan(requirements);
  const first = plan.shortlist(POSITION_PAGE, 0);
  const [rows, failing] = await Promise.all([
    db.query(first.sql, first.values) as Promise<{ id: string }[]>,
    plan.failing ? db.query(plan.failing.sql, plan.failing.values) : Promise.resolve([]),
  ]);
  const candidates = await fetchCandidates(db, rows.map((r) => r.id));
  await approvedEquivalentsAmong(db, candidates.map((c) => c.id));
  return candidates.length + failing.length;
}

export async function rankPosition(db: DataSource, requirements: PositionRequirements): Promise<PositionResults> {
  const plan = buildPositionPlan(requirements);
  const failingRows: CandidateRow[] = plan.failing ? await db.query(plan.failing.sql, plan.failing.values) : [];
  const { ranked, considered } = await rankShortlist(
    db,
    plan,
    POSITION_PAGE,
    [],
    async (candidates) => rankForPosition(requirements, candidates, { equivalents: await approvedEquivalentsAmong(db, candidates.map((c) => c.id)) }),
    (r) => r.items.length >= POSITION_SHOWN,
  );
  // The failing sample goes through the engine too, so its reasons are the engine's words.
  const failing = rankForPosition(requirements, failingRows.map(candidateFromRow)).unsuitable;
  const seen = new Set<string>();
  const unsuitable = [...ranked.unsuitable, ...failing].filter((u) => !seen.has(u.part.id) && seen.add(u.part.id));
  return { derived: ranked.derived, considered, items: ranked.items.slice(0, POSITION_SHOWN), unsuitable: unsuitable.slice(0, UNSUITABLE_SHOWN) };
}
