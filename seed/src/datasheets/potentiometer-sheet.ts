import { makersFor } from './invented-names';
import { numberText } from './quantity-text';
import { lowerFirst, measuredRow, withArticle, type CharRow, type SheetContent } from './sheet-model';
import type { Variations } from './variations';

export type Taper = 'linear' | 'log' | 'reverse-log';

export interface PotentiometerPart {
  partNumber: string;
  manufacturer: string;
  resistance: number;
  taper: Taper;
  /** ± percent. */
  tolerance: number;
  power: number;
  gangs: 1 | 2;
  bodySize: number;
  shaft: 'knurled' | 'd-flat' | 'smooth' | 'slotted';
  shaftLength: number;
  mounting: 'pcb-vertical' | 'pcb-right-angle' | 'solder-lug' | 'panel';
  centreDetent: boolean;
}

const MINUS = '−';

const RESISTANCES = [1e3, 5e3, 10e3, 20e3, 25e3, 50e3, 100e3, 250e3, 500e3, 1e6];

export function inventPotentiometer(v: Variations): PotentiometerPart {
  const { rng } = v;
  const gangs = v.choose('gangs', [1, 1, 2] as const);
  const taper = v.choose('taper', ['linear', 'log', 'reverse-log'] as const);
  const resistance = rng.pick(RESISTANCES);
  const bodySize = rng.pick([9, 16, 24]);
  const maker = rng.pick(makersFor('potentiometer'));
  return {
    partNumber: maker.partNumber(rng, { gangs, resistance, bodySize }),
    manufacturer: maker.name,
    resistance,
    taper,
    tolerance: rng.pick([10, 20, 20, 30]),
    power: bodySize === 9 ? rng.pick([0.05, 0.1]) : bodySize === 16 ? rng.pick([0.125, 0.2, 0.25]) : rng.pick([0.25, 0.5, 1]),
    gangs,
    bodySize: bodySize * 1e-3,
    shaft: rng.pick(['knurled', 'd-flat', 'smooth', 'slotted'] as const),
    shaftLength: rng.pick([15, 20, 25]) * 1e-3,
    mounting: bodySize === 24 ? 'solder-lug' : rng.pick(['pcb-vertical', 'pcb-right-angle', 'panel'] as const),
    centreDetent: rng.chance(0.2),
  };
}

const TAPER_TEXT: Record<Taper, { long: string[]; short: string[] }> = {
  linear: { long: ['Linear (B)', 'Linear', 'Linear law, 50 % at mid-rotation'], short: ['Linear', 'Lin', 'B (lin)'] },
  log: { long: ['Logarithmic (A), 15 % at mid-rotation', 'Audio taper (log)', 'Logarithmic'], short: ['Log', 'A (log)', 'Audio'] },
  'reverse-log': { long: ['Reverse logarithmic (C)', 'Reverse audio taper', 'Anti-logarithmic'], short: ['Rev. log', 'C (rev. log)', 'Anti-log'] },
};

export function buildPotentiometerSheet(part: PotentiometerPart, v: Variations): SheetContent {
  const { rng } = v;
  const pn = part.partNumber;
  const size = `${numberText(part.bodySize * 1e3)} mm`;
  const gangWord = part.gangs === 2 ? rng.pick(['Dual-gang', 'Stereo (dual-gang)', 'Two-gang']) : rng.pick(['Single-gang', 'Mono']);
  const mountingWord = part.mounting === 'solder-lug' ? 'solder-lug' : part.mounting === 'panel' ? 'panel-mount' : 'PCB-mount';
  const description = `${gangWord} ${size} ${mountingWord} rotary potentiometer`;
  const taperPlacement = v.choose('taper-placement', ['table', 'table', 'prose'] as const);
  const gangsRow = v.flag('gangs-row', 1, 2);
  const seriesTable = v.flag('decoy:series-values', 1, 2);
  const tolerancePlus = v.flag('tolerance-plus-minus', 2, 3);

  const resistance = measuredRow({ parameter: rng.pick(['Total resistance', 'Resistance', 'Nominal resistance']), symbol: 'RT', conditions: 'terminals 1–3', key: 'resistance', dim: 'Ω', si: { typ: part.resistance }, prefixes: ['M', 'k', ''], prefer: part.resistance >= 1e6 && rng.chance(0.5) ? 'k' : undefined, phrase: 'the total track resistance' });
  const tolerance = measuredRow({ parameter: 'Resistance tolerance', key: 'tolerance', dim: '%', si: { typ: part.tolerance }, prefixes: [''], plusMinus: tolerancePlus, phrase: 'the tolerance of the total resistance' });
  const power = measuredRow({ parameter: rng.pick(['Rated power', 'Power rating', 'Rated dissipation']), conditions: 'at 70 °C', key: 'powerRating', dim: 'W', si: { max: part.power }, prefixes: ['', 'm'], prefer: rng.pick(['', 'm']), phrase: 'the power across the whole track' });
  const taperShort = rng.pick(TAPER_TEXT[part.taper].short);
  const taperLong = rng.pick(TAPER_TEXT[part.taper].long);
  const taper: CharRow = {
    parameter: rng.pick(['Taper', 'Resistance taper', 'Resistance law']),
    unit: '',
    values: {},
    text: taperShort,
    listText: taperLong,
    truth: { key: 'taper', value: part.taper },
    sentence: `The track follows a ${part.taper === 'linear' ? 'linear' : part.taper === 'log' ? 'logarithmic (audio)' : 'reverse logarithmic'} resistance law.`,
  };
  const gangs = measuredRow({ parameter: 'Number of gangs', key: 'gangs', dim: '', si: { typ: part.gangs }, prefixes: [''] });
  const residual = measuredRow({ parameter: 'Residual resistance', conditions: 'wiper at either end', dim: 'Ω', si: { max: 20 }, prefixes: [''] });
  const insulation = measuredRow({ parameter: 'Insulation resistance', conditions: '250 V DC', dim: 'Ω', si: { min: 100e6 }, prefixes: ['M'] });
  const dielectric = { parameter: 'Dielectric withstanding voltage', conditions: '1 minute', unit: 'V AC', values: { min: '500' } } satisfies CharRow;
  const maxVoltage = { parameter: 'Maximum operating voltage', unit: 'V', values: { max: part.bodySize < 0.012 ? '50' : '200' } } satisfies CharRow;
  const noise = { parameter: 'Sliding noise', unit: 'mV', values: { max: '47' } } satisfies CharRow;
  const tracking = { parameter: 'Gang tracking error', conditions: `${MINUS}40 dB to 0 dB`, unit: 'dB', values: { max: '3' } } satisfies CharRow;
  const electrical: CharRow[] = [
    resistance,
    tolerance,
    ...(taperPlacement === 'table' ? [taper] : []),
    power,
    ...(gangsRow ? [gangs] : []),
    residual,
    insulation,
    dielectric,
    maxVoltage,
    noise,
    ...(part.gangs === 2 ? [tracking] : []),
  ];
  const mechanical: CharRow[] = [
    { parameter: 'Total rotation angle', unit: '°', values: { typ: '300' }, conditions: '±5°' },
    { parameter: 'Rotational torque', unit: 'mN·m', values: { min: '10', max: '100' } },
    { parameter: 'Rotational life', unit: 'cycles', values: { min: '15000' } },
    { parameter: 'Shaft length from mounting face', unit: 'mm', values: { typ: numberText(part.shaftLength * 1e3) } },
    { parameter: 'Body size', unit: 'mm', values: { typ: numberText(part.bodySize * 1e3) } },
    ...(part.centreDetent ? [{ parameter: 'Centre detent', unit: '', values: {}, text: 'Yes' } satisfies CharRow] : []),
  ];

  const codes = seriesTable ? [1e3, 10e3, 50e3, 100e3, 500e3, 1e6] : [];
  const code = (ohms: number) => {
    const exp = Math.floor(Math.log10(ohms)) - 1;
    return `${Math.round(ohms / 10 ** exp)}${exp}`;
  };
  return {
    family: 'potentiometer',
    partNumber: pn,
    manufacturer: part.manufacturer,
    description,
    features: [
      `${size} body, ${part.shaft === 'd-flat' ? 'D-flat' : part.shaft} shaft`,
      `${part.gangs === 2 ? 'Two tracks on one shaft for stereo controls' : 'One carbon track'}`,
      part.centreDetent ? 'Centre detent' : 'Smooth rotation without detent',
      'Carbon film track with precious-metal wiper',
    ],
    overview: [
      `The ${pn} is ${withArticle(lowerFirst(description))} for volume, tone and effect controls. The track is carbon film on a phenolic substrate with a multi-finger wiper for low noise.`,
      `${part.gangs === 2 ? 'Both gangs are matched for tracking, so stereo levels stay together across the rotation.' : 'Terminal 1 is the counter-clockwise end, terminal 2 the wiper and terminal 3 the clockwise end.'}`,
    ],
    applications: ['Volume and gain controls', 'Tone and filter controls', 'LFO rate and depth', 'Trim controls'],
    pinout: {
      title: 'Terminals (viewed from the shaft side)',
      rows:
        part.gangs === 2
          ? [['1', 'A1', 'Gang A, CCW end'], ['2', 'A2', 'Gang A, wiper'], ['3', 'A3', 'Gang A, CW end'], ['4', 'B1', 'Gang B, CCW end'], ['5', 'B2', 'Gang B, wiper'], ['6', 'B3', 'Gang B, CW end']]
          : [['1', 'CCW', 'Counter-clockwise end'], ['2', 'W', 'Wiper'], ['3', 'CW', 'Clockwise end']],
    },
    absoluteMax: [],
    primary: { title: rng.pick(['Specifications', 'Electrical characteristics', 'Ratings and characteristics']), subtitle: 'TA = 25 °C, relative humidity 45 % to 85 %', groups: [{ title: 'Electrical', rows: electrical }, { title: 'Mechanical', rows: mechanical }] },
    alternates: [],
    statements: taperPlacement === 'prose' ? [{ text: taper.sentence!, truth: [taper.truth!] }] : [],
    titleTruth: [{ key: 'gangs', si: { typ: part.gangs } }],
    applicationNotes: [
      `For a passive volume control after a guitar pickup, ${part.taper === 'log' ? 'this audio taper' : 'an audio taper'} part of 250 kΩ to 500 kΩ is usual. A 1 MΩ resistor from wiper to ground sets the minimum load when the control is turned up.`,
      `Ground the metal body through the mounting nut to reduce hum. Do not solder the lugs for more than 3 s at 350 °C.`,
      ...(codes.length
        ? [`Other values in the series: ${codes.map((r) => `${code(r)} (${numberText(r >= 1e6 ? r / 1e6 : r / 1e3)} ${r >= 1e6 ? 'MΩ' : 'kΩ'})`).join(', ')}.`]
        : []),
    ],
    graphs: [
      { caption: 'Figure 1. Resistance vs rotation', xLabel: 'Rotation (%)', yLabel: 'Resistance (%)', xTicks: ['0', '25', '50', '75', '100'], yTicks: ['0', '50', '100'], curve: part.taper === 'linear' ? [0, 0.25, 0.5, 0.75, 1] : part.taper === 'log' ? [0, 0.05, 0.15, 0.4, 1] : [0, 0.6, 0.85, 0.95, 1] },
      { caption: 'Figure 2. Rotational torque vs temperature', xLabel: 'Temperature (°C)', yLabel: 'Torque (mN·m)', xTicks: ['−20', '0', '20', '40', '60'], yTicks: ['0', '50', '100'], curve: [0.8, 0.55, 0.4, 0.35, 0.3] },
    ],
    packageName: `${size} body`,
    dimensions: [
      { symbol: 'A', min: '', nom: numberText(part.bodySize * 1e3), max: '' },
      { symbol: 'B', min: '', nom: numberText(part.shaftLength * 1e3), max: '' },
      { symbol: 'C', min: '5.9', nom: '6.0', max: '6.1' },
      { symbol: 'H', min: '', nom: numberText(part.bodySize * 1e3 * 0.6), max: '' },
    ],
    ordering: [
      { code: pn, package: `${size}`, marking: code(part.resistance), packing: 'Tray, 100 pcs' },
      { code: `${pn}-K`, package: `${size}, with knob`, marking: code(part.resistance), packing: 'Tray, 50 pcs' },
    ],
  };
}
