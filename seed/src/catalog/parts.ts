import type { Lifecycle, PackageKey, PartCreateBody, PinLayoutKey, RohsStatus } from '@understudy/shared-types';
import type { DemoManufacturerName } from './manufacturers';

// The demo parts library of Marrowbone Pedal Works. Every manufacturer, part number and description is invented.
// Values are in SI base units (V/s, Hz, V/√Hz, A, Ω, m, s), as the API stores them; the builders below only
// arrange them into the family's min / typ / max slots so each part reads as one line of numbers.

type TypMax = readonly [typ: number, max: number];
type MinMax = readonly [min: number, max: number];

interface Common {
  manufacturer: DemoManufacturerName;
  partNumber: string;
  description: string;
  lifecycle?: Lifecycle;
  tags: string[];
}

const MINUS = '\u2212';

// ---------------------------------------------------------------------------------------------------------------
// Op amps

interface OpAmpSpec extends Common {
  package: Extract<PackageKey, 'DIP-8' | 'SOIC-8' | 'MSOP-8' | 'TO-99' | 'SOT-23-5' | 'DIP-14' | 'SOIC-14' | 'TSSOP-14'>;
  channels: 1 | 2 | 4;
  stage: 'bipolar' | 'jfet' | 'cmos';
  /** Total span between the rails, min and max. */
  supply: MinMax;
  singleSupply: boolean;
  /** Slew rate [min, typ] in V/s. */
  slew: readonly [min: number, typ: number];
  gbw: number;
  noise: number;
  offset: TypMax;
  bias: TypMax;
  outputCurrent: TypMax;
  /** Per channel. */
  quiescent: TypMax;
  rri?: boolean;
  rro?: boolean;
  temperature?: MinMax;
  /** Supply span the datasheet tests at; defaults to ±15 V where allowed, else the top of the range. */
  testSupply?: number;
  rohsStatus?: RohsStatus;
  rohsNote?: string;
}

const SOT23_5_SINGLE = { 1: 'OUT', 2: `V${MINUS}`, 3: '+IN', 4: `${MINUS}IN`, 5: 'V+' };

function opAmp(s: OpAmpSpec): PartCreateBody {
  const testSupply = s.testSupply ?? Math.min(30, s.supply[1]);
  const at = { supply: testSupply, temperature: 25 };
  const layout: PinLayoutKey | null =
    s.package === 'SOT-23-5'
      ? null
      : s.channels === 1
        ? 'dip8-single-opamp'
        : s.channels === 2
          ? 'dip8-dual-opamp'
          : 'dip14-quad-opamp';
  return {
    family: 'op-amp',
    manufacturer: s.manufacturer,
    partNumber: s.partNumber,
    description: s.description,
    lifecycle: s.lifecycle ?? 'active',
    rohsStatus: s.rohsStatus ?? 'compliant',
    rohsNote: s.rohsNote ?? '',
    package: s.package,
    pinLayout: layout,
    pinMap: s.package === 'SOT-23-5' ? { ...SOT23_5_SINGLE } : {},
    tags: s.tags,
    parameters: {
      channels: { typ: s.channels },
      supplyVoltage: { min: s.supply[0], max: s.supply[1] },
      singleSupply: { value: s.singleSupply },
      slewRate: { min: s.slew[0], typ: s.slew[1], conditions: at },
      gainBandwidth: { typ: s.gbw, conditions: { supply: testSupply } },
      inputOffsetVoltage: { typ: s.offset[0], max: s.offset[1], conditions: at },
      inputBiasCurrent: { typ: s.bias[0], max: s.bias[1], conditions: at },
      inputNoiseDensity: { typ: s.noise, conditions: { supply: testSupply } },
      outputCurrent: { typ: s.outputCurrent[0], max: s.outputCurrent[1], conditions: { supply: testSupply } },
      quiescentCurrent: { typ: s.quiescent[0], max: s.quiescent[1], conditions: { supply: testSupply } },
      railToRailInput: { value: s.rri ?? false },
      railToRailOutput: { value: s.rro ?? false },
      inputStage: { value: s.stage },
      operatingTemperature: { min: s.temperature?.[0] ?? -40, max: s.temperature?.[1] ?? 85 },
    },
  };
}

const OP_AMPS: PartCreateBody[] = [
  // Halvard Semiconductor: bipolar duals and a quad.
  opAmp({
    manufacturer: 'Halvard Semiconductor',
    partNumber: 'HV4580',
    description:
      'Dual bipolar op amp with a very quiet input stage, aimed at preamps and the all-pass ladders of phasers. Runs from one 9 V rail or split supplies up to ±16 V. Draws more supply current than the general-purpose duals, so budget for it in battery pedals.',
    package: 'DIP-8',
    channels: 2,
    stage: 'bipolar',
    supply: [4, 32],
    singleSupply: true,
    slew: [3.5e6, 5e6],
    gbw: 15e6,
    noise: 3.3e-9,
    offset: [0.3e-3, 3e-3],
    bias: [100e-9, 500e-9],
    outputCurrent: [40e-3, 50e-3],
    quiescent: [2.4e-3, 3e-3],
    tags: ['low-noise', 'preamp', 'phaser', '9v'],
  }),
  opAmp({
    manufacturer: 'Halvard Semiconductor',
    partNumber: 'HV4580S',
    description:
      'Surface-mount twin of the HV4580: the same low-noise bipolar dual in an SOIC-8 body with the standard dual pinout. Handy when a through-hole phaser layout moves to a smaller board.',
    package: 'SOIC-8',
    channels: 2,
    stage: 'bipolar',
    supply: [4, 32],
    singleSupply: true,
    slew: [3.5e6, 5e6],
    gbw: 15e6,
    noise: 3.3e-9,
    offset: [0.3e-3, 3e-3],
    bias: [100e-9, 500e-9],
    outputCurrent: [40e-3, 50e-3],
    quiescent: [2.4e-3, 3e-3],
    tags: ['low-noise', 'smd', 'phaser', '9v'],
  }),
  opAmp({
    manufacturer: 'Halvard Semiconductor',
    partNumber: 'HV4558',
    description:
      'General-purpose bipolar dual that turned up in countless overdrive and vibe circuits. Modest slew and noise, forgiving of layout. Discontinued: the last reels have shipped, so pick a substitute for new builds.',
    lifecycle: 'obsolete',
    package: 'DIP-8',
    channels: 2,
    stage: 'bipolar',
    supply: [8, 30],
    singleSupply: true,
    slew: [1e6, 1.7e6],
    gbw: 3e6,
    noise: 10e-9,
    offset: [0.5e-3, 6e-3],
    bias: [50e-9, 400e-9],
    outputCurrent: [20e-3, 25e-3],
    quiescent: [1.1e-3, 2.5e-3],
    tags: ['general-purpose', 'overdrive', 'vibe'],
  }),
  opAmp({
    manufacturer: 'Halvard Semiconductor',
    partNumber: 'HV2902',
    description:
      'Low-power quad whose inputs work down to the negative rail, so it sits happily on a single supply. Slow and noisy for audio, but ideal for LFOs, envelope followers and control-voltage mixing.',
    package: 'DIP-14',
    channels: 4,
    stage: 'bipolar',
    supply: [3, 32],
    singleSupply: true,
    slew: [0.3e6, 0.5e6],
    gbw: 1e6,
    noise: 40e-9,
    offset: [2e-3, 7e-3],
    bias: [20e-9, 250e-9],
    outputCurrent: [20e-3, 40e-3],
    quiescent: [0.2e-3, 0.5e-3],
    tags: ['lfo', 'low-power', 'quad', 'control-voltage'],
  }),
  opAmp({
    manufacturer: 'Halvard Semiconductor',
    partNumber: 'HV6132',
    description:
      'Bipolar dual with a rail-to-rail output stage, specified from 3 V to 36 V. On a 9 V rail it leaves more headroom than classic duals, which suits tremolo output stages and compressor side chains.',
    package: 'SOIC-8',
    channels: 2,
    stage: 'bipolar',
    supply: [3, 36],
    singleSupply: true,
    slew: [4.5e6, 6e6],
    gbw: 8e6,
    noise: 9e-9,
    offset: [0.4e-3, 2.5e-3],
    bias: [60e-9, 300e-9],
    outputCurrent: [30e-3, 45e-3],
    quiescent: [0.9e-3, 1.3e-3],
    rro: true,
    tags: ['rail-to-rail', '9v', 'tremolo', 'compressor'],
  }),
  opAmp({
    manufacturer: 'Halvard Semiconductor',
    partNumber: 'HV833',
    description:
      'Low-noise audio dual with a brisk slew rate and a strong output stage that drives long cables. Still in production but flagged not for new designs; the HV4580 family is the suggested path forward.',
    lifecycle: 'nrnd',
    package: 'SOIC-8',
    channels: 2,
    stage: 'bipolar',
    supply: [5, 36],
    singleSupply: true,
    slew: [5e6, 7e6],
    gbw: 15e6,
    noise: 4.5e-9,
    offset: [0.3e-3, 2e-3],
    bias: [300e-9, 500e-9],
    outputCurrent: [40e-3, 60e-3],
    quiescent: [2.5e-3, 3e-3],
    tags: ['low-noise', 'line-driver', '9v'],
  }),

  // Quillon Microdevices: JFET and CMOS inputs.
  opAmp({
    manufacturer: 'Quillon Microdevices',
    partNumber: 'QM-071D',
    description:
      'Dual JFET-input op amp with picoamp bias current and a quick slew rate, the usual choice for high-impedance guitar buffers. The input common-mode range stops short of the negative rail, so it wants split rails or a mid-supply bias. Last-time-buy notice issued.',
    lifecycle: 'last-time-buy',
    package: 'DIP-8',
    channels: 2,
    stage: 'jfet',
    supply: [7, 36],
    singleSupply: false,
    slew: [8e6, 13e6],
    gbw: 3e6,
    noise: 18e-9,
    offset: [3e-3, 6e-3],
    bias: [30e-12, 200e-12],
    outputCurrent: [25e-3, 40e-3],
    quiescent: [1.4e-3, 2.5e-3],
    tags: ['jfet', 'buffer', 'general-purpose'],
  }),
  opAmp({
    manufacturer: 'Quillon Microdevices',
    partNumber: 'QM-072D',
    description:
      'Low-noise grade of the QM-071D: the same JFET dual and pinout with a quieter, better-matched input pair. A drop-in upgrade for buffers and phaser all-pass stages running from split rails.',
    package: 'DIP-8',
    channels: 2,
    stage: 'jfet',
    supply: [7, 36],
    singleSupply: false,
    slew: [8e6, 13e6],
    gbw: 3e6,
    noise: 15e-9,
    offset: [1.5e-3, 5e-3],
    bias: [30e-12, 200e-12],
    outputCurrent: [25e-3, 40e-3],
    quiescent: [1.4e-3, 2.5e-3],
    tags: ['jfet', 'low-noise', 'buffer', 'phaser'],
  }),
  opAmp({
    manufacturer: 'Quillon Microdevices',
    partNumber: 'QM-074Q',
    description:
      'Quad version of the QM-072D in a 14-pin package. Four matched JFET amplifiers make a compact four-stage phaser or a buffered multi-tap mixer.',
    package: 'DIP-14',
    channels: 4,
    stage: 'jfet',
    supply: [7, 36],
    singleSupply: false,
    slew: [8e6, 13e6],
    gbw: 3e6,
    noise: 15e-9,
    offset: [1.5e-3, 5e-3],
    bias: [30e-12, 200e-12],
    outputCurrent: [25e-3, 40e-3],
    quiescent: [1.4e-3, 2.5e-3],
    tags: ['jfet', 'quad', 'phaser'],
  }),
  opAmp({
    manufacturer: 'Quillon Microdevices',
    partNumber: 'QM-062L',
    description:
      'Micropower JFET dual drawing a fifth of the current of its siblings, once popular for battery-friendly LFOs. Noisy and slow for the audio path. Obsolete; no direct successor was announced.',
    lifecycle: 'obsolete',
    package: 'DIP-8',
    channels: 2,
    stage: 'jfet',
    supply: [7, 36],
    singleSupply: false,
    slew: [2e6, 3.5e6],
    gbw: 1e6,
    noise: 40e-9,
    offset: [3e-3, 7e-3],
    bias: [30e-12, 200e-12],
    outputCurrent: [10e-3, 20e-3],
    quiescent: [0.2e-3, 0.25e-3],
    temperature: [0, 70],
    tags: ['jfet', 'low-power', 'lfo'],
  }),
  opAmp({
    manufacturer: 'Quillon Microdevices',
    partNumber: 'QM-6002',
    description:
      'Low-power CMOS dual with rail-to-rail inputs and outputs, rated to 6 V only. Suited to 5 V control logic and sensor conditioning; it will not survive a 9 V pedal rail.',
    package: 'MSOP-8',
    channels: 2,
    stage: 'cmos',
    supply: [1.8, 6],
    singleSupply: true,
    slew: [0.4e6, 0.6e6],
    gbw: 1e6,
    noise: 28e-9,
    offset: [1e-3, 4.5e-3],
    bias: [1e-12, 60e-12],
    outputCurrent: [15e-3, 23e-3],
    quiescent: [0.2e-3, 0.3e-3],
    rri: true,
    rro: true,
    testSupply: 5,
    tags: ['cmos', 'rail-to-rail', 'low-power', '5v'],
  }),
  opAmp({
    manufacturer: 'Quillon Microdevices',
    partNumber: 'QM-6012S',
    description:
      'Fast single CMOS op amp in a five-lead SOT-23, with a rail-to-rail output and a wide bandwidth for its size. Limited to 5.5 V, and its five-pin layout matches none of the 8-pin footprints.',
    package: 'SOT-23-5',
    channels: 1,
    stage: 'cmos',
    supply: [2.5, 5.5],
    singleSupply: true,
    slew: [6e6, 9e6],
    gbw: 20e6,
    noise: 8e-9,
    offset: [0.5e-3, 3e-3],
    bias: [1e-12, 10e-12],
    outputCurrent: [40e-3, 60e-3],
    quiescent: [1.2e-3, 1.6e-3],
    rro: true,
    testSupply: 5,
    tags: ['cmos', 'high-slew', '5v', 'buffer', 'smd'],
  }),
  opAmp({
    manufacturer: 'Quillon Microdevices',
    partNumber: 'QM-2210',
    description:
      'CMOS dual rated from 2.7 V to 10 V with a rail-to-rail output. It runs on a 9 V rail but slews slowly, so keep it to LFOs and DC work. Not recommended for new designs.',
    lifecycle: 'nrnd',
    package: 'DIP-8',
    channels: 2,
    stage: 'cmos',
    supply: [2.7, 10],
    singleSupply: true,
    slew: [2e6, 3e6],
    gbw: 5e6,
    noise: 22e-9,
    offset: [1e-3, 5e-3],
    bias: [1e-12, 100e-12],
    outputCurrent: [20e-3, 30e-3],
    quiescent: [0.6e-3, 0.9e-3],
    rro: true,
    tags: ['cmos', 'rail-to-rail', '9v', 'lfo'],
  }),
  opAmp({
    manufacturer: 'Quillon Microdevices',
    partNumber: 'QM-3140',
    description:
      'Single op amp with a CMOS input pair and a bipolar output, giving picoamp bias current on supplies from 4 V to 36 V. Fast enough for audio buffers and envelope detectors, though on the noisy side. Last-time-buy notice issued.',
    lifecycle: 'last-time-buy',
    package: 'DIP-8',
    channels: 1,
    stage: 'cmos',
    supply: [4, 36],
    singleSupply: true,
    slew: [7e6, 9e6],
    gbw: 4.5e6,
    noise: 38e-9,
    offset: [2e-3, 7e-3],
    bias: [10e-12, 50e-12],
    outputCurrent: [40e-3, 45e-3],
    quiescent: [2.5e-3, 3e-3],
    tags: ['cmos', 'buffer', 'envelope', '9v'],
  }),

  // Kestrel Linear: classic singles and workhorse duals.
  opAmp({
    manufacturer: 'Kestrel Linear',
    partNumber: 'KL 2207',
    description:
      'Bipolar dual with a high slew rate and low noise that is comfortable on a single 9 V rail. A good all-round choice for vibe and phaser stages that swing large signals.',
    package: 'DIP-8',
    channels: 2,
    stage: 'bipolar',
    supply: [5, 36],
    singleSupply: true,
    slew: [6e6, 9e6],
    gbw: 10e6,
    noise: 6e-9,
    offset: [0.5e-3, 2e-3],
    bias: [200e-9, 450e-9],
    outputCurrent: [45e-3, 55e-3],
    quiescent: [2.2e-3, 2.8e-3],
    tags: ['high-slew', 'low-noise', '9v', 'vibe', 'phaser'],
  }),
  opAmp({
    manufacturer: 'Kestrel Linear',
    partNumber: 'KL 0741',
    description:
      'The old single-amplifier workhorse in a metal can, with offset-null pins. Needs at least ±5 V and slews far too slowly for clean audio. Obsolete; kept here for repairs of vintage units.',
    lifecycle: 'obsolete',
    rohsStatus: 'unknown',
    package: 'TO-99',
    channels: 1,
    stage: 'bipolar',
    supply: [10, 36],
    singleSupply: false,
    slew: [0.3e6, 0.5e6],
    gbw: 1e6,
    noise: 20e-9,
    offset: [1e-3, 5e-3],
    bias: [80e-9, 500e-9],
    outputCurrent: [20e-3, 25e-3],
    quiescent: [1.7e-3, 2.8e-3],
    temperature: [0, 70],
    tags: ['general-purpose', 'vintage', 'repair'],
  }),
  opAmp({
    manufacturer: 'Kestrel Linear',
    partNumber: 'KL 0741N',
    description:
      'The KL 0741 in an 8-pin plastic DIP with the same single-amplifier pinout. Equally slow and equally dependent on split rails. Last-time buy.',
    lifecycle: 'last-time-buy',
    package: 'DIP-8',
    channels: 1,
    stage: 'bipolar',
    supply: [10, 36],
    singleSupply: false,
    slew: [0.3e6, 0.5e6],
    gbw: 1e6,
    noise: 20e-9,
    offset: [1e-3, 5e-3],
    bias: [80e-9, 500e-9],
    outputCurrent: [20e-3, 25e-3],
    quiescent: [1.7e-3, 2.8e-3],
    temperature: [0, 70],
    tags: ['general-purpose', 'vintage', 'repair'],
  }),
  opAmp({
    manufacturer: 'Kestrel Linear',
    partNumber: 'KL 1300',
    description:
      'High-slew single bipolar op amp for line drivers and fast buffers on ±5 V to ±18 V rails. Its minimum supply rules out a 9 V battery. Last-time-buy notice issued.',
    lifecycle: 'last-time-buy',
    package: 'DIP-8',
    channels: 1,
    stage: 'bipolar',
    supply: [10, 36],
    singleSupply: false,
    slew: [18e6, 25e6],
    gbw: 20e6,
    noise: 11e-9,
    offset: [1e-3, 4e-3],
    bias: [150e-9, 500e-9],
    outputCurrent: [30e-3, 50e-3],
    quiescent: [2.5e-3, 3e-3],
    tags: ['high-slew', 'line-driver', 'split-supply'],
  }),
  opAmp({
    manufacturer: 'Kestrel Linear',
    partNumber: 'KL 0358',
    description:
      'Low-power dual whose inputs include the negative rail, made for single-supply control circuits. Slow and noisy, but the cheapest way to build LFOs, comparators-in-a-pinch and bias buffers.',
    package: 'SOIC-8',
    channels: 2,
    stage: 'bipolar',
    supply: [3, 32],
    singleSupply: true,
    slew: [0.3e6, 0.4e6],
    gbw: 0.7e6,
    noise: 40e-9,
    offset: [2e-3, 7e-3],
    bias: [45e-9, 250e-9],
    outputCurrent: [30e-3, 40e-3],
    quiescent: [0.35e-3, 0.6e-3],
    tags: ['low-power', 'lfo', 'general-purpose', '9v'],
  }),
  opAmp({
    manufacturer: 'Kestrel Linear',
    partNumber: 'KL 3404',
    description:
      'Quad bipolar op amp with a respectable slew rate that runs from a single 4 V to 36 V supply. Four amplifiers in one package make a tidy four-stage phaser on a 9 V board.',
    package: 'DIP-14',
    channels: 4,
    stage: 'bipolar',
    supply: [4, 36],
    singleSupply: true,
    slew: [4e6, 5.5e6],
    gbw: 7e6,
    noise: 8e-9,
    offset: [0.5e-3, 3e-3],
    bias: [100e-9, 400e-9],
    outputCurrent: [25e-3, 40e-3],
    quiescent: [1e-3, 1.5e-3],
    tags: ['quad', 'phaser', '9v'],
  }),

  // Corvel Analog: modern rail-to-rail CMOS for 9 V work.
  opAmp({
    manufacturer: 'Corvel Analog',
    partNumber: 'CV2207',
    description:
      'Rail-to-rail CMOS dual specified on a 9 V rail, with low noise for a CMOS part and only picoamps of input bias current. The house favourite for tremolo and vibe builds: full output swing from a single battery.',
    package: 'DIP-8',
    channels: 2,
    stage: 'cmos',
    supply: [2.7, 16],
    singleSupply: true,
    slew: [7e6, 10e6],
    gbw: 10e6,
    noise: 7e-9,
    offset: [0.25e-3, 1.5e-3],
    bias: [2e-12, 50e-12],
    outputCurrent: [35e-3, 50e-3],
    quiescent: [1.1e-3, 1.6e-3],
    rri: true,
    rro: true,
    testSupply: 9,
    tags: ['rail-to-rail', '9v', 'buffer', 'tremolo', 'vibe', 'low-noise'],
  }),
  opAmp({
    manufacturer: 'Corvel Analog',
    partNumber: 'CV2204',
    description:
      'Quad member of the CV2207 family in a small TSSOP-14 body. Four rail-to-rail amplifiers on one 9 V rail cover a phaser ladder or an LFO with buffered outputs.',
    package: 'TSSOP-14',
    channels: 4,
    stage: 'cmos',
    supply: [2.7, 16],
    singleSupply: true,
    slew: [7e6, 10e6],
    gbw: 10e6,
    noise: 7e-9,
    offset: [0.25e-3, 1.5e-3],
    bias: [2e-12, 50e-12],
    outputCurrent: [35e-3, 50e-3],
    quiescent: [1.1e-3, 1.6e-3],
    rri: true,
    rro: true,
    testSupply: 9,
    tags: ['rail-to-rail', '9v', 'quad', 'phaser', 'smd'],
  }),
  opAmp({
    manufacturer: 'Corvel Analog',
    partNumber: 'CV2201',
    description:
      'Single-amplifier CV2207 in SOIC-8 with the standard single pinout, offset pins left unconnected inside. A neat input buffer for a 9 V compressor or envelope filter.',
    package: 'SOIC-8',
    channels: 1,
    stage: 'cmos',
    supply: [2.7, 16],
    singleSupply: true,
    slew: [7e6, 10e6],
    gbw: 10e6,
    noise: 7e-9,
    offset: [0.25e-3, 1.5e-3],
    bias: [2e-12, 50e-12],
    outputCurrent: [35e-3, 50e-3],
    quiescent: [1.1e-3, 1.6e-3],
    rri: true,
    rro: true,
    testSupply: 9,
    tags: ['rail-to-rail', '9v', 'buffer', 'compressor', 'smd'],
  }),
  opAmp({
    manufacturer: 'Corvel Analog',
    partNumber: 'CV1010',
    description:
      'Very fast CMOS dual meant for ±5 V to ±6 V rails only: the supply span must stay between 10 V and 12 V. Excellent slew, but it cannot run from a single 9 V battery.',
    package: 'SOIC-8',
    channels: 2,
    stage: 'cmos',
    supply: [10, 12],
    singleSupply: false,
    slew: [15e6, 20e6],
    gbw: 18e6,
    noise: 9e-9,
    offset: [0.5e-3, 2.5e-3],
    bias: [2e-12, 20e-12],
    outputCurrent: [40e-3, 55e-3],
    quiescent: [2e-3, 2.6e-3],
    rro: true,
    testSupply: 10,
    tags: ['high-slew', 'split-supply', 'smd'],
  }),
];

// ---------------------------------------------------------------------------------------------------------------
// Photoresistors

const EXEMPT_NOTE =
  'Contains cadmium; supplied under a RoHS exemption for cadmium photoresistors. Confirm the exemption still applies to your product and market.';
const NON_COMPLIANT_NOTE =
  'Contains cadmium and is sold without an exemption claim. Not for products placed on markets where RoHS applies.';

interface PhotoresistorSpec extends Common {
  material: 'cds' | 'cdse' | 'other';
  rohsStatus: RohsStatus;
  rohsNote?: string;
  /** Dark resistance [min, typ] in Ω, read `darkTime` seconds after the light goes out. */
  dark: readonly [min: number, typ: number];
  darkTime?: number;
  /** At 10 lx. */
  light: MinMax;
  gamma: number;
  peak: number;
  rise: number;
  decay: number;
  maxVoltage: number;
  power: number;
  diameter: number;
}

function photoresistor(s: PhotoresistorSpec): PartCreateBody {
  return {
    family: 'photoresistor',
    manufacturer: s.manufacturer,
    partNumber: s.partNumber,
    description: s.description,
    lifecycle: s.lifecycle ?? 'active',
    rohsStatus: s.rohsStatus,
    rohsNote: s.rohsNote ?? (s.rohsStatus === 'exempt' ? EXEMPT_NOTE : s.rohsStatus === 'non-compliant' ? NON_COMPLIANT_NOTE : ''),
    package: 'radial',
    pinLayout: 'photoresistor-2lead',
    tags: s.tags,
    parameters: {
      darkResistance: { min: s.dark[0], typ: s.dark[1], conditions: { time: s.darkTime ?? 10 } },
      lightResistance: { min: s.light[0], max: s.light[1], conditions: { temperature: 25 } },
      gamma: { typ: s.gamma },
      peakWavelength: { typ: s.peak },
      riseTime: { typ: s.rise },
      decayTime: { typ: s.decay },
      maxVoltage: { max: s.maxVoltage },
      powerDissipation: { max: s.power },
      cellMaterial: { value: s.material },
      cellDiameter: { typ: s.diameter },
    },
  };
}

const PHOTORESISTORS: PartCreateBody[] = [
  photoresistor({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-LDR-5K',
    description:
      'Low-resistance 5 mm CdS cell that reaches a few kilohms under modest light. Its quick fall and gentle recovery give a rounded, lamp-like tremolo pulse.',
    material: 'cds',
    rohsStatus: 'exempt',
    dark: [0.5e6, 1e6],
    light: [3e3, 7e3],
    gamma: 0.6,
    peak: 540e-9,
    rise: 25e-3,
    decay: 35e-3,
    maxVoltage: 100,
    power: 0.09,
    diameter: 5e-3,
    tags: ['tremolo', 'cds', 'ldr'],
  }),
  photoresistor({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-LDR-10K',
    description:
      'General-purpose 5 mm CdS cell in the 10 kΩ class at 10 lux, the default choice for LED-and-LDR tremolos and optical compressors. Peak response sits in the green, so pair it with a green or yellow-green LED.',
    material: 'cds',
    rohsStatus: 'exempt',
    dark: [1e6, 2e6],
    light: [8e3, 15e3],
    gamma: 0.7,
    peak: 540e-9,
    rise: 20e-3,
    decay: 30e-3,
    maxVoltage: 150,
    power: 0.1,
    diameter: 5e-3,
    tags: ['tremolo', 'compressor', 'cds', 'ldr'],
  }),
  photoresistor({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-LDR-20K',
    description:
      'Mid-range 5 mm CdS cell with a 15 kΩ to 30 kΩ window at 10 lux. Useful where the cell forms the lower leg of a divider with a larger fixed resistor.',
    material: 'cds',
    rohsStatus: 'non-compliant',
    dark: [2e6, 5e6],
    light: [15e3, 30e3],
    gamma: 0.7,
    peak: 560e-9,
    rise: 20e-3,
    decay: 30e-3,
    maxVoltage: 150,
    power: 0.1,
    diameter: 5e-3,
    tags: ['cds', 'ldr', 'divider'],
  }),
  photoresistor({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-LDR-50K',
    description:
      'High-resistance 5 mm CdS cell with a steep response, reaching several megohms in the dark. Good for deep tremolo where the cell shunts a high-impedance node.',
    material: 'cds',
    rohsStatus: 'exempt',
    dark: [5e6, 10e6],
    light: [30e3, 90e3],
    gamma: 0.8,
    peak: 560e-9,
    rise: 20e-3,
    decay: 30e-3,
    maxVoltage: 150,
    power: 0.1,
    diameter: 5e-3,
    tags: ['tremolo', 'cds', 'ldr'],
  }),
  photoresistor({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-LDR-100K',
    description:
      'Very high-resistance CdS cell for light-sensing switches and long-tail dividers, with a dark resistance well above 10 MΩ. Last-time buy; the 50 kΩ class is the nearest continuing part.',
    lifecycle: 'last-time-buy',
    material: 'cds',
    rohsStatus: 'non-compliant',
    dark: [10e6, 20e6],
    light: [50e3, 200e3],
    gamma: 0.85,
    peak: 560e-9,
    rise: 20e-3,
    decay: 30e-3,
    maxVoltage: 150,
    power: 0.1,
    diameter: 5e-3,
    tags: ['cds', 'ldr', 'sensor'],
  }),
  photoresistor({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-LDR-5K-12',
    description:
      'Large 12 mm CdS cell with a low light resistance and a slow, lazy recovery that suits lamp-driven vibe circuits. Handles more power and voltage than the 5 mm cells. Obsolete.',
    lifecycle: 'obsolete',
    material: 'cds',
    rohsStatus: 'non-compliant',
    dark: [0.5e6, 1e6],
    light: [2e3, 5e3],
    gamma: 0.6,
    peak: 550e-9,
    rise: 40e-3,
    decay: 90e-3,
    maxVoltage: 250,
    power: 0.2,
    diameter: 12e-3,
    tags: ['vibe', 'cds', 'ldr', 'vintage'],
  }),
  photoresistor({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-LDR-10K-4',
    description:
      'Compact 4 mm CdS cell in the 10 kΩ class, small enough to share a heat-shrink sleeve with a 3 mm LED. Slightly slower than the 5 mm version. Obsolete.',
    lifecycle: 'obsolete',
    material: 'cds',
    rohsStatus: 'exempt',
    dark: [0.8e6, 1.5e6],
    light: [8e3, 20e3],
    gamma: 0.65,
    peak: 540e-9,
    rise: 30e-3,
    decay: 40e-3,
    maxVoltage: 100,
    power: 0.05,
    diameter: 4e-3,
    tags: ['tremolo', 'cds', 'ldr'],
  }),
  photoresistor({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-SE-12',
    description:
      'CdSe cell with its peak response in the red, so a red LED drives it efficiently. Faster than CdS cells of the same size, giving a choppier, more defined tremolo.',
    material: 'cdse',
    rohsStatus: 'exempt',
    dark: [1e6, 3e6],
    light: [4e3, 12e3],
    gamma: 0.65,
    peak: 690e-9,
    rise: 10e-3,
    decay: 15e-3,
    maxVoltage: 150,
    power: 0.1,
    diameter: 5e-3,
    tags: ['tremolo', 'cdse', 'ldr', 'fast'],
  }),
  photoresistor({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-SE-40',
    description:
      'High-resistance CdSe cell with a deep-red peak and a fast response. Not recommended for new designs; the lighter-resistance BW-SE-12 continues.',
    lifecycle: 'nrnd',
    material: 'cdse',
    rohsStatus: 'non-compliant',
    dark: [5e6, 10e6],
    light: [20e3, 60e3],
    gamma: 0.75,
    peak: 720e-9,
    rise: 8e-3,
    decay: 12e-3,
    maxVoltage: 150,
    power: 0.1,
    diameter: 5e-3,
    tags: ['cdse', 'ldr', 'fast'],
  }),
  photoresistor({
    manufacturer: 'Fenwick Photonics',
    partNumber: 'FNW-LS550',
    description:
      'Cadmium-free light-dependent resistor with a CdS-like green peak and 10 kΩ-class light resistance. It responds in a few milliseconds, much faster than CdS, so expect a harder tremolo edge unless the LED drive is smoothed.',
    material: 'other',
    rohsStatus: 'compliant',
    dark: [1e6, 2e6],
    light: [5e3, 15e3],
    gamma: 0.55,
    peak: 550e-9,
    rise: 2e-3,
    decay: 3e-3,
    maxVoltage: 50,
    power: 0.05,
    diameter: 5e-3,
    tags: ['cadmium-free', 'ldr', 'tremolo'],
  }),
  photoresistor({
    manufacturer: 'Fenwick Photonics',
    partNumber: 'FNW-LS580',
    description:
      'Cadmium-free sensor with a yellow peak and a higher light resistance, for ambient-light sensing and gentle optical gain control. Rated for low voltages only.',
    material: 'other',
    rohsStatus: 'compliant',
    dark: [0.5e6, 1e6],
    light: [10e3, 40e3],
    gamma: 0.6,
    peak: 580e-9,
    rise: 2e-3,
    decay: 4e-3,
    maxVoltage: 50,
    power: 0.05,
    diameter: 5e-3,
    tags: ['cadmium-free', 'ldr', 'sensor'],
  }),
  photoresistor({
    manufacturer: 'Fenwick Photonics',
    partNumber: 'FNW-LS520',
    description:
      'Low-resistance cadmium-free cell peaking in the green, reaching a couple of kilohms under bright light. Not recommended for new designs.',
    lifecycle: 'nrnd',
    material: 'other',
    rohsStatus: 'compliant',
    dark: [0.5e6, 0.8e6],
    light: [2e3, 8e3],
    gamma: 0.5,
    peak: 520e-9,
    rise: 1.5e-3,
    decay: 3e-3,
    maxVoltage: 50,
    power: 0.05,
    diameter: 5e-3,
    tags: ['cadmium-free', 'ldr'],
  }),
];

// ---------------------------------------------------------------------------------------------------------------
// LEDs

const LED_PACKAGE = { '3mm': 'led-3mm', '5mm': 'led-5mm', '0603': '0603', '0805': '0805', '1206': '1206' } as const;

interface LedSpec extends Common {
  colour: 'red' | 'orange' | 'amber' | 'yellow' | 'green' | 'blue' | 'white' | 'infrared' | 'ultraviolet';
  /** Peak wavelength in m; white LEDs have none. */
  peak?: number;
  /** Forward voltage [typ, max] at 20 mA. */
  vf: TypMax;
  /** Test and rated current. */
  current?: TypMax;
  /** On-axis intensity in cd at 20 mA; infrared and ultraviolet parts quote none. */
  intensity?: number;
  angle: number;
  size: keyof typeof LED_PACKAGE;
  lens: 'clear' | 'diffused' | 'tinted';
}

function led(s: LedSpec): PartCreateBody {
  const at = { current: 20e-3 };
  return {
    family: 'led',
    manufacturer: s.manufacturer,
    partNumber: s.partNumber,
    description: s.description,
    lifecycle: s.lifecycle ?? 'active',
    rohsStatus: 'compliant',
    package: LED_PACKAGE[s.size],
    pinLayout: 'led-2lead',
    tags: s.tags,
    parameters: {
      colour: { value: s.colour },
      ...(s.peak === undefined ? {} : { peakWavelength: { typ: s.peak, conditions: at } }),
      forwardVoltage: { typ: s.vf[0], max: s.vf[1], conditions: at },
      forwardCurrent: { typ: s.current?.[0] ?? 20e-3, max: s.current?.[1] ?? 30e-3 },
      ...(s.intensity === undefined ? {} : { luminousIntensity: { typ: s.intensity, conditions: at } }),
      viewingAngle: { typ: s.angle },
      ledPackage: { value: s.size },
      lens: { value: s.lens },
    },
  };
}

const LEDS: PartCreateBody[] = [
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR5-RD-D',
    description:
      'Diffused 5 mm red indicator with a wide, even glow that reads well from any angle. The usual bypass lamp on a pedal enclosure.',
    colour: 'red',
    peak: 630e-9,
    vf: [2.0, 2.6],
    intensity: 0.08,
    angle: 60,
    size: '5mm',
    lens: 'diffused',
    tags: ['indicator', 'bypass'],
  }),
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR5-RD-HB',
    description:
      'High-brightness 5 mm red LED in a water-clear lens with a narrow beam. Drives CdSe cells efficiently in home-made optocouplers.',
    colour: 'red',
    peak: 625e-9,
    vf: [2.0, 2.6],
    intensity: 8,
    angle: 15,
    size: '5mm',
    lens: 'clear',
    tags: ['ldr-drive', 'tremolo'],
  }),
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR5-YG-C',
    description:
      'Yellow-green 5 mm LED whose emission lines up with the peak response of CdS cells. Modest brightness, but most of its light lands where the cell is most sensitive.',
    colour: 'green',
    peak: 570e-9,
    vf: [2.1, 2.6],
    intensity: 0.25,
    angle: 30,
    size: '5mm',
    lens: 'clear',
    tags: ['ldr-drive', 'tremolo', 'compressor'],
  }),
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR5-GN-HB',
    description:
      'Very bright true-green 5 mm LED with a narrow beam, a strong light source for CdS tremolo cells. Needs a higher forward voltage than red or yellow-green parts.',
    colour: 'green',
    peak: 525e-9,
    vf: [3.2, 3.8],
    intensity: 12,
    angle: 15,
    size: '5mm',
    lens: 'clear',
    tags: ['ldr-drive', 'tremolo'],
  }),
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR5-BL-C',
    description:
      'Bright blue 5 mm indicator in a clear lens. At full current it can dazzle on a dark stage, so most builds run it at a few milliamps.',
    colour: 'blue',
    peak: 470e-9,
    vf: [3.2, 3.8],
    intensity: 6,
    angle: 20,
    size: '5mm',
    lens: 'clear',
    tags: ['indicator'],
  }),
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR5-WH-C',
    description:
      'Cool-white 5 mm LED with a broad spectrum that lights both CdS and CdSe cells. Also a bright status lamp.',
    colour: 'white',
    vf: [3.1, 3.6],
    intensity: 10,
    angle: 20,
    size: '5mm',
    lens: 'clear',
    tags: ['indicator', 'ldr-drive'],
  }),
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR3-OR-D',
    description:
      'Diffused 3 mm orange LED for compact panels and rate-indicator blinkers. Soft and readable rather than bright.',
    colour: 'orange',
    peak: 605e-9,
    vf: [2.0, 2.5],
    intensity: 0.05,
    angle: 60,
    size: '3mm',
    lens: 'diffused',
    tags: ['indicator', 'lfo'],
  }),
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR3-AM-D',
    description:
      'Diffused 3 mm amber LED, a warm rate indicator that pulses with the LFO. Last-time buy; the orange LR3-OR-D is the closest continuing part.',
    lifecycle: 'last-time-buy',
    colour: 'amber',
    peak: 590e-9,
    vf: [2.0, 2.5],
    intensity: 0.12,
    angle: 50,
    size: '3mm',
    lens: 'diffused',
    tags: ['indicator', 'lfo'],
  }),
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR3-YE-T',
    description:
      'Yellow 3 mm LED in a tinted lens that looks yellow even when off. Obsolete.',
    lifecycle: 'obsolete',
    colour: 'yellow',
    peak: 588e-9,
    vf: [2.0, 2.5],
    intensity: 0.3,
    angle: 40,
    size: '3mm',
    lens: 'tinted',
    tags: ['indicator'],
  }),
  led({
    manufacturer: 'Lumen Row',
    partNumber: 'LR5-IR-940',
    description:
      'Infrared 5 mm emitter at 940 nm for optical switches and sensors. Invisible to the eye and to CdS cells alike, so it is no use for LDR tremolos. Not recommended for new designs.',
    lifecycle: 'nrnd',
    colour: 'infrared',
    peak: 940e-9,
    vf: [1.2, 1.5],
    current: [20e-3, 50e-3],
    angle: 30,
    size: '5mm',
    lens: 'clear',
    tags: ['sensor', 'infrared'],
  }),
  led({
    manufacturer: 'Fenwick Photonics',
    partNumber: 'FNW-0603-RD',
    description:
      'Tiny 0603 red indicator for status lights on surface-mount boards. Wide viewing angle; bright enough behind a light pipe.',
    colour: 'red',
    peak: 632e-9,
    vf: [1.9, 2.4],
    current: [20e-3, 25e-3],
    intensity: 0.06,
    angle: 120,
    size: '0603',
    lens: 'clear',
    tags: ['indicator', 'smd'],
  }),
  led({
    manufacturer: 'Fenwick Photonics',
    partNumber: 'FNW-0805-BL',
    description:
      'Blue 0805 surface-mount LED for status lights and edge-lit panels. Brighter per milliamp than the red 0603, so it often runs at a lower current.',
    colour: 'blue',
    peak: 468e-9,
    vf: [2.9, 3.5],
    current: [20e-3, 25e-3],
    intensity: 0.1,
    angle: 120,
    size: '0805',
    lens: 'clear',
    tags: ['indicator', 'smd'],
  }),
  led({
    manufacturer: 'Fenwick Photonics',
    partNumber: 'FNW-1206-UV',
    description:
      'Near-ultraviolet 1206 LED for checking fluorescent markings and curing small spots of UV adhesive. Do not look into the beam.',
    colour: 'ultraviolet',
    peak: 400e-9,
    vf: [3.3, 3.9],
    current: [20e-3, 30e-3],
    angle: 120,
    size: '1206',
    lens: 'clear',
    tags: ['smd', 'ultraviolet'],
  }),
];

// ---------------------------------------------------------------------------------------------------------------
// Potentiometers

interface PotSpec extends Common {
  resistance: number;
  taper: 'linear' | 'log' | 'reverse-log';
  tolerance?: number;
  power: number;
  gangs?: 1 | 2;
  /** Body size in mm: 9, 16 or 24. */
  body: 9 | 16 | 24;
  shaft: 'knurled' | 'd-flat' | 'smooth' | 'slotted';
  /** Shaft length in mm. */
  shaftLength: number;
  mounting: 'pcb-vertical' | 'pcb-right-angle' | 'solder-lug' | 'panel';
  detent?: boolean;
}

function pot(s: PotSpec): PartCreateBody {
  const gangs = s.gangs ?? 1;
  return {
    family: 'potentiometer',
    manufacturer: s.manufacturer,
    partNumber: s.partNumber,
    description: s.description,
    lifecycle: s.lifecycle ?? 'active',
    rohsStatus: 'compliant',
    package: `pot-${s.body}mm`,
    pinLayout: gangs === 2 ? 'pot-dual-6lug' : 'pot-3lug',
    tags: s.tags,
    parameters: {
      resistance: { typ: s.resistance },
      taper: { value: s.taper },
      tolerance: { typ: s.tolerance ?? 20 },
      powerRating: { max: s.power },
      gangs: { typ: gangs },
      bodySize: { typ: s.body * 1e-3 },
      shaftType: { value: s.shaft },
      shaftLength: { typ: s.shaftLength * 1e-3 },
      mounting: { value: s.mounting },
      centreDetent: { value: s.detent ?? false },
    },
  };
}

const POTS: PartCreateBody[] = [
  pot({
    manufacturer: 'Tessaly Components',
    partNumber: 'TS9-B1K',
    description:
      'Miniature 9 mm linear pot at 1 kΩ, board-mounted. Sets LED brightness in an optocoupler drive or trims a bias point.',
    resistance: 1e3,
    taper: 'linear',
    power: 0.05,
    body: 9,
    shaft: 'knurled',
    shaftLength: 15,
    mounting: 'pcb-vertical',
    tags: ['trim', 'bias', 'ldr-drive'],
  }),
  pot({
    manufacturer: 'Tessaly Components',
    partNumber: 'TS9-B4K7',
    description:
      'Right-angle 9 mm linear pot at 4.7 kΩ for front-panel boards. Not recommended for new designs; the vertical 9 mm range continues.',
    lifecycle: 'nrnd',
    resistance: 4.7e3,
    taper: 'linear',
    power: 0.05,
    body: 9,
    shaft: 'd-flat',
    shaftLength: 15,
    mounting: 'pcb-right-angle',
    tags: ['depth', 'trim'],
  }),
  pot({
    manufacturer: 'Tessaly Components',
    partNumber: 'TS9-A47K',
    description:
      'Compact 9 mm audio-taper pot at 47 kΩ for level controls on crowded boards. The log law makes the level change feel even across the rotation.',
    resistance: 47e3,
    taper: 'log',
    power: 0.025,
    body: 9,
    shaft: 'knurled',
    shaftLength: 15,
    mounting: 'pcb-vertical',
    tags: ['level', 'volume'],
  }),
  pot({
    manufacturer: 'Tessaly Components',
    partNumber: 'TS16-B10K',
    description:
      '16 mm linear pot at 10 kΩ with a D-flat shaft, mounted straight onto the board. A common depth or intensity control.',
    resistance: 10e3,
    taper: 'linear',
    power: 0.125,
    body: 16,
    shaft: 'd-flat',
    shaftLength: 20,
    mounting: 'pcb-vertical',
    tags: ['depth', 'intensity'],
  }),
  pot({
    manufacturer: 'Tessaly Components',
    partNumber: 'TS16-A22K',
    description:
      '16 mm audio-taper pot at 22 kΩ on right-angle pins. Suits tone and blend controls feeding a low-impedance stage.',
    resistance: 22e3,
    taper: 'log',
    power: 0.0625,
    body: 16,
    shaft: 'knurled',
    shaftLength: 20,
    mounting: 'pcb-right-angle',
    tags: ['tone', 'blend'],
  }),
  pot({
    manufacturer: 'Tessaly Components',
    partNumber: 'TS16-C25K',
    description:
      '16 mm reverse-log pot at 25 kΩ, the usual rate control for an LFO: fine adjustment at slow speeds, a quick climb to fast ones.',
    resistance: 25e3,
    taper: 'reverse-log',
    power: 0.0625,
    body: 16,
    shaft: 'knurled',
    shaftLength: 20,
    mounting: 'pcb-vertical',
    tags: ['rate', 'lfo', 'tremolo'],
  }),
  pot({
    manufacturer: 'Tessaly Components',
    partNumber: 'TS16-B50K-CD',
    description:
      '16 mm linear pot at 50 kΩ with a click at mid-travel, for blend and balance controls where the centre should be easy to find.',
    resistance: 50e3,
    taper: 'linear',
    power: 0.125,
    body: 16,
    shaft: 'knurled',
    shaftLength: 20,
    mounting: 'pcb-vertical',
    detent: true,
    tags: ['blend', 'balance', 'detent'],
  }),
  pot({
    manufacturer: 'Tessaly Components',
    partNumber: 'TS16-DA100K',
    description:
      'Dual-gang 16 mm audio-taper pot at 100 kΩ per track, both tracks on one shaft. For stereo level controls and two-stage sweeps.',
    resistance: 100e3,
    taper: 'log',
    power: 0.0625,
    gangs: 2,
    body: 16,
    shaft: 'knurled',
    shaftLength: 20,
    mounting: 'pcb-vertical',
    tags: ['ganged', 'stereo', 'vibe'],
  }),
  pot({
    manufacturer: 'Orrin & Vale',
    partNumber: 'OV24-DB220K',
    description:
      'Dual-gang 24 mm linear pot at 220 kΩ with solder lugs, for manually swept phasers and filters that need two tracks moving together.',
    resistance: 220e3,
    taper: 'linear',
    tolerance: 10,
    power: 0.5,
    gangs: 2,
    body: 24,
    shaft: 'smooth',
    shaftLength: 25,
    mounting: 'solder-lug',
    tags: ['ganged', 'phaser', 'sweep'],
  }),
  pot({
    manufacturer: 'Orrin & Vale',
    partNumber: 'OV24-A250K',
    description:
      'Full-size 24 mm audio-taper pot at 250 kΩ with solder lugs and a smooth shaft. The traditional volume control after a high-impedance stage.',
    resistance: 250e3,
    taper: 'log',
    tolerance: 10,
    power: 0.25,
    body: 24,
    shaft: 'smooth',
    shaftLength: 25,
    mounting: 'solder-lug',
    tags: ['volume', 'tone'],
  }),
  pot({
    manufacturer: 'Orrin & Vale',
    partNumber: 'OV24-A500K',
    description:
      '24 mm audio-taper pot at 500 kΩ with solder lugs, a volume or tone control ahead of a JFET buffer. Obsolete; the 250 kΩ version remains.',
    lifecycle: 'obsolete',
    resistance: 500e3,
    taper: 'log',
    tolerance: 10,
    power: 0.25,
    body: 24,
    shaft: 'smooth',
    shaftLength: 25,
    mounting: 'solder-lug',
    tags: ['volume', 'tone'],
  }),
  pot({
    manufacturer: 'Orrin & Vale',
    partNumber: 'OV24-B1M',
    description:
      '24 mm linear pot at 1 MΩ with a slotted shaft, fixed through the panel. Sets input impedance or a slow envelope release.',
    resistance: 1e6,
    taper: 'linear',
    power: 0.5,
    body: 24,
    shaft: 'slotted',
    shaftLength: 15,
    mounting: 'panel',
    tags: ['trim', 'envelope', 'compressor'],
  }),
];

// ---------------------------------------------------------------------------------------------------------------
// Resistive optocouplers

interface OptoSpec extends Common {
  material: 'cds' | 'cdse' | 'other';
  rohsStatus: RohsStatus;
  /** On resistance [typ, max] at `onCurrent` amps of LED current. */
  on: TypMax;
  onCurrent: number;
  /** Off resistance (min) `offTime` seconds after the LED goes dark. */
  off: number;
  offTime: number;
  ledVf: TypMax;
  ledMax: number;
  turnOn: number;
  turnOff: number;
}

function optocoupler(s: OptoSpec): PartCreateBody {
  return {
    family: 'optocoupler',
    manufacturer: s.manufacturer,
    partNumber: s.partNumber,
    description: s.description,
    lifecycle: s.lifecycle ?? 'active',
    rohsStatus: s.rohsStatus,
    rohsNote: s.rohsStatus === 'exempt' ? EXEMPT_NOTE : s.rohsStatus === 'non-compliant' ? NON_COMPLIANT_NOTE : '',
    package: 'opto-4lead',
    pinLayout: 'optocoupler-4lead',
    tags: s.tags,
    parameters: {
      onResistance: { typ: s.on[0], max: s.on[1], conditions: { current: s.onCurrent } },
      offResistance: { min: s.off, conditions: { time: s.offTime } },
      ledForwardVoltage: { typ: s.ledVf[0], max: s.ledVf[1], conditions: { current: 20e-3 } },
      ledMaxCurrent: { max: s.ledMax },
      turnOnTime: { typ: s.turnOn, conditions: { current: s.onCurrent } },
      turnOffTime: { typ: s.turnOff },
      cellMaterial: { value: s.material },
    },
  };
}

const OPTOCOUPLERS: PartCreateBody[] = [
  optocoupler({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-VX2',
    description:
      'Sealed LED and CdS cell with a low on resistance and a moderate release. A good gain element for optical compressors and for tremolos that need real depth.',
    material: 'cds',
    rohsStatus: 'exempt',
    on: [200, 400],
    onCurrent: 20e-3,
    off: 10e6,
    offTime: 5,
    ledVf: [1.8, 2.2],
    ledMax: 40e-3,
    turnOn: 2.5e-3,
    turnOff: 35e-3,
    tags: ['compressor', 'tremolo', 'optical'],
  }),
  optocoupler({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-VX3',
    description:
      'CdS optocoupler with a deliberately slow recovery of over a second, for programme-dependent levelling where a fast release would pump. Too slow for tremolo.',
    material: 'cds',
    rohsStatus: 'exempt',
    on: [3e3, 6e3],
    onCurrent: 10e-3,
    off: 50e6,
    offTime: 10,
    ledVf: [1.8, 2.2],
    ledMax: 40e-3,
    turnOn: 5e-3,
    turnOff: 1.5,
    tags: ['compressor', 'leveller', 'optical'],
  }),
  optocoupler({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-VX5C',
    description:
      'Fast CdSe optocoupler that follows an LFO cleanly up to quick tremolo rates. Sets the depth in a four-cell vibe or phaser when used as matched sets.',
    material: 'cdse',
    rohsStatus: 'exempt',
    on: [1e3, 2e3],
    onCurrent: 10e-3,
    off: 100e6,
    offTime: 10,
    ledVf: [1.8, 2.2],
    ledMax: 40e-3,
    turnOn: 3.5e-3,
    turnOff: 10e-3,
    tags: ['tremolo', 'vibe', 'phaser', 'optical'],
  }),
  optocoupler({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-VX7',
    description:
      'CdSe optocoupler with a wider resistance span, reaching a few hundred ohms at full LED drive. Not recommended for new designs.',
    lifecycle: 'nrnd',
    material: 'cdse',
    rohsStatus: 'non-compliant',
    on: [400, 900],
    onCurrent: 20e-3,
    off: 20e6,
    offTime: 10,
    ledVf: [1.9, 2.3],
    ledMax: 40e-3,
    turnOn: 3e-3,
    turnOff: 15e-3,
    tags: ['tremolo', 'optical'],
  }),
  optocoupler({
    manufacturer: 'Brightwater Optics',
    partNumber: 'BW-VX9',
    description:
      'High-resistance CdS optocoupler made for very low LED currents, with an off resistance in the hundreds of megohms. Obsolete; the BW-VX3 is the nearest continuing part for slow work.',
    lifecycle: 'obsolete',
    material: 'cds',
    rohsStatus: 'non-compliant',
    on: [10e3, 20e3],
    onCurrent: 1e-3,
    off: 400e6,
    offTime: 10,
    ledVf: [1.6, 2.0],
    ledMax: 25e-3,
    turnOn: 10e-3,
    turnOff: 0.5,
    tags: ['compressor', 'optical', 'vintage'],
  }),
  optocoupler({
    manufacturer: 'Fenwick Photonics',
    partNumber: 'FNW-OC1',
    description:
      'Cadmium-free resistive optocoupler built around a photodiode-driven resistive element. Very fast and RoHS compliant, but its off resistance is far lower than a CdS cell, which limits tremolo depth.',
    material: 'other',
    rohsStatus: 'compliant',
    on: [600, 1.2e3],
    onCurrent: 10e-3,
    off: 1e6,
    offTime: 1,
    ledVf: [1.7, 2.1],
    ledMax: 30e-3,
    turnOn: 1e-3,
    turnOff: 2e-3,
    tags: ['cadmium-free', 'tremolo', 'optical'],
  }),
];

/** The whole demo library, grouped by family. */
export const DEMO_PARTS: PartCreateBody[] = [...OP_AMPS, ...PHOTORESISTORS, ...LEDS, ...POTS, ...OPTOCOUPLERS];

/** Part numbers the search tests lean on: a spaced lookup and a pair one keystroke apart. */
export const DEMO_SEARCH_EXAMPLES = {
  /** Typed with a space and lower case, it must still find CV2207 (and not KL 2207). */
  spacedQuery: 'cv 2207',
  spacedMatch: 'CV2207',
  /** Two real catalog entries differing in one character. */
  nearIdentical: ['QM-071D', 'QM-072D'],
} as const;
