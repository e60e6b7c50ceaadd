import { FAMILIES, numericFilterMode, type ParameterDefinition } from '@understudy/shared-types';

/** The SQL expressions search filters and sorts on; indexes must use exactly these to be chosen by the planner. */
export const slotExpr = (key: string, slot: string) => `((parameters->'${key}'->>'${slot}')::float8)`;
export const representativeExpr = (key: string) => `(COALESCE(${slotExpr(key, 'typ')}, ${slotExpr(key, 'min')}, ${slotExpr(key, 'max')}))`;

/** One index statement per filterable numeric parameter: both ends of a range parameter, else its representative value. */
export function parameterIndexStatements(definitions: readonly ParameterDefinition[] = allNumericDefinitions()): { name: string; sql: string }[] {
  const out: { name: string; sql: string }[] = [];
  for (const def of definitions) {
    if (def.kind !== 'number' || !def.filterable) continue;
    const snake = def.key.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
    if (numericFilterMode(def.slots) === 'covers') {
      out.push({ name: `parts_p_${snake}_min_idx`, sql: `ON parts (${slotExpr(def.key, 'min')})` });
      out.push({ name: `parts_p_${snake}_max_idx`, sql: `ON parts (${slotExpr(def.key, 'max')})` });
    } else {
      out.push({ name: `parts_p_${snake}_idx`, sql: `ON parts (${representativeExpr(def.key)})` });
      // A forward scan serves ascending sorts; descending with missing values last needs its own order.
      out.push({ name: `parts_p_${snake}_desc_idx`, sql: `ON parts (${representativeExpr(def.key)} DESC NULLS LAST)` });
    }
  }
  return out;
}

function allNumericDefinitions(): ParameterDefinition[] {
  const seen = new Map<string, ParameterDefinition>();
  for (const family of Object.values(FAMILIES)) for (const def of family.parameters) if (!seen.has(def.key)) seen.set(def.key, def);
  return [...seen.values()];
}
