import type {
  ApprovedEquivalentRef,
  BomCheckDto,
  BomDetailDto,
  BomDto,
  BomLineDto,
  BomPart,
  BomPreview,
  BomSummary,
} from '@understudy/shared-types';
import { USERS } from '../../../test/render-app';

// Invented makers and part numbers only.

const at = '2025-04-02T08:30:00.000Z';

export function uuid(prefix: string, n: number): string {
  return `${prefix}-0000-4000-8000-${String(n).padStart(12, '0')}`;
}

export const bomId = (n = 1) => uuid('b0b00000', n);
export const lineId = (n: number) => uuid('11e00000', n);
export const bomPartId = (n: number) => uuid('7a0c0000', 500 + n);

export function makeBomPart(overrides: Partial<BomPart> = {}): BomPart {
  return {
    id: bomPartId(1),
    family: 'op-amp',
    partNumber: 'NW4580',
    manufacturer: 'Northwind Analog',
    description: 'Low-noise dual op amp for preamps.',
    lifecycle: 'active',
    rohsStatus: 'compliant',
    cadmium: false,
    ...overrides,
  };
}

export function makeLine(overrides: Partial<BomLineDto> = {}): BomLineDto {
  const part = overrides.match?.part === undefined ? makeBomPart() : overrides.match.part;
  return {
    id: lineId(overrides.row ?? 2),
    row: 2,
    cells: ['NW4580', '2', 'U1, U2'],
    partNumber: 'NW4580',
    manufacturer: null,
    quantity: 2,
    designators: ['U1', 'U2'],
    notes: '',
    match: { kind: 'exact', part, detail: null, candidates: [] },
    problems: [],
    status: 'ok',
    risk: '',
    approvedEquivalents: [],
    replacement: null,
    ...overrides,
  };
}

export function makeSummary(overrides: Partial<BomSummary> = {}): BomSummary {
  return {
    lines: 0,
    ok: 0,
    obsolete: 0,
    nrnd: 0,
    lastTimeBuy: 0,
    nonCompliant: 0,
    cadmium: 0,
    unmatched: 0,
    toConfirm: 0,
    withProblems: 0,
    replaced: 0,
    text: '',
    ...overrides,
  };
}

export function makeCheck(overrides: Partial<BomCheckDto> = {}): BomCheckDto {
  return {
    id: uuid('c4ec0000', 1),
    checkedAt: at,
    checkedBy: { id: USERS.viewer.id, name: USERS.viewer.name },
    trigger: 'upload',
    summary: makeSummary(),
    changes: [],
    durationMs: 420,
    ...overrides,
  };
}

export function makeBom(overrides: Partial<BomDto> = {}): BomDto {
  return {
    id: bomId(),
    name: 'Tremolo rev B',
    owner: { id: USERS.viewer.id, name: USERS.viewer.name },
    sharedWith: [],
    fileName: 'tremolo-rev-b.csv',
    watched: false,
    lineCount: 0,
    summary: makeSummary(),
    lastCheckedAt: at,
    createdAt: at,
    updatedAt: at,
    ...overrides,
  };
}

export function makeBomDetail(lines: BomLineDto[], overrides: Partial<BomDetailDto> = {}): BomDetailDto {
  const summary = overrides.summary ?? makeSummary({ lines: lines.length, ok: lines.filter((l) => l.status === 'ok').length });
  return {
    ...makeBom({ lineCount: lines.length, summary }),
    encoding: 'utf-8',
    delimiter: ',',
    hasHeader: true,
    columns: ['Part number', 'Qty', 'Designators'],
    mapping: { partNumber: 0, quantity: 1, designators: 2 },
    lines,
    checks: [makeCheck({ summary })],
    ...overrides,
  };
}

export function makeEquivalentRef(part: BomPart, overrides: Partial<ApprovedEquivalentRef> = {}): ApprovedEquivalentRef {
  return { part, use: 'any', note: '', ...overrides };
}

export function makePreview(overrides: Partial<BomPreview> = {}): BomPreview {
  return {
    text: 'Ref\tMPN\tQty\nU1, U2\tNW4580\t2\nR1\tKR-10K\t1\n',
    encoding: 'text',
    delimiter: '\t',
    hasHeader: true,
    columns: [
      { index: 0, header: 'Ref', samples: ['U1, U2', 'R1'] },
      { index: 1, header: 'MPN', samples: ['NW4580', 'KR-10K'] },
      { index: 2, header: 'Qty', samples: ['2', '1'] },
    ],
    lineCount: 2,
    sampleRows: [
      ['U1, U2', 'NW4580', '2'],
      ['R1', 'KR-10K', '1'],
    ],
    mapping: { designators: 0, partNumber: 1, quantity: 2 },
    mappingSource: { designators: 'content', partNumber: 'headers', quantity: 'remembered' },
    ...overrides,
  };
}
