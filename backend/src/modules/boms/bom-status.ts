// Each line's status and risk in plain words, the BOM's summary, and what changed between two checks. Pure:
// computed from the stored line and the catalog parts as they are now.
import {
  LINE_STATUS_LABELS,
  type ApprovedEquivalentRef,
  type BomLineDto,
  type BomPart,
  type BomSummary,
  type LineStatus,
  type PersonRef,
} from '@understudy/shared-types';
import type { BomLine } from '../../entities';

export interface StoredLine extends Omit<BomLine, 'bomId' | 'updatedAt' | 'replacementChosenById'> {
  replacementChosenBy: PersonRef | null;
}

export const MATCHED_KINDS = new Set(['exact', 'suffix', 'confirmed']);

export const CADMIUM_RISK = 'Cadmium cell: check the RoHS exemptions that apply and local rules';

/** What puts a matched part at risk, worst first. */
export function partRisks(part: BomPart): string[] {
  const risks: string[] = [];
  if (part.lifecycle === 'obsolete') risks.push('Obsolete');
  else if (part.lifecycle === 'last-time-buy') risks.push('Last-time buy');
  else if (part.lifecycle === 'nrnd') risks.push('Not recommended for new designs');
  if (part.cadmium) risks.push(CADMIUM_RISK);
  else if (part.rohsStatus === 'non-compliant') risks.push('Not RoHS compliant');
  return risks;
}

const plural = (n: number, one: string, many = `${one}s`) => `${n.toLocaleString('en')} ${n === 1 ? one : many}`;
export const partLabel = (p: Pick<BomPart, 'manufacturer' | 'partNumber'>) => `${p.manufacturer} ${p.partNumber}`;

export interface Catalog {
  parts: ReadonlyMap<string, BomPart>;
  /** Approved equivalents by part id (each seen from that part). */
  equivalents: ReadonlyMap<string, ApprovedEquivalentRef[]>;
}

/** The line as the page shows it, judged against the catalog as it is now. */
export function evaluateLine(line: StoredLine, catalog: Catalog): BomLineDto {
  const part = line.partId ? (catalog.parts.get(line.partId) ?? null) : null;
  const matched = MATCHED_KINDS.has(line.matchKind) && part !== null;
  const candidates = line.candidates.flatMap((c) => {
    const p = catalog.parts.get(c.partId);
    return p ? [{ part: p, similarity: Math.round(c.similarity * 1000) / 1000 }] : [];
  });
  const replacementPart = line.replacementPartId ? (catalog.parts.get(line.replacementPartId) ?? null) : null;
  const replacement =
    replacementPart && line.replacementChosenAt
      ? { part: replacementPart, note: line.replacementNote, chosenBy: line.replacementChosenBy, chosenAt: new Date(line.replacementChosenAt).toISOString() }
      : null;
  const approvedEquivalents = matched ? (catalog.equivalents.get(part.id) ?? []) : [];

  let status: LineStatus;
  let risk: string;
  // A matched kind whose part has since gone from the catalog reads as not in it.
  const kind = MATCHED_KINDS.has(line.matchKind) && !part ? 'unmatched' : line.matchKind;
  if (kind === 'unmatched') {
    status = 'unmatched';
    risk = !line.partNumber ? 'No part number' : MATCHED_KINDS.has(line.matchKind) ? 'The matched part is no longer in the catalog' : 'Not in the catalog';
  } else if (kind === 'candidates') {
    status = 'confirm';
    const first = candidates[0];
    risk =
      candidates.length > 1 && candidates.every((c) => c.similarity === 1)
        ? `${candidates.length} makers use this number: confirm which`
        : candidates.length === 1 && first
          ? `Not found exactly: confirm ${partLabel(first.part)}`
          : `Not found exactly: ${plural(candidates.length, 'close part number')} to confirm`;
  } else {
    const risks = partRisks(part!);
    if (risks.length) {
      status = 'at-risk';
      const tail = replacement
        ? `replaced by ${partLabel(replacement.part)}`
        : approvedEquivalents.length
          ? plural(approvedEquivalents.length, 'approved equivalent')
          : 'no approved equivalent yet';
      risk = `${risks.join('; ')} — ${tail}`;
    } else if (line.problems.length) {
      status = 'attention';
      risk = line.problems.length > 1 ? `${line.problems[0]!.message} (and ${plural(line.problems.length - 1, 'more problem')})` : line.problems[0]!.message;
    } else {
      status = 'ok';
      risk = replacement ? `Replaced by ${partLabel(replacement.part)}` : '';
    }
  }

  return {
    id: line.id,
    row: line.rowNumber,
    cells: line.cells,
    partNumber: line.partNumber,
    manufacturer: line.manufacturer,
    quantity: line.quantity,
    designators: line.designators,
    notes: line.notes,
    match: { kind: kind === 'unmatched' ? 'unmatched' : line.matchKind, part: matched ? part : null, detail: line.matchDetail, candidates },
    problems: line.problems,
    status,
    risk,
    approvedEquivalents,
    replacement,
  };
}

export type SummaryCounts = Omit<BomSummary, 'text'>;

const COUNTED = ['lines', 'ok', 'obsolete', 'nrnd', 'lastTimeBuy', 'nonCompliant', 'cadmium', 'unmatched', 'toConfirm', 'withProblems', 'replaced'] as const;

/** What one line adds to the summary's counts. */
function lineCounts(line: BomLineDto): SummaryCounts {
  const part = line.match.part;
  return {
    lines: 1,
    ok: line.status === 'ok' ? 1 : 0,
    obsolete: part?.lifecycle === 'obsolete' ? 1 : 0,
    lastTimeBuy: part?.lifecycle === 'last-time-buy' ? 1 : 0,
    nrnd: part?.lifecycle === 'nrnd' ? 1 : 0,
    cadmium: part?.cadmium ? 1 : 0,
    nonCompliant: part && !part.cadmium && part.rohsStatus === 'non-compliant' ? 1 : 0,
    unmatched: line.status === 'unmatched' ? 1 : 0,
    toConfirm: line.status === 'confirm' ? 1 : 0,
    withProblems: line.problems.length ? 1 : 0,
    replaced: line.replacement ? 1 : 0,
  };
}

/** "30 lines: 3 obsolete, 1 last-time buy, 2 cadmium, 1 not in catalog, 2 to confirm — 2 replacements chosen". */
export function summaryText(s: SummaryCounts): string {
  const counts: [number, string][] = [
    [s.obsolete, 'obsolete'],
    [s.lastTimeBuy, 'last-time buy'],
    [s.nrnd, 'not recommended for new designs'],
    [s.nonCompliant, 'not RoHS compliant'],
    [s.cadmium, 'cadmium'],
    [s.unmatched, 'not in catalog'],
    [s.toConfirm, 'to confirm'],
    [s.withProblems, 'with line problems'],
  ];
  const said = counts.filter(([n]) => n > 0).map(([n, words]) => `${n.toLocaleString('en')} ${words}`);
  const head = plural(s.lines, 'line');
  let text = said.length ? `${head}: ${said.join(', ')}` : s.lines ? `${head}, all OK` : head;
  if (s.replaced) text += ` — ${plural(s.replaced, 'replacement')} chosen`;
  return text;
}

export function summarise(lines: readonly BomLineDto[]): BomSummary {
  const s = Object.fromEntries(COUNTED.map((k) => [k, 0])) as SummaryCounts;
  for (const line of lines) {
    const c = lineCounts(line);
    for (const k of COUNTED) s[k] += c[k];
  }
  return { ...s, text: summaryText(s) };
}

/** The summary after one line changed from `before` to `after`, without judging every other line again. */
export function adjustSummary(summary: BomSummary, before: BomLineDto, after: BomLineDto): BomSummary {
  const b = lineCounts(before);
  const a = lineCounts(after);
  const s = Object.fromEntries(COUNTED.map((k) => [k, Math.max(0, summary[k] - b[k] + a[k])])) as SummaryCounts;
  return { ...s, text: summaryText(s) };
}

/** Changes worth words are at most this many; the rest are counted. */
const MAX_CHANGES = 200;

/** The lines whose status differs from the check before, in words: "Row 12, CV2207: OK → At risk (Obsolete …)". */
export function describeChanges(previous: readonly LineStatus[] | null, lines: readonly BomLineDto[]): string[] {
  if (!previous) return [];
  const changed = lines.flatMap((line, i) => {
    const before = previous[i];
    if (!before || before === line.status) return [];
    const why = line.risk ? ` (${line.risk})` : '';
    return [`Row ${line.row}, ${line.partNumber || 'no part number'}: ${LINE_STATUS_LABELS[before]} → ${LINE_STATUS_LABELS[line.status]}${why}`];
  });
  if (changed.length <= MAX_CHANGES) return changed;
  return [...changed.slice(0, MAX_CHANGES), `…and ${(changed.length - MAX_CHANGES).toLocaleString('en')} more lines changed`];
}
