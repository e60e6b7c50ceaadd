import type { PartDto } from '@understudy/shared-types';
import Fuse from 'fuse.js';

export const QUICK_FIND_LIMIT = 8;

const FUSE_OPTIONS = {
  keys: [
    { name: 'partNumber', weight: 3 },
    { name: 'manufacturer.name', weight: 1 },
    { name: 'description', weight: 1 },
  ],
  ignoreLocation: true,
  threshold: 0.4,
};

/**
 * Orders the server's candidates for the person typing: fuse.js ranks the short list, weighted toward the part
 * number. Candidates fuse cannot place (the server matched them on a tag, or across spacing fuse does not forgive)
 * follow in the server's order, so nothing the server found is dropped.
 */
export function rankParts(candidates: readonly PartDto[], text: string, limit = QUICK_FIND_LIMIT): PartDto[] {
  const term = text.trim();
  if (!term) return candidates.slice(0, limit);
  const ranked = new Fuse(candidates, FUSE_OPTIONS).search(term).map((r) => r.item);
  const seen = new Set(ranked.map((p) => p.id));
  return [...ranked, ...candidates.filter((p) => !seen.has(p.id))].slice(0, limit);
}
