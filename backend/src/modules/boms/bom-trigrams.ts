// Trigram similarity exactly as pg_trgm computes it for a normalised part-number key (one word of [a-z0-9]):
// the word padded with two spaces in front and one behind, its distinct trigrams, and
// similarity = shared / (a + b - shared). Used when a BOM has too many unknown numbers to ask PostgreSQL one by
// one: the catalog's keys are read once and searched here with an inverted index, giving the same answers.

const ALPHABET = 37; // space, a-z, 0-9

function charCode(c: number): number {
  if (c >= 97 && c <= 122) return c - 96; // a-z → 1..26
  if (c >= 48 && c <= 57) return c - 21; // 0-9 → 27..36
  return 0;
}

/** Writes the distinct trigrams of a key into `out` from `at`, returns how many; no allocation per key. */
function writeTrigrams(key: string, out: Int32Array, at: number): number {
  if (!key) return 0;
  let n = 0;
  let a = 0;
  let b = 0;
  for (let i = 0; i <= key.length; i++) {
    const c = i < key.length ? charCode(key.charCodeAt(i)) : 0;
    const g = (a * ALPHABET + b) * ALPHABET + c;
    let seen = false;
    for (let j = at; j < at + n; j++) if (out[j] === g) seen = true;
    if (!seen) out[at + n++] = g;
    a = b;
    b = c;
  }
  return n;
}

/** The distinct trigrams of a key as small integers, in ascending order. */
export function trigramsOf(key: string): number[] {
  const out = new Int32Array(key.length + 1);
  const n = writeTrigrams(key, out, 0);
  return Array.from(out.subarray(0, n)).sort((x, y) => x - y);
}

export function trigramSimilarity(a: string, b: string): number {
  const ta = trigramsOf(a);
  const tb = new Set(trigramsOf(b));
  if (!ta.length || !tb.size) return 0;
  let shared = 0;
  for (const t of ta) if (tb.has(t)) shared++;
  return shared / (ta.length + tb.size - shared);
}

export interface NearKey {
  key: string;
  similarity: number;
}

/**
 * An inverted index over many distinct keys: which keys hold each trigram. Keys are numbered in order of their
 * trigram count, so each posting list is sorted by size too and a query walks only the sizes that could pass.
 */
export class TrigramIndex {
  private readonly keys: string[];
  private readonly sizes: Uint8Array;
  /** sizeStart[s]: the first key number with at least s trigrams. */
  private readonly sizeStart: Int32Array;
  private readonly offsets: Int32Array;
  private readonly postings: Int32Array;
  private readonly flat: Int32Array;
  private readonly starts: Int32Array;
  private readonly seen: Uint8Array;
  private readonly inQuery = new Uint8Array(ALPHABET ** 3);

  constructor(keys: readonly string[]) {
    // A key of L characters has at most L + 1 distinct trigrams; sort by that count (exact after the first pass).
    let total = 0;
    for (const k of keys) total += k.length + 1;
    const scratch = new Int32Array(total);
    const size = keys.map((key) => writeTrigrams(key, scratch, 0));
    const order = Array.from(keys.keys()).sort((x, y) => size[x]! - size[y]!);
    this.keys = order.map((i) => keys[i]!);

    const flat = new Int32Array(total);
    const starts = new Int32Array(this.keys.length + 1);
    this.sizes = new Uint8Array(this.keys.length);
    this.sizeStart = new Int32Array(MAX_SIZE + 2).fill(this.keys.length);
    this.offsets = new Int32Array(ALPHABET ** 3 + 1);
    let at = 0;
    for (let k = 0; k < this.keys.length; k++) {
      const n = writeTrigrams(this.keys[k]!, flat, at);
      this.sizes[k] = Math.min(MAX_SIZE, n);
      for (let j = at; j < at + n; j++) this.offsets[flat[j]! + 1]!++;
      at += n;
      starts[k + 1] = at;
    }
    for (let k = 0, s = 0; k < this.keys.length; k++) while (s <= this.sizes[k]!) this.sizeStart[s++] = k;
    for (let i = 1; i < this.offsets.length; i++) this.offsets[i]! += this.offsets[i - 1]!;
    this.postings = new Int32Array(at);
    const fill = this.offsets.slice(0, -1);
    for (let k = 0; k < this.keys.length; k++) for (let j = starts[k]!; j < starts[k + 1]!; j++) this.postings[fill[flat[j]!]!++] = k;
    this.flat = flat;
    this.starts = starts;
    this.seen = new Uint8Array(this.keys.length);
  }

  /**
   * The `limit` most similar keys with similarity ≥ threshold, best first, ties by key. For each size s that
   * could pass, a key must share m ≥ t(n + s)/(1 + t) of the query's n trigrams, so it holds one of any n − m + 1
   * of them: only the rarest n − m + 1 posting lists are walked (within size s), and each key found is compared
   * in full.
   */
  nearest(query: string, limit: number, threshold: number): NearKey[] {
    const grams = trigramsOf(query);
    if (!grams.length) return [];
    const n = grams.length;
    const length = (g: number) => this.offsets[g + 1]! - this.offsets[g]!;
    const byRarity = [...grams].sort((x, y) => length(x) - length(y));
    for (const g of grams) this.inQuery[g] = 1;
    const touched: number[] = [];
    // similarity ≤ min(n, s) / max(n, s), so s lies within [t·n, n/t].
    const low = Math.max(1, Math.ceil(threshold * n - 1e-9));
    const high = Math.min(MAX_SIZE, Math.floor(n / threshold + 1e-9));
    for (let s = low; s <= high; s++) {
      const from = this.sizeStart[s]!;
      const to = this.sizeStart[s + 1]!;
      if (from >= to) continue;
      const m = Math.max(1, Math.ceil((threshold * (n + s)) / (1 + threshold) - 1e-9));
      if (m > Math.min(n, s)) continue;
      for (let r = 0; r < n - m + 1; r++) {
        const g = byRarity[r]!;
        const end = this.offsets[g + 1]!;
        for (let i = this.lowerBound(this.offsets[g]!, end, from); i < end; i++) {
          const k = this.postings[i]!;
          if (k >= to) break;
          if (this.seen[k] === 0) {
            this.seen[k] = 1;
            touched.push(k);
          }
        }
      }
    }
    const best: NearKey[] = [];
    for (const k of touched) {
      this.seen[k] = 0;
      let shared = 0;
      for (let j = this.starts[k]!; j < this.starts[k + 1]!; j++) shared += this.inQuery[this.flat[j]!]!;
      const similarity = shared / (n + this.sizes[k]! - shared);
      if (similarity < threshold) continue;
      const key = this.keys[k]!;
      if (best.length === limit && !better(similarity, key, best[limit - 1]!)) continue;
      best.push({ key, similarity });
      best.sort((x, y) => (better(x.similarity, x.key, y) ? -1 : 1));
      if (best.length > limit) best.pop();
    }
    for (const g of grams) this.inQuery[g] = 0;
    return best;
  }

  /** The first index in postings[from, to) whose key number is ≥ k. */
  private lowerBound(from: number, to: number, k: number): number {
    let lo = from;
    let hi = to;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (this.postings[mid]! < k) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }
}

/** Part-number keys are at most 64 characters: 65 trigrams. */
const MAX_SIZE = 255;

function better(similarity: number, key: string, than: NearKey): boolean {
  return similarity > than.similarity || (similarity === than.similarity && key < than.key);
}

/**
 * Optimal string alignment distance: how many insertions, deletions, substitutions and swaps of neighbouring
 * characters turn one key into the other (each character edited once at most).
 */
export function editDistance(a: string, b: string): number {
  const rows = a.length + 1;
  const cols = b.length + 1;
  const d: number[][] = Array.from({ length: rows }, (_, i) => Array.from({ length: cols }, (_, j) => (i === 0 ? j : j === 0 ? i : 0)));
  for (let i = 1; i < rows; i++) {
    for (let j = 1; j < cols; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      let best = Math.min(d[i - 1]![j]! + 1, d[i]![j - 1]! + 1, d[i - 1]![j - 1]! + cost);
      if (i > 1 && j > 1 && a[i - 1] === b[j - 2] && a[i - 2] === b[j - 1]) best = Math.min(best, d[i - 2]![j - 2]! + 1);
      d[i]![j] = best;
    }
  }
  return d[a.length]![b.length]!;
}

/**
 * How alike two part-number keys are, 0..1: the better of their trigram similarity and 1 − edits / length. Trigrams
 * miss what a typist most often does (two neighbours swapped, "4850" for "4580", shares 3 of 11 trigrams), edits
 * catch it (5 of 6 characters in place).
 */
export function likeness(a: string, b: string): number {
  const longest = Math.max(a.length, b.length);
  if (!longest) return 0;
  return Math.max(trigramSimilarity(a, b), 1 - editDistance(a, b) / longest);
}

/** The key with each pair of different neighbouring characters swapped. */
export function neighbourSwaps(key: string): string[] {
  const out = new Set<string>();
  for (let i = 0; i + 1 < key.length; i++) {
    if (key[i] !== key[i + 1]) out.add(key.slice(0, i) + key[i + 1] + key[i] + key.slice(i + 2));
  }
  return [...out];
}
