import { parseQuantity, type ConditionKey, type ParameterConditions } from '@understudy/shared-types';
import { normaliseUnitSpelling } from './quantity';

const NUM = String.raw`[+\-]?\d+(?:\.\d+)?`;

function quantity(text: string, unit: string): number | undefined {
  const r = parseQuantity(text, { unit });
  return r.ok ? r.value : undefined;
}

/** The ambient temperature a condition names: "TA = 25 °C", "at 85°C", "Tamb = -40 °C". Ranges are no single temperature. */
function temperature(text: string): number | undefined {
  const named = new RegExp(String.raw`\bT\s*(?:A|J|amb|a|ambient)?\s*[=:]\s*(${NUM})\s*°\s*C(?!\s*(?:to|\.\.))`, 'i').exec(text);
  if (named) return Number(named[1]);
  const bare = new RegExp(String.raw`(?:^|[\s(,;@]|at\s)(${NUM})\s*°\s*C\b(?!\s*(?:to|\.\.))`, 'i').exec(text);
  if (bare && !new RegExp(String.raw`${NUM}\s*°?\s*C?\s*(?:to|\.\.)\s*${bare[1]!.replace(/[+]/g, '\\+')}\s*°\s*C`).test(text)) {
    return Number(bare[1]);
  }
  return undefined;
}

/** Total span of the supply a condition names: "VS = ±15 V" → 30 V, "VCC = 5 V" → 5 V, "VCC = 15 V, VEE = -15 V" → 30 V. */
function supply(text: string): number | undefined {
  const pos = /\b(?:V\s*(?:S|CC|DD|\+|SUPPLY)|\+V\s*S?|supply(?: voltage)?)\s*[=:]\s*(±\s*)?(\d+(?:\.\d+)?)\s*V\b/i.exec(text);
  const neg = /\b(?:V\s*(?:EE|SS|-)|-V\s*S?)\s*[=:]\s*([+\-]?\d+(?:\.\d+)?)\s*V\b/i.exec(text);
  if (pos) {
    const v = Number(pos[2]);
    if (pos[1]) return 2 * v;
    // The negative rail may be printed with or without its sign.
    if (neg) return v + Math.abs(Number(neg[1]));
    return v;
  }
  const dual = /(?:^|[\s(,;@]|at\s)±\s*(\d+(?:\.\d+)?)\s*V\b(?!\s*(?:to|\.\.))/.exec(text);
  if (dual && /supply|V\s*S|V\s*CC/i.test(text)) return 2 * Number(dual[1]);
  return undefined;
}

/** The current a condition names: "IF = 20 mA", "I_LED = 10 mA", "at 20 mA". */
function current(text: string): number | undefined {
  const named = /\bI\s*(?:F|LED|_F|_LED|D)?\s*[=:]\s*(\d+(?:\.\d+)?\s*[mµu]?A)\b/i.exec(text);
  if (named) return quantity(named[1]!, 'A');
  const bare = /(?:^|[\s(,;@]|at\s)(\d+(?:\.\d+)?\s*[mµu]A)\b(?!\s*(?:to|\.\.))/.exec(text);
  return bare ? quantity(bare[1]!, 'A') : undefined;
}

/** Time after a change: "10 s after removal of light", "after 5 s", "t = 10 s". */
function time(text: string): number | undefined {
  const after = /(\d+(?:\.\d+)?\s*(?:ms|s|sec|seconds?|min))\s+(?:after|following)/i.exec(text);
  const before = /\bafter\s+(\d+(?:\.\d+)?\s*(?:ms|s|sec|seconds?|min))\b/i.exec(text);
  const named = /\bt\s*=\s*(\d+(?:\.\d+)?\s*(?:ms|s|sec))\b/.exec(text);
  const hit = (after ?? before ?? named)?.[1];
  if (!hit) return undefined;
  const minutes = /min$/i.exec(hit.trim());
  if (minutes) return Number.parseFloat(hit) * 60;
  return quantity(hit, 's');
}

const READERS: Record<ConditionKey, (text: string) => number | undefined> = { supply, temperature, current, time };

/**
 * Reads the test conditions a definition allows from the printed text, in SI (temperature in °C). The most specific
 * text comes first: a row's own conditions override the table's.
 */
export function readConditions(texts: (string | null | undefined)[], allowed: readonly ConditionKey[] = []): ParameterConditions {
  const out: ParameterConditions = {};
  for (const key of allowed) {
    for (const raw of texts) {
      if (!raw) continue;
      const value = READERS[key](normaliseUnitSpelling(raw));
      if (value !== undefined && Number.isFinite(value)) {
        out[key] = value;
        break;
      }
    }
  }
  return out;
}

/** The temperature any of the texts names, allowed by the definition or not: used to prefer 25 °C figures. */
export function statedTemperature(texts: (string | null | undefined)[]): number | undefined {
  for (const raw of texts) {
    if (!raw) continue;
    const t = temperature(normaliseUnitSpelling(raw));
    if (t !== undefined) return t;
  }
  return undefined;
}

/** Whether the text names a temperature other than room temperature, or the full range. */
export function namesHotOrFullRange(text: string | null | undefined): boolean {
  if (!text) return false;
  const t = statedTemperature([text]);
  if (t !== undefined) return t < 15 || t > 30;
  return /full\s+(temperature\s+)?range|over\s+temperature|(elevated|high|low|extended)\s+temperatures?|\b(hot|cold)\b|T\s*(A|J)?\s*=\s*T\s*(MIN|MAX|LOW|HIGH)|T\s*MIN\s*(to|≤|<)|-?\d+\s*°?\s*C?\s*(to|\.\.)\s*\+?\d+\s*°\s*C/i.test(
    normaliseUnitSpelling(text),
  );
}
