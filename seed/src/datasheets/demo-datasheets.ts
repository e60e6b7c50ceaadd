import type { DatasheetSummary, PartCreateBody } from '@understudy/shared-types';
import { DEMO_PARTS } from '../catalog';
import { composeDatasheet } from './compose-datasheet';
import type { DatasheetSpec } from './datasheet-spec';
import { buildLedSheet, type LedPart } from './led-sheet';
import { buildOpAmpSheet, type OpAmpPart } from './op-amp-sheet';
import { buildPhotoresistorSheet, type PhotoresistorPart } from './photoresistor-sheet';
import { createRng } from './prng';
import { fixedVariations } from './variations';

/** A demo datasheet for a part already in the seed catalog, so "apply to an existing part" can be shown. */
export interface DemoDatasheet {
  fileName: string;
  partNumber: string;
  manufacturer: string;
  spec: DatasheetSpec;
  truth: DatasheetSummary;
  /** Where the datasheet deliberately differs from the catalog, as a later revision would. */
  revisedFromCatalog: { key: string; catalog: number; datasheet: number }[];
}

function catalogPart(partNumber: string): PartCreateBody {
  const part = DEMO_PARTS.find((p) => p.partNumber === partNumber);
  if (!part) throw new Error(`${partNumber} is not in the seed catalog`);
  return part;
}

type Slots = { min?: number; typ?: number; max?: number; value?: string | boolean };
const param = (part: PartCreateBody, key: string): Slots => {
  const value = (part.parameters as Record<string, Slots | undefined>)[key];
  if (!value) throw new Error(`${part.partNumber} has no ${key}`);
  return value;
};

// One clean house style for every demo: ruled tables with units in their own column, µ and Ω spelled properly.
const HOUSE_STYLE = {
  micro: 'µ',
  ohm: 'symbol',
  'root-hz': '√Hz',
  degree: '°',
  percent: 'spaced',
  minus: '−',
  'header-words': 'short',
  columns: 'parameter-symbol-conditions-min-typ-max-unit',
  rules: 'header',
  'shaded-header': true,
  'empty-cell': '',
  'value-align': 'centre',
  'page-size': 'A4',
  'body-font': 'sans',
  'title-layout': 'banner',
  'first-page': 'features-beside-pinout',
  'date-format': 'month-year',
  'page-label': 'Page {n} of {total}',
  'absolute-maximum-layout': 'parameter-symbol-value-unit',
} as const;

function opAmpDemo(): DemoDatasheet {
  const c = catalogPart('HV4580');
  const slewTyp = 5.5e6;
  const part: OpAmpPart = {
    partNumber: c.partNumber,
    manufacturer: c.manufacturer,
    channels: param(c, 'channels').typ as 2,
    stage: param(c, 'inputStage').value as 'bipolar',
    supply: [param(c, 'supplyVoltage').min!, param(c, 'supplyVoltage').max!],
    dualSupply: true,
    // Revision D of the datasheet raised the typical slew rate from the catalog's 5 V/µs.
    slew: [param(c, 'slewRate').min!, slewTyp],
    gbw: param(c, 'gainBandwidth').typ!,
    noise: param(c, 'inputNoiseDensity').typ!,
    offset: [param(c, 'inputOffsetVoltage').typ!, param(c, 'inputOffsetVoltage').max!],
    bias: [param(c, 'inputBiasCurrent').typ!, param(c, 'inputBiasCurrent').max!],
    outputCurrent: [param(c, 'outputCurrent').typ!, param(c, 'outputCurrent').max!],
    quiescent: [param(c, 'quiescentCurrent').typ!, param(c, 'quiescentCurrent').max!],
    packages: ['DIP-8', 'SOIC-8'],
    lowNoise: true,
  };
  const v = fixedVariations(createRng(4580), {
    ...HOUSE_STYLE,
    'supply-form': 'dual',
    'supply-placement': 'characteristics',
    'alternate-tables': 'one',
    'prose-values': 1,
    'revision-format': 'Rev. C',
  });
  const composed = composeDatasheet(buildOpAmpSheet(part, v), v, { pages: 4 });
  return {
    fileName: 'hv4580-dual-low-noise-op-amp.pdf',
    partNumber: c.partNumber,
    manufacturer: c.manufacturer,
    spec: composed.spec,
    truth: composed.truth,
    revisedFromCatalog: [{ key: 'slewRate.typ', catalog: param(c, 'slewRate').typ!, datasheet: slewTyp }],
  };
}

function photoresistorDemo(): DemoDatasheet {
  const c = catalogPart('BW-LDR-10K');
  const part: PhotoresistorPart = {
    partNumber: c.partNumber,
    manufacturer: c.manufacturer,
    material: param(c, 'cellMaterial').value as 'cds',
    dark: [param(c, 'darkResistance').min!, param(c, 'darkResistance').typ!],
    light: [param(c, 'lightResistance').min!, param(c, 'lightResistance').max!],
    gamma: param(c, 'gamma').typ!,
    peak: param(c, 'peakWavelength').typ!,
    rise: param(c, 'riseTime').typ!,
    decay: param(c, 'decayTime').typ!,
    maxVoltage: param(c, 'maxVoltage').max!,
    power: param(c, 'powerDissipation').max!,
    diameter: param(c, 'cellDiameter').typ!,
  };
  const v = fixedVariations(createRng(10), {
    ...HOUSE_STYLE,
    'limits-placement': 'absolute-maximum-only',
    'alternate-tables': 'none',
    'prose-values': 1,
    'revision-format': 'Rev 1.2',
  });
  const composed = composeDatasheet(buildPhotoresistorSheet(part, v), v, { pages: 3 });
  return { fileName: 'bw-ldr-10k-cds-photocell.pdf', partNumber: c.partNumber, manufacturer: c.manufacturer, spec: composed.spec, truth: composed.truth, revisedFromCatalog: [] };
}

function ledDemo(): DemoDatasheet {
  const c = catalogPart('LR5-YG-C');
  const part: LedPart = {
    partNumber: c.partNumber,
    manufacturer: c.manufacturer,
    colour: param(c, 'colour').value as 'green',
    colourName: 'yellow-green',
    peak: param(c, 'peakWavelength').typ!,
    vf: [param(c, 'forwardVoltage').typ!, param(c, 'forwardVoltage').max!],
    current: [param(c, 'forwardCurrent').typ!, param(c, 'forwardCurrent').max!],
    intensity: param(c, 'luminousIntensity').typ!,
    angle: param(c, 'viewingAngle').typ!,
    size: '5 mm',
    lens: param(c, 'lens').value as 'clear',
  };
  const v = fixedVariations(createRng(570), {
    ...HOUSE_STYLE,
    'test-current-placement': 'row',
    'rating-placement': 'absolute-maximum',
    'alternate-tables': 'none',
    'prose-values': 0,
    'revision-format': 'Revision 3',
  });
  const composed = composeDatasheet(buildLedSheet(part, v), v, { pages: 2 });
  return { fileName: 'lr5-yg-c-yellow-green-led.pdf', partNumber: c.partNumber, manufacturer: c.manufacturer, spec: composed.spec, truth: composed.truth, revisedFromCatalog: [] };
}

/** Three invented datasheets in a tidy house style: an op amp, a photocell and an LED from the seed catalog. */
export function buildDemoDatasheets(): DemoDatasheet[] {
  return [opAmpDemo(), photoresistorDemo(), ledDemo()];
}
