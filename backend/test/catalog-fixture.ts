import type { DataSource } from 'typeorm';
import type { PartCreateBody } from '@understudy/shared-types';
import { PartCreateBodySchema } from '@understudy/shared-types';
import { createPart } from '../src/modules/parts/parts.service';

/** A small catalog whose right answers are obvious by eye. Invented parts. */
export const FIXTURE_PARTS: PartCreateBody[] = [
  {
    family: 'op-amp', manufacturer: 'Fixture Linear', partNumber: 'CV2207', description: 'Low-noise dual for gain stages.',
    lifecycle: 'obsolete', rohsStatus: 'compliant', package: 'DIP-8', pinLayout: 'dip8-dual-opamp',
    parameters: { channels: { typ: 2 }, supplyVoltage: { min: 6, max: 36 }, singleSupply: { value: true }, slewRate: { typ: 13e6 }, inputStage: { value: 'jfet' } },
  },
  {
    family: 'op-amp', manufacturer: 'Fixture Linear', partNumber: 'CV2208', description: 'Bipolar dual, steady and slow.',
    lifecycle: 'active', rohsStatus: 'compliant', package: 'DIP-8', pinLayout: 'dip8-dual-opamp',
    parameters: { channels: { typ: 2 }, supplyVoltage: { min: 3, max: 32 }, singleSupply: { value: true }, slewRate: { typ: 0.6e6 }, inputStage: { value: 'bipolar' } },
  },
  {
    family: 'op-amp', manufacturer: 'Oddfellow Devices', partNumber: 'OD-4558X', description: 'Fast dual for buffers.',
    lifecycle: 'active', rohsStatus: 'compliant', package: 'SOIC-8', pinLayout: 'dip8-dual-opamp',
    parameters: { channels: { typ: 2 }, supplyVoltage: { min: 4, max: 30 }, singleSupply: { value: true }, slewRate: { typ: 7e6 }, inputStage: { value: 'bipolar' } },
  },
  {
    family: 'op-amp', manufacturer: 'Oddfellow Devices', partNumber: 'OD-10V', description: 'Needs a split supply of at least ±6 V.',
    lifecycle: 'last-time-buy', rohsStatus: 'compliant', package: 'DIP-8', pinLayout: 'dip8-single-opamp',
    parameters: { channels: { typ: 1 }, supplyVoltage: { min: 12, max: 36 }, singleSupply: { value: false }, slewRate: { typ: 20e6 }, inputStage: { value: 'jfet' } },
  },
  {
    family: 'photoresistor', manufacturer: 'Oddfellow Devices', partNumber: 'OD-LDR5', description: 'Cadmium sulphide cell.',
    lifecycle: 'active', rohsStatus: 'non-compliant', rohsNote: 'Contains cadmium.', package: 'radial',
    parameters: { lightResistance: { min: 5e3, max: 12e3 }, gamma: { typ: 0.7 }, cellMaterial: { value: 'cds' } },
  },
];

export async function loadFixtureCatalog(db: DataSource): Promise<Map<string, string>> {
  const ids = new Map<string, string>();
  for (const part of FIXTURE_PARTS) {
    const dto = await createPart(db, null, PartCreateBodySchema.parse(part));
    ids.set(part.partNumber, dto.id);
  }
  return ids;
}
