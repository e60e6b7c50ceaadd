import type { FamilyKey } from '@understudy/shared-types';

/**
 * How datasheets name one parameter: row labels (matched as whole words, case-insensitive, anywhere in the label),
 * table symbols (matched exactly, subscripts run together), and labels that look alike but mean something else.
 */
export interface Synonym {
  key: string;
  names: RegExp[];
  symbols?: string[];
  reject?: RegExp;
  /** Higher wins when two labels of one key compete ("Output current" over "short-circuit current"). */
  rank?: number;
  /** Values in this table are limits by nature, so an absolute-maximum table is a right place to read them. */
  limit?: boolean;
}

/** Labels that never carry an operating value of the parameters below, whatever words they share. */
const COMMON_REJECT = /drift|coefficient|tempco|rejection|ratio|vs\.?|versus|change|matching|derat/i;

const OP_AMP: Synonym[] = [
  { key: 'channels', names: [/^(number of )?(channels|amplifiers)( per package)?$/i, /^amplifiers per package$/i] },
  {
    key: 'supplyVoltage',
    names: [
      /\bsupply voltage( range)?\b/i,
      /\boperating (supply )?voltage( range)?\b/i,
      /\bpower supply( voltage)?( range)?\b/i,
      /\bsupply range\b/i,
      /\bsupply span\b/i,
    ],
    symbols: ['VS', 'VCC', 'V+', 'VDD', 'VSUPPLY', 'V+−V−', 'V+-V-'],
    reject: /rejection|sensitivity|current|ripple|noise|differential|input|output|common/i,
  },
  { key: 'slewRate', names: [/\bslew rate\b/i], symbols: ['SR', 'SR+', 'SR−', 'SR-'], reject: /settling/i },
  {
    key: 'gainBandwidth',
    names: [/\bgain[\s-]*bandwidth( product)?\b/i, /\bunity[\s-]*gain (bandwidth|frequency|crossover)\b/i, /\bgbw\b/i, /\bgbp\b/i],
    symbols: ['GBW', 'GBP', 'GBWP', 'GB', 'fT', 'FT', 'fu'],
    reject: /full[\s-]*power|power bandwidth|-3 ?db|small[\s-]*signal bandwidth/i,
  },
  {
    key: 'inputOffsetVoltage',
    names: [/\b(input )?offset voltage\b/i],
    symbols: ['VOS', 'VIO', 'VOFFSET'],
    reject: /drift|adjust|null|trim|long[\s-]*term|current/i,
  },
  {
    key: 'inputBiasCurrent',
    names: [/\b(input )?bias current\b/i],
    symbols: ['IB', 'IIB', 'IBIAS', 'IB+', 'IB−', 'IB-'],
    reject: /offset current|drift/i,
  },
  {
    key: 'inputNoiseDensity',
    names: [/\b(input )?(voltage )?noise( voltage)? density\b/i, /\binput (referred )?(voltage )?noise\b/i, /\bvoltage noise\b/i],
    symbols: ['en', 'eN', 'EN', 'vn', 'Vn'],
    reject: /current noise|noise current|peak|p-p|pp|rms|figure|0\.1 ?hz/i,
  },
  {
    key: 'outputCurrent',
    names: [/\boutput current\b/i, /\boutput drive current\b/i],
    symbols: ['IO', 'IOUT'],
    rank: 2,
    reject: /leakage|limit/i,
  },
  {
    key: 'outputCurrent',
    names: [/\bshort[\s-]*circuit (output )?current\b/i, /\boutput short[\s-]*circuit( current)?\b/i],
    symbols: ['ISC', 'IOS(SC)', 'ISHORT'],
    rank: 1,
    reject: /duration/i,
  },
  {
    key: 'quiescentCurrent',
    names: [/\bsupply current\b/i, /\bquiescent current\b/i, /\boperating current\b/i, /\bcurrent consumption\b/i, /\bidle current\b/i],
    symbols: ['IQ', 'ICC', 'IS', 'ISY', 'IDD', 'ISUPPLY'],
    reject: /shutdown|standby|sleep|disabled|power[\s-]*down/i,
  },
  {
    key: 'operatingTemperature',
    names: [/\boperating (ambient )?temperature( range)?\b/i, /\bambient temperature range\b/i, /\bspecified temperature range\b/i],
    symbols: ['TA', 'TOPR', 'TOP', 'Tamb'],
    reject: /storage|junction|lead|solder/i,
  },
];

const PHOTORESISTOR: Synonym[] = [
  {
    key: 'darkResistance',
    names: [/\bdark resistance\b/i, /\bresistance (in|at) (darkness|dark|0 ?lux|0 ?lx)\b/i, /\bdark cell resistance\b/i],
    symbols: ['RD', 'RDARK', 'Rdark', 'R0'],
  },
  {
    key: 'lightResistance',
    names: [
      /\blight resistance\b/i,
      /\bresistance (at|under|@) ?10 ?(lux|lx)\b/i,
      /\billuminated resistance\b/i,
      /\bon resistance\b/i,
      /\bcell resistance\b/i,
      /\bresistance at illumination\b/i,
    ],
    symbols: ['RL', 'R10', 'RLIGHT', 'R10LX', 'R10lx'],
    reject: /dark|100 ?(lux|lx)|1 ?(lux|lx)\b|1000|1 ?k ?(lux|lx)/i,
  },
  { key: 'gamma', names: [/\bgamma\b/i, /^γ$/, /\bsensitivity slope\b/i, /\bslope\b.*\bγ\b/i], symbols: ['γ', 'γ10/100', 'γ10', 'gamma'] },
  {
    key: 'peakWavelength',
    names: [/\bpeak (spectral )?(response|sensitivity|wavelength)\b/i, /\bspectral peak\b/i, /\bwavelength of (peak|maximum) sensitivity\b/i],
    symbols: ['λp', 'λP', 'λpeak', 'λmax', 'λ'],
    reject: /range|bandwidth|half/i,
  },
  { key: 'riseTime', names: [/\brise time\b/i, /\bresponse time,? rise\b/i, /\bresponse time \(rise\)/i, /\bturn[\s-]*on time\b/i], symbols: ['tr', 'tR', 'trise', 'ton'] },
  {
    key: 'decayTime',
    names: [/\bdecay time\b/i, /\bfall time\b/i, /\bresponse time,? (decay|fall)\b/i, /\bresponse time \((decay|fall)\)/i, /\brecovery time\b/i],
    symbols: ['td', 'tf', 'tD', 'tF', 'tdecay', 'toff'],
  },
  {
    key: 'maxVoltage',
    names: [
      /\b(max(imum)?\.? )?(cell |applied |operating )?voltage\b/i,
      /\bvoltage,? (dc or ac peak|ac\/dc peak|dc\/ac peak)\b/i,
      /\bmax(imum)?\.? (cell )?voltage\b/i,
    ],
    symbols: ['Vmax', 'VMAX', 'Vcell', 'V'],
    reject: /breakdown|isolation|test|forward|reverse/i,
    limit: true,
  },
  {
    key: 'powerDissipation',
    names: [/\bpower dissipation\b/i, /\b(max(imum)?\.? )?power( rating)?\b/i, /\bdissipation\b/i],
    symbols: ['P', 'PD', 'Pmax', 'PMAX', 'Ptot', 'PTOT'],
    reject: /derat/i,
    limit: true,
  },
  { key: 'cellDiameter', names: [/\b(cell|body|element|photocell)? ?diameter\b/i, /\bcell size\b/i], symbols: ['D', 'Ø', 'ø', '⌀'] },
  { key: 'cellMaterial', names: [/\b(cell |photoconductive |sensor |sensing )?material\b/i, /\bphotoconductor\b/i] },
];

const LED: Synonym[] = [
  {
    key: 'forwardVoltage',
    names: [/\bforward voltage\b/i],
    symbols: ['VF', 'Vf', 'VFWD'],
    reject: /reverse|temperature|coefficient/i,
  },
  {
    key: 'forwardCurrent',
    names: [/\b(continuous |dc |rated |test |operating )?forward current\b/i, /\btest current\b/i, /\brated current\b/i, /\boperating current\b/i],
    symbols: ['IF', 'If', 'IFDC', 'IF(DC)'],
    reject: /peak|pulse|surge|reverse|derat/i,
    limit: true,
  },
  {
    key: 'peakWavelength',
    names: [/\bpeak (emission )?wavelength\b/i, /\bwavelength (at|of) peak( emission)?\b/i, /\bpeak emission\b/i],
    symbols: ['λp', 'λP', 'λpeak', 'λPEAK'],
    reject: /dominant|spectral (line )?half|bandwidth|width/i,
  },
  { key: 'luminousIntensity', names: [/\bluminous intensity\b/i, /\bluminosity\b/i, /\bbrightness\b/i], symbols: ['IV', 'Iv'] },
  {
    key: 'viewingAngle',
    names: [/\bviewing angle\b/i, /\bview angle\b/i, /\bbeam angle\b/i, /\bhalf[\s-]*(intensity|power)?[\s-]*angle\b/i, /\bangle of half intensity\b/i],
    symbols: ['2θ½', '2θ1/2', '2Θ½', '2θ', '2φ½', 'θ½', 'θ1/2'],
  },
  { key: 'colour', names: [/\b(emitted |emitting |emission )?colou?r\b/i], reject: /lens|temperature/i },
  { key: 'lens', names: [/\blens( colou?r| type| finish)?\b/i, /\bepoxy\b/i] },
];

const POTENTIOMETER: Synonym[] = [
  {
    key: 'resistance',
    names: [/^(total |nominal |track |end[\s-]*to[\s-]*end |rated )?resistance( value| range)?$/i, /\b(total|nominal|end[\s-]*to[\s-]*end|track) resistance\b/i],
    symbols: ['R', 'RT', 'Rn', 'RN'],
    reject: /residual|contact|insulation|minimum|min\.|end resistance$|variation|tolerance|wiper|hop[\s-]*off/i,
  },
  { key: 'taper', names: [/\btaper\b/i, /\b(resistance |track )?law\b/i, /\b(resistance |taper )?curve\b/i, /\bcharacteristic curve\b/i], reject: /tolerance|tracking/i },
  { key: 'tolerance', names: [/\b(resistance |total resistance )?tolerance\b/i], reject: /taper|tracking|gang|angle|mechanical/i },
  {
    key: 'powerRating',
    names: [/\bpower rating\b/i, /\brated power\b/i, /\b(rated |max(imum)? )?(power )?dissipation\b/i, /^power$/i, /\bpower handling\b/i, /\brated wattage\b/i],
    symbols: ['P', 'PR', 'Pmax', 'P70'],
    reject: /derat/i,
    limit: true,
  },
  { key: 'gangs', names: [/\b(number of )?gangs\b/i, /\bgang(ing)?\b/i, /\bsections\b/i, /\belements\b/i], reject: /tracking|error|balance|matching|torque/i },
  { key: 'bodySize', names: [/\bbody (size|diameter|width)\b/i, /\b(housing|case) (size|diameter)\b/i, /^size$/i] },
  { key: 'shaftType', names: [/\bshaft( type| style| shape)?$/i, /\bshaft (type|style|shape)\b/i], reject: /length|diameter|torque|rotation|angle/i },
  { key: 'shaftLength', names: [/\bshaft length\b/i, /\blength of shaft\b/i], symbols: ['L'] },
  { key: 'mounting', names: [/\bmounting( style| type)?\b/i, /\bterminals?( style| type)?\b/i, /\btermination\b/i], reject: /torque|hardware|nut/i },
  { key: 'centreDetent', names: [/\bcent(re|er) detent\b/i, /\bdetent\b/i] },
];

const OPTOCOUPLER: Synonym[] = [
  {
    key: 'onResistance',
    names: [/\bon[\s-]*resistance\b/i, /\bresistance,? (led|lamp|input) on\b/i, /\billuminated resistance\b/i, /\bcell resistance,? on\b/i, /\bon[\s-]*state resistance\b/i],
    symbols: ['RON', 'Ron', 'R(ON)', 'RON'],
  },
  {
    key: 'offResistance',
    names: [/\boff[\s-]*resistance\b/i, /\bdark resistance\b/i, /\bresistance,? (led|lamp|input) off\b/i, /\boff[\s-]*state resistance\b/i],
    symbols: ['ROFF', 'Roff', 'R(OFF)'],
  },
  { key: 'ledForwardVoltage', names: [/\b(led |input |diode )?forward voltage\b/i], symbols: ['VF', 'Vf'], reject: /reverse/i },
  {
    key: 'ledMaxCurrent',
    names: [/\b(continuous |max(imum)?\.? |dc )?(led |input )?(forward )?current\b/i],
    symbols: ['IF', 'IFmax', 'IF(max)', 'IFM'],
    reject: /peak|pulse|surge|reverse|leakage|dark|on[\s-]*resistance|derat/i,
    limit: true,
  },
  { key: 'turnOnTime', names: [/\bturn[\s-]*on time\b/i, /\bon time\b/i, /\brise time\b/i, /\bresponse time,? on\b/i], symbols: ['ton', 'tON', 'tr'] },
  { key: 'turnOffTime', names: [/\bturn[\s-]*off time\b/i, /\boff time\b/i, /\bdecay time\b/i, /\bfall time\b/i, /\bresponse time,? off\b/i], symbols: ['toff', 'tOFF', 'tf', 'td'] },
  { key: 'cellMaterial', names: [/\b(cell |photoconductive )?material\b/i] },
];

export const SYNONYMS: Record<FamilyKey, Synonym[]> = {
  'op-amp': OP_AMP,
  photoresistor: PHOTORESISTOR,
  led: LED,
  potentiometer: POTENTIOMETER,
  optocoupler: OPTOCOUPLER,
};

/** Subscripts run together and look-alike characters folded, so V_OS, V OS and VOS compare equal. */
export function normaliseSymbol(symbol: string): string {
  return symbol
    .normalize('NFKC')
    .replace(/[\s_{}]/g, '')
    .replace(/[\u2212\u2013]/g, '−')
    .replace(/1[\/\u2044]2/g, '½')
    .trim();
}

export function normaliseLabel(label: string): string {
  return label
    .normalize('NFKC')
    .replace(/[\u2010-\u2015\u2212]/g, '-')
    .replace(/\s*\((note|see note)[^)]*\)|\s*\[\d+\]|[¹²³*†‡]+/gi, '')
    .replace(/\s+/g, ' ')
    .trim();
}

export interface LabelMatch {
  synonym: Synonym;
  /** 'name' when the row's words say it, 'symbol' when only its symbol does. */
  by: 'name' | 'symbol';
  /** Length of the matched words: the most specific label wins. */
  strength: number;
}

/** Which parameter a row label (and symbol) names, if any. */
export function matchLabel(family: FamilyKey, label: string, symbol = ''): LabelMatch | null {
  const text = normaliseLabel(label);
  let best: LabelMatch | null = null;
  if (text) {
    for (const synonym of SYNONYMS[family]) {
      if (synonym.reject?.test(text)) continue;
      if (COMMON_REJECT.test(text) && synonym.key !== 'gamma') continue;
      for (const re of synonym.names) {
        const m = re.exec(text);
        if (!m) continue;
        const strength = m[0].length + (synonym.rank ?? 0) * 0.01;
        if (!best || strength > best.strength) best = { synonym, by: 'name', strength };
      }
    }
  }
  if (best) return best;
  const sym = normaliseSymbol(symbol);
  if (!sym) return null;
  for (const synonym of SYNONYMS[family]) {
    if (synonym.symbols?.includes(sym)) {
      if (text && (synonym.reject?.test(text) || COMMON_REJECT.test(text))) continue;
      return { synonym, by: 'symbol', strength: 0 };
    }
  }
  return null;
}
