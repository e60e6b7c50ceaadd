import { z } from 'zod';
import { getFamily } from './families';
import type { ConditionKey, FamilyKey, ParameterDefinition, ValueSlot } from './types';
import { VALUE_SLOTS } from './types';

const finite = z.number({ error: 'Enter a finite number' });

export const ConditionsSchema = z.strictObject({
  supply: finite.optional(),
  temperature: finite.optional(),
  current: finite.optional(),
  time: finite.optional(),
});
export type ParameterConditions = z.infer<typeof ConditionsSchema>;

type Slots = { min?: number | undefined; typ?: number | undefined; max?: number | undefined };

// min ≤ typ ≤ max wherever two of them are given.
function checkOrder(v: Slots, ctx: z.core.$RefinementCtx): void {
  const pairs: [ValueSlot, ValueSlot][] = [
    ['min', 'typ'],
    ['typ', 'max'],
    ['min', 'max'],
  ];
  for (const [lo, hi] of pairs) {
    const a = v[lo];
    const b = v[hi];
    if (a !== undefined && b !== undefined && a > b) {
      ctx.addIssue({ code: 'custom', path: [hi], message: `${hi} must not be below ${lo}` });
      return;
    }
  }
}

/** One stored parameter value: numbers in SI base units with optional test conditions, or a text/enum/boolean value. */
export const ParameterValueSchema = z
  .strictObject({
    min: finite.optional(),
    typ: finite.optional(),
    max: finite.optional(),
    value: z.union([z.string(), z.boolean()]).optional(),
    conditions: ConditionsSchema.optional(),
  })
  .superRefine(checkOrder);
export type ParameterValue = z.infer<typeof ParameterValueSchema>;

/** "Slew rate" → "slew rate", but "LED forward voltage" keeps its acronym. */
function lower(text: string): string {
  return /^[A-Z][a-z]/.test(text) ? text[0]!.toLowerCase() + text.slice(1) : text;
}

function list(keys: readonly string[]): string {
  return keys.length === 1 ? keys[0]! : `${keys.slice(0, -1).join(', ')} or ${keys[keys.length - 1]}`;
}

/** The schema for one parameter's value, from its definition: allowed slots and conditions only. */
export function parameterValueSchemaFor(def: ParameterDefinition): z.ZodType<ParameterValue> {
  switch (def.kind) {
    case 'number': {
      const slots = def.slots ?? VALUE_SLOTS;
      const conditions: readonly ConditionKey[] = def.conditions ?? [];
      const conditionShape = Object.fromEntries(conditions.map((c) => [c, finite.optional()]));
      const shape: Record<string, z.ZodType> = Object.fromEntries(slots.map((s) => [s, finite.optional()]));
      if (conditions.length > 0) {
        shape.conditions = z
          .strictObject(conditionShape, {
            error: (iss) =>
              iss.code === 'unrecognized_keys'
                ? `${def.label} takes no ${list(iss.keys)} condition; it may state ${list(conditions)}`
                : undefined,
          })
          .optional();
      }
      return z
        .strictObject(shape, {
          error: (iss) => {
            if (iss.code !== 'unrecognized_keys') return undefined;
            return iss.keys.includes('conditions')
              ? `${def.label} takes no test conditions`
              : `${def.label} gives ${list(slots)}, not ${list(iss.keys)}`;
          },
        })
        .check((ctx) => {
          // Only ask for a value when nothing else is wrong: a misplaced slot already says what to write.
          const v = ctx.value as Slots;
          if (ctx.issues.length === 0 && !slots.some((s) => v[s] !== undefined)) {
            ctx.issues.push({ code: 'custom', message: `Give ${lower(def.label)} as ${list(slots)}`, input: ctx.value });
          }
        })
        .superRefine((v, ctx) => checkOrder(v as Slots, ctx)) as unknown as z.ZodType<ParameterValue>;
    }
    case 'enum': {
      const values = (def.choices ?? []).map((c) => c.value);
      return z.strictObject({
        value: z.string().refine((v) => values.includes(v), {
          message: `${def.label} must be one of ${list(values)}`,
        }),
      });
    }
    case 'boolean':
      return z.strictObject({ value: z.boolean({ error: `${def.label} is yes or no (true or false)` }) });
    case 'text':
      return z.strictObject({ value: z.string().trim().min(1, `Enter ${lower(def.label)}`).max(500) });
  }
}

export type FamilyParameters = Partial<Record<string, ParameterValue>>;

const cache = new Map<FamilyKey, z.ZodType<FamilyParameters>>();

/**
 * The schema for a part's parameters in one family: every parameter optional, each shaped by its definition,
 * unknown keys refused by name.
 */
export function parametersSchemaFor(family: FamilyKey): z.ZodType<FamilyParameters> {
  const hit = cache.get(family);
  if (hit) return hit;
  const def = getFamily(family);
  const shape = Object.fromEntries(def.parameters.map((p) => [p.key, parameterValueSchemaFor(p).optional()]));
  const schema = z.strictObject(shape, {
    error: (iss) =>
      iss.code === 'unrecognized_keys'
        ? `${list(iss.keys.map((k) => `"${k}"`))} ${iss.keys.length === 1 ? 'is not a parameter' : 'are not parameters'} of ${lower(def.pluralLabel)}`
        : undefined,
  }) as unknown as z.ZodType<FamilyParameters>;
  cache.set(family, schema);
  return schema;
}
