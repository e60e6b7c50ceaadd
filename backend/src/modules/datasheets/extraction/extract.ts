import { FAMILY_KEYS, FAMILY_LABELS, type DatasheetExtraction, type FamilyKey } from '@understudy/shared-types';
import { detectFamily, familyFromWords, readIdentity, titleText } from './identity';
import { buildLines, type Cell } from './layout';
import type { PdfText } from './pdf-text';
import { clampConfidence, type Candidate } from './recognise/candidate';
import { candidatesFromFacts } from './recognise/facts';
import { buildPassages, candidatesFromProse } from './recognise/prose';
import { candidatesFromTables } from './recognise/table-rows';
import { selectProposals } from './select';
import { analyseLayout, findTables, type DocumentLayout, type Table } from './tables';

function familyCandidates(family: FamilyKey, layout: DocumentLayout, tables: Table[], taken: Set<Cell>, documentText: string): Candidate[] {
  const fromTables = candidatesFromTables(tables, { family, documentText });
  const fromProse = candidatesFromProse(buildPassages(layout, taken), { family, documentText });
  const fromFacts = candidatesFromFacts(family, titleText(layout), layout.lines, documentText);
  const all = [...fromTables, ...fromProse, ...fromFacts];
  return [...all, ...derived(family, all)];
}

/** Figures one row implies for another parameter: an LED's test current is the current its forward voltage is given at. */
function derived(family: FamilyKey, candidates: Candidate[]): Candidate[] {
  if (family !== 'led' || candidates.some((c) => c.key === 'forwardCurrent' && c.value.typ !== undefined)) return [];
  const vf = candidates
    .filter((c) => c.key === 'forwardVoltage' && c.value.conditions?.current !== undefined && !c.offNominal)
    .sort((a, b) => b.confidence - a.confidence)[0];
  if (!vf) return [];
  return [
    {
      ...vf,
      key: 'forwardCurrent',
      value: { typ: vf.value.conditions!.current! },
      statedUnit: 'mA',
      conditionsText: null,
      confidence: clampConfidence(vf.confidence - 0.3),
      rank: -1,
    },
  ];
}

/** From positioned text to proposals and identity: the parser's pure part, no I/O. */
export function extractFromText(pdf: PdfText): DatasheetExtraction {
  const warnings: string[] = [];
  const layout = analyseLayout(buildLines(pdf.items), pdf.pages);
  const tables = findTables(layout);
  const taken = new Set<Cell>(tables.flatMap((t) => [...t.cells]));
  const documentText = layout.lines.map((l) => l.text).join('\n');

  let family = detectFamily(layout);
  let candidates: Candidate[] = family ? familyCandidates(family.value, layout, tables, taken, documentText) : [];
  if (!family) {
    // The title does not say what the part is: the family whose table labels find the most parameters, else the
    // family the text talks about most.
    let bestKeys = 1;
    for (const f of FAMILY_KEYS) {
      const found = familyCandidates(f, layout, tables, taken, documentText);
      const keys = new Set(found.filter((c) => c.origin !== 'prose').map((c) => c.key)).size;
      if (keys > bestKeys) {
        bestKeys = keys;
        family = { value: f, confidence: keys >= 4 ? 0.6 : 0.4, source: null };
        candidates = found;
      }
    }
    family ??= familyFromWords(layout);
    if (family && candidates.length === 0) candidates = familyCandidates(family.value, layout, tables, taken, documentText);
    warnings.push(
      family
        ? `The title does not say what kind of part this is; read as ${FAMILY_LABELS[family.value].toLowerCase()} from its contents.`
        : 'The document does not say what kind of part it describes, and no known parameters were found.',
    );
  }

  const identity = readIdentity(layout, tables, family);
  if (!identity.partNumber) warnings.push('No part number found in the title.');
  if (!identity.manufacturer) warnings.push('No manufacturer found.');
  if (!tables.some((t) => t.kind === 'characteristics')) warnings.push('No characteristics table found; values come from the text around them.');
  const proposals = family ? selectProposals(family.value, candidates) : [];
  if (family && proposals.length === 0) warnings.push('No parameter values recognised.');
  return { pageCount: pdf.pageCount, pages: pdf.pages, identity, proposals, warnings };
}
