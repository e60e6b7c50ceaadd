import { PIN_LAYOUTS } from '@understudy/shared-types';
import { makersFor } from './invented-names';
import { numberText } from './quantity-text';
import { lowerFirst, measuredRow, withArticle, type AlternateTable, type CharRow, type SheetContent } from './sheet-model';
import type { Variations } from './variations';

/** An invented op amp's numbers in SI units; the sheet prints a subset of them. */
export interface OpAmpPart {
  partNumber: string;
  manufacturer: string;
  channels: 1 | 2 | 4;
  stage: 'bipolar' | 'jfet' | 'cmos';
  /** Total span between the rails. */
  supply: readonly [min: number, max: number];
  /** The span can be printed as ±X without awkward digits. */
  dualSupply: boolean;
  slew: readonly [min: number, typ: number];
  gbw: number;
  noise: number;
  offset: readonly [typ: number, max: number];
  bias: readonly [typ: number, max: number];
  outputCurrent: readonly [typ: number, max: number];
  /** Per channel. */
  quiescent: readonly [typ: number, max: number];
  packages: readonly string[];
  lowNoise?: boolean;
}

const r2 = (x: number) => Number(x.toPrecision(2));
const MINUS = '−';

const SUPPLIES: { span: [number, number]; dual: boolean }[] = [
  { span: [3, 32], dual: true },
  { span: [4, 36], dual: true },
  { span: [5, 36], dual: true },
  { span: [10, 36], dual: true },
  { span: [6, 44], dual: true },
  { span: [4.5, 36], dual: true },
  { span: [2.7, 16], dual: false },
  { span: [3, 36], dual: true },
  { span: [10, 12], dual: true },
  { span: [1.8, 5.5], dual: false },
  { span: [2.7, 5.5], dual: false },
];

export function inventOpAmp(v: Variations, partNumber?: string, manufacturer?: string): OpAmpPart {
  const { rng } = v;
  const channels = v.choose('channels', [1, 2, 2, 4] as const);
  const stage = v.choose('input-stage', ['bipolar', 'jfet', 'cmos'] as const);
  const supplies = stage === 'cmos' ? SUPPLIES.filter((s) => s.span[1] <= 16) : SUPPLIES.filter((s) => s.span[1] >= 30);
  const { span, dual } = rng.pick(supplies);
  const slewTyp = rng.pick(stage === 'bipolar' ? [0.5, 2, 3.5, 5, 6, 7, 9, 13, 20] : [3, 7, 9, 10, 13, 15, 20, 25]);
  const noise = rng.pick(stage === 'bipolar' ? [3.3, 4.5, 5, 6, 8, 10] : stage === 'jfet' ? [12, 16, 18, 25] : [7, 9, 15, 22, 38]) * 1e-9;
  const offsetTyp = rng.pick(stage === 'cmos' ? [0.05, 0.25, 0.5, 1] : [0.3, 0.5, 1, 2]) * 1e-3;
  const biasTyp = stage === 'bipolar' ? rng.pick([45, 80, 100, 200]) * 1e-9 : rng.pick([1, 2, 10, 30, 65]) * 1e-12;
  const outTyp = rng.pick([20, 25, 30, 35, 40, 45]) * 1e-3;
  const qTyp = rng.pick([0.35, 0.6, 1.1, 1.5, 2.2, 2.5, 3]) * 1e-3;
  const maker = rng.pick(makersFor('op-amp'));
  const packages = channels === 4 ? ['DIP-14', 'SOIC-14', 'TSSOP-14'] : channels === 2 ? ['DIP-8', 'SOIC-8', 'MSOP-8'] : ['DIP-8', 'SOIC-8'];
  return {
    partNumber: partNumber ?? maker.partNumber(rng, { channels }),
    manufacturer: manufacturer ?? maker.name,
    channels,
    stage,
    supply: span,
    dualSupply: dual,
    slew: [r2(slewTyp * rng.pick([0.6, 0.7, 0.75])) * 1e6, slewTyp * 1e6],
    gbw: rng.pick(slewTyp < 1 ? [0.7, 1] : [3, 4.5, 5, 7, 8, 10, 12, 15, 18]) * 1e6,
    noise,
    offset: [offsetTyp, r2(offsetTyp * rng.pick([3, 5, 6])) ],
    bias: [biasTyp, r2(biasTyp * rng.pick([2.5, 5, 10]))],
    outputCurrent: [outTyp, r2(outTyp * rng.pick([1.25, 1.5]))],
    quiescent: [qTyp, r2(qTyp * rng.pick([1.25, 1.4, 1.6]))],
    packages: rng.shuffle(packages).slice(0, rng.int(1, packages.length)),
    lowNoise: noise <= 6e-9,
  };
}

function supplyRows(part: OpAmpPart, form: 'dual' | 'single' | 'both', rng: Variations['rng']): CharRow[] {
  const [lo, hi] = part.supply;
  const dual = (): CharRow => {
    const a = numberText(lo / 2);
    const b = numberText(hi / 2);
    return {
      parameter: form === 'both' ? 'Supply voltage, split supplies' : 'Supply voltage range',
      symbol: 'VS',
      unit: 'V',
      values: { min: `±${a}`, max: `±${b}` },
      truth: { key: 'supplyVoltage', si: { min: 2 * Number(a), max: 2 * Number(b) } },
      listText: `±${a} V to ±${b} V`,
      sentence: rng.pick([
        `The ${part.partNumber} operates from split supplies of ±${a} V to ±${b} V.`,
        `It is specified for dual supplies from ±${a} V to ±${b} V.`,
      ]),
    };
  };
  const single = (): CharRow => {
    const a = numberText(lo);
    const b = numberText(hi);
    return {
      parameter: form === 'both' ? 'Supply voltage, single supply' : rng.pick(['Supply voltage range', 'Operating supply voltage']),
      symbol: 'VS',
      unit: 'V',
      values: { min: a, max: b },
      truth: { key: 'supplyVoltage', si: { min: Number(a), max: Number(b) } },
      listText: rng.pick([`${a} to ${b} V`, `${a} V – ${b} V`, `${a} V to ${b} V`]),
      sentence: rng.pick([
        `It runs from a single supply of ${a} to ${b} V.`,
        `The ${part.partNumber} works from any single supply between ${a} V and ${b} V.`,
        `Supply range: ${a} V – ${b} V.`,
      ]),
    };
  };
  if (form === 'dual') return [dual()];
  if (form === 'single') return [single()];
  return [dual(), single()];
}

interface Conditions {
  /** Total span of the table's supply. */
  span: number;
  label: string;
}

function supplyLabel(span: number, dual: boolean): string {
  return dual ? `VS = ±${numberText(span / 2)} V` : `VS = ${numberText(span)} V`;
}

/** The test supplies: the primary table is always the larger span, the alternate a low one. */
function testSupplies(part: OpAmpPart): { primary: Conditions; alternate: Conditions } {
  const [lo, hi] = part.supply;
  const primary = part.dualSupply ? Math.min(30, hi) : hi >= 16 ? 15 : 5;
  const low = part.dualSupply ? Math.max(lo, 10) : hi >= 16 ? 5 : 3;
  const alternate = low === primary ? lo : low;
  return {
    primary: { span: primary, label: supplyLabel(primary, part.dualSupply) },
    alternate: { span: alternate, label: supplyLabel(alternate, part.dualSupply) },
  };
}

/** The same row under other conditions, with numbers moved the way real parts move; never truth. */
function scaled(row: CharRow, factor: number): CharRow {
  const values: CharRow['values'] = {};
  for (const [slot, text] of Object.entries(row.values) as [keyof CharRow['values'], string][]) {
    const plain = Number(text.replace('±', ''));
    let next = Number((plain * factor).toPrecision(2));
    if (next === plain) next = Number((plain * factor * factor).toPrecision(3));
    values[slot] = `${text.startsWith('±') ? '±' : ''}${numberText(next)}`;
  }
  return { parameter: row.parameter, symbol: row.symbol, conditions: row.conditions, conditionsMatter: row.conditionsMatter, unit: row.unit, values };
}

export function buildOpAmpSheet(part: OpAmpPart, v: Variations): SheetContent {
  const { rng } = v;
  const pn = part.partNumber;
  const count = part.channels === 1 ? 'Single' : part.channels === 2 ? 'Dual' : 'Quad';
  const stageWord = part.stage === 'bipolar' ? 'bipolar' : part.stage === 'jfet' ? 'JFET-input' : 'CMOS';
  const stageName = part.stage === 'bipolar' ? 'bipolar' : part.stage === 'jfet' ? 'JFET' : 'CMOS';
  const flavour = part.lowNoise ? 'low-noise' : part.slew[1] >= 13e6 ? 'high-slew-rate' : part.stage === 'cmos' ? 'rail-to-rail output' : 'general-purpose';
  const description = `${count} ${flavour} ${stageWord} operational amplifier`;
  const sparse = v.flag('lone-values', 1, 2);
  const plusMinus = v.flag('plus-minus-values', 1, 4);
  const totalQuiescent = part.channels > 1 && v.flag('quiescent-total', 1, 3);
  const fullRange = v.flag('full-temperature-rows', 1, 2);
  const noiseAt10Hz = v.flag('noise-at-two-frequencies', 1, 2);
  const gbwMinDecoy = v.flag('slot-outside-definition', 1, 3);
  const supplyForm = part.dualSupply ? v.choose('supply-form', ['dual', 'single', 'both'] as const) : 'single';
  const { primary: at, alternate: alt } = testSupplies(part);

  const slewSlots = sparse && rng.chance(0.5) ? { typ: part.slew[1] } : { min: part.slew[0], typ: part.slew[1] };
  const offsetSlots = sparse && rng.chance(0.5) ? { max: part.offset[1] } : { typ: part.offset[0], max: part.offset[1] };
  const q = part.quiescent.map((x) => (totalQuiescent ? x * part.channels : x)) as [number, number];

  const rows = {
    offset: measuredRow({ parameter: 'Input offset voltage', symbol: 'VOS', conditions: rng.pick(['VCM = 0 V', 'RS = 50 Ω', '']), key: 'inputOffsetVoltage', dim: 'V', si: offsetSlots, prefixes: ['m', 'µ'], prefer: rng.pick(['m', 'µ']), phrase: 'the input offset voltage', plusMinus: plusMinus && rng.chance(0.5) }),
    offsetHot: measuredRow({ parameter: '', conditions: `TA = ${MINUS}40 °C to +85 °C`, conditionsMatter: true, dim: 'V', si: { max: r2(part.offset[1] * 1.6) }, prefixes: ['m', 'µ'], continuation: true }),
    drift: measuredRow({ parameter: 'Input offset voltage drift', symbol: 'ΔVOS/ΔT', dim: '', si: { typ: rng.pick([1, 2, 5, 10]) }, prefixes: [''] }),
    bias: measuredRow({ parameter: 'Input bias current', symbol: 'IB', key: 'inputBiasCurrent', dim: 'A', si: sparse && rng.chance(0.4) ? { max: part.bias[1] } : { typ: part.bias[0], max: part.bias[1] }, prefixes: ['n', 'p'], phrase: 'the input bias current' }),
    biasHot: measuredRow({ parameter: '', conditions: `TA = ${MINUS}40 °C to +85 °C`, conditionsMatter: true, dim: 'A', si: { max: r2(part.bias[1] * (part.stage === 'bipolar' ? 2 : 40)) }, prefixes: ['n', 'p'], continuation: true }),
    offsetCurrent: measuredRow({ parameter: 'Input offset current', symbol: 'IOS', dim: 'A', si: { typ: r2(part.bias[0] / 5), max: r2(part.bias[1] / 4) }, prefixes: ['n', 'p'] }),
    cmrr: measuredRow({ parameter: 'Common-mode rejection ratio', symbol: 'CMRR', conditions: 'VCM = ±10 V', dim: '', si: { min: 80, typ: rng.pick([90, 100, 110]) }, prefixes: [''] }),
    psrr: measuredRow({ parameter: 'Power-supply rejection ratio', symbol: 'PSRR', dim: '', si: { min: 80, typ: rng.pick([95, 100, 105]) }, prefixes: [''] }),
    gain: measuredRow({ parameter: 'Large-signal voltage gain', symbol: 'AVOL', conditions: 'RL = 2 kΩ, VO = ±10 V', dim: '', si: { min: 90, typ: rng.pick([100, 110, 120]) }, prefixes: [''] }),
    swing: (part.dualSupply
      ? { parameter: 'Output voltage swing', symbol: 'VOM', conditions: 'RL = 10 kΩ', unit: 'V', values: { min: `±${numberText(at.span / 2 - 1.5)}`, typ: `±${numberText(at.span / 2 - 1)}` } }
      : { parameter: 'Output voltage swing from either rail', symbol: 'VO', conditions: 'RL = 10 kΩ', unit: 'mV', values: { typ: '50', max: '100' } }) satisfies CharRow,
    output: measuredRow({ parameter: rng.pick(['Output short-circuit current', 'Output current']), symbol: 'ISC', key: 'outputCurrent', dim: 'A', si: { typ: part.outputCurrent[0], max: part.outputCurrent[1] }, prefixes: ['m'], phrase: 'the output short-circuit current', plusMinus: plusMinus && rng.chance(0.5) }),
    quiescent: (() => {
      const row = measuredRow({
        parameter: totalQuiescent ? rng.pick([`Supply current, all amplifiers`, `Total supply current (${part.channels === 2 ? 'both' : 'all four'} amplifiers)`]) : rng.pick(['Supply current per amplifier', 'Quiescent current, per channel']),
        symbol: 'IQ',
        conditions: 'No load',
        key: 'quiescentCurrent',
        dim: 'A',
        si: { typ: q[0], max: q[1] },
        prefixes: ['m', 'µ'],
        phrase: totalQuiescent ? 'the total supply current of all amplifiers together' : 'the quiescent current per amplifier',
      });
      if (totalQuiescent && row.truth && 'si' in row.truth) {
        // The catalog stores current per channel; a total is divided by the channel count.
        row.truth = { key: 'quiescentCurrent', si: Object.fromEntries(Object.entries(row.truth.si).map(([s, x]) => [s, x / part.channels])) };
      }
      return row;
    })(),
    slew: measuredRow({ parameter: 'Slew rate', symbol: 'SR', conditions: rng.pick(['RL = 2 kΩ, CL = 100 pF', 'AV = +1, RL = 10 kΩ', 'G = +1']), key: 'slewRate', dim: 'V/s', si: slewSlots, prefixes: ['µ'], phrase: 'the slew rate' }),
    gbw: measuredRow({ parameter: rng.pick(['Gain-bandwidth product', 'Gain bandwidth product', 'Unity-gain bandwidth product']), symbol: 'GBW', conditions: 'f = 100 kHz', key: 'gainBandwidth', dim: 'Hz', si: gbwMinDecoy ? { min: r2(part.gbw * 0.7), typ: part.gbw } : { typ: part.gbw }, prefixes: ['M', 'k'], phrase: 'the gain-bandwidth product' }),
    phase: measuredRow({ parameter: 'Phase margin', symbol: 'φm', conditions: 'CL = 100 pF', dim: '°', si: { typ: rng.pick([55, 60, 65, 70]) }, prefixes: [''] }),
    fpbw: measuredRow({ parameter: 'Full-power bandwidth', symbol: 'BWP', conditions: 'VO = 20 Vpp', dim: 'Hz', si: { typ: r2(part.slew[1] / (Math.PI * 20)) }, prefixes: ['k'] }),
    settling: measuredRow({ parameter: 'Settling time', symbol: 'ts', conditions: 'to 0.01 %, 10 V step', dim: 's', si: { typ: rng.pick([0.8, 1.2, 2, 4]) * 1e-6 }, prefixes: ['µ'] }),
    noise: measuredRow({ parameter: 'Input voltage noise density', symbol: 'en', conditions: 'f = 1 kHz', conditionsMatter: noiseAt10Hz, key: 'inputNoiseDensity', dim: 'V/√Hz', si: { typ: part.noise }, prefixes: ['n'], phrase: 'the input voltage noise density at 1 kHz' }),
    noise10: measuredRow({ parameter: 'Input voltage noise density', symbol: 'en', conditions: 'f = 10 Hz', conditionsMatter: true, dim: 'V/√Hz', si: { typ: r2(part.noise * rng.pick([1.6, 2.5, 3])) }, prefixes: ['n'] }),
    noisePp: measuredRow({ parameter: 'Input noise voltage', symbol: 'en p-p', conditions: 'f = 0.1 Hz to 10 Hz', dim: 'V', si: { typ: rng.pick([0.3, 0.5, 1, 2]) * 1e-6 }, prefixes: ['µ'] }),
    currentNoise: measuredRow({ parameter: 'Input current noise density', symbol: 'in', conditions: 'f = 1 kHz', dim: 'A/√Hz', si: { typ: part.stage === 'bipolar' ? rng.pick([0.4, 0.5, 0.9]) * 1e-12 : rng.pick([2, 5, 10]) * 1e-15 }, prefixes: ['p', 'f'] }),
    thd: measuredRow({ parameter: 'Total harmonic distortion + noise', symbol: 'THD+N', conditions: 'f = 1 kHz, VO = 3 Vrms', dim: '%', si: { typ: rng.pick([0.0003, 0.0005, 0.001, 0.002]) }, prefixes: [''] }),
    separation: measuredRow({ parameter: 'Channel separation', conditions: 'f = 1 kHz', dim: '', si: { typ: rng.pick([110, 120, 130]) }, prefixes: [''] }),
  };
  // dB and µV/°C rows are decoys only: their units are written straight in.
  for (const row of [rows.cmrr, rows.psrr, rows.gain, rows.separation]) row.unit = 'dB';
  rows.drift.unit = 'µV/°C';

  const supply = supplyRows(part, supplyForm, rng);
  const supplyInOperating = v.choose('supply-placement', ['characteristics', 'operating-table', 'prose'] as const);

  const dc: CharRow[] = [
    rows.offset,
    ...(fullRange ? [rows.offsetHot] : []),
    rows.drift,
    rows.bias,
    ...(fullRange ? [rows.biasHot] : []),
    rows.offsetCurrent,
    rows.cmrr,
    rows.psrr,
    rows.gain,
    rows.swing,
    rows.output,
  ];
  const power: CharRow[] = [...(supplyInOperating === 'characteristics' ? supply : []), rows.quiescent];
  const ac: CharRow[] = [rows.slew, rows.gbw, rows.phase, rows.fpbw, rows.settling];
  const noise: CharRow[] = [...(noiseAt10Hz ? [rows.noise10] : []), rows.noise, rows.noisePp, rows.currentNoise, rows.thd, ...(part.channels > 1 ? [rows.separation] : [])];

  const lowSupply: AlternateTable = {
    kind: 'supply',
    title: `Electrical characteristics, ${alt.label}`,
    subtitle: `${alt.label}, TA = 25 °C, RL = 2 kΩ unless otherwise noted`,
    groups: [
      { title: 'DC characteristics', rows: [scaled(rows.offset, 1.2), scaled(rows.bias, 0.9), scaled(rows.output, 0.6), { ...scaled(rows.quiescent, 0.85), parameter: rows.quiescent.parameter }] },
      { title: 'AC characteristics', rows: [scaled(rows.slew, 0.8), scaled(rows.gbw, 0.9), scaled(rows.noise, 1.1)] },
    ],
  };
  const hot: AlternateTable = {
    kind: 'temperature',
    title: rng.pick(['Electrical characteristics, TA = 85 °C', 'Electrical characteristics at elevated temperature']),
    subtitle: `${at.label}, TA = 85 °C`,
    groups: [
      {
        title: 'DC characteristics',
        rows: [scaled(rows.offset, 1.5), scaled(rows.bias, part.stage === 'bipolar' ? 1.8 : 30), scaled(rows.output, 0.8), scaled(rows.quiescent, 1.15)],
      },
      { title: 'AC characteristics', rows: [scaled(rows.slew, 0.85), scaled(rows.gbw, 0.85)] },
    ],
  };

  const layoutKey = part.channels === 1 ? 'dip8-single-opamp' : part.channels === 2 ? 'dip8-dual-opamp' : 'dip14-quad-opamp';
  const pins = PIN_LAYOUTS[layoutKey].pins as Record<number, string>;
  const pinFunction = (name: string): string => {
    const ch = name.match(/ ([A-D])$/)?.[1];
    const where = ch ? `, amplifier ${ch}` : '';
    if (name.startsWith('OUT')) return `Output${where}`;
    if (name.startsWith(`${MINUS}IN`)) return `Inverting input${where}`;
    if (name.startsWith('+IN')) return `Non-inverting input${where}`;
    if (name === 'V+') return 'Positive supply';
    if (name === `V${MINUS}`) return 'Negative supply or ground';
    if (name === 'OFFSET NULL') return 'Offset trim (leave open if unused)';
    return 'No internal connection';
  };

  const supplyHalf = numberText(part.supply[1] / 2 + rng.pick([1, 2, 4]));
  const features = [
    `${part.lowNoise ? 'Low input noise' : 'Input voltage noise'}: ${rows.noise.values.typ} nV/√Hz at 1 kHz`,
    ...(rows.slew.values.typ ? [`Slew rate: ${rows.slew.values.typ} V/µs typical`] : []),
    `Gain-bandwidth product: ${rows.gbw.values.typ} ${rows.gbw.unit}`,
    part.stage === 'bipolar' ? 'Unity-gain stable with 100 pF loads' : 'Picoamp input bias current',
    `Industry-standard ${part.channels === 1 ? 'single' : part.channels === 2 ? 'dual' : 'quad'} pinout`,
    `Available in ${part.packages.join(', ')}`,
  ];

  const overview = [
    `The ${pn} is ${withArticle(lowerFirst(description))} for audio signal paths, active filters and effects circuits. ${
      part.channels === 1 ? 'The package holds one amplifier.' : `Each package holds ${part.channels === 2 ? 'two' : 'four'} independent amplifiers sharing the supply pins.`
    }`,
    `Its ${stageName} input stage ${part.stage === 'bipolar' ? 'keeps voltage noise low with moderate source impedances' : 'draws almost no input current, which suits high-impedance buffers and long time constants'}. The output stage drives 2 kΩ loads and is protected against short circuits to either rail.`,
  ];

  const absoluteMax = [
    { parameter: 'Supply voltage', symbol: 'VS', value: part.dualSupply ? `±${supplyHalf}` : numberText(part.supply[1] + rng.pick([0.5, 1, 4])), unit: 'V' },
    { parameter: 'Differential input voltage', symbol: 'VID', value: part.stage === 'cmos' ? '±VS' : '±30', unit: part.stage === 'cmos' ? '' : 'V' },
    { parameter: 'Input voltage range', symbol: 'VI', value: `(V${MINUS}) ${MINUS} 0.3 to (V+) + 0.3`, unit: 'V' },
    { parameter: 'Output short-circuit duration', value: 'Indefinite', unit: '' },
    { parameter: 'Power dissipation', symbol: 'PD', value: rng.pick(['500', '680', '830']), unit: 'mW' },
    { parameter: 'Operating temperature', symbol: 'TA', value: `${MINUS}40 to +85`, unit: '°C' },
    { parameter: 'Storage temperature', symbol: 'TSTG', value: `${MINUS}65 to +150`, unit: '°C' },
    { parameter: 'Junction temperature', symbol: 'TJ', value: '150', unit: '°C' },
    { parameter: 'Lead temperature (soldering, 10 s)', value: '260', unit: '°C' },
    { parameter: 'ESD rating, human-body model', value: rng.pick(['2000', '4000']), unit: 'V' },
  ];

  const operating =
    supplyInOperating === 'operating-table'
      ? {
          title: 'Recommended operating conditions',
          subtitle: 'Over operating free-air temperature range',
          groups: [
            {
              title: '',
              rows: [
                ...supply,
                { parameter: 'Operating free-air temperature', symbol: 'TA', unit: '°C', values: { min: `${MINUS}40`, max: '85' } } satisfies CharRow,
              ],
            },
          ],
        }
      : undefined;

  const pkg = part.packages[0]!;
  return {
    family: 'op-amp',
    partNumber: pn,
    manufacturer: part.manufacturer,
    description,
    features,
    overview,
    applications: ['Guitar and synthesiser effects', 'Active tone controls and filters', 'Microphone and line preamplifiers', 'Phaser all-pass stages', 'Buffers and mixers'],
    pinout: { title: `Pin configuration (${pkg}, top view)`, rows: Object.entries(pins).map(([pin, name]) => [pin, name, pinFunction(name)]) },
    absoluteMax,
    ...(operating ? { operating } : {}),
    primary: {
      title: 'Electrical characteristics',
      subtitle: `${at.label}, TA = 25 °C, RL = 2 kΩ unless otherwise noted`,
      groups: [
        { title: 'DC characteristics', rows: dc },
        { title: 'Power supply', rows: power },
        { title: 'AC characteristics', rows: ac },
        { title: 'Noise and distortion', rows: noise },
      ],
    },
    alternates: [lowSupply, hot],
    statements: supplyInOperating === 'prose' ? supply.map((row) => ({ text: row.sentence!, truth: [row.truth!] })) : [],
    titleTruth: [{ key: 'channels', si: { typ: part.channels } }],
    applicationNotes: [
      `Decouple each supply pin with a 100 nF ceramic capacitor placed close to the package, plus 10 µF per board. With a single 9 V supply, bias the non-inverting inputs at mid-supply through a 100 kΩ divider.`,
      `For unity-gain buffers driving long cables, add 47 Ω in series with the output. Keep feedback resistors below 10 kΩ to preserve the noise performance; at 1 kΩ the resistor noise is about 4 nV/√Hz.`,
      `The ${pn} is not a comparator. Driving the inputs beyond the supply rails can forward-bias the input protection diodes; limit the current to 10 mA.`,
    ],
    graphs: [
      { caption: 'Figure 1. Slew rate vs supply voltage', xLabel: 'Supply voltage (V)', yLabel: 'Slew rate (V/µs)', xTicks: ['5', '10', '20', '30', '40'], yTicks: ['0', '5', '10', '15', '20'], curve: [0.3, 0.45, 0.55, 0.6, 0.62] },
      { caption: 'Figure 2. Voltage noise density vs frequency', xLabel: 'Frequency (Hz)', yLabel: 'Noise (nV/√Hz)', xTicks: ['10', '100', '1k', '10k', '100k'], yTicks: ['1', '10', '100'], curve: [0.8, 0.45, 0.3, 0.28, 0.28] },
      { caption: 'Figure 3. Open-loop gain vs frequency', xLabel: 'Frequency (Hz)', yLabel: 'Gain (dB)', xTicks: ['1', '100', '10k', '1M', '100M'], yTicks: ['0', '40', '80', '120'], curve: [0.95, 0.9, 0.6, 0.3, 0.02] },
    ],
    packageName: pkg,
    dimensions: pkg.startsWith('DIP')
      ? [
          { symbol: 'A', min: '', nom: '', max: '5.33' },
          { symbol: 'b', min: '0.36', nom: '0.46', max: '0.56' },
          { symbol: 'D', min: pkg === 'DIP-14' ? '18.67' : '9.02', nom: pkg === 'DIP-14' ? '19.05' : '9.27', max: pkg === 'DIP-14' ? '19.69' : '10.16' },
          { symbol: 'E', min: '7.62', nom: '7.87', max: '8.26' },
          { symbol: 'e', min: '', nom: '2.54', max: '' },
          { symbol: 'L', min: '2.92', nom: '3.30', max: '3.81' },
        ]
      : [
          { symbol: 'A', min: '1.35', nom: '1.55', max: '1.75' },
          { symbol: 'A1', min: '0.10', nom: '0.15', max: '0.25' },
          { symbol: 'b', min: '0.31', nom: '0.41', max: '0.51' },
          { symbol: 'D', min: '4.80', nom: '4.90', max: '5.00' },
          { symbol: 'E', min: '3.80', nom: '3.90', max: '4.00' },
          { symbol: 'e', min: '', nom: '1.27', max: '' },
          { symbol: 'L', min: '0.40', nom: '0.80', max: '1.27' },
        ],
    ordering: part.packages.flatMap((p) => {
      const code = p.startsWith('DIP') ? 'P' : p.startsWith('SOIC') ? 'D' : p.startsWith('MSOP') ? 'DGK' : 'PW';
      const pins = p.match(/\d+/)?.[0] ?? '8';
      const base = { package: p, marking: pn.replace(/[^A-Z0-9]/gi, '').slice(-6) };
      return p.startsWith('DIP')
        ? [{ ...base, code: `${pn}-${code}${pins}`, packing: 'Tube, 50' }]
        : [
            { ...base, code: `${pn}-${code}${pins}`, packing: 'Tube, 100' },
            { ...base, code: `${pn}-${code}${pins}-TR`, packing: 'Tape and reel, 2500' },
          ];
    }),
  };
}
