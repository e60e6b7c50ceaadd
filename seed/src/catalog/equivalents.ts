import type { EquivalentStatus } from '@understudy/shared-types';

/** Rulings the workshop's editor has already made, by part number; the pair is unordered. */
export interface DemoEquivalent {
  a: string;
  b: string;
  status: EquivalentStatus;
  use: string;
  note: string;
}

// Each approved pair is one the substitution engine also ranks near the top, so the demo never contradicts it.
export const DEMO_EQUIVALENTS: DemoEquivalent[] = [
  { a: 'HV4558', b: 'HV4580', status: 'approved', use: 'any audio stage', note: 'Same DIP-8 dual pinout; the vibe’s four stages ran unchanged at 9 V.' },
  { a: 'QM-062L', b: 'QM-072D', status: 'approved', use: 'buffers and LFO', note: 'JFET input like the original; slightly more supply current, within the pedal’s budget.' },
  { a: 'KL 0741', b: 'CV2201', status: 'approved', use: 'single op amp positions', note: 'Pin for pin in DIP-8; the offset-null pins are unused in our builds.' },
  { a: 'BW-LDR-10K-4', b: 'BW-LDR-10K', status: 'approved', use: 'tremolo cell', note: 'Depth matched within a few percent after re-trimming the bias.' },
  { a: 'BW-LDR-5K-12', b: 'BW-LDR-5K', status: 'approved', use: 'phaser cells', note: 'Sorted in fours by light resistance, as with the original.' },
  { a: 'OV24-A500K', b: 'OV24-A250K', status: 'approved', use: 'volume after the output buffer', note: 'Lower track resistance is harmless behind the buffer; not for a passive tone stack.' },
  { a: 'BW-VX9', b: 'BW-VX2', status: 'rejected', use: 'optical compressor', note: 'Releases far too fast; the compressor pumps.' },
];
