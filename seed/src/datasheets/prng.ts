/**
 * A small seeded generator (mulberry32) so the corpus is the same on every machine and every run;
 * Math.random would make benchmark figures incomparable between runs.
 */
export interface Rng {
  /** Uniform in [0, 1). */
  next(): number;
  /** Integer in [lo, hi], both included. */
  int(lo: number, hi: number): number;
  chance(p: number): boolean;
  pick<T>(items: readonly T[]): T;
  shuffle<T>(items: readonly T[]): T[];
  /** An independent generator, so adding draws in one part of the corpus does not shift every later document. */
  fork(label: string): Rng;
}

function hash(text: string, seed: number): number {
  let h = seed ^ 0x9e3779b9;
  for (let i = 0; i < text.length; i++) {
    h = Math.imul(h ^ text.charCodeAt(i), 0x85ebca6b);
    h ^= h >>> 13;
  }
  return h >>> 0;
}

export function createRng(seed: number): Rng {
  let state = seed >>> 0;
  const next = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const rng: Rng = {
    next,
    int: (lo, hi) => lo + Math.floor(next() * (hi - lo + 1)),
    chance: (p) => next() < p,
    pick: (items) => {
      if (items.length === 0) throw new Error('pick from an empty list');
      return items[Math.floor(next() * items.length)]!;
    },
    shuffle: (items) => {
      const out = [...items];
      for (let i = out.length - 1; i > 0; i--) {
        const j = Math.floor(next() * (i + 1));
        [out[i], out[j]] = [out[j]!, out[i]!];
      }
      return out;
    },
    fork: (label) => createRng(hash(label, state)),
  };
  return rng;
}

/**
 * Deals values from a shuffled deck, reshuffling when it runs out, so that every variation turns up within
 * one pass of the deck instead of only on average.
 */
export function createDeck<T>(rng: Rng, items: readonly T[]): () => T {
  let deck: T[] = [];
  return () => {
    if (deck.length === 0) deck = rng.shuffle(items);
    return deck.pop()!;
  };
}
