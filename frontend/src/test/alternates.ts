import type {
  AlternatesResponse,
  BreakdownLine,
  CandidatePart,
  EquivalentDto,
  PartDto,
  PositionMatch,
  PositionResults,
  RankedAlternate,
  RankedPair,
  RequirementSetDto,
  Unsuitable,
} from '@understudy/shared-types';
import { USERS } from './render-app';

const at = '2025-03-01T09:00:00.000Z';

/** The fields a ranking carries of a part. */
export function candidateOf(part: PartDto): CandidatePart {
  const { id, family, manufacturer, partNumber, description, lifecycle, rohsStatus, package: pkg, pinLayout, pinMap, parameters } = part;
  return { id, family, manufacturer, partNumber, description, lifecycle, rohsStatus, package: pkg, pinLayout, pinMap, parameters };
}

export function breakdownLine(overrides: Partial<BreakdownLine> = {}): BreakdownLine {
  return {
    criterion: 'slewRate',
    label: 'Slew rate',
    original: '1.7 V/µs',
    candidate: '13 V/µs',
    points: 0,
    maxPoints: 15.4,
    reason: 'faster than the original, no loss',
    ...overrides,
  };
}

/** A scored candidate; a drop-in with no ruling unless told otherwise. */
export function makeRanked(part: PartDto, overrides: Partial<RankedAlternate> = {}): RankedAlternate {
  return {
    part: candidateOf(part),
    score: 80,
    breakdown: [breakdownLine()],
    pinout: { class: 'drop-in', packageChange: null, differingPins: [], summary: 'Same functions on the same pins.' },
    equivalent: null,
    ...overrides,
  };
}

/** An LED + photoresistor pair scored as an optocoupler, with an estimate worked at 10 mA and 5 mm. */
export function makeRankedPair(led: PartDto, cell: PartDto, overrides: Partial<RankedPair> = {}): RankedPair {
  return {
    id: `${led.id}+${cell.id}`,
    led: candidateOf(led),
    cell: candidateOf(cell),
    partNumber: `${led.partNumber} + ${cell.partNumber}`,
    lifecycle: 'active',
    rohsStatus: 'exempt',
    score: 74,
    breakdown: [
      breakdownLine({ criterion: 'onResistance', label: 'On resistance', original: '2 kΩ', candidate: '2 kΩ', points: 0, maxPoints: 21.4, reason: "estimated on resistance 2 kΩ matches the original's" }),
      breakdownLine({
        criterion: 'pinout',
        label: 'Pinout',
        original: 'opto-4lead',
        candidate: 'led-5mm + radial',
        points: -7.1,
        maxPoints: 14.3,
        reason: 'two parts in place of one package, so the board layout changes; never a drop-in: −7.1',
      }),
    ],
    pinout: { class: 'adapter', packageChange: { from: 'opto-4lead', to: 'led-5mm + radial' }, differingPins: [], summary: 'Two parts in place of one package, so the board layout changes; never a drop-in.' },
    driveCurrentA: 10e-3,
    spacingM: 5e-3,
    estimate: {
      resistanceOhms: { low: 816, typical: 2000, high: 5660 },
      illuminanceLux: 1000,
      spectralFactor: 1,
      assumptions: [
        "The LED is driven at 10 mA: the current the original's on resistance is stated at.",
        'The LED sits 5 mm from the cell, facing it and shielded from outside light, as in a usual home-made pair (common practice, no source).',
      ],
      note: 'An estimate from datasheet figures and the assumptions listed, to confirm on the bench before building on it.',
    },
    ...overrides,
  };
}

export function makeUnsuitable(part: PartDto, reasons: string[]): Unsuitable {
  return { part: candidateOf(part), reasons };
}

export function alternatesOf(
  original: PartDto,
  items: RankedAlternate[],
  unsuitable: Unsuitable[] = [],
  weights: Record<string, number> = {},
): AlternatesResponse {
  return { original: candidateOf(original), weights, considered: items.length + unsuitable.length, items, unsuitable };
}

export function makeEquivalent(overrides: Partial<EquivalentDto> = {}): EquivalentDto {
  return {
    id: '4e0a0000-0000-4000-8000-000000000001',
    partId: '7a0c0000-0000-4000-8000-000000000001',
    equivalentId: '7a0c0000-0000-4000-8000-000000000002',
    status: 'approved',
    use: 'any',
    note: '',
    decidedBy: { id: USERS.editor.id, name: USERS.editor.name },
    createdAt: at,
    updatedAt: at,
    ...overrides,
  };
}

export function makeMatch(part: PartDto, overrides: Partial<PositionMatch> = {}): PositionMatch {
  return {
    part: candidateOf(part),
    score: 90,
    margins: [
      {
        need: 'slewRate',
        label: 'Slew rate',
        needed: 'at least 0.251 V/µs',
        actual: '13 V/µs',
        margin: 50.7,
        ok: true,
        reason: 'slew rate 13 V/µs is 52× the 0.251 V/µs needed',
      },
    ],
    equivalentOf: [],
    ...overrides,
  };
}

export function positionResultsOf(items: PositionMatch[], unsuitable: Unsuitable[] = []): PositionResults {
  return {
    derived: [
      {
        key: 'slewRate',
        label: 'Slew rate',
        value: { min: 2 * Math.PI * 20e3 * 2 },
        unit: 'V/s',
        formula: 'SR = 2π·f·Vpeak',
        explanation: '2 V peak at 20 kHz needs at least 0.251 V/µs to stay undistorted.',
      },
    ],
    considered: items.length + unsuitable.length,
    items,
    unsuitable,
  };
}

export function requirementSetId(n: number): string {
  return `5b0e0000-0000-4000-8000-${String(n).padStart(12, '0')}`;
}

export function makeRequirementSet(overrides: Partial<RequirementSetDto> = {}): RequirementSetDto {
  return {
    id: requirementSetId(1),
    name: 'Vibe LFO buffer',
    design: 'Photocell vibe',
    requirements: {
      family: 'op-amp',
      supply: { kind: 'single', volts: 9, halfSupplyBias: false },
      signal: { peakVolts: 2, frequencyHz: 20e3 },
      allowObsolete: false,
    },
    owner: { id: USERS.viewer.id, name: USERS.viewer.name },
    createdAt: at,
    updatedAt: at,
    ...overrides,
  };
}
