import { parseQuantity, type FamilyKey, type ParameterValue } from '@understudy/shared-types';
import { boxesOf, type Line } from '../layout';
import { clampConfidence, type Candidate } from './candidate';
import { readCellMaterial, readColour, readInputStage, readLedPackage, readLens, readMounting, readShaft, readTaper } from './enums';
import { definitionOf } from './values';

/** A fact the words of a line state without a label: "Dual op amp", "rail-to-rail output", "5 mm red LED". */
interface FactRule {
  key: string;
  families: FamilyKey[];
  /** Read from the title block only, or from any line of the document. */
  where: 'title' | 'anywhere';
  read: (text: string, context: string) => ParameterValue | null;
  confidence: number;
}

const COUNT_WORDS: Record<string, number> = { single: 1, one: 1, mono: 1, dual: 2, two: 2, twin: 2, stereo: 2, quad: 4, four: 4, quadruple: 4 };

function count(re: RegExp, text: string): ParameterValue | null {
  const m = re.exec(text);
  if (!m) return null;
  const n = COUNT_WORDS[m[1]!.toLowerCase()] ?? Number(m[1]);
  return Number.isInteger(n) && n > 0 ? { typ: n } : null;
}

function mm(re: RegExp, text: string): ParameterValue | null {
  const m = re.exec(text);
  if (!m) return null;
  const r = parseQuantity(`${m[1]} mm`, { unit: 'm' });
  return r.ok ? { typ: r.value } : null;
}

const enumOf = (v: string | null): ParameterValue | null => (v === null ? null : { value: v });
const yes = (re: RegExp, not?: RegExp) => (text: string): ParameterValue | null =>
  re.test(text) && !(not?.test(text) ?? false) ? { value: true } : null;

const RULES: FactRule[] = [
  {
    key: 'channels',
    families: ['op-amp'],
    where: 'title',
    read: (t) => count(/\b(single|dual|quad|quadruple|two|four|1|2|4)[\s-]*(channel|op(erational)?[\s-]*amp|amplifier|low|high|precision|general|rail|jfet|cmos|bipolar|audio|ultra|wide|fast)/i, t) ?? count(/\b(single|dual|quad)\b/i, t),
    confidence: 0.85,
  },
  {
    key: 'channels',
    families: ['op-amp'],
    where: 'anywhere',
    read: (t) => count(/\b(one|two|four|single|dual|quad)\s+(independent\s+)?(amplifiers|op[\s-]*amps|channels)\s+(in|per)\s+(one|a|each|the)\s+package/i, t) ?? count(/\bcontains\s+(one|two|four)\s+(independent\s+)?(amplifiers|op[\s-]*amps)/i, t),
    confidence: 0.7,
  },
  { key: 'inputStage', families: ['op-amp'], where: 'title', read: (t) => enumOf(readInputStage(t)), confidence: 0.8 },
  {
    key: 'railToRailOutput',
    families: ['op-amp'],
    where: 'anywhere',
    read: yes(/\brail[\s-]*to[\s-]*rail\s+(input\s+and\s+)?output|\bRRIO\b|\brail[\s-]*to[\s-]*rail\s+(inputs?\s+and\s+)?outputs?/i, /\bnot\s+rail[\s-]*to[\s-]*rail|\bnon[\s-]*rail/i),
    confidence: 0.7,
  },
  {
    key: 'railToRailInput',
    families: ['op-amp'],
    where: 'anywhere',
    read: yes(/\brail[\s-]*to[\s-]*rail\s+inputs?\b|\bRRIO\b|\brail[\s-]*to[\s-]*rail\s+input\s+and\s+output/i, /\bnot\s+rail[\s-]*to[\s-]*rail|\bnon[\s-]*rail/i),
    confidence: 0.7,
  },
  {
    key: 'singleSupply',
    families: ['op-amp'],
    where: 'anywhere',
    read: yes(/\bsingle[\s-]*supply (operation|capable|operat)|\boperates? from a single supply|\bsingle[\s-]*supply\b/i, /\bnot\b.{0,20}single[\s-]*supply/i),
    confidence: 0.6,
  },
  { key: 'colour', families: ['led'], where: 'title', read: (t) => enumOf(readColour(t)), confidence: 0.85 },
  { key: 'lens', families: ['led'], where: 'title', read: (t) => enumOf(readLens(t)), confidence: 0.8 },
  { key: 'ledPackage', families: ['led'], where: 'title', read: (t) => enumOf(readLedPackage(t)), confidence: 0.8 },
  { key: 'cellMaterial', families: ['photoresistor', 'optocoupler'], where: 'title', read: (t) => enumOf(readCellMaterial(t)), confidence: 0.8 },
  { key: 'cellMaterial', families: ['photoresistor', 'optocoupler'], where: 'anywhere', read: (t) => enumOf(readCellMaterial(t)), confidence: 0.6 },
  { key: 'cellDiameter', families: ['photoresistor'], where: 'title', read: (t) => mm(/\b(\d+(?:\.\d+)?)\s*mm\b/i, t), confidence: 0.75 },
  {
    key: 'gangs',
    families: ['potentiometer'],
    where: 'title',
    read: (t) => count(/\b(single|dual|twin|two|four|quad|stereo|mono|1|2|4)[\s-]*(gang|section|track)s?\b/i, t) ?? count(/\b(stereo|mono)\b/i, t),
    confidence: 0.85,
  },
  { key: 'bodySize', families: ['potentiometer'], where: 'title', read: (t) => mm(/\b(\d+(?:\.\d+)?)\s*mm\b/i, t), confidence: 0.75 },
  {
    key: 'taper',
    families: ['potentiometer'],
    where: 'title',
    read: (t, c) => {
      const r = /\b(lin(ear)?|log(arithmic)?|audio|reverse[\s-]*log(arithmic)?|anti[\s-]*log)\b/i.exec(t);
      return r ? enumOf(readTaper(r[0], c)?.value ?? null) : null;
    },
    confidence: 0.8,
  },
  { key: 'shaftType', families: ['potentiometer'], where: 'title', read: (t) => enumOf(/shaft/i.test(t) ? readShaft(t) : null), confidence: 0.7 },
  { key: 'mounting', families: ['potentiometer'], where: 'title', read: (t) => enumOf(readMounting(t)), confidence: 0.6 },
  { key: 'centreDetent', families: ['potentiometer'], where: 'anywhere', read: yes(/\bcent(re|er)[\s-]*detent\b/i, /\bno\s+cent(re|er)[\s-]*detent|without\s+(a\s+)?cent(re|er)[\s-]*detent/i), confidence: 0.65 },
];

/** Facts the title block and running text state in words. */
export function candidatesFromFacts(family: FamilyKey, title: { text: string; lines: Line[] }, lines: Line[], context: string): Candidate[] {
  const out: Candidate[] = [];
  for (const rule of RULES) {
    if (!rule.families.includes(family)) continue;
    if (out.some((c) => c.key === rule.key)) continue;
    const def = definitionOf(family, rule.key);
    const pool = rule.where === 'title' ? title.lines : lines;
    for (const line of pool) {
      const value = rule.read(line.text, context);
      if (!value) continue;
      if (def.kind === 'number' && def.slots && !Object.keys(value).every((k) => (def.slots as readonly string[]).includes(k))) continue;
      out.push({
        key: rule.key,
        value,
        statedUnit: def.kind === 'number' && def.unit ? 'mm' : null,
        origin: 'prose',
        conditionsText: null,
        confidence: clampConfidence(rule.confidence),
        source: { page: line.page, snippet: line.text, boxes: boxesOf(line.items) },
        order: line.index,
        offNominal: false,
        rank: -1,
      });
      break;
    }
  }
  return out;
}
