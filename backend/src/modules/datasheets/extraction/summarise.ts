import { getParameter, type DatasheetExtraction, type DatasheetSummary } from '@understudy/shared-types';

type SummaryValue = DatasheetSummary['parameters'][string];

/**
 * The batch CLI's answer: each parameter's kept value in SI base units with the definition's unit named. Rejected
 * proposals are left out and an edited one counts as edited.
 */
export function summarise(extraction: DatasheetExtraction): DatasheetSummary {
  const family = extraction.identity.family?.value ?? null;
  const parameters: Record<string, SummaryValue> = {};
  const best = new Map<string, DatasheetExtraction['proposals'][number]>();
  for (const p of extraction.proposals) {
    if (p.decision === 'rejected') continue;
    const held = best.get(p.key);
    if (!held || p.confidence > held.confidence) best.set(p.key, p);
  }
  for (const [key, p] of best) {
    const value = p.decision === 'edited' && p.editedValue ? p.editedValue : p.value;
    const def = family ? getParameter(family, key) : undefined;
    const out: SummaryValue = {};
    for (const slot of ['min', 'typ', 'max'] as const) if (value[slot] !== undefined) out[slot] = value[slot];
    if (value.value !== undefined) out.value = value.value;
    if (def?.kind === 'number' && def.unit) out.unit = def.unit;
    parameters[key] = out;
  }
  return {
    family,
    partNumber: extraction.identity.partNumber?.value ?? null,
    manufacturer: extraction.identity.manufacturer?.value ?? null,
    parameters,
  };
}
