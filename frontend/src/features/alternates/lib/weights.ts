import { defaultWeights, formatWeights, parseWeights, type FamilyKey, type Weights } from '@understudy/shared-types';

/** The weights a link asks for, over the family's defaults; a weight the link garbles is ignored, and said so. */
export function weightsFromParam(text: string | null, family: FamilyKey): { weights: Weights; error?: string } {
  const defaults = defaultWeights(family);
  if (!text) return { weights: defaults };
  const parsed = parseWeights(text, family);
  if (!parsed.ok) return { weights: defaults, error: parsed.error };
  return { weights: { ...defaults, ...parsed.weights } };
}

/** What goes in the address: nothing when every weight is its default, so a plain link stays plain. */
export function weightsParam(weights: Weights, family: FamilyKey): string | undefined {
  const text = formatWeights(weights, family);
  return text === '' || text === formatWeights(defaultWeights(family), family) ? undefined : text;
}

export function isDefaultWeights(weights: Weights, family: FamilyKey): boolean {
  return weightsParam(weights, family) === undefined;
}
