import type { FamilyKey, Lifecycle, PartCreateBody, RohsStatus } from '@understudy/shared-types';

// A synthetic catalog for benchmarks: plausible spreads, not real parts. The same (n, seed) always yields the same
// parts in the same order, so timings compare like with like across runs and machines.

/** mulberry32: a tiny 32-bit PRNG, plenty for test data and identical on every JS engine. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

class Rng {
  private readonly next: () => number;
  constructor(seed: number) {
    this.next = mulberry32(seed);
  }
  float(): number {
    return this.next();
  }
  uniform(lo: number, hi: number): number {
    return lo + (hi - lo) * this.next();
  }
  /** Evenly spread on a log scale: as many parts per decade at 1 kΩ as at 1 MΩ. */
  logUniform(lo: number, hi: number): number {
    return Math.exp(this.uniform(Math.log(lo), Math.log(hi)));
  }
  int(lo: number, hi: number): number {
    return lo + Math.floor(this.next() * (hi - lo + 1));
  }
  chance(p: number): boolean {
    return this.next() < p;
  }
  pick<T>(items: readonly T[]): T {
    return items[Math.floor(this.next() * items.length)]!;
  }
  weighted<T>(items: readonly (readonly [T, number])[]): T {
    const total = items.reduce((s, [, w]) => s + w, 0);
    let r = this.next() * total;
    for (const [item, w] of items) {
      r -= w;
      if (r < 0) return item;
    }
    return items[items.length - 1]![0];
  }
}

/** Round to significant digits, as a datasheet prints; monotone, so min ≤ typ ≤ max survives it. */
const sig = (x: number, digits = 3): number => Number(x.toPrecision(digits));

const STEMS = ['Fab', 'Linear', 'Optics', 'Devices', 'Controls', 'Photonics', 'Micro', 'Audio'] as const;
const MANUFACTURER_COUNT = 40;

/** The 40 invented manufacturer names the synthetic catalog uses, e.g. "Synthetic Fab 01", "Synthetic Optics 03". */
export function syntheticManufacturers(): string[] {
  return Array.from(
    { length: MANUFACTURER_COUNT },
    (_, i) => `Synthetic ${STEMS[i % STEMS.length]} ${String(i + 1).padStart(2, '0')}`,
  );
}

// Each manufacturer numbers its parts its own way; the per-manufacturer counter keeps them unique even after
// partNumberKey strips case and punctuation, because the counter sits in a fixed place between letters.
type NumberStyle = (prefix: string, code: string, serial: string, suffix: string) => string;
const NUMBER_STYLES: readonly NumberStyle[] = [
  (p, c, s, x) => `${p}${s}${x}`,
  (p, c, s, x) => `${p}-${c}${s}${x}`,
  (p, c, s, x) => `${p} ${s}${x}`,
  (p, c, s, x) => `${c}${s}-${p}${x}`,
  (p, c, s, x) => `${p}${c}-${s}${x}`,
];

const FAMILY_CODES: Record<FamilyKey, string> = {
  'op-amp': 'OA',
  photoresistor: 'PR',
  led: 'LD',
  potentiometer: 'PT',
  optocoupler: 'OC',
};

const FAMILY_MIX: readonly (readonly [FamilyKey, number])[] = [
  ['op-amp', 45],
  ['photoresistor', 15],
  ['led', 15],
  ['potentiometer', 20],
  ['optocoupler', 5],
];

const LIFECYCLE_MIX: readonly (readonly [Lifecycle, number])[] = [
  ['active', 85],
  ['nrnd', 7],
  ['last-time-buy', 4],
  ['obsolete', 4],
];

const CADMIUM_NOTE = 'Synthetic cadmium cell: check the RoHS exemptions that apply before specifying.';

interface Body {
  package: string;
  pinLayout: string | null;
  pinMap?: Record<string, string>;
  parameters: NonNullable<PartCreateBody['parameters']>;
  tags: string[];
  description: string;
  rohsStatus: RohsStatus;
  rohsNote?: string;
}

function opAmp(r: Rng): Body {
  const channels = r.weighted([
    [1, 30],
    [2, 50],
    [4, 20],
  ] as const);
  const stage = r.weighted([
    ['bipolar', 50],
    ['jfet', 25],
    ['cmos', 25],
  ] as const);
  let supply: [number, number];
  let single: boolean;
  if (stage === 'cmos') {
    supply = [r.pick([1.8, 2.2, 2.5, 2.7, 3]), r.pick([5.5, 6, 10, 12, 16, 36])];
    single = true;
  } else if (stage === 'jfet') {
    supply = [r.pick([7, 8, 10]), r.pick([30, 36, 44])];
    single = r.chance(0.2);
  } else {
    supply = [r.pick([3, 4, 5, 8, 10]), r.pick([30, 32, 36, 44])];
    single = supply[0] < 10 && r.chance(0.75);
  }
  const testSupply = Math.min(30, supply[1]);
  const at = { supply: testSupply, temperature: 25 };
  const slewTyp = r.logUniform(0.3e6, stage === 'cmos' ? 12e6 : 25e6);
  const gbw = Math.min(20e6, Math.max(0.5e6, slewTyp * r.logUniform(0.3, 3)));
  const noise = stage === 'bipolar' ? r.logUniform(3e-9, 20e-9) : r.logUniform(6e-9, 40e-9);
  const offset = r.logUniform(0.1e-3, 3e-3);
  const bias = stage === 'bipolar' ? r.logUniform(10e-9, 300e-9) : r.logUniform(1e-12, stage === 'jfet' ? 100e-12 : 10e-12);
  const iout = r.logUniform(10e-3, 50e-3);
  const iq = r.logUniform(0.2e-3, 2.5e-3);
  const rri = stage === 'cmos' && r.chance(0.5);
  const rro = stage === 'cmos' ? r.chance(0.8) : r.chance(0.2);
  const temperature = r.pick([
    [0, 70],
    [-40, 85],
    [-40, 125],
  ] as const);

  const pkg =
    channels === 4
      ? r.pick(['DIP-14', 'SOIC-14', 'TSSOP-14'])
      : channels === 2
        ? r.pick(['DIP-8', 'SOIC-8', 'MSOP-8'])
        : r.weighted([
            ['DIP-8', 35],
            ['SOIC-8', 35],
            ['MSOP-8', 10],
            ['TO-99', 5],
            ['SOT-23-5', 15],
          ] as const);
  const sot = pkg === 'SOT-23-5';
  const layout = sot ? null : channels === 1 ? 'dip8-single-opamp' : channels === 2 ? 'dip8-dual-opamp' : 'dip14-quad-opamp';

  const tags = [stage, channels === 1 ? 'single' : channels === 2 ? 'dual' : 'quad'];
  if (noise < 8e-9) tags.push('low-noise');
  if (slewTyp >= 10e6) tags.push('high-slew');
  if (rro) tags.push('rail-to-rail');
  if (iq < 0.5e-3) tags.push('low-power');
  if (single && supply[0] <= 9 && supply[1] >= 9) tags.push('9v');

  const kind = channels === 1 ? 'Single' : channels === 2 ? 'Dual' : 'Quad';
  return {
    package: pkg,
    pinLayout: layout,
    ...(sot ? { pinMap: { 1: 'OUT', 2: 'V\u2212', 3: '+IN', 4: '\u2212IN', 5: 'V+' } } : {}),
    rohsStatus: r.weighted([
      ['compliant', 90],
      ['unknown', 10],
    ] as const),
    tags,
    description: `${kind} ${stage === 'jfet' ? 'JFET' : stage === 'cmos' ? 'CMOS' : 'bipolar'} op amp, ${supply[0]} V to ${supply[1]} V. Synthetic benchmark part.`,
    parameters: {
      channels: { typ: channels },
      supplyVoltage: { min: supply[0], max: supply[1] },
      singleSupply: { value: single },
      slewRate: r.chance(0.4)
        ? { min: sig(slewTyp * r.uniform(0.6, 0.85)), typ: sig(slewTyp), conditions: at }
        : { typ: sig(slewTyp), conditions: at },
      gainBandwidth: { typ: sig(gbw), conditions: { supply: testSupply } },
      inputOffsetVoltage: { typ: sig(offset), max: sig(Math.min(7e-3, offset * r.uniform(2, 4))), conditions: at },
      inputBiasCurrent: { typ: sig(bias), max: sig(bias * r.uniform(2, 8)), conditions: at },
      inputNoiseDensity: { typ: sig(noise), conditions: { supply: testSupply } },
      outputCurrent: { typ: sig(iout), max: sig(iout * r.uniform(1.1, 1.5)), conditions: { supply: testSupply } },
      quiescentCurrent: { typ: sig(iq), max: sig(iq * r.uniform(1.2, 1.6)), conditions: { supply: testSupply } },
      railToRailInput: { value: rri },
      railToRailOutput: { value: rro },
      inputStage: { value: stage },
      operatingTemperature: { min: temperature[0], max: temperature[1] },
    },
  };
}

function cadmiumRohs(r: Rng): { rohsStatus: RohsStatus; rohsNote: string } {
  const rohsStatus = r.weighted([
    ['exempt', 50],
    ['non-compliant', 40],
    ['unknown', 10],
  ] as const);
  return { rohsStatus, rohsNote: CADMIUM_NOTE };
}

function photoresistor(r: Rng): Body {
  const material = r.weighted([
    ['cds', 60],
    ['cdse', 25],
    ['other', 15],
  ] as const);
  const lightMin = r.logUniform(2e3, 100e3);
  const darkMin = r.logUniform(0.5e6, 20e6);
  const rise = r.logUniform(material === 'other' ? 1e-3 : 8e-3, material === 'other' ? 5e-3 : 80e-3);
  const peak =
    material === 'cds' ? r.uniform(520e-9, 580e-9) : material === 'cdse' ? r.uniform(670e-9, 720e-9) : r.uniform(530e-9, 600e-9);
  const darkTime = r.pick([5, 10]);
  return {
    package: 'radial',
    pinLayout: 'photoresistor-2lead',
    ...(material === 'other' ? { rohsStatus: 'compliant' as const } : cadmiumRohs(r)),
    tags: [material === 'other' ? 'cadmium-free' : material, 'ldr', ...(r.chance(0.3) ? ['tremolo'] : [])],
    description: `${material === 'other' ? 'Cadmium-free' : material === 'cds' ? 'CdS' : 'CdSe'} photoresistor. Synthetic benchmark part.`,
    parameters: {
      darkResistance: r.chance(0.6)
        ? { min: sig(darkMin), typ: sig(darkMin * r.uniform(1.5, 3)), conditions: { time: darkTime } }
        : { min: sig(darkMin), conditions: { time: darkTime } },
      lightResistance: { min: sig(lightMin), max: sig(lightMin * r.uniform(2, 3)), conditions: { temperature: 25 } },
      gamma: { typ: sig(r.uniform(0.5, 0.9), 2) },
      peakWavelength: { typ: sig(peak) },
      riseTime: { typ: sig(rise) },
      decayTime: { typ: sig(rise * r.uniform(1.5, 5)) },
      maxVoltage: { max: material === 'other' ? r.pick([20, 50]) : r.pick([100, 150, 200, 250]) },
      powerDissipation: { max: r.pick([0.05, 0.09, 0.1, 0.15, 0.2]) },
      cellMaterial: { value: material },
      cellDiameter: { typ: r.pick([3, 4, 5, 7, 11, 12]) * 1e-3 },
    },
  };
}

const LED_COLOURS = [
  { colour: 'red', peak: [620e-9, 640e-9], vf: 2.0, weight: 25 },
  { colour: 'orange', peak: [600e-9, 612e-9], vf: 2.0, weight: 6 },
  { colour: 'amber', peak: [588e-9, 595e-9], vf: 2.0, weight: 6 },
  { colour: 'yellow', peak: [583e-9, 592e-9], vf: 2.0, weight: 10 },
  { colour: 'green', peak: [520e-9, 572e-9], vf: 2.6, weight: 20 },
  { colour: 'blue', peak: [460e-9, 475e-9], vf: 3.1, weight: 12 },
  { colour: 'white', peak: undefined, vf: 3.1, weight: 12 },
  { colour: 'infrared', peak: [850e-9, 940e-9], vf: 1.3, weight: 5 },
  { colour: 'ultraviolet', peak: [385e-9, 405e-9], vf: 3.3, weight: 4 },
] as const;

function led(r: Rng): Body {
  const c = r.weighted(LED_COLOURS.map((x) => [x, x.weight] as const));
  const size = r.weighted([
    ['5mm', 35],
    ['3mm', 25],
    ['0603', 15],
    ['0805', 15],
    ['1206', 10],
  ] as const);
  const smd = size !== '3mm' && size !== '5mm';
  const at = { current: 20e-3 };
  const vf = c.vf + r.uniform(0, 0.3);
  const visible = c.colour !== 'infrared' && c.colour !== 'ultraviolet';
  const intensity = smd ? r.logUniform(0.02, 0.5) : r.logUniform(0.05, 12);
  const parameters: Body['parameters'] = {
    colour: { value: c.colour },
    forwardVoltage: { typ: sig(vf, 2), max: sig(vf + r.uniform(0.3, 0.7), 2), conditions: at },
    forwardCurrent: { typ: 20e-3, max: r.pick([25e-3, 30e-3, 50e-3]) },
    viewingAngle: { typ: smd ? r.pick([110, 120, 140]) : r.pick([15, 20, 30, 40, 60]) },
    ledPackage: { value: size },
    lens: { value: r.pick(['clear', 'diffused', 'tinted']) },
  };
  if (c.peak) parameters.peakWavelength = { typ: sig(r.uniform(c.peak[0], c.peak[1])), conditions: at };
  if (visible) parameters.luminousIntensity = { typ: sig(intensity), conditions: at };
  return {
    package: size === '3mm' ? 'led-3mm' : size === '5mm' ? 'led-5mm' : size,
    pinLayout: 'led-2lead',
    rohsStatus: 'compliant',
    tags: [c.colour, smd ? 'smd' : 'through-hole', ...(r.chance(0.3) ? ['indicator'] : [])],
    description: `${c.colour[0]!.toUpperCase()}${c.colour.slice(1)} LED, ${size === '3mm' || size === '5mm' ? size.replace('mm', ' mm') : size}. Synthetic benchmark part.`,
    parameters,
  };
}

const POT_VALUES = [1e3, 2.2e3, 4.7e3, 5e3, 10e3, 20e3, 22e3, 25e3, 47e3, 50e3, 100e3, 220e3, 250e3, 470e3, 500e3, 1e6];

function potentiometer(r: Rng): Body {
  const body = r.weighted([
    [9, 30],
    [16, 50],
    [24, 20],
  ] as const);
  const taper = r.weighted([
    ['log', 45],
    ['linear', 45],
    ['reverse-log', 10],
  ] as const);
  const gangs = r.chance(0.15) ? 2 : 1;
  const power = body === 9 ? 0.05 : body === 16 ? (taper === 'linear' ? 0.125 : 0.0625) : taper === 'linear' ? 0.5 : 0.25;
  const resistance = r.pick(POT_VALUES);
  const mounting =
    body === 24 ? r.pick(['solder-lug', 'panel']) : r.pick(['pcb-vertical', 'pcb-vertical', 'pcb-right-angle', 'solder-lug']);
  return {
    package: `pot-${body}mm`,
    pinLayout: gangs === 2 ? 'pot-dual-6lug' : 'pot-3lug',
    rohsStatus: 'compliant',
    tags: [taper, ...(gangs === 2 ? ['ganged'] : []), r.pick(['volume', 'tone', 'rate', 'depth', 'blend', 'trim'])],
    description: `${body} mm ${taper === 'log' ? 'audio-taper' : taper === 'linear' ? 'linear' : 'reverse-log'} potentiometer${gangs === 2 ? ', dual gang' : ''}. Synthetic benchmark part.`,
    parameters: {
      resistance: { typ: resistance },
      taper: { value: taper },
      tolerance: { typ: r.pick([10, 20, 20]) },
      powerRating: { max: power },
      gangs: { typ: gangs },
      bodySize: { typ: body * 1e-3 },
      shaftType: { value: r.pick(['knurled', 'd-flat', 'smooth', 'slotted']) },
      shaftLength: { typ: r.pick([15, 18, 20, 25]) * 1e-3 },
      mounting: { value: mounting },
      centreDetent: { value: r.chance(0.1) },
    },
  };
}

function optocoupler(r: Rng): Body {
  const material = r.weighted([
    ['cds', 60],
    ['cdse', 30],
    ['other', 10],
  ] as const);
  const on = r.logUniform(200, 20e3);
  const onCurrent = r.pick([1e-3, 5e-3, 10e-3, 20e-3]);
  const vf = r.uniform(1.6, 2.0);
  return {
    package: 'opto-4lead',
    pinLayout: 'optocoupler-4lead',
    ...(material === 'other' ? { rohsStatus: 'compliant' as const } : cadmiumRohs(r)),
    tags: ['optical', material === 'other' ? 'cadmium-free' : material, r.pick(['tremolo', 'compressor', 'vibe'])],
    description: `Resistive optocoupler with a ${material === 'other' ? 'cadmium-free' : material === 'cds' ? 'CdS' : 'CdSe'} cell. Synthetic benchmark part.`,
    parameters: {
      onResistance: { typ: sig(on), max: sig(on * r.uniform(1.5, 2)), conditions: { current: onCurrent } },
      offResistance: { min: sig(material === 'other' ? r.logUniform(0.5e6, 5e6) : r.logUniform(5e6, 400e6)), conditions: { time: r.pick([1, 5, 10]) } },
      ledForwardVoltage: { typ: sig(vf, 2), max: sig(vf + r.uniform(0.3, 0.5), 2), conditions: { current: 20e-3 } },
      ledMaxCurrent: { max: r.pick([25e-3, 30e-3, 40e-3]) },
      turnOnTime: { typ: sig(r.logUniform(1e-3, 10e-3)), conditions: { current: onCurrent } },
      turnOffTime: { typ: sig(material === 'other' ? r.logUniform(1e-3, 5e-3) : r.logUniform(10e-3, 1.5)) },
      cellMaterial: { value: material },
    },
  };
}

const BUILDERS: Record<FamilyKey, (r: Rng) => Body> = {
  'op-amp': opAmp,
  photoresistor,
  led,
  potentiometer,
  optocoupler,
};

/**
 * `n` synthetic parts, deterministic for a given seed: about 45% op amps, 15% photoresistors, 15% LEDs, 20% pots
 * and 5% optocouplers from 40 invented manufacturers, mostly active. Lazy, so 100,000 parts never sit in memory at once.
 */
export function* generateSyntheticParts(n = 100_000, seed = 1): Generator<PartCreateBody> {
  const r = new Rng(seed);
  const manufacturers = syntheticManufacturers();
  // Prefix and numbering style are fixed per manufacturer (by index, not by seed) so names read consistently.
  const prefixes = manufacturers.map((name, i) => `${name.split(' ')[1]!.slice(0, 2).toUpperCase()}${String(i + 1).padStart(2, '0')}`);
  const serials = new Array<number>(manufacturers.length).fill(0);

  for (let i = 0; i < n; i++) {
    const family = r.weighted(FAMILY_MIX);
    const m = r.int(0, manufacturers.length - 1);
    const serial = ++serials[m]!;
    const style = NUMBER_STYLES[m % NUMBER_STYLES.length]!;
    const suffix = r.chance(0.3) ? r.pick(['A', 'B', 'C', 'D', 'N', 'S']) : '';
    const body = BUILDERS[family](r);
    yield {
      family,
      manufacturer: manufacturers[m]!,
      partNumber: style(prefixes[m]!, FAMILY_CODES[family], String(serial).padStart(5, '0'), suffix),
      lifecycle: r.weighted(LIFECYCLE_MIX),
      ...body,
    };
  }
}
