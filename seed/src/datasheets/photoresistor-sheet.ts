import { makersFor } from './invented-names';
import { numberText } from './quantity-text';
import { lowerFirst, measuredRow, withArticle, type AbsRow, type AlternateTable, type CharRow, type SheetContent } from './sheet-model';
import type { Variations } from './variations';

export interface PhotoresistorPart {
  partNumber: string;
  manufacturer: string;
  material: 'cds' | 'cdse' | 'other';
  dark: readonly [min: number, typ: number];
  /** At 10 lx. */
  light: readonly [min: number, max: number];
  gamma: number;
  peak: number;
  rise: number;
  decay: number;
  maxVoltage: number;
  power: number;
  diameter: number;
}

const MINUS = '−';
const r2 = (x: number) => Number(x.toPrecision(2));

export function inventPhotoresistor(v: Variations): PhotoresistorPart {
  const { rng } = v;
  const material = v.choose('cell-material', ['cds', 'cds', 'cdse', 'other'] as const);
  const light = rng.pick([[2, 6], [3, 7], [5, 15], [8, 15], [10, 20], [15, 30], [20, 60], [50, 100], [100, 200]] as const);
  const darkMin = rng.pick([0.2, 0.5, 1, 2, 5, 10]) * 1e6;
  const rise = rng.pick(material === 'other' ? [1.5, 2, 3] : material === 'cdse' ? [5, 8, 10] : [20, 25, 30, 45, 60]) * 1e-3;
  const maker = rng.pick(makersFor('photoresistor'));
  return {
    partNumber: maker.partNumber(rng, {}),
    manufacturer: maker.name,
    material,
    dark: [darkMin, darkMin * rng.pick([2, 2.5, 4])],
    light: [light[0] * 1e3, light[1] * 1e3],
    gamma: rng.pick([0.5, 0.55, 0.6, 0.7, 0.75, 0.8, 0.85]),
    peak: rng.pick(material === 'cdse' ? [690, 720] : [520, 540, 550, 560, 580, 600]) * 1e-9,
    rise,
    decay: r2(rise * rng.pick([1.5, 2, 3])),
    maxVoltage: rng.pick([50, 100, 150, 200, 250, 320]),
    power: rng.pick([0.05, 0.09, 0.1, 0.2, 0.25, 0.5]),
    diameter: rng.pick([3, 4, 5, 7, 12]) * 1e-3,
  };
}

export function buildPhotoresistorSheet(part: PhotoresistorPart, v: Variations): SheetContent {
  const { rng } = v;
  const pn = part.partNumber;
  const materialName = part.material === 'cds' ? 'cadmium sulphide (CdS)' : part.material === 'cdse' ? 'cadmium selenide (CdSe)' : 'cadmium-free';
  const size = `${numberText(part.diameter * 1e3)} mm`;
  const description =
    part.material === 'other'
      ? `${size} cadmium-free light-dependent resistor`
      : rng.pick([`${size} ${part.material === 'cds' ? 'CdS' : 'CdSe'} photoconductive cell`, `${size} ${part.material === 'cds' ? 'CdS' : 'CdSe'} photoresistor`]);
  const loneMin = v.flag('lone-values', 1, 2);
  const extraSlot = v.flag('slot-outside-definition', 1, 3);
  const limits = v.choose('limits-placement', ['absolute-maximum-only', 'both', 'characteristics-only', 'prose'] as const);
  const at100 = v.flag('decoy:light-resistance-at-100-lx', 1, 2);

  const light = measuredRow({
    parameter: 'Light resistance',
    symbol: 'R10',
    conditions: rng.pick(['10 lx, 2856 K', 'E = 10 lx, colour temperature 2856 K', 'at 10 lux']),
    conditionsMatter: at100,
    key: 'lightResistance',
    dim: 'Ω',
    si: extraSlot ? { min: part.light[0], typ: r2(Math.sqrt(part.light[0] * part.light[1])), max: part.light[1] } : { min: part.light[0], max: part.light[1] },
    prefixes: ['k', ''],
    phrase: 'the resistance at 10 lx',
  });
  const light100 = measuredRow({ parameter: 'Light resistance', symbol: 'R100', conditions: '100 lx, 2856 K', conditionsMatter: true, dim: 'Ω', si: { typ: r2(part.light[1] * 10 ** -part.gamma) }, prefixes: ['k', ''] });
  const dark = measuredRow({
    parameter: 'Dark resistance',
    symbol: 'RD',
    conditions: rng.pick(['10 s after removal of 10 lx', '10 s after switching off the light', 'after 10 s in darkness']),
    key: 'darkResistance',
    dim: 'Ω',
    si: loneMin ? { min: part.dark[0] } : { min: part.dark[0], typ: part.dark[1] },
    prefixes: ['M', 'k'],
    prefer: rng.pick(['M', 'k']),
    phrase: 'the dark resistance',
  });
  const gamma = measuredRow({
    parameter: rng.pick(['Gamma', 'Gamma (slope)', 'Sensitivity slope γ']),
    symbol: 'γ',
    conditions: '10 lx to 100 lx',
    key: 'gamma',
    dim: '',
    si: extraSlot ? { min: r2(part.gamma - 0.1), typ: part.gamma } : { typ: part.gamma },
    prefixes: [''],
    phrase: 'the gamma between 10 lx and 100 lx',
  });
  const peak = measuredRow({ parameter: 'Peak spectral response', symbol: 'λp', key: 'peakWavelength', dim: 'm', si: { typ: part.peak }, prefixes: ['n'], phrase: 'the peak spectral response' });
  const range = { parameter: 'Spectral response range', symbol: 'Δλ', unit: 'nm', values: { min: numberText(Math.round(part.peak * 1e9 - 150)), max: numberText(Math.round(part.peak * 1e9 + 160)) } } satisfies CharRow;
  const rise = measuredRow({ parameter: 'Rise time', symbol: 'tr', conditions: '10 lx, to 63 % of final value', key: 'riseTime', dim: 's', si: { typ: part.rise }, prefixes: ['m'], phrase: 'the rise time' });
  const decay = measuredRow({ parameter: rng.pick(['Decay time', 'Fall time']), symbol: 'td', conditions: '10 lx to dark, to 37 %', key: 'decayTime', dim: 's', si: { typ: part.decay }, prefixes: ['m'], phrase: 'the decay time after the light is removed' });
  const tempco = { parameter: 'Temperature coefficient of R10', conditions: `${MINUS}20 °C to +60 °C`, unit: '%/°C', values: { typ: `${MINUS}${rng.pick(['0.4', '0.5', '0.8'])}` } } satisfies CharRow;
  const voltage = measuredRow({ parameter: 'Maximum cell voltage (DC or AC peak)', symbol: 'Vmax', key: 'maxVoltage', dim: 'V', si: { max: part.maxVoltage }, prefixes: [''], phrase: 'the voltage across the cell' });
  const power = measuredRow({ parameter: 'Power dissipation at 25 °C', symbol: 'Pmax', key: 'powerDissipation', dim: 'W', si: { max: part.power }, prefixes: ['m', ''], prefer: rng.pick(['m', '']), phrase: 'the power dissipated in the cell' });

  const cadmium = part.material !== 'other';
  const inCharacteristics = limits === 'both' || limits === 'characteristics-only';
  const inAbsMax = limits === 'both' || limits === 'absolute-maximum-only';
  const absLimit = (row: CharRow, parameter: string, symbol: string): AbsRow => ({
    parameter,
    symbol,
    value: row.values.max!,
    unit: row.unit,
    ...(row.truth ? { truth: row.truth } : {}),
  });
  const absoluteMax: AbsRow[] = [
    ...(inAbsMax ? [absLimit(voltage, rng.pick(['Cell voltage (DC or AC peak)', 'Maximum voltage']), 'VMAX'), absLimit(power, 'Power dissipation', 'PD')] : []),
    { parameter: 'Operating temperature', symbol: 'TA', value: `${MINUS}30 to +70`, unit: '°C' },
    { parameter: 'Storage temperature', symbol: 'TSTG', value: `${MINUS}40 to +75`, unit: '°C' },
    { parameter: 'Lead soldering temperature (3 mm from body, 5 s)', value: '260', unit: '°C' },
  ];

  const characteristics: CharRow[] = [light, ...(at100 ? [light100] : []), dark, gamma, peak, range, rise, decay, tempco, ...(inCharacteristics ? [voltage, power] : [])];

  const warm = (row: CharRow, factor: number): CharRow => ({
    parameter: row.parameter,
    symbol: row.symbol,
    conditions: `${row.conditions ?? ''}${row.conditions ? ', ' : ''}TA = 60 °C`,
    unit: row.unit,
    values: Object.fromEntries(Object.entries(row.values).map(([s, t]) => [s, numberText(Number((Number(t) * factor).toPrecision(2)))])),
  });
  const hot: AlternateTable = {
    kind: 'temperature',
    title: 'Characteristics at TA = 60 °C',
    subtitle: 'Measured after 1 h at 60 °C ambient',
    groups: [{ title: '', rows: [warm(light, 0.8), warm(dark, 0.5), warm(decay, 0.7)] }],
  };

  const derating = numberText(Number(((part.power * 1e3) / 45).toPrecision(2)));
  return {
    family: 'photoresistor',
    partNumber: pn,
    manufacturer: part.manufacturer,
    description,
    features: [
      cadmium ? `${materialName[0]!.toUpperCase()}${materialName.slice(1)} photoconductive element` : 'Photoconductive element with a CdS-like spectral response',
      `Peak response at ${peak.values.typ} nm`,
      'Epoxy-coated, moisture resistant',
      `${size} diameter with 2.54 mm lead spacing option`,
      ...(cadmium ? ['Supplied under the cadmium photocell exemption'] : ['Cadmium-free construction']),
    ],
    overview: [
      `The ${pn} is ${withArticle(lowerFirst(description))} whose resistance falls as the light on it increases. It is intended for LED-driven optical attenuators, tremolo and compressor circuits, light sensing and switching.`,
      `The response follows the light with a short lag on rising light and a longer recovery after the light is removed, which gives optical audio circuits their characteristic smooth envelope.`,
    ],
    applications: ['Optical tremolo and vibrato', 'Optical compressors and limiters', 'Ambient light detection', 'Light-operated switches'],
    pinout: { title: 'Terminals', rows: [['1', 'A', 'Cell terminal (either polarity)'], ['2', 'B', 'Cell terminal (either polarity)']] },
    absoluteMax,
    primary: {
      title: rng.pick(['Electro-optical characteristics', 'Characteristics', 'Optical and electrical characteristics']),
      subtitle: 'TA = 25 °C, light source: tungsten lamp at 2856 K',
      groups: [{ title: 'Resistance and response', rows: characteristics }],
    },
    alternates: [hot],
    statements:
      limits === 'prose'
        ? [
            { text: `The cell may be operated at up to ${voltage.values.max} V (DC or AC peak); higher voltages can break down the cell surface.`, truth: [voltage.truth!] },
            { text: `Power dissipated in the cell must not exceed ${power.values.max} ${power.unit} at 25 °C; derate by ${derating} mW/°C above that.`, truth: [power.truth!] },
          ]
        : [],
    titleTruth: [],
    applicationNotes: [
      `In a tremolo, place the cell as the lower leg of a divider after a 100 kΩ series resistor and light it with a green or yellow-green LED through a 1 kΩ resistor; keep the pair in a light-tight sleeve.`,
      `Resistance depends on light history: a cell kept in the dark for hours reads higher than one measured 10 s after the light was removed. Let cells settle for a few minutes under normal light before matching them.`,
    ],
    graphs: [
      { caption: 'Figure 1. Resistance vs illuminance', xLabel: 'Illuminance (lx)', yLabel: 'Resistance (Ω)', xTicks: ['1', '10', '100', '1000'], yTicks: ['100', '1k', '10k', '100k', '1M'], curve: [0.85, 0.6, 0.4, 0.2] },
      { caption: 'Figure 2. Relative spectral response', xLabel: 'Wavelength (nm)', yLabel: 'Relative response (%)', xTicks: ['400', '500', '600', '700', '800'], yTicks: ['0', '50', '100'], curve: [0.05, 0.6, 0.95, 0.4, 0.05] },
      { caption: 'Figure 3. Resistance recovery after darkness', xLabel: 'Time (s)', yLabel: 'Resistance (MΩ)', xTicks: ['0', '5', '10', '15', '20'], yTicks: ['0', '1', '2', '3'], curve: [0.05, 0.4, 0.6, 0.7, 0.75] },
    ],
    packageName: 'Radial, 2 leads',
    dimensions: [
      { symbol: 'D', min: numberText(part.diameter * 1e3 - 0.2), nom: numberText(part.diameter * 1e3), max: numberText(part.diameter * 1e3 + 0.2) },
      { symbol: 'H', min: '1.8', nom: '2.0', max: '2.4' },
      { symbol: 'L', min: '28', nom: '30', max: '' },
      { symbol: 'P', min: '3.2', nom: '3.4', max: '3.6' },
      { symbol: 'd', min: '', nom: '0.5', max: '' },
    ],
    ordering: [
      { code: pn, package: 'Radial', marking: 'none', packing: 'Bulk, 200 pcs' },
      { code: `${pn}-AM`, package: 'Radial', marking: 'none', packing: 'Ammo pack, 1000 pcs' },
    ],
    ...(cadmium
      ? { caution: 'Caution: this cell contains cadmium. Do not crush, burn or grind it; dispose of it as hazardous waste and follow local regulations.' }
      : {}),
  };
}
