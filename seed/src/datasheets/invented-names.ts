import type { FamilyKey } from '@understudy/shared-types';
import type { Rng } from './prng';

/**
 * Manufacturers and part-number habits for the test corpus. All invented: none stands for a real company, and
 * the prefixes were chosen not to collide with real part-number families.
 */
export interface InventedMaker {
  name: string;
  /** Legal name for the copyright line; the title block always uses `name`. */
  legalName: string;
  families: readonly FamilyKey[];
  partNumber: (rng: Rng, detail: PartDetail) => string;
  /** Document-number prefix, e.g. "HGM-DS". */
  docPrefix: string;
}

export interface PartDetail {
  channels?: 1 | 2 | 4;
  gangs?: 1 | 2;
  colour?: string;
  resistance?: number;
  /** Body size in mm, for pot series named after it. */
  bodySize?: number;
}

const digits = (rng: Rng, n: number) => Array.from({ length: n }, (_, i) => rng.int(i === 0 ? 1 : 0, 9)).join('');
const channelDigit = (d: PartDetail) => String(d.channels ?? 2);

function resistanceCode(ohms: number): string {
  // The three-digit code printed on trimmers: two significant figures and a power of ten.
  const exp = Math.floor(Math.log10(ohms)) - 1;
  return `${Math.round(ohms / 10 ** exp)}${exp}`;
}

const COLOUR_CODES: Record<string, string> = {
  red: 'R',
  orange: 'O',
  amber: 'A',
  yellow: 'Y',
  green: 'G',
  blue: 'B',
  white: 'W',
  infrared: 'IR',
  ultraviolet: 'UV',
};

export const INVENTED_MAKERS: readonly InventedMaker[] = [
  {
    name: 'Harrowgate Microsystems',
    legalName: 'Harrowgate Microsystems Ltd.',
    families: ['op-amp'],
    partNumber: (rng, d) => `HGX${rng.int(3, 8)}${channelDigit(d)}${digits(rng, 2)}`,
    docPrefix: 'HGX-DS',
  },
  {
    name: 'Pellowe Analog',
    legalName: 'Pellowe Analog GmbH',
    families: ['op-amp'],
    partNumber: (rng, d) => `PLA-${channelDigit(d)}${digits(rng, 3)}${rng.pick(['', 'A', 'B'])}`,
    docPrefix: 'PLA',
  },
  {
    name: 'Ostrander Linear',
    legalName: 'Ostrander Linear Corporation',
    families: ['op-amp'],
    partNumber: (rng, d) => `OSL ${digits(rng, 3)}${channelDigit(d)}`,
    docPrefix: 'OSL-D',
  },
  {
    name: 'Marlpit Semiconductor',
    legalName: 'Marlpit Semiconductor Co.',
    families: ['op-amp', 'led'],
    partNumber: (rng, d) =>
      d.colour ? `MPL-${rng.pick(['3', '5'])}${COLOUR_CODES[d.colour]}${digits(rng, 2)}` : `MQ${digits(rng, 2)}${channelDigit(d)}${rng.pick(['', 'C', 'H'])}`,
    docPrefix: 'MS',
  },
  {
    name: 'Calder Reach Devices',
    legalName: 'Calder Reach Devices plc',
    families: ['op-amp', 'photoresistor'],
    partNumber: (rng, d) => (d.channels ? `CRD${digits(rng, 3)}${channelDigit(d)}` : `CRP-${rng.pick(['05', '07', '12'])}${digits(rng, 2)}`),
    docPrefix: 'CRD',
  },
  {
    name: 'Thistlebank Optics',
    legalName: 'Thistlebank Optics Ltd.',
    families: ['photoresistor', 'led'],
    partNumber: (rng, d) => (d.colour ? `TBL${digits(rng, 3)}-${COLOUR_CODES[d.colour]}` : `TBC-${rng.pick(['5', '7'])}${digits(rng, 3)}`),
    docPrefix: 'TBO',
  },
  {
    name: 'Wrenfield Photonics',
    legalName: 'Wrenfield Photonics Inc.',
    families: ['photoresistor'],
    partNumber: (rng) => `WPR${digits(rng, 2)}${rng.pick(['L', 'M', 'H'])}${rng.int(1, 9)}`,
    docPrefix: 'WP',
  },
  {
    name: 'Lanternwick Lighting',
    legalName: 'Lanternwick Lighting Co., Ltd.',
    families: ['led'],
    partNumber: (rng, d) => `LW${rng.pick(['3', '5', 'S'])}${digits(rng, 2)}${COLOUR_CODES[d.colour ?? 'red']}${rng.pick(['C', 'D', 'T'])}`,
    docPrefix: 'LWL',
  },
  {
    name: 'Glimmerbrook Electronics',
    legalName: 'Glimmerbrook Electronics AB',
    families: ['led', 'potentiometer'],
    partNumber: (rng, d) =>
      d.colour ? `GBE-${COLOUR_CODES[d.colour]}${digits(rng, 3)}` : `GBP${String(d.bodySize ?? 16).padStart(2, '0')}-${d.gangs === 2 ? 'D' : 'S'}${resistanceCode(d.resistance ?? 1e4)}`,
    docPrefix: 'GBE',
  },
  {
    name: 'Cobbold Controls',
    legalName: 'Cobbold Controls Ltd.',
    families: ['potentiometer'],
    partNumber: (rng, d) => `CC${String(d.bodySize ?? 16).padStart(2, '0')}${d.gangs === 2 ? 'G' : 'N'}-${resistanceCode(d.resistance ?? 1e4)}${rng.pick(['A', 'B', 'C'])}`,
    docPrefix: 'CCL',
  },
  {
    name: 'Tarrant & Sloe',
    legalName: 'Tarrant & Sloe Components LLP',
    families: ['potentiometer'],
    partNumber: (rng) => `TS-${digits(rng, 4)}`,
    docPrefix: 'T&S',
  },
  {
    name: 'Kittering Components',
    legalName: 'Kittering Components S.A.',
    families: ['potentiometer', 'photoresistor'],
    partNumber: (rng, d) => (d.resistance ? `KRP${digits(rng, 2)}${d.gangs === 2 ? '2' : '1'}` : `KLD-${digits(rng, 3)}`),
    docPrefix: 'KC',
  },
];

export function makersFor(family: FamilyKey): InventedMaker[] {
  return INVENTED_MAKERS.filter((m) => m.families.includes(family));
}
