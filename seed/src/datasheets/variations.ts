import { createDeck, type Rng } from './prng';

/**
 * Hands out variations from per-name decks, so every option of every choice appears once per pass of its deck,
 * and records what each document got as tags ("columns:parameter-min-typ-max-unit").
 */
export interface Variations {
  rng: Rng;
  choose<T extends string | number | boolean>(name: string, options: readonly T[]): T;
  /** A yes/no choice that comes up yes `yes` times in every `of`. */
  flag(name: string, yes?: number, of?: number): boolean;
  tag(tag: string): void;
  readonly tags: string[];
}

export interface VariationDecks {
  /** Variations for one document, drawing from decks shared by every document of the same group. */
  forDocument(group: string, rng: Rng): Variations;
}

export function createVariationDecks(rng: Rng): VariationDecks {
  const decks = new Map<string, () => unknown>();
  return {
    forDocument(group, docRng) {
      const tags: string[] = [];
      const deal = <T>(name: string, options: readonly T[]): T => {
        const id = `${group}/${name}/${options.length}`;
        let deck = decks.get(id);
        if (!deck) {
          deck = createDeck(rng.fork(id), options);
          decks.set(id, deck);
        }
        return deck() as T;
      };
      return {
        rng: docRng,
        choose(name, options) {
          const value = deal(name, options);
          tags.push(`${name}:${String(value)}`);
          return value;
        },
        flag(name, yes = 1, of = 2) {
          const value = deal(name, Array.from({ length: of }, (_, i) => i < yes));
          if (value) tags.push(name);
          return value;
        },
        tag: (t) => void tags.push(t),
        tags,
      };
    },
  };
}

/**
 * Variations with every choice fixed in advance, for hand-made documents: a named choice takes its preset,
 * anything else its first option (or no for a flag).
 */
export function fixedVariations(rng: Rng, presets: Record<string, string | number | boolean>): Variations {
  const tags: string[] = [];
  return {
    rng,
    choose(name, options) {
      const preset = presets[name];
      const value = (preset !== undefined && options.includes(preset as never) ? preset : options[0]) as (typeof options)[number];
      tags.push(`${name}:${String(value)}`);
      return value;
    },
    flag(name) {
      const value = presets[name] === true;
      if (value) tags.push(name);
      return value;
    },
    tag: (t) => void tags.push(t),
    tags,
  };
}
