import type { PartDto, PartListResponse, PartRevisionDto } from '@understudy/shared-types';
import { USERS } from './render-app';

let counter = 0;

/** A UUID-shaped id that is unique per call and readable in failures. */
export function partId(n = ++counter): string {
  return `7a0c0000-0000-4000-8000-${String(n).padStart(12, '0')}`;
}

const at = '2025-02-01T10:00:00.000Z';

/** An invented dual op amp; override anything. */
export function makePart(overrides: Partial<PartDto> = {}): PartDto {
  const id = overrides.id ?? partId();
  return {
    id,
    family: 'op-amp',
    manufacturer: { id: '5e1f0000-0000-4000-8000-000000000001', name: 'Northwind Analog' },
    partNumber: 'NW4580',
    description: 'Low-noise dual op amp for preamps.',
    lifecycle: 'active',
    rohsStatus: 'compliant',
    rohsNote: '',
    package: 'DIP-8',
    pinLayout: 'dip8-dual-opamp',
    pinMap: {},
    parameters: {
      channels: { typ: 2 },
      supplyVoltage: { min: 4, max: 36 },
      slewRate: { typ: 13e6, conditions: { supply: 30 } },
      gainBandwidth: { typ: 10e6 },
      inputNoiseDensity: { typ: 4e-9 },
      inputOffsetVoltage: { typ: 0.5e-3, max: 3e-3 },
      singleSupply: { value: false },
      inputStage: { value: 'bipolar' },
    },
    tags: ['low noise'],
    version: 3,
    archived: false,
    createdAt: at,
    updatedAt: at,
    ...overrides,
  };
}

export function makePhotoresistor(overrides: Partial<PartDto> = {}): PartDto {
  return makePart({
    family: 'photoresistor',
    partNumber: 'LC-5516',
    manufacturer: { id: '5e1f0000-0000-4000-8000-000000000002', name: 'Lumen Cells' },
    description: 'General purpose 5 mm cell.',
    package: 'radial',
    pinLayout: 'photoresistor-2lead',
    rohsStatus: 'exempt',
    rohsNote: 'Cadmium exemption; check it still applies.',
    parameters: {
      darkResistance: { min: 500e3 },
      lightResistance: { min: 8e3, max: 20e3 },
      gamma: { typ: 0.7 },
      cellMaterial: { value: 'cds' },
    },
    tags: [],
    ...overrides,
  });
}

export function listOf(items: PartDto[], page = 1, pageSize = 50, total = items.length): PartListResponse {
  return { items, total, page, pageSize };
}

export function makeRevision(overrides: Partial<PartRevisionDto> = {}): PartRevisionDto {
  return {
    id: '9b0d0000-0000-4000-8000-000000000001',
    version: 3,
    actor: { id: USERS.editor.id, name: USERS.editor.name },
    source: 'ui',
    datasheet: null,
    changes: [{ field: 'description', before: 'Old words.', after: 'Low-noise dual op amp for preamps.' }],
    createdAt: at,
    ...overrides,
  };
}

/** The query string of every fetch to a path, as URLSearchParams. */
export function queriesTo(fetchMock: { mock: { calls: unknown[][] } }, path: string): URLSearchParams[] {
  return fetchMock.mock.calls
    .map(([input]) => new URL(String(input), 'http://localhost'))
    .filter((url) => url.pathname === path)
    .map((url) => url.searchParams);
}
