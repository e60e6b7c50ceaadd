import type { CandidatePart, EquivalentDto } from '../alternates';
import type { FamilyKey, ParameterValue } from '../families';

// Invented parts for the substitution tests: fictional makers and part numbers, round figures.

let counter = 0;

export function testId(): string {
  counter++;
  return `00000000-0000-4000-8000-${counter.toString(16).padStart(12, '0')}`;
}

type Params = Record<string, ParameterValue>;
type Extra = Partial<Omit<CandidatePart, 'parameters' | 'family'>>;

export function testPart(family: FamilyKey, partNumber: string, parameters: Params, extra: Extra = {}): CandidatePart {
  return {
    id: testId(),
    family,
    manufacturer: { id: '00000000-0000-4000-8000-ffffffffffff', name: 'Fixture Linear' },
    partNumber,
    description: '',
    lifecycle: 'active',
    rohsStatus: 'compliant',
    package: '',
    pinLayout: null,
    pinMap: {},
    parameters,
    ...extra,
  };
}

/** Replace, add or (with undefined) drop parameters. */
export function withParams(part: CandidatePart, changes: Record<string, ParameterValue | undefined>, partNumber = `${part.partNumber}-X`): CandidatePart {
  const parameters: Params = { ...part.parameters };
  for (const [k, v] of Object.entries(changes)) {
    if (v === undefined) delete parameters[k];
    else parameters[k] = v;
  }
  return { ...part, id: testId(), partNumber, parameters };
}

export function variant(part: CandidatePart, partNumber: string, extra: Extra = {}, changes: Record<string, ParameterValue | undefined> = {}): CandidatePart {
  return { ...withParams(part, changes, partNumber), ...extra, id: extra.id ?? testId() };
}

/** A FET-input dual op amp in the usual 8-pin layout. */
export function dualOpAmp(partNumber = 'FX-2200', extra: Extra = {}): CandidatePart {
  return testPart(
    'op-amp',
    partNumber,
    {
      channels: { typ: 2 },
      supplyVoltage: { min: 6, max: 36 },
      singleSupply: { value: true },
      slewRate: { typ: 13e6 },
      gainBandwidth: { typ: 3e6 },
      inputOffsetVoltage: { typ: 3e-3, max: 10e-3 },
      inputBiasCurrent: { typ: 30e-12, max: 200e-12 },
      inputNoiseDensity: { typ: 18e-9 },
      outputCurrent: { typ: 20e-3 },
      railToRailInput: { value: false },
      railToRailOutput: { value: true },
    },
    { package: 'DIP-8', pinLayout: 'dip8-dual-opamp', ...extra },
  );
}

export function cdsCell(partNumber = 'LX-3410', extra: Extra = {}): CandidatePart {
  return testPart(
    'photoresistor',
    partNumber,
    {
      darkResistance: { min: 1e6 },
      lightResistance: { min: 8e3, max: 20e3 },
      gamma: { typ: 0.7 },
      peakWavelength: { typ: 540e-9 },
      riseTime: { typ: 30e-3 },
      decayTime: { typ: 60e-3 },
      cellMaterial: { value: 'cds' },
    },
    { package: 'radial', pinLayout: 'photoresistor-2lead', rohsStatus: 'exempt', ...extra },
  );
}

export function redLed(partNumber = 'LD-630R', extra: Extra = {}): CandidatePart {
  return testPart(
    'led',
    partNumber,
    {
      colour: { value: 'red' },
      peakWavelength: { typ: 630e-9 },
      forwardVoltage: { typ: 2.0 },
      forwardCurrent: { typ: 20e-3, max: 30e-3 },
      luminousIntensity: { typ: 0.5 },
      viewingAngle: { typ: 30 },
      ledPackage: { value: '5mm' },
    },
    { package: 'led-5mm', pinLayout: 'led-2lead', ...extra },
  );
}

export function logPot(partNumber = 'PT-16A50K', extra: Extra = {}): CandidatePart {
  return testPart(
    'potentiometer',
    partNumber,
    {
      resistance: { typ: 50e3 },
      taper: { value: 'log' },
      tolerance: { typ: 20 },
      powerRating: { max: 0.125 },
      gangs: { typ: 1 },
      bodySize: { typ: 16e-3 },
      shaftType: { value: 'knurled' },
      mounting: { value: 'pcb-vertical' },
    },
    { package: 'pot-16mm', pinLayout: 'pot-3lug', ...extra },
  );
}

export function ruling(part: CandidatePart, other: CandidatePart, status: 'approved' | 'rejected', use = 'any', note = ''): EquivalentDto {
  return {
    id: testId(),
    partId: part.id,
    equivalentId: other.id,
    status,
    use,
    note,
    decidedBy: null,
    createdAt: '2024-01-01T00:00:00.000Z',
    updatedAt: '2024-01-01T00:00:00.000Z',
  };
}

/** A resistive optocoupler: 2 kΩ at 10 mA, 10 MΩ dark, 5 ms on and 50 ms off, a CdS cell under an exemption. */
export function vactrol(partNumber = 'VX-2K', extra: Extra = {}): CandidatePart {
  return testPart(
    'optocoupler',
    partNumber,
    {
      onResistance: { typ: 2e3, max: 4e3, conditions: { current: 10e-3 } },
      offResistance: { min: 10e6 },
      ledForwardVoltage: { typ: 2.0 },
      ledMaxCurrent: { max: 40e-3 },
      turnOnTime: { typ: 5e-3 },
      turnOffTime: { typ: 50e-3 },
      cellMaterial: { value: 'cds' },
    },
    { package: 'opto-4lead', pinLayout: 'optocoupler-4lead', rohsStatus: 'exempt', ...extra },
  );
}
