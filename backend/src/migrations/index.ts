import { Foundation1764633600000 } from './1764633600000-foundation';

/** Listed explicitly so tsx, vitest and a bundler all see the same set, in order. */
export const MIGRATIONS = [Foundation1764633600000];
