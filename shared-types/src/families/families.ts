import { z } from 'zod';
import { LED } from './led';
import { OP_AMP } from './op-amp';
import { OPTOCOUPLER } from './optocoupler';
import { PHOTORESISTOR } from './photoresistor';
import { POTENTIOMETER } from './potentiometer';
import { FAMILY_KEYS, type FamilyDefinition, type FamilyKey, type ParameterDefinition } from './types';

/** Every family and its parameters, defined once for the API, the forms, the filters and the tables. */
export const FAMILIES: Record<FamilyKey, FamilyDefinition> = {
  'op-amp': OP_AMP,
  photoresistor: PHOTORESISTOR,
  led: LED,
  potentiometer: POTENTIOMETER,
  optocoupler: OPTOCOUPLER,
};

export const FAMILY_LABELS: Record<FamilyKey, string> = Object.fromEntries(
  FAMILY_KEYS.map((k) => [k, FAMILIES[k].label]),
) as Record<FamilyKey, string>;

export const FamilyKeySchema = z.enum(FAMILY_KEYS, { error: () => `Choose one of: ${FAMILY_KEYS.join(', ')}` });

export function isFamilyKey(value: unknown): value is FamilyKey {
  return typeof value === 'string' && (FAMILY_KEYS as readonly string[]).includes(value);
}

export function getFamily(key: FamilyKey): FamilyDefinition {
  const family = FAMILIES[key];
  if (!family) throw new RangeError(`Unknown part family "${String(key)}"`);
  return family;
}

export function getParameter(family: FamilyKey | FamilyDefinition, key: string): ParameterDefinition | undefined {
  const def = typeof family === 'string' ? getFamily(family) : family;
  return def.parameters.find((p) => p.key === key);
}
