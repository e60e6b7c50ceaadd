import { LINE_STATUSES, type BomLineDto, type BomSummary, type LineStatus, type MatchKind } from '@understudy/shared-types';

export type Tone = 'neutral' | 'accent' | 'ok' | 'warning' | 'danger' | 'ink';

/** Colour by how much the line needs someone: dark for "we do not know it", red for risk, copper for a question. */
export const LINE_STATUS_TONES: Record<LineStatus, Tone> = {
  unmatched: 'ink',
  confirm: 'accent',
  'at-risk': 'danger',
  attention: 'warning',
  ok: 'ok',
};

/** Worst first: the contract lists the statuses in that order. */
export function statusRank(status: LineStatus): number {
  return LINE_STATUSES.indexOf(status);
}

export function compareWorstFirst(a: BomLineDto, b: BomLineDto): number {
  return statusRank(a.status) - statusRank(b.status) || a.row - b.row;
}

export type RiskKey = 'obsolete' | 'nrnd' | 'lastTimeBuy' | 'nonCompliant' | 'cadmium' | 'unmatched' | 'toConfirm';

export interface RiskCategory {
  key: RiskKey & keyof BomSummary;
  /** As a count reads: "3 obsolete", "1 not in catalog". */
  label: string;
  tone: Tone;
  matches: (line: BomLineDto) => boolean;
}

/** The summary's counts, in the order a purchaser reads them, each also a filter on the lines. */
export const RISK_CATEGORIES: readonly RiskCategory[] = [
  { key: 'obsolete', label: 'obsolete', tone: 'danger', matches: (l) => l.match.part?.lifecycle === 'obsolete' },
  { key: 'nrnd', label: 'not recommended', tone: 'warning', matches: (l) => l.match.part?.lifecycle === 'nrnd' },
  { key: 'lastTimeBuy', label: 'last-time buy', tone: 'warning', matches: (l) => l.match.part?.lifecycle === 'last-time-buy' },
  { key: 'nonCompliant', label: 'not RoHS compliant', tone: 'danger', matches: (l) => l.match.part?.rohsStatus === 'non-compliant' },
  { key: 'cadmium', label: 'cadmium', tone: 'warning', matches: (l) => l.match.part?.cadmium === true },
  { key: 'unmatched', label: 'not in catalog', tone: 'ink', matches: (l) => l.status === 'unmatched' },
  { key: 'toConfirm', label: 'to confirm', tone: 'accent', matches: (l) => l.status === 'confirm' },
];

export function riskCategory(key: RiskKey): RiskCategory {
  return RISK_CATEGORIES.find((c) => c.key === key)!;
}

export function isRiskKey(value: string | null): value is RiskKey {
  return RISK_CATEGORIES.some((c) => c.key === value);
}

/** How a line found its part, in a few words. */
export function matchKindText(line: BomLineDto, confirmedByYou: boolean): string {
  const kind: MatchKind = line.match.kind;
  switch (kind) {
    case 'exact':
      return 'exact';
    case 'suffix':
      return line.match.detail ?? 'suffix set aside';
    case 'confirmed':
      return confirmedByYou ? 'confirmed by you' : 'confirmed by the owner';
    case 'candidates': {
      const n = line.match.candidates.length;
      return `${n} close ${n === 1 ? 'match' : 'matches'} to confirm`;
    }
    case 'unmatched':
      return 'nothing close in the catalog';
  }
}

export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n.toLocaleString()} ${n === 1 ? one : many}`;
}

/** Whether a line mentions the text: as written, its matched part, its designators or its replacement. */
export function lineMentions(line: BomLineDto, text: string): boolean {
  const needle = text.trim().toLowerCase();
  if (!needle) return true;
  const haystack = [
    line.partNumber,
    line.manufacturer ?? '',
    line.match.part?.partNumber ?? '',
    line.replacement?.part.partNumber ?? '',
    line.designators.join(' '),
    line.notes,
  ]
    .join('\n')
    .toLowerCase();
  return haystack.includes(needle);
}
