/** Shown wherever a cadmium photocell is specified or listed. */
export const CADMIUM_CAUTION =
  'Contains cadmium. RoHS restricts cadmium in electrical and electronic equipment: check the exemptions that currently apply and your local rules before specifying this part.';

/** Shown with handling and disposal information. */
export const CADMIUM_HANDLING_NOTE =
  'Do not break, burn or grind cadmium cells. Dispose of them as hazardous waste following local rules and regulations; where this note and your local codes differ, follow the local codes.';

/**
 * Whether a cell material contains cadmium: the cellMaterial values 'cds' and 'cdse', their labels, or any
 * other cadmium compound written with the Cd symbol (CdTe) or the word.
 */
export function isCadmiumCell(material: string | null | undefined): boolean {
  if (typeof material !== 'string') return false;
  const m = material.trim();
  return /^cd(?:s|se|te)?\b/i.test(m) || /^Cd[A-Z]/.test(m) || /cadmium/i.test(m);
}
