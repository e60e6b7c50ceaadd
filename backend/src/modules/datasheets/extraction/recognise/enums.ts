/** Word values of enum parameters, read from a table cell or a title. Returns the choice's value or null. */

export interface TaperReading {
  value: 'linear' | 'log' | 'reverse-log';
  /** The law was spelled out rather than given as a letter code whose meaning depends on the region. */
  spelled: boolean;
}

/**
 * The letter codes differ by region (common practice, no source): the JIS / US code most makers use today reads
 * A = log, B = linear, C = reverse log; the older European IEC/DIN code reads A = linear, B = log, F = reverse log.
 * Words always win over letters; a letter alone follows the European code only when the text says so.
 */
export function readTaper(text: string, context = ''): TaperReading | null {
  const t = text.toLowerCase();
  if (/reverse[\s-]*(log|audio)|anti[\s-]*log|inverse[\s-]*log|negative[\s-]*log|rev\.?\s*log|-\s*log\b/.test(t)) {
    return { value: 'reverse-log', spelled: true };
  }
  if (/\blog(arithmic)?\b|\baudio\b|\bexponential\b|\+\s*log\b/.test(t)) return { value: 'log', spelled: true };
  if (/\blin(ear)?\b/.test(t)) return { value: 'linear', spelled: true };
  const trimmed = text.trim().replace(/[.;,]$/, '');
  const letter =
    /^(?:(?:taper|law|curve|code|type)\s*)?\(?([A-Z])\)?(?:\s*(?:taper|law|curve|code|type))?$/i.exec(trimmed) ??
    /^([ABCF])\s*\d/.exec(trimmed) ??
    /\d\s*[kKM]?\s*([ABCF])$/.exec(trimmed) ??
    /\b(?:taper|law|curve)\s+(?:code\s+)?([ABCF])\b/i.exec(trimmed);
  const code = letter?.[1]?.toUpperCase();
  if (!code) return null;
  const european = /\b(european|iec|din)\b/i.test(context) && !/\b(jis|asian|us code|american)\b/i.test(context);
  const map: Record<string, TaperReading['value']> = european
    ? { A: 'linear', B: 'log', C: 'log', F: 'reverse-log', Y: 'reverse-log' }
    : { A: 'log', B: 'linear', C: 'reverse-log' };
  const value = map[code];
  return value ? { value, spelled: false } : null;
}

const COLOURS: [RegExp, string][] = [
  [/\b(infra[\s-]*red|ir)\b/i, 'infrared'],
  [/\b(ultra[\s-]*violet|uv)\b/i, 'ultraviolet'],
  [/\bwhite\b/i, 'white'],
  [/\bamber\b/i, 'amber'],
  [/\borange\b/i, 'orange'],
  [/\byellow\b/i, 'yellow'],
  [/\bgreen\b/i, 'green'],
  [/\bblue\b/i, 'blue'],
  [/\bred\b/i, 'red'],
];

export function readColour(text: string): string | null {
  for (const [re, value] of COLOURS) if (re.test(text)) return value;
  return null;
}

export function readLens(text: string): string | null {
  if (/\bdiffus/i.test(text)) return 'diffused';
  if (/\btint/i.test(text)) return 'tinted';
  if (/\b(water[\s-]*)?clear\b|\btransparent\b/i.test(text)) return 'clear';
  return null;
}

export function readCellMaterial(text: string): string | null {
  if (/\bCdSe\b|cadmium selenide/i.test(text)) return 'cdse';
  if (/\bCdS\b|cadmium sulphide|cadmium sulfide/i.test(text)) return 'cds';
  return null;
}

export function readLedPackage(text: string): string | null {
  const t = text.replace(/\s+/g, ' ');
  if (/\bT-?1\s*(3\/4|¾)/i.test(t) || /\b5\s*mm\b/i.test(t)) return '5mm';
  if (/\bT-?1\b(?!\s*(3\/4|¾))/i.test(t) || /\b3\s*mm\b/i.test(t)) return '3mm';
  for (const code of ['0603', '0805', '1206']) if (new RegExp(`\\b${code}\\b`).test(t)) return code;
  return null;
}

export function readShaft(text: string): string | null {
  if (/knurl|spline|serrat/i.test(text)) return 'knurled';
  if (/\bd[\s-]*(flat|shaft|cut|type)\b|\bflatted\b|\bflat\b/i.test(text)) return 'd-flat';
  if (/slot/i.test(text)) return 'slotted';
  if (/smooth|plain|round/i.test(text)) return 'smooth';
  return null;
}

export function readMounting(text: string): string | null {
  if (/right[\s-]*angle|horizontal/i.test(text)) return 'pcb-right-angle';
  if (/\bpcb\b|printed circuit|vertical|pc pins?|board/i.test(text)) return 'pcb-vertical';
  if (/solder[\s-]*(lug|tag|terminal)|lugs?\b|tags?\b/i.test(text)) return 'solder-lug';
  if (/panel/i.test(text)) return 'panel';
  return null;
}

export function readInputStage(text: string): string | null {
  if (/\bj-?fet\b/i.test(text)) return 'jfet';
  if (/\bcmos\b|\bmosfet[\s-]*input/i.test(text)) return 'cmos';
  if (/\bbipolar\b|\bbjt\b/i.test(text)) return 'bipolar';
  return null;
}

/** Yes / no words in a table cell. */
export function readBoolean(text: string): boolean | null {
  if (/^(yes|y|true|with|included|available|✓|✔)$/i.test(text.trim())) return true;
  if (/^(no|n|false|without|none|—|-)$/i.test(text.trim())) return false;
  return null;
}

/** The enum reader for each enum or boolean parameter. */
export const ENUM_READERS: Record<string, (text: string, context: string) => string | boolean | null> = {
  taper: (t, c) => readTaper(t, c)?.value ?? null,
  colour: (t) => readColour(t),
  lens: (t) => readLens(t),
  cellMaterial: (t) => readCellMaterial(t),
  ledPackage: (t) => readLedPackage(t),
  shaftType: (t) => readShaft(t),
  mounting: (t) => readMounting(t),
  inputStage: (t) => readInputStage(t),
  centreDetent: (t) => readBoolean(t),
  singleSupply: (t) => readBoolean(t),
  railToRailInput: (t) => readBoolean(t),
  railToRailOutput: (t) => readBoolean(t),
};
