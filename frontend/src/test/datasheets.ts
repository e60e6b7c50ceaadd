import type { DatasheetDto, DatasheetExtraction, DatasheetListItem, ParameterProposal } from '@understudy/shared-types';
import { USERS } from './render-app';

let counter = 0;

export function datasheetId(n = ++counter): string {
  return `d5a70000-0000-4000-8000-${String(n).padStart(12, '0')}`;
}

const at = '2025-03-01T09:00:00.000Z';

/** An invented, already parsed datasheet without its extraction; override anything. */
export function makeDatasheetItem(overrides: Partial<DatasheetListItem> = {}): DatasheetListItem {
  return {
    id: overrides.id ?? datasheetId(),
    fileName: 'nw4580-datasheet.pdf',
    byteSize: 812_000,
    sha256: 'a'.repeat(64),
    pageCount: 4,
    status: 'ready',
    failureReason: null,
    part: null,
    uploadedBy: { id: USERS.editor.id, name: USERS.editor.name },
    proposalCount: 3,
    createdAt: at,
    updatedAt: at,
    parsedAt: at,
    appliedAt: null,
    ...overrides,
  };
}

export function makeProposal(overrides: Partial<ParameterProposal> = {}): ParameterProposal {
  return {
    id: 'p1',
    key: 'slewRate',
    value: { typ: 13e6, conditions: { supply: 30 } },
    statedUnit: 'V/us',
    origin: 'table',
    conditionsText: 'VS = ±15 V, TA = 25 °C',
    confidence: 0.92,
    source: { page: 2, snippet: 'Slew rate  SR  RL = 2 kΩ  13  V/us', boxes: [{ x: 61.2, y: 79.2, width: 244.8, height: 12 }] },
    decision: 'pending',
    editedValue: null,
    ...overrides,
  };
}

/** What the parser might read from an invented dual op amp's datasheet. */
export function makeExtraction(overrides: Partial<DatasheetExtraction> = {}): DatasheetExtraction {
  return {
    pageCount: 4,
    pages: Array.from({ length: 4 }, () => ({ width: 612, height: 792 })),
    identity: {
      family: { value: 'op-amp', confidence: 0.95, source: { page: 1, snippet: 'Dual operational amplifier', boxes: [] } },
      partNumber: { value: 'NW4580', confidence: 0.98, source: { page: 1, snippet: 'NW4580', boxes: [{ x: 40, y: 30, width: 120, height: 24 }] } },
      manufacturer: { value: 'Northwind Analog', confidence: 0.7, source: { page: 4, snippet: 'Northwind Analog Ltd.', boxes: [] } },
      package: { value: 'DIP-8', confidence: 0.6, source: null },
      pinMap: null,
    },
    proposals: [
      makeProposal(),
      makeProposal({
        id: 'p2',
        key: 'supplyVoltage',
        value: { max: 36 },
        statedUnit: 'V',
        origin: 'absolute-maximum',
        conditionsText: null,
        confidence: 0.85,
        source: { page: 1, snippet: 'Supply voltage  V+ – V−  36  V', boxes: [{ x: 50, y: 400, width: 300, height: 12 }] },
      }),
      makeProposal({
        id: 'p3',
        key: 'inputOffsetVoltage',
        value: { typ: 0.5e-3, max: 3e-3 },
        statedUnit: 'mV',
        conditionsText: 'TA = 25 °C',
        confidence: 0.4,
        source: { page: 3, snippet: 'Input offset voltage  VIO  0.5  3  mV', boxes: [] },
      }),
    ],
    warnings: [],
    ...overrides,
  };
}

export function makeDatasheet(overrides: Partial<DatasheetDto> = {}): DatasheetDto {
  const { extraction, ...rest } = overrides;
  return { ...makeDatasheetItem(rest), extraction: extraction === undefined ? makeExtraction() : extraction };
}
