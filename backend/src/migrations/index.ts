import { Foundation1764633600000 } from './1764633600000-foundation';
import { PartsCatalog1764720000000 } from './1764720000000-parts-catalog';
import { ParameterColumns1764723600000 } from './1764723600000-parameter-columns';
import { Datasheets1764806400000 } from './1764806400000-datasheets';
import { Substitution1764896400000 } from './1764896400000-substitution';
import { Boms1764982800000 } from './1764982800000-boms';
import { BomAlerts1764986400000 } from './1764986400000-bom-alerts';

/** Listed explicitly so tsx, vitest and a bundler all see the same set, in order. */
export const MIGRATIONS = [Foundation1764633600000, PartsCatalog1764720000000, ParameterColumns1764723600000, Datasheets1764806400000, Substitution1764896400000, Boms1764982800000, BomAlerts1764986400000];
