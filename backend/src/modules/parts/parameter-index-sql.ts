import { FAMILIES, numericFilterMode, type FamilyKey, type ParameterDefinition } from '@understudy/shared-types';

/**
 * Filterable numbers are mirrored from the JSONB document into stored generated columns: plain columns can be read
 * from an index alone, so counting ten thousand matches never touches the wide rows. The search reads these
 * columns; the migration builds them from the same definitions.
 */
const slotExpr = (key: string, slot: string) => `((parameters->'${key}'->>'${slot}')::float8)`;
const representativeExpr = (key: string) => `(COALESCE(${slotExpr(key, 'typ')}, ${slotExpr(key, 'min')}, ${slotExpr(key, 'max')}))`;

export interface ParameterColumn {
  /** Column name, e.g. n_supply_voltage_min. */
  name: string;
  key: string;
  /** 'min' / 'max' for a range parameter's ends, 'rep' for the representative value (typ, else min, else max). */
  role: 'min' | 'max' | 'rep';
  expression: string;
}

const snake = (key: string) => key.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

export function columnsFor(def: ParameterDefinition): ParameterColumn[] {
  if (def.kind !== 'number' || !def.filterable) return [];
  const base = `n_${snake(def.key)}`;
  if (numericFilterMode(def.slots) === 'covers') {
    return [
      { name: `${base}_min`, key: def.key, role: 'min', expression: slotExpr(def.key, 'min') },
      { name: `${base}_max`, key: def.key, role: 'max', expression: slotExpr(def.key, 'max') },
    ];
  }
  return [{ name: base, key: def.key, role: 'rep', expression: representativeExpr(def.key) }];
}

/** Every generated column, once per parameter key (a key shared by two families shares its column). */
export function allParameterColumns(): ParameterColumn[] {
  const seen = new Map<string, ParameterColumn>();
  for (const family of Object.values(FAMILIES)) for (const def of family.parameters) for (const c of columnsFor(def)) if (!seen.has(c.name)) seen.set(c.name, c);
  return [...seen.values()];
}

export function familyColumns(family: FamilyKey): ParameterColumn[] {
  return FAMILIES[family].parameters.flatMap(columnsFor);
}

/** The SQL a filter or sort reads for a parameter: its generated column, or the JSONB expression for the rest. */
export function parameterSql(def: ParameterDefinition, role: 'min' | 'max' | 'rep', alias = 'p'): string {
  const column = columnsFor(def).find((c) => c.role === role);
  if (column) return `${alias}.${column.name}`;
  const expr = role === 'rep' ? representativeExpr(def.key) : slotExpr(def.key, role);
  return expr.replaceAll('parameters', `${alias}.parameters`);
}
