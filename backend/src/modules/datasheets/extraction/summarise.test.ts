import type { DatasheetExtraction, ParameterProposal } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { summarise } from './summarise';

function proposal(id: string, key: string, value: ParameterProposal['value'], extra: Partial<ParameterProposal> = {}): ParameterProposal {
  return { id, key, value, statedUnit: null, origin: 'table', conditionsText: null, confidence: 0.9, source: { page: 1, snippet: '', boxes: [] }, decision: 'pending', editedValue: null, ...extra };
}

const extraction = (proposals: ParameterProposal[]): DatasheetExtraction => ({
  pageCount: 1,
  pages: [{ width: 595, height: 842 }],
  identity: {
    family: { value: 'led', confidence: 0.9, source: null },
    partNumber: { value: 'LB5-R40', confidence: 0.9, source: null },
    manufacturer: null,
    package: null,
    pinMap: null,
  },
  proposals,
  warnings: [],
});

describe('summarise', () => {
  it('names the canonical unit of numeric parameters only and drops conditions', () => {
    const s = summarise(
      extraction([
        proposal('p1', 'forwardVoltage', { typ: 2, max: 2.4, conditions: { current: 0.02 } }),
        proposal('p2', 'colour', { value: 'red' }),
        proposal('p3', 'viewingAngle', { typ: 30 }),
      ]),
    );
    expect(s).toEqual({
      family: 'led',
      partNumber: 'LB5-R40',
      manufacturer: null,
      parameters: { forwardVoltage: { typ: 2, max: 2.4, unit: 'V' }, colour: { value: 'red' }, viewingAngle: { typ: 30, unit: '°' } },
    });
  });

  it('leaves out rejected proposals and uses a reviewer edit', () => {
    const s = summarise(
      extraction([
        proposal('p1', 'forwardVoltage', { typ: 2 }, { decision: 'rejected' }),
        proposal('p2', 'luminousIntensity', { typ: 0.3 }, { decision: 'edited', editedValue: { typ: 0.35 } }),
      ]),
    );
    expect(s.parameters).toEqual({ luminousIntensity: { typ: 0.35, unit: 'cd' } });
  });
});
