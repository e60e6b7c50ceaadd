// Matching a whole BOM against the catalog in bulk: one query for every distinct key and suffix variant, then one
// similarity search for whatever is left, never a query per line.
import type { DataSource, EntityManager } from 'typeorm';
import { BOM_LIMITS } from '@understudy/shared-types';
import type { StoredCandidate } from '../../entities';
import { CANDIDATE_SIMILARITY, decideExact, decideFuzzy, keyVariants, type CatalogHit, type MatchResult } from './bom-match';
import { likeness, neighbourSwaps, TrigramIndex } from './bom-trigrams';

type Db = DataSource | EntityManager;

export interface MatchInput {
  partNumber: string;
  manufacturer: string | null;
}

/**
 * Up to this many unknown numbers are searched one by one in PostgreSQL (pg_trgm, trigram index); more, and the
 * catalog's keys are read once and searched in memory with the same similarity, which is far cheaper than a
 * trigram index probe per line on a large catalog.
 */
export const SQL_SIMILARITY_MAX = 25;

export async function matchLines(db: Db, lines: readonly MatchInput[]): Promise<MatchResult[]> {
  const variants = lines.map((l) => (l.partNumber ? keyVariants(l.partNumber) : []));
  const keys = [...new Set(variants.flatMap((vs) => vs.map((v) => v.key)).filter(Boolean))];
  const hitsByKey = await exactHits(db, keys);

  const results: (MatchResult | null)[] = lines.map((line, i) => {
    if (!line.partNumber || !variants[i]![0]!.key) return { kind: 'unmatched', partId: null, detail: null, candidates: [] };
    return decideExact(line.partNumber, line.manufacturer, variants[i]!, hitsByKey);
  });

  // The similarity search, on the key as written and on the key with its suffixes set aside; and, since trigrams
  // miss two swapped neighbours, every such swap of the key looked up exactly.
  const searchKeys = new Map<number, string[]>();
  const swapKeys = new Map<number, string[]>();
  results.forEach((r, i) => {
    if (r) return;
    const vs = variants[i]!.filter((v) => v.key.length >= 3 && !v.removed.some((x) => x.kind === 'package-letter'));
    const deepest = vs[vs.length - 1];
    const searched = [...new Set([vs[0]?.key, deepest?.key].filter((k): k is string => !!k))];
    searchKeys.set(i, searched);
    swapKeys.set(i, searched.filter((k) => k.length >= MIN_SWAP_KEY).flatMap(neighbourSwaps));
  });
  const [near, swapped] = await Promise.all([
    nearestParts(db, [...new Set([...searchKeys.values()].flat())]),
    exactHits(db, [...new Set([...swapKeys.values()].flat())]),
  ]);
  return results.map((r, i) => {
    if (r) return r;
    const searched = searchKeys.get(i) ?? [];
    const byPart = new Map<string, StoredCandidate>();
    const offer = (partId: string, key: string) => {
      const similarity = Math.round(Math.max(...searched.map((q) => likeness(q, key))) * 1000) / 1000;
      if ((byPart.get(partId)?.similarity ?? -1) < similarity) byPart.set(partId, { partId, similarity });
    };
    for (const key of searched) for (const c of near.get(key) ?? []) offer(c.partId, c.key);
    for (const key of swapKeys.get(i) ?? []) for (const h of swapped.get(key) ?? []) offer(h.id, h.key);
    // Best first; equally alike, in the order found (the similarity search's order: by key, then id).
    const ranked = [...byPart.values()].sort((a, b) => b.similarity - a.similarity).slice(0, BOM_LIMITS.candidatesPerLine);
    return decideFuzzy(ranked);
  });
}

/** Swaps are tried on keys this long or longer; in a shorter one a swap is as likely another real number. */
const MIN_SWAP_KEY = 4;

interface HitRow {
  id: string;
  part_number: string;
  part_number_key: string;
  manufacturer: string;
}

async function exactHits(db: Db, keys: string[]): Promise<Map<string, CatalogHit[]>> {
  const out = new Map<string, CatalogHit[]>();
  if (!keys.length) return out;
  const rows: HitRow[] = await db.query(
    // A join on the unnested keys, not "= ANY": with thousands of keys that would compare each row with each key.
    `SELECT p.id, p.part_number, p.part_number_key, m.name AS manufacturer
       FROM unnest($1::text[]) AS k(key)
       JOIN parts p ON p.part_number_key = k.key AND NOT p.archived
       JOIN manufacturers m ON m.id = p.manufacturer_id
      ORDER BY p.part_number_key, m.name, p.id`,
    [keys],
  );
  for (const r of rows) {
    const list = out.get(r.part_number_key) ?? [];
    list.push({ id: r.id, partNumber: r.part_number, key: r.part_number_key, manufacturer: r.manufacturer });
    out.set(r.part_number_key, list);
  }
  return out;
}

/**
 * The closest catalog parts to each key (similarity ≥ CANDIDATE_SIMILARITY, best first, ties by key and id),
 * at most candidatesPerLine per key.
 */
export interface NearPart extends StoredCandidate {
  /** The part's own key. */
  key: string;
}

export async function nearestParts(db: Db, keys: string[], options: { inMemory?: boolean } = {}): Promise<Map<string, NearPart[]>> {
  const out = new Map<string, NearPart[]>();
  if (!keys.length) return out;
  const limit = BOM_LIMITS.candidatesPerLine;
  const inMemory = options.inMemory ?? keys.length > SQL_SIMILARITY_MAX;
  if (!inMemory) {
    const rows: { key: string; id: string; part_key: string; sim: number }[] = await db.query(
      `SELECT q.key, c.id, c.part_key, c.sim
         FROM unnest($1::text[]) AS q(key)
         CROSS JOIN LATERAL (
           SELECT p.id, p.part_number_key AS part_key, similarity(p.part_number_key, q.key) AS sim
             FROM parts p
            WHERE NOT p.archived AND p.part_number_key % q.key AND similarity(p.part_number_key, q.key) >= $2
            ORDER BY sim DESC, p.part_number_key, p.id
            LIMIT $3) c`,
      [keys, CANDIDATE_SIMILARITY, limit],
    );
    for (const r of rows) out.set(r.key, [...(out.get(r.key) ?? []), { partId: r.id, key: r.part_key, similarity: Number(r.sim) }]);
    return out;
  }

  // One string of every key: far cheaper to send and split than 100,000 rows.
  const [row]: { keys: string | null }[] = await db.query(`SELECT string_agg(part_number_key, ' ') AS keys FROM parts WHERE NOT archived`);
  const index = new TrigramIndex([...new Set((row?.keys ?? '').split(' ').filter(Boolean))]);
  const nearKeys = new Map(keys.map((k) => [k, index.nearest(k, limit, CANDIDATE_SIMILARITY)]));
  const wanted = [...new Set([...nearKeys.values()].flat().map((n) => n.key))];
  const hits = await exactHits(db, wanted);
  for (const [key, near] of nearKeys) {
    // A key held by several parts (several makers) gives each of them, in id order, as the SQL above does.
    const parts = near.flatMap((n) => [...(hits.get(n.key) ?? [])].sort((a, b) => (a.id < b.id ? -1 : 1)).map((h) => ({ partId: h.id, key: h.key, similarity: n.similarity })));
    if (parts.length) out.set(key, parts.slice(0, limit));
  }
  return out;
}
