import type { DataSource } from 'typeorm';
import {
  CELL_RESPONSE_FWHM_M,
  defaultWeights,
  formatQuantity,
  getParameter,
  isCadmiumCell,
  pairDriveCurrent,
  PAIR_SPACING_M,
  PAIRS_DROP_IN_NOTE,
  PAIRS_SHOWN,
  rankPairs,
  type CandidatePart,
  type ParameterValue,
  type RankedPairs,
  type RohsStatus,
  type Weights,
} from '@understudy/shared-types';
import { parameterSql } from '../parts/parameter-index-sql';
import { CANDIDATE_COLUMNS, candidateFromRow, type CandidateRow } from './candidate-parts';
import { alternatesCloseness, type Bind, type ShortlistContext } from './shortlist-sql';

/**
 * LED + photoresistor pairs for a resistive optocoupler. Every LED with every cell is far too many to score, so SQL
 * shortlists each side and the engine scores every pair of the two shortlists (25 × 40 = 1000).
 *
 * The cell decides most of what a pair is judged on (off resistance, turn-on and turn-off), and the LED can be
 * chosen to light it to the original's on resistance, so the cells come first: ordered as the alternates of an ideal
 * cell would be (alternatesCloseness), plus how much more light than the catalog's brightest LED gives the cell would need to reach
 * the original's on resistance. Then each LED is ordered by the best pair it would make with those cells: the
 * cell's own loss plus how far its light at the cell, spectral response included, misses what the cell needs; plus
 * its own rating, lifecycle and RoHS. The optocoupler's weights carry over to the criteria each side decides.
 */

export const PAIR_LEDS = 25;
export const PAIR_CELLS = 40;
/** How many of the best cells each LED is weighed against. */
const CELLS_FOR_LEDS = 10;
/** Of a side, how many of the nearest by the indexed terms have their documents read for the rest of the order. */
const NEAR = 200;
/** A cell stating no gamma is taken at the engine's assumed 0.7. */
const ASSUMED_GAMMA = 0.7;
/** In SQL an intensity is taken at the usual 20 mA test current; the engine reads the stated one. */
const TEST_CURRENT_A = 20e-3;

export interface PairsInput {
  weights: Weights;
  requireDropIn: boolean;
  allowObsolete: boolean;
}

class Params {
  readonly values: unknown[] = [];
  readonly add = (value: unknown): string => {
    this.values.push(value);
    return `$${this.values.length}`;
  };
}

const f8 = (n: number) => `${n}::float8`;

function def(family: 'led' | 'photoresistor', key: string) {
  const d = getParameter(family, key);
  if (!d) throw new RangeError(`No parameter ${key} in ${family}`);
  return d;
}

/** A part that is only a target for the closeness: the figures it is given, nothing else. */
function ideal(family: 'led' | 'photoresistor', parameters: Record<string, ParameterValue | undefined>, rohsStatus: RohsStatus = 'compliant'): CandidatePart {
  return {
    id: '00000000-0000-4000-8000-000000000000',
    family,
    manufacturer: { id: '00000000-0000-4000-8000-000000000000', name: '' },
    partNumber: `ideal ${family}`,
    description: '',
    lifecycle: 'active',
    rohsStatus,
    package: '',
    pinLayout: null,
    pinMap: {},
    parameters: Object.fromEntries(Object.entries(parameters).filter((e): e is [string, ParameterValue] => e[1] !== undefined)),
  };
}

interface Side {
  where: string;
  target: Omit<ShortlistContext, 'requireDropIn'>;
  /** A term of the order beyond the ideal part's closeness, read from indexed columns. */
  extra?: (bind: Bind) => string;
  /** A condition only the document can answer, tested on the nearest. */
  documentWhere?: (bind: Bind) => string;
}

type Row = CandidateRow & { near_count: number; loss: number };

/**
 * The nearest `limit` of a side: the nearest by the indexed terms (an index-only scan where the side's columns
 * allow), then their documents for the rest of the order and for `documentWhere`. Should that condition thin the
 * nearest below `limit`, the scan is made again with it applied to every part, slower but missing none.
 */
async function shortlist(db: DataSource, side: Side, limit: number): Promise<{ part: CandidatePart; loss: number }[]> {
  const run = async (documentFirst: boolean) => {
    const params = new Params();
    const closeness = alternatesCloseness({ ...side.target, requireDropIn: false }, params.add);
    const indexed = side.extra ? `${closeness.indexed} + ${side.extra(params.add)}` : closeness.indexed;
    const condition = side.documentWhere?.(params.add);
    const inner = documentFirst && condition ? `${side.where} AND ${condition}` : side.where;
    const loss = `near.closeness${closeness.heap ? ` + (${closeness.heap})` : ''}`;
    const sql = `WITH near AS (
        SELECT p.id, p.part_number_key, (${indexed}) AS closeness FROM parts p WHERE ${inner}
         ORDER BY closeness, p.part_number_key, p.id LIMIT ${NEAR})
      SELECT ${CANDIDATE_COLUMNS}, ${loss} AS loss, (SELECT count(*) FROM near)::int AS near_count
        FROM near JOIN parts p ON p.id = near.id JOIN manufacturers m ON m.id = p.manufacturer_id
       ${!documentFirst && condition ? `WHERE ${condition}` : ''}
       ORDER BY ${loss}, near.part_number_key, near.id LIMIT ${limit}`;
    return (await db.query(sql, params.values)) as Row[];
  };
  let rows = await run(false);
  if (side.documentWhere && rows.length < limit && (rows[0]?.near_count ?? NEAR) >= NEAR) rows = await run(true);
  return rows.map((row) => ({ part: candidateFromRow(row), loss: row.loss }));
}

function scope(family: 'led' | 'photoresistor', allowObsolete: boolean): string {
  return `p.family = '${family}' AND NOT p.archived${allowObsolete ? '' : ` AND p.lifecycle <> 'obsolete'`}`;
}

/** The pairs' half of an optocoupler's alternates: the engine's best pairs of the two shortlists. */
export async function findPairs(db: DataSource, original: CandidatePart, input: PairsInput): Promise<RankedPairs> {
  if (input.requireDropIn) return { items: [], considered: 0, note: PAIRS_DROP_IN_NOTE };
  const found = await shortlistPairParts(db, original, input);
  if ('none' in found) return { items: [], considered: 0, note: found.none };
  const { items, considered, note } = rankPairs(original, found.leds, found.cells, {
    weights: { ...defaultWeights('optocoupler'), ...input.weights },
    allowObsolete: input.allowObsolete,
    limit: PAIRS_SHOWN,
    spacingM: PAIR_SPACING_M,
  });
  return { items, considered, note };
}

/** The database half of findPairs: the two shortlists, or why there are none. */
export async function shortlistPairParts(
  db: DataSource,
  original: CandidatePart,
  input: Omit<PairsInput, 'requireDropIn'>,
): Promise<{ leds: CandidatePart[]; cells: CandidatePart[] } | { none: string }> {
  const weights = { ...defaultWeights('optocoupler'), ...input.weights };
  const wOn = weights.onResistance ?? 0;
  const drive = pairDriveCurrent(original).currentA;
  const spacingM = PAIR_SPACING_M;
  // The on resistance as the engine compares it, typ first.
  const onOhms = original.parameters.onResistance?.typ ?? original.parameters.onResistance?.max;
  const driveText = formatQuantity(drive, 'A', { displayUnit: 'mA' });
  const obsoleteNote = input.allowObsolete ? '' : ' (obsolete parts left out)';
  // RoHS as the engine reads the original (a cadmium cell without an exemption is not compliant): when it is not
  // compliant itself, nothing is lost on RoHS, and the ideal parts say so.
  const cadmium = original.rohsStatus !== 'exempt' && isCadmiumCell(original.parameters.cellMaterial?.value as string | undefined);
  const rohs: RohsStatus = cadmium ? 'non-compliant' : original.rohsStatus;

  const intensity = parameterSql(def('led', 'luminousIntensity'), 'rep');
  const ledWhere = `${scope('led', input.allowObsolete)} AND ${intensity} > 0`;
  // log10 of the illuminance per candela at the cell, E = Iv·(I/Itest)/d² (inverse-square law).
  const luxPerCandela = Math.log10(drive / TEST_CURRENT_A / spacingM ** 2);
  // The brightest LED in the catalog (read once, as the statement's init plan): a cell needing more light than it
  // gives cannot be lit to the original's resistance. Less light is always to be had (a dimmer LED, or one off the
  // cell's peak).
  const brightest = `(SELECT log(max(${intensity})) FROM parts p WHERE ${ledWhere})`;

  // The cell's light resistance at 10 lx, as the engine's typical (the centre of the stated range), and its gamma.
  const lo = parameterSql(def('photoresistor', 'lightResistance'), 'min');
  const hi = parameterSql(def('photoresistor', 'lightResistance'), 'max');
  const r10 = `(log(coalesce(${lo}, ${hi})) + log(coalesce(${hi}, ${lo}))) / 2`;
  const gamma = `coalesce(nullif(greatest(${parameterSql(def('photoresistor', 'gamma'), 'rep')}, 0), 0), ${f8(ASSUMED_GAMMA)})`;
  // R = R10·(E/10 lx)^−γ solved for the light that gives the original's on resistance: log E = 1 + (log R10 − log R)/γ.
  const need = (bind: Bind) => `(1 + (${r10} - ${bind(Math.log10(onOhms!))}) / ${gamma})`;
  const turnOn = original.parameters.turnOnTime?.typ;
  const turnOff = original.parameters.turnOffTime?.typ;
  const off = original.parameters.offResistance?.min;
  const cells = await shortlist(
    db,
    {
      where: `${scope('photoresistor', input.allowObsolete)} AND coalesce(${lo}, ${hi}) > 0 AND coalesce(${hi}, ${lo}) > 0`,
      target: {
        original: ideal('photoresistor', {
          darkResistance: off !== undefined ? { min: off } : undefined,
          riseTime: turnOn !== undefined ? { typ: turnOn } : undefined,
          decayTime: turnOff !== undefined ? { typ: turnOff } : undefined,
        }, rohs),
        weights: { darkResistance: weights.offResistance!, riseTime: weights.turnOnTime!, decayTime: weights.turnOffTime!, lifecycle: weights.lifecycle!, rohs: weights.rohs! },
      },
      // Decades of resistance (γ × decades of light) the catalog's LEDs fall short of, on the engine's near-log curve.
      ...(onOhms && onOhms > 0 && wOn > 0
        ? {
            extra: (bind: Bind) =>
              `least(${f8(wOn)}, ${f8(wOn)} * ${gamma} * greatest(${f8(0)}, ${need(bind)} - ${brightest} - ${bind(luxPerCandela)}))`,
          }
        : {}),
    },
    PAIR_CELLS,
  );
  if (!cells.length) {
    return { none: `No photoresistor in the catalog states its light resistance${obsoleteNote}, so no pairs can be made.` };
  }

  // What the best cells need, for the LEDs' order: light for the original's resistance, peak, gamma, own loss. The
  // best pairs are made with the best few cells, and each cell more costs every LED another term.
  const needs = cells.slice(0, CELLS_FOR_LEDS).map(({ part, loss }) => {
    const lr = part.parameters.lightResistance!;
    const g = part.parameters.gamma?.typ! > 0 ? part.parameters.gamma!.typ! : ASSUMED_GAMMA;
    const centre = (Math.log10(lr.min ?? lr.max!) + Math.log10(lr.max ?? lr.min!)) / 2;
    return { need: onOhms && onOhms > 0 ? 1 + (centre - Math.log10(onOhms)) / g : 0, peak: part.parameters.peakWavelength?.typ ?? null, gamma: g, loss };
  });
  const peak = parameterSql(def('led', 'peakWavelength'), 'rep');
  const ledMax = original.parameters.ledMaxCurrent?.max;
  const ledRows = await shortlist(
    db,
    {
      where: ledWhere,
      target: {
        original: ideal('led', { forwardCurrent: ledMax !== undefined ? { max: ledMax } : undefined }, rohs),
        weights: { forwardCurrent: weights.ledMaxCurrent!, lifecycle: weights.lifecycle!, rohs: weights.rohs! },
      },
      // The best pair with a shortlisted cell: its loss plus the light's miss, the spectral factor as in the estimate.
      extra: (bind) => {
        const light = `(log(${intensity}) + ${bind(luxPerCandela)})`;
        // log10 of the spectral factor, −4·ln2·(Δλ/FWHM)²/ln10; an LED stating no peak is taken as fully effective.
        const dimming = (cellPeak: number) => `coalesce(power(${peak} - ${bind(cellPeak)}, 2) * ${f8((4 * Math.LN2) / Math.LN10 / CELL_RESPONSE_FWHM_M ** 2)}, ${f8(0)})`;
        const per = needs.map((c) => {
          if (!(onOhms && onOhms > 0 && wOn > 0)) return f8(c.loss);
          const miss = `abs(${light}${c.peak === null ? '' : ` - ${dimming(c.peak)}`} - ${bind(c.need)})`;
          return `${f8(c.loss)} + least(${f8(wOn)}, ${f8(wOn * c.gamma)} * ${miss})`;
        });
        return per.length === 1 ? per[0]! : `least(${per.join(', ')})`;
      },
      // The rating is the document's max slot (the generated column reads typ first), so it is checked on the nearest.
      documentWhere: (bind) => `${parameterSql(def('led', 'forwardCurrent'), 'max')} >= ${bind(drive * (1 - 1e-9))}`,
    },
    PAIR_LEDS,
  );
  if (!ledRows.length) {
    return { none: `No LED in the catalog states its luminous intensity and is rated for the ${driveText} drive${obsoleteNote}, so no pairs can be made.` };
  }
  return { leds: ledRows.map((r) => r.part), cells: cells.map((c) => c.part) };
}
