import type { FamilyKey } from './types';

export interface PackageDefinition {
  key: string;
  label: string;
  mounting: 'through-hole' | 'surface-mount' | 'panel';
  /** Lead or pad count, where it is fixed. */
  pinCount?: number;
  families: readonly FamilyKey[];
}

/** Packages and body sizes the catalog knows. */
export const PACKAGES = [
  { key: 'DIP-8', label: 'DIP-8', mounting: 'through-hole', pinCount: 8, families: ['op-amp'] },
  { key: 'SOIC-8', label: 'SOIC-8', mounting: 'surface-mount', pinCount: 8, families: ['op-amp'] },
  { key: 'MSOP-8', label: 'MSOP-8', mounting: 'surface-mount', pinCount: 8, families: ['op-amp'] },
  { key: 'TO-99', label: 'TO-99 metal can', mounting: 'through-hole', pinCount: 8, families: ['op-amp'] },
  { key: 'SOT-23-5', label: 'SOT-23-5', mounting: 'surface-mount', pinCount: 5, families: ['op-amp'] },
  { key: 'DIP-14', label: 'DIP-14', mounting: 'through-hole', pinCount: 14, families: ['op-amp'] },
  { key: 'SOIC-14', label: 'SOIC-14', mounting: 'surface-mount', pinCount: 14, families: ['op-amp'] },
  { key: 'TSSOP-14', label: 'TSSOP-14', mounting: 'surface-mount', pinCount: 14, families: ['op-amp'] },
  { key: 'radial', label: 'Radial leads', mounting: 'through-hole', pinCount: 2, families: ['photoresistor'] },
  { key: 'led-3mm', label: '3 mm', mounting: 'through-hole', pinCount: 2, families: ['led'] },
  { key: 'led-5mm', label: '5 mm', mounting: 'through-hole', pinCount: 2, families: ['led'] },
  { key: '0603', label: '0603', mounting: 'surface-mount', pinCount: 2, families: ['led'] },
  { key: '0805', label: '0805', mounting: 'surface-mount', pinCount: 2, families: ['led'] },
  { key: '1206', label: '1206', mounting: 'surface-mount', pinCount: 2, families: ['led'] },
  { key: 'pot-9mm', label: '9 mm', mounting: 'panel', families: ['potentiometer'] },
  { key: 'pot-16mm', label: '16 mm', mounting: 'panel', families: ['potentiometer'] },
  { key: 'pot-24mm', label: '24 mm', mounting: 'panel', families: ['potentiometer'] },
  { key: 'opto-4lead', label: '4-lead module', mounting: 'through-hole', pinCount: 4, families: ['optocoupler'] },
] as const satisfies readonly PackageDefinition[];
export type PackageKey = (typeof PACKAGES)[number]['key'];

export interface PinLayout {
  key: string;
  label: string;
  /** The package the numbering is drawn for; `packages` lists every package that shares it. */
  packageFamily: string;
  packages: readonly PackageKey[];
  /** Pin number → function, with the true minus sign U+2212 for display. */
  pins: Readonly<Record<number, string>>;
}

const MINUS = '\u2212';

/** Pin layouts, defined once; compare functions with normalizePinFunction, never by label text. */
export const PIN_LAYOUTS = {
  'dip8-dual-opamp': {
    key: 'dip8-dual-opamp',
    label: 'Dual op amp, 8 pins',
    packageFamily: 'DIP-8',
    packages: ['DIP-8', 'SOIC-8', 'MSOP-8'],
    pins: {
      1: 'OUT A',
      2: `${MINUS}IN A`,
      3: '+IN A',
      4: `V${MINUS}`,
      5: '+IN B',
      6: `${MINUS}IN B`,
      7: 'OUT B',
      8: 'V+',
    },
  },
  'dip8-single-opamp': {
    key: 'dip8-single-opamp',
    label: 'Single op amp, 8 pins',
    packageFamily: 'DIP-8',
    packages: ['DIP-8', 'SOIC-8', 'MSOP-8', 'TO-99'],
    pins: {
      1: 'OFFSET NULL',
      2: `${MINUS}IN`,
      3: '+IN',
      4: `V${MINUS}`,
      5: 'OFFSET NULL',
      6: 'OUT',
      7: 'V+',
      8: 'NC',
    },
  },
  'dip14-quad-opamp': {
    key: 'dip14-quad-opamp',
    label: 'Quad op amp, 14 pins',
    packageFamily: 'DIP-14',
    packages: ['DIP-14', 'SOIC-14', 'TSSOP-14'],
    pins: {
      1: 'OUT A',
      2: `${MINUS}IN A`,
      3: '+IN A',
      4: 'V+',
      5: '+IN B',
      6: `${MINUS}IN B`,
      7: 'OUT B',
      8: 'OUT C',
      9: `${MINUS}IN C`,
      10: '+IN C',
      11: `V${MINUS}`,
      12: '+IN D',
      13: `${MINUS}IN D`,
      14: 'OUT D',
    },
  },
  'photoresistor-2lead': {
    key: 'photoresistor-2lead',
    label: 'Photoresistor, 2 leads',
    packageFamily: 'radial',
    packages: ['radial'],
    pins: { 1: 'cell', 2: 'cell' },
  },
  'led-2lead': {
    key: 'led-2lead',
    label: 'LED, 2 leads',
    packageFamily: 'LED',
    packages: ['led-3mm', 'led-5mm', '0603', '0805', '1206'],
    pins: { 1: 'anode', 2: 'cathode' },
  },
  'pot-3lug': {
    key: 'pot-3lug',
    label: 'Single-gang pot, 3 lugs',
    packageFamily: 'pot',
    packages: ['pot-9mm', 'pot-16mm', 'pot-24mm'],
    pins: { 1: 'CCW', 2: 'wiper', 3: 'CW' },
  },
  'pot-dual-6lug': {
    key: 'pot-dual-6lug',
    label: 'Dual-gang pot, 6 lugs',
    packageFamily: 'pot',
    packages: ['pot-9mm', 'pot-16mm', 'pot-24mm'],
    pins: { 1: 'CCW A', 2: 'wiper A', 3: 'CW A', 4: 'CCW B', 5: 'wiper B', 6: 'CW B' },
  },
  'optocoupler-4lead': {
    key: 'optocoupler-4lead',
    label: 'Resistive optocoupler, 4 leads',
    packageFamily: 'opto-4lead',
    packages: ['opto-4lead'],
    pins: { 1: 'LED anode', 2: 'LED cathode', 3: 'cell', 4: 'cell' },
  },
} as const satisfies Record<string, PinLayout>;
export type PinLayoutKey = keyof typeof PIN_LAYOUTS;

/** Which layouts each family's parts may have. */
export const PIN_LAYOUTS_BY_FAMILY: Record<FamilyKey, readonly PinLayoutKey[]> = {
  'op-amp': ['dip8-single-opamp', 'dip8-dual-opamp', 'dip14-quad-opamp'],
  photoresistor: ['photoresistor-2lead'],
  led: ['led-2lead'],
  potentiometer: ['pot-3lug', 'pot-dual-6lug'],
  optocoupler: ['optocoupler-4lead'],
};

const channelLetter = (c: string | undefined): string =>
  c === undefined ? '' : ` ${/\d/.test(c) ? 'ABCD'[Number(c) - 1] : c}`;

/** Inputs in the spellings datasheets use: -IN A, IN-A, INA-, 1IN-, NON-INVERTING INPUT A. */
function matchInput(t: string): { sign: string; channel: string | undefined } | undefined {
  let m: RegExpExecArray | null;
  if ((m = /^([+-])IN([A-D1-4])?$/.exec(t))) return { sign: m[1]!, channel: m[2] };
  if ((m = /^IN([+-])([A-D1-4])?$/.exec(t))) return { sign: m[1]!, channel: m[2] };
  if ((m = /^IN([A-D1-4])([+-])$/.exec(t))) return { sign: m[2]!, channel: m[1] };
  if ((m = /^([A-D1-4])IN([+-])$/.exec(t))) return { sign: m[2]!, channel: m[1] };
  if ((m = /^(NON-?INVERTING|INVERTING)INPUT([A-D1-4])?$/.exec(t))) {
    return { sign: m[1]!.startsWith('NON') ? '+' : '-', channel: m[2] };
  }
  return undefined;
}

/**
 * One canonical spelling of a pin function for comparisons (ASCII minus, upper case, channel as a letter):
 * '-IN A', '−IN A', 'IN- A', 'INA-' and '1IN-' all become '-IN A'; VCC/VDD/+VS become 'V+', VEE/VSS/-VS 'V-'.
 * Not for display: labels keep the true minus sign.
 */
export function normalizePinFunction(label: string): string {
  const s = label
    .normalize('NFKC')
    .replace(/[\u2212\u2010-\u2014]/g, '-')
    .toUpperCase()
    .replace(/[_\s]+/g, ' ')
    .trim();
  const t = s.replace(/ /g, '');

  if (/^(NC|N\.C\.?|N\/C|NOCONNECT(ION)?)$/.test(t)) return 'NC';
  if (/^(V\+|\+V|VCC|VDD|\+VS|VS\+|\+VCC|VCC\+)$/.test(t)) return 'V+';
  if (/^(V-|-V|VEE|VSS|-VS|VS-|-VCC|VCC-|-VEE)$/.test(t)) return 'V-';
  if (/^(OFFSETNULL[12]?|NULL[12]?|OFFSETN[12]|N[12]|BAL(ANCE)?[12]?)$/.test(t)) return 'OFFSET NULL';

  const input = matchInput(t);
  if (input) return `${input.sign}IN${channelLetter(input.channel)}`;

  let m: RegExpExecArray | null;
  if ((m = /^OUT(?:PUT)?([A-D1-4])?$/.exec(t))) return `OUT${channelLetter(m[1])}`;
  if ((m = /^([A-D1-4])OUT(?:PUT)?$/.exec(t))) return `OUT${channelLetter(m[1])}`;
  if ((m = /^(CCW|CW|WIPER|W)([A-D1-4])?$/.exec(t))) return `${m[1] === 'W' ? 'WIPER' : m[1]}${channelLetter(m[2])}`;

  return s;
}

/** Pin numbers whose function matches, in any spelling: findPins(layout, 'VCC') → [8] on a dual op amp. */
export function findPins(layout: PinLayout, fn: string): number[] {
  const want = normalizePinFunction(fn);
  return Object.entries(layout.pins)
    .filter(([, f]) => normalizePinFunction(f) === want)
    .map(([n]) => Number(n));
}

/** Whether two pinouts put the same functions on the same pins: the first test of a drop-in substitute. */
export function pinoutsMatch(a: Pick<PinLayout, 'pins'>, b: Pick<PinLayout, 'pins'>): boolean {
  const ka = Object.keys(a.pins);
  const kb = Object.keys(b.pins);
  if (ka.length !== kb.length) return false;
  return ka.every((n) => {
    const fb = b.pins[Number(n)];
    return fb !== undefined && normalizePinFunction(a.pins[Number(n)]!) === normalizePinFunction(fb);
  });
}
