import { Foundation1764633600000 } from './1764633600000-foundation';
import { PartsCatalog1764720000000 } from './1764720000000-parts-catalog';
import { ParameterIndexes1764723600000 } from './1764723600000-parameter-indexes';
import { SearchPagingIndexes1764727200000 } from './1764727200000-search-paging-indexes';

/** Listed explicitly so tsx, vitest and a bundler all see the same set, in order. */
export const MIGRATIONS = [Foundation1764633600000, PartsCatalog1764720000000, ParameterIndexes1764723600000, SearchPagingIndexes1764727200000];
