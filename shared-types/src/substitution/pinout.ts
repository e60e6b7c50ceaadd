import type { CandidatePart, PinoutClass, PinoutComparison } from '../alternates';
import { normalizePinFunction } from '../families';
import { joinList, pinMapOf } from './values';

// Pin labels repeat across a catalog ("OUT A", "V+"), and normalising one runs a dozen regular expressions.
const labelCache = new Map<string, string>();
function norm(label: string): string {
  let v = labelCache.get(label);
  if (v === undefined) {
    v = normalizePinFunction(label);
    if (labelCache.size > 10_000) labelCache.clear();
    labelCache.set(label, v);
  }
  return v;
}

/** One side of a comparison, normalised once. */
export interface PinSide {
  raw: Readonly<Record<string, string>>;
  fns: Record<string, string>;
  /** Pin numbers in numeric order. */
  pins: string[];
  /** Functions with channel letters renamed in order of first appearance, so A/B swapped whole compare equal. */
  channelless: string;
  /** The sorted multiset of functions. */
  multiset: string;
}

const CHANNEL = / ([A-D])$/;

function sideOf(raw: Readonly<Record<string, string>>): PinSide {
  const pins = Object.keys(raw).sort((a, b) => Number(a) - Number(b));
  const fns: Record<string, string> = {};
  for (const p of pins) fns[p] = norm(raw[p]!);
  const letters = new Map<string, string>();
  const canon = pins.map((p) => {
    const f = fns[p]!;
    const m = CHANNEL.exec(f);
    if (!m) return `${p}=${f}`;
    let renamed = letters.get(m[1]!);
    if (renamed === undefined) {
      renamed = String(letters.size + 1);
      letters.set(m[1]!, renamed);
    }
    return `${p}=${f.slice(0, -1)}#${renamed}`;
  });
  return { raw, fns, pins, channelless: canon.join('|'), multiset: pins.map((p) => fns[p]).sort().join('|') };
}

export function pinSide(part: CandidatePart): PinSide | undefined {
  const raw = pinMapOf(part);
  return raw ? sideOf(raw) : undefined;
}

/** What the pin functions alone say, before any package change is added. */
interface PinVerdict {
  class: PinoutClass;
  differingPins: readonly string[];
  summary: string;
  /** Drop-in only because whole channels are lettered the other way. */
  relabelled: boolean;
}

function verdictFor(side: PinSide, raw: Readonly<Record<string, string>>): PinVerdict {
  const other = sideOf(raw);
  const numbers = new Set([...side.pins, ...other.pins]);
  const differing = [...numbers].filter((p) => side.fns[p] !== other.fns[p]).sort((a, b) => Number(a) - Number(b));
  if (differing.length === 0) return { class: 'drop-in', differingPins: [], summary: 'Same functions on the same pins.', relabelled: false };
  if (other.channelless === side.channelless) {
    return {
      class: 'drop-in',
      differingPins: [],
      summary: `Each pin does the same job; only the channels are lettered the other way (pins ${joinList(differing)}), so it is a drop-in.`,
      relabelled: true,
    };
  }
  if (other.pins.length === side.pins.length && other.multiset === side.multiset) {
    return {
      class: 'adapter',
      differingPins: differing,
      summary: `The same functions on other pins (${joinList(differing)}): it needs an adapter or a board change.`,
      relabelled: false,
    };
  }
  if (other.pins.length !== side.pins.length) {
    return {
      class: 'incompatible',
      differingPins: differing,
      summary: `Not pin compatible: ${other.pins.length} pins here, ${side.pins.length} on the original.`,
      relabelled: false,
    };
  }
  const examples = differing.slice(0, 3).map((p) => `pin ${p} is ${other.raw[p] ?? 'absent'} here, ${side.raw[p] ?? 'absent'} on the original`);
  const more = differing.length > 3 ? `, and ${differing.length - 3} more` : '';
  return { class: 'incompatible', differingPins: differing, summary: `Not pin compatible: ${examples.join('; ')}${more}.`, relabelled: false };
}

/**
 * Comparisons against one original. Candidates share layouts and packages, so verdicts are memoised by shared layout
 * and by content, and whole results by verdict and package; the results are frozen because items share them.
 */
export interface PinComparer {
  compare(candidate: CandidatePart): PinoutComparison;
}

export function pinComparer(original: CandidatePart, side: PinSide | undefined = pinSide(original)): PinComparer {
  const from = original.package.trim();
  const byLayout = new Map<string, PinVerdict>();
  const byContent = new Map<string, PinVerdict>();
  const results = new Map<PinVerdict, Map<string, PinoutComparison>>();
  const SAME: PinVerdict = { class: 'drop-in', differingPins: [], summary: 'Same functions on the same pins.', relabelled: false };
  const noOriginal: PinVerdict = { class: 'unknown', differingPins: [], summary: "The original's pin map is not recorded, so the pinout is not compared.", relabelled: false };
  const noCandidate: PinVerdict = { class: 'unknown', differingPins: [], summary: "This part's pin map is not recorded, so the pinout cannot be compared.", relabelled: false };

  function verdict(candidate: CandidatePart): PinVerdict {
    if (!side) return noOriginal;
    const raw = pinMapOf(candidate);
    if (!raw) return noCandidate;
    // A part that records no map of its own uses its shared layout's: one verdict per layout.
    const layout = raw === candidate.pinMap ? undefined : candidate.pinLayout!;
    if (layout !== undefined) {
      const known = byLayout.get(layout);
      if (known) return known;
    }
    // The common case, the original's own functions on the same pins, without building anything.
    let same = true;
    for (let i = 0; i < side.pins.length; i++) {
      const pin = side.pins[i]!;
      const label = raw[pin];
      if (label === side.raw[pin]) continue;
      if (label === undefined || side.fns[pin] !== norm(label)) {
        same = false;
        break;
      }
    }
    let v: PinVerdict;
    if (same && Object.keys(raw).length === side.pins.length) v = SAME;
    else {
      let key = '';
      for (const pin in raw) key += `${pin}\u0000${raw[pin]}\u0001`;
      v = byContent.get(key) ?? verdictFor(side, raw);
      if (byContent.size < 1000) byContent.set(key, v);
    }
    if (layout !== undefined) byLayout.set(layout, v);
    return v;
  }

  function result(v: PinVerdict, to: string): PinoutComparison {
    let perPackage = results.get(v);
    if (!perPackage) results.set(v, (perPackage = new Map()));
    const hit = perPackage.get(to);
    if (hit) return hit;
    const changed = from !== '' && to !== '' && from.toUpperCase() !== to.toUpperCase();
    const packageChange = changed ? Object.freeze({ from, to }) : null;
    let summary = v.summary;
    if (changed && v.class === 'drop-in') {
      summary = v.relabelled
        ? `${summary} The package changes from ${from} to ${to}, so the board needs that footprint or an adapter.`
        : `Same functions on the same pins, so a drop-in electrically; the package changes from ${from} to ${to}, so the board needs that footprint or an adapter.`;
    } else if (changed) {
      summary = `${summary} The package also changes from ${from} to ${to}.`;
    }
    const r = Object.freeze({ class: v.class, packageChange, differingPins: Object.freeze([...v.differingPins]) as string[], summary });
    if (perPackage.size < 100) perPackage.set(to, r);
    return r;
  }

  return {
    compare: (candidate) => result(verdict(candidate), candidate.package === from ? from : candidate.package.trim()),
  };
}

/**
 * Pin by pin, from the pin maps (or the shared layout a part names): identical functions → drop-in, the same
 * functions elsewhere → adapter, otherwise incompatible; no map → unknown. A whole channel lettered the other way
 * (OUT B on pin 1 with its own inputs on 2 and 3) still puts the same job on each pin, so it counts as drop-in.
 * A package change (DIP-8 → SOIC-8) is reported apart from pin functions.
 */
export function comparePinouts(original: CandidatePart, candidate: CandidatePart): PinoutComparison {
  return pinComparer(original).compare(candidate);
}
