import { makersFor } from './invented-names';
import { numberText } from './quantity-text';
import { lowerFirst, measuredRow, withArticle, type AbsRow, type AlternateTable, type CharRow, type SheetContent } from './sheet-model';
import type { Variations } from './variations';

export type LedColour = 'red' | 'orange' | 'amber' | 'yellow' | 'green' | 'blue' | 'white' | 'infrared' | 'ultraviolet';

export interface LedPart {
  partNumber: string;
  manufacturer: string;
  colour: LedColour;
  /** Marketing colour name for the title, e.g. "yellow-green". */
  colourName: string;
  peak?: number;
  vf: readonly [typ: number, max: number];
  /** Test current and the continuous rating. */
  current: readonly [typ: number, max: number];
  /** On axis, in cd; infrared and ultraviolet parts quote none. */
  intensity?: number;
  angle: number;
  size: '3 mm' | '5 mm' | '0603' | '0805' | '1206';
  lens: 'clear' | 'diffused' | 'tinted';
}

const MINUS = '−';
const r2 = (x: number) => Number(x.toPrecision(2));

const COLOURS: { colour: LedColour; name: string; peaks: number[]; vf: [number, number] }[] = [
  { colour: 'red', name: 'red', peaks: [625, 630, 635, 660], vf: [2.0, 2.6] },
  { colour: 'orange', name: 'orange', peaks: [605, 610], vf: [2.0, 2.5] },
  { colour: 'amber', name: 'amber', peaks: [590, 592], vf: [2.0, 2.5] },
  { colour: 'yellow', name: 'yellow', peaks: [585, 588], vf: [2.0, 2.4] },
  { colour: 'green', name: 'yellow-green', peaks: [565, 570, 572], vf: [2.1, 2.6] },
  { colour: 'green', name: 'true green', peaks: [520, 525], vf: [3.2, 3.8] },
  { colour: 'blue', name: 'blue', peaks: [465, 470], vf: [3.1, 3.6] },
  { colour: 'white', name: 'cool white', peaks: [], vf: [3.0, 3.6] },
  { colour: 'infrared', name: 'infrared', peaks: [850, 940], vf: [1.2, 1.5] },
  { colour: 'ultraviolet', name: 'ultraviolet', peaks: [395, 405], vf: [3.3, 3.9] },
];

export function inventLed(v: Variations): LedPart {
  const { rng } = v;
  const c = v.choose('colour', COLOURS.map((x) => x.name));
  const info = COLOURS.find((x) => x.name === c)!;
  const size = rng.pick(['3 mm', '5 mm', '5 mm', '0603', '0805', '1206'] as const);
  const smd = !size.endsWith('mm');
  const lens = smd ? 'clear' : rng.pick(['clear', 'diffused', 'tinted'] as const);
  const narrow = lens === 'clear' && !smd;
  const visible = info.colour !== 'infrared' && info.colour !== 'ultraviolet';
  const maker = rng.pick(makersFor('led'));
  const vfTyp = info.vf[0] + rng.pick([0, 0.1]);
  return {
    partNumber: maker.partNumber(rng, { colour: info.colour }),
    manufacturer: maker.name,
    colour: info.colour,
    colourName: info.name,
    ...(info.peaks.length ? { peak: rng.pick(info.peaks) * 1e-9 } : {}),
    vf: [Number(vfTyp.toFixed(1)), info.vf[1]],
    current: smd ? [rng.pick([5, 10, 20]) * 1e-3, rng.pick([20, 25]) * 1e-3] : [20e-3, rng.pick([25, 30, 50]) * 1e-3],
    ...(visible ? { intensity: rng.pick(narrow ? [2, 4, 6, 8, 12, 15] : [0.05, 0.08, 0.12, 0.25, 0.4, 0.8]) } : {}),
    angle: smd ? rng.pick([120, 140]) : narrow ? rng.pick([15, 20, 25, 30]) : rng.pick([40, 50, 60]),
    size,
    lens,
  };
}

const E12 = [1, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2];

/** The preferred value nearest to (9 V − VF) / IF, as an application note would suggest it. */
function seriesResistor(part: LedPart): string {
  const ideal = (9 - part.vf[0]) / part.current[0];
  const decade = 10 ** Math.floor(Math.log10(ideal));
  const nearest = E12.map((m) => m * decade).reduce((a, b) => (Math.abs(b - ideal) < Math.abs(a - ideal) ? b : a));
  return nearest >= 1000 ? `${numberText(nearest / 1000)} kΩ` : `${numberText(nearest)} Ω`;
}

export function buildLedSheet(part: LedPart, v: Variations): SheetContent {
  const { rng } = v;
  const pn = part.partNumber;
  const smd = !part.size.endsWith('mm');
  const lensWord = part.lens === 'clear' ? 'water-clear' : part.lens;
  const description = smd
    ? `${part.colourName[0]!.toUpperCase()}${part.colourName.slice(1)} ${part.size} surface-mount LED`
    : `${part.size} ${part.colourName} LED, ${lensWord} lens`;
  const testCurrent = numberText(part.current[0] * 1e3);
  const at = `IF = ${testCurrent} mA`;
  const extraSlot = v.flag('slot-outside-definition', 1, 3);
  const fullPeak = part.peak !== undefined && v.flag('peak-min-typ-max', 1, 3);
  const testCurrentPlacement = v.choose('test-current-placement', ['row', 'prose'] as const);
  const ratingPlacement = v.choose('rating-placement', ['absolute-maximum', 'absolute-maximum', 'characteristics', 'prose'] as const);
  const dominant = part.peak !== undefined && part.colour !== 'infrared' && v.flag('decoy:dominant-wavelength', 1, 2);

  const intensity =
    part.intensity === undefined
      ? undefined
      : measuredRow({
          parameter: 'Luminous intensity',
          symbol: 'IV',
          conditions: at,
          key: 'luminousIntensity',
          dim: 'cd',
          si: extraSlot ? { min: r2(part.intensity * 0.6), typ: part.intensity } : { typ: part.intensity },
          prefixes: ['m', ''],
          prefer: rng.pick(['m', 'm', '']),
          phrase: 'the on-axis luminous intensity',
        });
  const angle = measuredRow({ parameter: rng.pick(['Viewing angle', 'Viewing angle (full angle at half intensity)']), symbol: '2θ½', conditions: at, key: 'viewingAngle', dim: '°', si: { typ: part.angle }, prefixes: [''], phrase: 'the viewing angle' });
  const peak =
    part.peak === undefined
      ? undefined
      : measuredRow({
          parameter: 'Peak wavelength',
          symbol: 'λp',
          conditions: at,
          key: 'peakWavelength',
          dim: 'm',
          si: fullPeak ? { min: part.peak - 5e-9, typ: part.peak, max: part.peak + 5e-9 } : { typ: part.peak },
          prefixes: ['n'],
          phrase: 'the peak emission wavelength',
        });
  const dominantRow = dominant && part.peak ? measuredRow({ parameter: 'Dominant wavelength', symbol: 'λd', conditions: at, dim: 'm', si: { min: part.peak - 12e-9, typ: part.peak - 7e-9, max: part.peak - 2e-9 }, prefixes: ['n'] }) : undefined;
  const bandwidth = part.peak ? measuredRow({ parameter: 'Spectral bandwidth at 50 %', symbol: 'Δλ', conditions: at, dim: 'm', si: { typ: rng.pick([18, 20, 25, 30]) * 1e-9 }, prefixes: ['n'] }) : undefined;
  const vf = measuredRow({
    parameter: 'Forward voltage',
    symbol: 'VF',
    conditions: at,
    key: 'forwardVoltage',
    dim: 'V',
    si: extraSlot && rng.chance(0.5) ? { min: r2(part.vf[0] - 0.3), typ: part.vf[0], max: part.vf[1] } : { typ: part.vf[0], max: part.vf[1] },
    prefixes: [''],
    phrase: `the forward voltage at ${testCurrent} mA`,
  });
  const reverse = measuredRow({ parameter: 'Reverse current', symbol: 'IR', conditions: 'VR = 5 V', dim: 'A', si: { max: 10e-6 }, prefixes: ['µ'] });
  const test = measuredRow({ parameter: rng.pick(['Test current', 'Recommended operating current']), symbol: 'IF', key: 'forwardCurrent', dim: 'A', si: { typ: part.current[0] }, prefixes: ['m'], phrase: 'the test current' });
  const rating = measuredRow({ parameter: 'Maximum continuous forward current', symbol: 'IF', key: 'forwardCurrent', dim: 'A', si: { max: part.current[1] }, prefixes: ['m'], phrase: 'the continuous forward current' });
  const white = part.colour === 'white';
  const cct = { parameter: 'Correlated colour temperature', symbol: 'CCT', conditions: at, unit: 'K', values: { min: '5500', typ: '6500', max: '8000' } } satisfies CharRow;
  const chroma = { parameter: 'Chromaticity coordinates (x, y)', conditions: at, unit: '', values: { typ: '0.31, 0.32' } } satisfies CharRow;
  const radiant =
    part.colour === 'infrared' || part.colour === 'ultraviolet'
      ? ({ parameter: part.colour === 'infrared' ? 'Radiant intensity' : 'Radiant flux', symbol: part.colour === 'infrared' ? 'Ie' : 'Φe', conditions: at, unit: part.colour === 'infrared' ? 'mW/sr' : 'mW', values: { typ: rng.pick(['8', '12', '15', '20']) } } satisfies CharRow)
      : undefined;

  const characteristics = [
    ...(testCurrentPlacement === 'row' ? [test] : []),
    vf,
    reverse,
    ...(intensity ? [intensity] : []),
    ...(radiant ? [radiant] : []),
    angle,
    ...(peak ? [peak] : []),
    ...(dominantRow ? [dominantRow] : []),
    ...(bandwidth ? [bandwidth] : []),
    ...(white ? [cct, chroma] : []),
    ...(ratingPlacement === 'characteristics' ? [rating] : []),
  ];

  const absoluteMax: AbsRow[] = [
    ...(ratingPlacement === 'absolute-maximum'
      ? [{ parameter: rng.pick(['Continuous forward current', 'DC forward current']), symbol: 'IF', value: rating.values.max!, unit: rating.unit, truth: rating.truth! }]
      : []),
    { parameter: 'Peak forward current (1/10 duty, 0.1 ms pulse)', symbol: 'IFP', value: rng.pick(['100', '150']), unit: 'mA' },
    { parameter: 'Reverse voltage', symbol: 'VR', value: '5', unit: 'V' },
    { parameter: 'Power dissipation', symbol: 'PD', value: numberText(Math.round(part.current[1] * part.vf[1] * 1e3 * 1.1)), unit: 'mW' },
    { parameter: 'Operating temperature', symbol: 'TOPR', value: `${MINUS}40 to +85`, unit: '°C' },
    { parameter: 'Storage temperature', symbol: 'TSTG', value: `${MINUS}40 to +100`, unit: '°C' },
    { parameter: smd ? 'Reflow soldering peak temperature' : 'Soldering temperature (2 mm from body, 5 s)', value: '260', unit: '°C' },
  ];

  const lowCurrent = numberText(part.current[0] * 1e3 >= 10 ? 5 : 2);
  const scale = (row: CharRow | undefined, factor: number): CharRow[] =>
    row
      ? [
          {
            parameter: row.parameter,
            symbol: row.symbol,
            conditions: `IF = ${lowCurrent} mA`,
            unit: row.unit,
            values: Object.fromEntries(Object.entries(row.values).map(([s, t]) => [s, numberText(Number((Number(t) * factor).toPrecision(2)))])),
          },
        ]
      : [];
  const low: AlternateTable = {
    kind: 'current',
    title: `Characteristics at IF = ${lowCurrent} mA`,
    subtitle: 'TA = 25 °C',
    groups: [{ title: '', rows: [...scale(vf, 0.93), ...scale(intensity, 0.3)] }],
  };
  const hot: AlternateTable = {
    kind: 'temperature',
    title: 'Characteristics at TA = 85 °C',
    subtitle: at,
    groups: [{ title: '', rows: [...scale(vf, 0.92), ...scale(intensity, 0.6)].map((r) => ({ ...r, conditions: at })) }],
  };

  return {
    family: 'led',
    partNumber: pn,
    manufacturer: part.manufacturer,
    description,
    features: [
      `${part.colourName[0]!.toUpperCase()}${part.colourName.slice(1)} emission${part.peak ? ` at ${numberText(part.peak * 1e9)} nm` : ''}`,
      smd ? `EIA ${part.size} package for reflow soldering` : `${part.size} round through-hole package`,
      `${angle.values.typ}° viewing angle`,
      'Lead-free and RoHS compliant',
      'Binned for forward voltage and intensity',
    ],
    overview: [
      `The ${pn} is ${withArticle(smd ? lowerFirst(description) : `${part.size} ${part.colourName} LED with ${withArticle(lensWord)} lens`)} for indicators, panel lighting and optical couplers. ${part.lens === 'diffused' ? 'The diffused lens spreads the light evenly.' : 'The lens concentrates the light on axis.'}`,
      `Drive it from a current source or through a series resistor; the forward voltage falls slightly as the junction warms.`,
    ],
    applications: ['Status and bypass indicators', 'Lighting photoresistors in optical tremolos and compressors', 'Backlighting'],
    pinout: {
      title: 'Terminals',
      rows: smd
        ? [['1', 'K', 'Cathode (marked)'], ['2', 'A', 'Anode']]
        : [['1', 'A', 'Anode (longer lead)'], ['2', 'K', 'Cathode (flat on rim)']],
    },
    absoluteMax,
    primary: { title: rng.pick(['Electro-optical characteristics', 'Electrical and optical characteristics']), subtitle: `TA = 25 °C, ${at} unless otherwise noted`, groups: [{ title: 'Characteristics', rows: characteristics }] },
    alternates: [low, hot],
    statements: [
      ...(testCurrentPlacement === 'prose' ? [{ text: `All characteristics are measured at a test current of ${testCurrent} mA.`, truth: [test.truth!] }] : []),
      ...(ratingPlacement === 'prose' ? [{ text: `Do not exceed a continuous forward current of ${rating.values.max} mA.`, truth: [rating.truth!] }] : []),
    ],
    titleTruth: [],
    applicationNotes: [
      `From a 9 V supply at ${testCurrent} mA, a ${seriesResistor(part)} series resistor is a good start; it then dissipates about ${numberText(Math.round(part.current[0] * (9 - part.vf[0]) * 1e3))} mW.`,
      `To light a photoresistor, mount the LED face to face with the cell inside a black sleeve; 2 mA to 10 mA is usually enough.`,
    ],
    graphs: [
      { caption: 'Figure 1. Forward current vs forward voltage', xLabel: 'Forward voltage (V)', yLabel: 'Forward current (mA)', xTicks: ['1.5', '2.0', '2.5', '3.0', '3.5'], yTicks: ['0', '10', '20', '30', '40'], curve: [0, 0.05, 0.3, 0.7, 0.95] },
      { caption: 'Figure 2. Relative intensity vs forward current', xLabel: 'Forward current (mA)', yLabel: 'Relative intensity', xTicks: ['0', '10', '20', '30'], yTicks: ['0', '0.5', '1.0', '1.5'], curve: [0, 0.35, 0.65, 0.9] },
    ],
    packageName: smd ? part.size : `T-1${part.size === '5 mm' ? ' ¾' : ''} (${part.size})`,
    dimensions: smd
      ? [
          { symbol: 'L', min: '', nom: part.size === '0603' ? '1.6' : part.size === '0805' ? '2.0' : '3.2', max: '' },
          { symbol: 'W', min: '', nom: part.size === '0603' ? '0.8' : part.size === '0805' ? '1.25' : '1.6', max: '' },
          { symbol: 'H', min: '0.5', nom: '0.6', max: '0.8' },
        ]
      : [
          { symbol: 'D', min: '', nom: part.size === '5 mm' ? '5.0' : '3.0', max: '' },
          { symbol: 'H', min: '8.4', nom: part.size === '5 mm' ? '8.6' : '5.3', max: '9.0' },
          { symbol: 'L', min: '25.0', nom: '', max: '' },
          { symbol: 'e', min: '', nom: '2.54', max: '' },
        ],
    ordering: [
      { code: `${pn}`, package: part.size, marking: 'none', packing: smd ? 'Tape, 4000 pcs' : 'Bag, 1000 pcs' },
      { code: `${pn}-V2`, package: part.size, marking: 'none', packing: 'VF bin 2, bag of 500' },
    ],
    ...(part.colour === 'ultraviolet' ? { caution: 'Caution: ultraviolet emission. Do not look into the beam; use UV-blocking eye protection.' } : {}),
  };
}
