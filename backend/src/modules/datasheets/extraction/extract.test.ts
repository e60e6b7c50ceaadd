import { DatasheetExtractionSchema, type DatasheetExtraction } from '@understudy/shared-types';
import { describe, expect, it } from 'vitest';
import { extractDatasheet, summarise } from './index';
import { footer, onePage, pages, paragraph, section, titleBlock } from './test-support/sheets';

const OP_AMP_TITLE = titleBlock({ manufacturer: 'Quillon Devices', partNumber: 'QX4102', description: 'Dual low-noise operational amplifier' });
const FULL_COLUMNS = [50, 190, 232, 340, 380, 420, 470];
const FULL_HEADER = ['Parameter', 'Symbol', 'Conditions', 'Min', 'Typ', 'Max', 'Unit'];

function proposal(ex: DatasheetExtraction, key: string) {
  return ex.proposals.find((p) => p.key === key);
}

/** Relative comparison for SI values computed from printed decimals. */
function near(actual: number | undefined, expected: number): void {
  expect(actual).toBeDefined();
  expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(Math.abs(expected) * 1e-9);
}

describe('extractDatasheet: characteristics tables', () => {
  it('reads a Parameter | Symbol | Conditions | Min | Typ | Max | Unit table into SI values with the table conditions', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({
        top: 140,
        heading: 'Electrical characteristics',
        conditions: 'VS = ±15 V, TA = 25 °C unless otherwise noted',
        columns: FULL_COLUMNS,
        rows: [
          FULL_HEADER,
          ['Input offset voltage', 'VOS', 'VCM = 0 V', null, '0.5', '2', 'mV'],
          ['Input bias current', 'IB', null, null, '80', '200', 'nA'],
          ['Slew rate', 'SR', 'RL = 2 kΩ', '9', '13', null, 'V/µs'],
          ['Gain-bandwidth product', 'GBW', 'f = 100 kHz', null, '10', null, 'MHz'],
          ['Input voltage noise density', 'en', 'f = 1 kHz', null, '4.5', null, 'nV/√Hz'],
          ['Supply current per amplifier', 'IQ', 'No load', null, '1.5', '2.1', 'mA'],
        ],
      }),
      ...footer('© 2024 Quillon Devices Ltd. All rights reserved.'),
    ]);
    const ex = await extractDatasheet(pdf);
    expect(DatasheetExtractionSchema.safeParse(ex).success).toBe(true);
    expect(ex.pageCount).toBe(1);
    // A4 in points (ISO 216: 210 mm × 297 mm at 72 points per inch).
    expect(ex.pages[0]!.width).toBeCloseTo(595.28, 1);
    expect(ex.pages[0]!.height).toBeCloseTo(841.89, 1);

    const offset = proposal(ex, 'inputOffsetVoltage')!;
    // SI prefixes per the SI Brochure (9th edition), table 7: m = 10^-3, µ = 10^-6, n = 10^-9, M = 10^6.
    near(offset.value.typ, 0.5e-3);
    near(offset.value.max, 2e-3);
    expect(offset.value.conditions).toEqual({ supply: 30, temperature: 25 });
    expect(offset.statedUnit).toBe('mV');
    expect(offset.origin).toBe('table');
    expect(offset.conditionsText).toContain('VS = ±15 V, TA = 25 °C');
    expect(offset.conditionsText).toContain('VCM = 0 V');
    expect(offset.confidence).toBeGreaterThan(0.9);
    expect(offset.source.page).toBe(1);
    expect(offset.source.snippet).toContain('Input offset voltage');
    expect(offset.source.boxes.length).toBeGreaterThan(0);

    near(proposal(ex, 'inputBiasCurrent')!.value.typ, 80e-9);
    near(proposal(ex, 'slewRate')!.value.min, 9e6);
    near(proposal(ex, 'slewRate')!.value.typ, 13e6);
    near(proposal(ex, 'gainBandwidth')!.value.typ, 10e6);
    near(proposal(ex, 'inputNoiseDensity')!.value.typ, 4.5e-9);
    near(proposal(ex, 'quiescentCurrent')!.value.typ, 1.5e-3);
    expect(proposal(ex, 'channels')!.value).toEqual({ typ: 2 });

    // Ids follow document order and every key appears once.
    expect(ex.proposals.map((p) => p.id)).toEqual(ex.proposals.map((_, i) => `p${i + 1}`));
    expect(new Set(ex.proposals.map((p) => p.key)).size).toBe(ex.proposals.length);
    expect(ex.proposals.every((p) => p.decision === 'pending' && p.editedValue === null)).toBe(true);

    expect(ex.identity.family?.value).toBe('op-amp');
    expect(ex.identity.partNumber?.value).toBe('QX4102');
    expect(ex.identity.manufacturer?.value).toBe('Quillon Devices');
  });

  it('knows a lone value under Max is the maximum', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({
        top: 140,
        heading: 'Electrical characteristics',
        columns: FULL_COLUMNS,
        rows: [FULL_HEADER, ['Input offset voltage', 'VOS', null, null, null, '3', 'mV'], ['Input bias current', 'IB', null, null, '45', null, 'nA']],
      }),
    ]);
    const ex = await extractDatasheet(pdf);
    expect(proposal(ex, 'inputOffsetVoltage')!.value).toEqual({ max: 0.003 });
    near(proposal(ex, 'inputBiasCurrent')!.value.typ, 45e-9);
    expect(proposal(ex, 'inputBiasCurrent')!.value.max).toBeUndefined();
  });

  it('reads columns in any order, without Symbol or Conditions columns, with header words in other spellings', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({
        top: 140,
        heading: 'ELECTRICAL CHARACTERISTICS',
        columns: [50, 250, 300, 350, 410],
        rows: [
          ['CHARACTERISTIC', 'UNITS', 'Maximum', 'Min.', 'Typical'],
          ['Slew rate', 'V/us', null, '6', '9'],
          ['Input offset voltage', 'mV', '1.5', null, '0.3'],
        ],
      }),
    ]);
    const ex = await extractDatasheet(pdf);
    expect(proposal(ex, 'slewRate')!.value).toEqual({ min: 6e6, typ: 9e6 });
    near(proposal(ex, 'inputOffsetVoltage')!.value.typ, 0.3e-3);
    near(proposal(ex, 'inputOffsetVoltage')!.value.max, 1.5e-3);
  });

  it('drops slots the definition lacks, such as a gain-bandwidth minimum', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({ top: 140, columns: FULL_COLUMNS, rows: [FULL_HEADER, ['Gain bandwidth product', 'GBW', null, '7', '10', null, 'MHz']] }),
    ]);
    expect(proposal(await extractDatasheet(pdf), 'gainBandwidth')!.value).toEqual({ typ: 10e6 });
  });

  it('prefers the 25 °C table over one at 85 °C and keeps the conditions it was read under', async () => {
    const rows = (offset: string) => [FULL_HEADER, ['Input offset voltage', 'VOS', null, null, offset, null, 'mV'], ['Slew rate', 'SR', null, null, offset === '1' ? '9' : '7', null, 'V/µs']];
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({ top: 140, heading: 'Electrical characteristics at 85 °C', conditions: 'VS = ±15 V, TA = 85 °C', columns: FULL_COLUMNS, rows: rows('1.4') }),
      ...section({ top: 260, heading: 'Electrical characteristics', conditions: 'VS = ±15 V, TA = 25 °C', columns: FULL_COLUMNS, rows: rows('1') }),
    ]);
    const ex = await extractDatasheet(pdf);
    near(proposal(ex, 'inputOffsetVoltage')!.value.typ, 1e-3);
    expect(proposal(ex, 'inputOffsetVoltage')!.value.conditions?.temperature).toBe(25);
    expect(proposal(ex, 'slewRate')!.value.typ).toBe(9e6);
    expect(proposal(ex, 'slewRate')!.conditionsText).toContain('TA = 25 °C');
  });

  it('ignores a full-temperature-range continuation row inside the 25 °C table', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({
        top: 140,
        heading: 'Electrical characteristics',
        conditions: 'TA = 25 °C',
        columns: FULL_COLUMNS,
        rows: [FULL_HEADER, ['Input offset voltage', 'VOS', null, null, '0.5', '2', 'mV'], [null, null, 'TA = −40 °C to +85 °C', null, null, '3', 'mV']],
      }),
    ]);
    expect(proposal(await extractDatasheet(pdf), 'inputOffsetVoltage')!.value).toMatchObject({ typ: 0.0005, max: 0.002 });
  });

  it('takes the largest test supply when tables differ only in supply', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({
        top: 140,
        heading: 'Electrical characteristics, VS = ±5 V',
        conditions: 'VS = ±5 V, TA = 25 °C',
        columns: FULL_COLUMNS,
        rows: [FULL_HEADER, ['Slew rate', 'SR', null, null, '7', null, 'V/µs']],
      }),
      ...section({
        top: 230,
        heading: 'Electrical characteristics',
        conditions: 'VS = ±15 V, TA = 25 °C',
        columns: FULL_COLUMNS,
        rows: [FULL_HEADER, ['Slew rate', 'SR', null, null, '9', null, 'V/µs'], ['Input bias current', 'IB', null, null, '80', null, 'nA']],
      }),
    ]);
    const slew = proposal(await extractDatasheet(pdf), 'slewRate')!;
    expect(slew.value).toEqual({ typ: 9e6, conditions: { supply: 30, temperature: 25 } });
  });

  it('divides a supply current stated for all amplifiers by the channel count', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({ top: 140, columns: FULL_COLUMNS, rows: [FULL_HEADER, ['Supply current, all amplifiers', 'IQ', 'No load', null, '3', '4', 'mA']] }),
    ]);
    const q = proposal(await extractDatasheet(pdf), 'quiescentCurrent')!;
    near(q.value.typ, 1.5e-3);
    near(q.value.max, 2e-3);
  });
});

describe('extractDatasheet: supplies', () => {
  it('reads a dual range in Min and Max cells as the total span', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({ top: 140, heading: 'Recommended operating conditions', columns: FULL_COLUMNS, rows: [FULL_HEADER, ['Supply voltage range', 'VS', null, '±1.5', null, '±16', 'V']] }),
    ]);
    // A dual ±X V supply spans 2X V between the rails (the shared definition's rule).
    expect(proposal(await extractDatasheet(pdf), 'supplyVoltage')!.value).toEqual({ min: 3, max: 32 });
  });

  it('reads single and dual ranges written in one cell', async () => {
    for (const [text, expected] of [
      ['4.5 to 36 V', { min: 4.5, max: 36 }],
      ['±1.5 V to ±16 V', { min: 3, max: 32 }],
    ] as const) {
      const pdf = await onePage([
        ...OP_AMP_TITLE,
        ...section({ top: 140, columns: [50, 300], rows: [['Parameter', 'Value'], ['Supply voltage', text]] }),
      ]);
      expect(proposal(await extractDatasheet(pdf), 'supplyVoltage')!.value).toEqual(expected);
    }
  });

  it('never takes the absolute-maximum supply as the operating range', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({ top: 140, heading: 'Absolute maximum ratings', columns: [50, 250, 320, 380], rows: [['Parameter', 'Symbol', 'Value', 'Unit'], ['Supply voltage', 'VS', '±18', 'V']] }),
    ]);
    expect(proposal(await extractDatasheet(pdf), 'supplyVoltage')).toBeUndefined();
  });
});

describe('extractDatasheet: prose', () => {
  it('reads values stated in sentences, with lower confidence than a table cell', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...paragraph(140, [
        'The QX4102 suits audio filters and preamplifiers. The slew rate is typically 9 V/µs and at least',
        '6 V/µs. The input offset voltage is 0.5 mV typical and does not exceed 2 mV.',
        'It runs from a single supply of 3 V to 32 V.',
      ]),
      ...section({ top: 220, columns: FULL_COLUMNS, rows: [FULL_HEADER, ['Input bias current', 'IB', null, null, '80', null, 'nA']] }),
    ]);
    const ex = await extractDatasheet(pdf);
    const slew = proposal(ex, 'slewRate')!;
    expect(slew.value).toEqual({ min: 6e6, typ: 9e6 });
    expect(slew.origin).toBe('prose');
    // pdf.js folds the micro sign into Greek mu in the text it hands back.
    expect(slew.source.snippet).toMatch(/slew rate is typically 9 V\/[µμ]s/);
    expect(slew.confidence).toBeLessThan(proposal(ex, 'inputBiasCurrent')!.confidence);
    near(proposal(ex, 'inputOffsetVoltage')!.value.typ, 0.5e-3);
    near(proposal(ex, 'inputOffsetVoltage')!.value.max, 2e-3);
    expect(proposal(ex, 'supplyVoltage')!.value).toEqual({ min: 3, max: 32 });
  });
});

describe('extractDatasheet: limits', () => {
  it('takes a photoresistor maximum voltage and power from the absolute-maximum table, marked as such', async () => {
    const pdf = await onePage([
      ...titleBlock({ manufacturer: 'Fernlight Optics', partNumber: 'FL-5528', description: '5 mm CdS photoresistor' }),
      ...section({
        top: 140,
        heading: 'Absolute maximum ratings',
        columns: [50, 250, 320, 380],
        rows: [['Parameter', 'Symbol', 'Value', 'Unit'], ['Maximum voltage (DC or AC peak)', 'Vmax', '150', 'V'], ['Power dissipation', 'PD', '100', 'mW'], ['Operating temperature', 'TA', '−30 to +70', '°C']],
      }),
      ...section({
        top: 260,
        heading: 'Optical characteristics',
        conditions: 'TA = 25 °C',
        columns: [50, 200, 330, 370, 410, 460],
        rows: [
          ['Parameter', 'Conditions', 'Min', 'Typ', 'Max', 'Unit'],
          ['Dark resistance', '10 s after removal of light', '0.5', '1', null, 'MΩ'],
          ['Light resistance', '10 lx', '8', null, '20', 'kohm'],
          ['Light resistance', '100 lx', null, '2', null, 'kohm'],
          ['Gamma', '10 lx to 100 lx', null, '0.7', null, null],
          ['Peak spectral response', null, null, '540', null, 'nm'],
        ],
      }),
    ]);
    const ex = await extractDatasheet(pdf);
    expect(ex.identity.family?.value).toBe('photoresistor');
    const v = proposal(ex, 'maxVoltage')!;
    expect(v.value).toEqual({ max: 150 });
    expect(v.origin).toBe('absolute-maximum');
    expect(proposal(ex, 'powerDissipation')!.value).toEqual({ max: 0.1 });
    expect(proposal(ex, 'darkResistance')!.value).toEqual({ min: 5e5, typ: 1e6, conditions: { time: 10 } });
    // The 100 lx row is another quantity; light resistance is defined at 10 lx.
    expect(proposal(ex, 'lightResistance')!.value).toMatchObject({ min: 8000, max: 20000 });
    expect(proposal(ex, 'gamma')!.value).toEqual({ typ: 0.7 });
    near(proposal(ex, 'peakWavelength')!.value.typ, 540e-9);

    const summary = summarise(ex);
    expect(summary.parameters.gamma).toEqual({ typ: 0.7 });
    expect(summary.parameters.darkResistance).toEqual({ min: 5e5, typ: 1e6, unit: 'Ω' });
  });
});

describe('extractDatasheet: unit spellings', () => {
  it('reads µ, μ and u; kΩ, kohm, K and k Ω; V/us; nV/√Hz and nV/rtHz', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({
        top: 140,
        columns: [50, 300, 360],
        rows: [
          ['Parameter', 'Typ', 'Unit'],
          ['Slew rate', '9', 'V/us'],
          ['Input offset voltage', '250', 'µV'],
          ['Input bias current', '20', 'μA'],
          ['Input voltage noise density', '7', 'nV/rtHz'],
          ['Output current', '25', 'mA'],
        ],
      }),
    ]);
    const ex = await extractDatasheet(pdf);
    expect(proposal(ex, 'slewRate')!.value.typ).toBe(9e6);
    near(proposal(ex, 'inputOffsetVoltage')!.value.typ, 250e-6);
    near(proposal(ex, 'inputBiasCurrent')!.value.typ, 20e-6);
    near(proposal(ex, 'inputNoiseDensity')!.value.typ, 7e-9);
    expect(proposal(ex, 'slewRate')!.statedUnit).toBe('V/us');
    expect(proposal(ex, 'inputBiasCurrent')!.statedUnit).toBe('µA');

    const pot = await onePage([
      ...titleBlock({ partNumber: 'KR16-B10K', description: 'Single-gang 16 mm rotary potentiometer, linear taper' }),
      ...section({
        top: 140,
        columns: [50, 250],
        rows: [['Parameter', 'Value'], ['Total resistance', '10 k Ω'], ['Resistance tolerance', '±20 %'], ['Rated power', '0.125 W'], ['Taper', 'B (linear)']],
      }),
    ]);
    const potEx = await extractDatasheet(pot);
    expect(potEx.identity.family?.value).toBe('potentiometer');
    expect(proposal(potEx, 'resistance')!.value).toEqual({ typ: 10000 });
    // "±20 %" is a tolerance of 20 percent: the magnitude, as printed.
    expect(proposal(potEx, 'tolerance')!.value).toEqual({ typ: 20 });
    // A plain rating is the only slot the definition has (max).
    expect(proposal(potEx, 'powerRating')!.value).toEqual({ max: 0.125 });
    expect(proposal(potEx, 'taper')!.value).toEqual({ value: 'linear' });
    expect(proposal(potEx, 'gangs')!.value).toEqual({ typ: 1 });
    expect(summarise(potEx).parameters.gangs).toEqual({ typ: 1 });
  });

  it('reads kohm and K, mcd, degrees and deg', async () => {
    const led = await onePage([
      ...titleBlock({ manufacturer: 'Lumen Brook', partNumber: 'LB5-R40', description: '5 mm red LED, diffused lens' }),
      ...section({
        top: 140,
        heading: 'Optical and electrical characteristics',
        conditions: 'TA = 25 °C, IF = 20 mA',
        columns: [50, 190, 240, 330, 380, 430, 480],
        rows: [
          FULL_HEADER,
          ['Forward voltage', 'VF', 'IF = 20 mA', null, '2.0', '2.4', 'V'],
          ['Luminous intensity', 'IV', 'IF = 20 mA', null, '350', null, 'mcd'],
          ['Viewing angle', '2θ½', null, null, '30', null, 'deg'],
          ['Peak wavelength', 'λp', 'IF = 20 mA', '620', '630', '640', 'nm'],
          ['Dominant wavelength', 'λd', 'IF = 20 mA', null, '625', null, 'nm'],
          ['Test current', 'IF', null, null, '20', null, 'mA'],
        ],
      }),
    ]);
    const ex = await extractDatasheet(led);
    expect(ex.identity.family?.value).toBe('led');
    expect(proposal(ex, 'luminousIntensity')!.value).toEqual({ typ: 0.35, conditions: { current: 0.02 } });
    expect(proposal(ex, 'viewingAngle')!.value).toEqual({ typ: 30 });
    near(proposal(ex, 'peakWavelength')!.value.typ, 630e-9);
    expect(proposal(ex, 'forwardCurrent')!.value).toEqual({ typ: 0.02 });
    expect(proposal(ex, 'colour')!.value).toEqual({ value: 'red' });
    expect(proposal(ex, 'lens')!.value).toEqual({ value: 'diffused' });

    const cell = await onePage([
      ...titleBlock({ partNumber: 'FL-7K', description: 'Photoresistor (light-dependent resistor)' }),
      ...section({ top: 140, columns: [50, 200, 330, 370, 410, 460], rows: [['Parameter', 'Conditions', 'Min', 'Typ', 'Max', 'Unit'], ['Light resistance', '10 lx', '4K', null, '11K', null], ['Rise time', null, null, '60', null, 'ms'], ['Decay time', null, null, '0.2', null, 's']] }),
    ]);
    const cellEx = await extractDatasheet(cell);
    expect(proposal(cellEx, 'lightResistance')!.value).toEqual({ min: 4000, max: 11000 });
    near(proposal(cellEx, 'riseTime')!.value.typ, 0.06);
    near(proposal(cellEx, 'decayTime')!.value.typ, 0.2);
  });
});

describe('extractDatasheet: lists and family', () => {
  it('reads a parameter list set out in two columns without a header row', async () => {
    const pdf = await onePage([
      ...titleBlock({ partNumber: 'FL-5528', description: '5 mm CdS photoresistor' }),
      { text: 'Key specifications', x: 50, y: 140, size: 10.5, bold: true },
      { text: 'Dark resistance', x: 50, y: 160, size: 9 },
      { text: '≥ 1 MΩ', x: 250, y: 160, size: 9 },
      { text: 'Resistance at 10 lux', x: 50, y: 174, size: 9 },
      { text: '8 kΩ to 15 kΩ', x: 250, y: 174, size: 9 },
    ]);
    const ex = await extractDatasheet(pdf);
    expect(proposal(ex, 'darkResistance')!.value).toEqual({ min: 1e6 });
    expect(proposal(ex, 'lightResistance')!.value).toEqual({ min: 8000, max: 15000 });
    expect(proposal(ex, 'darkResistance')!.origin).toBe('table');
  });

  it('finds the family from the parameters when the title does not name it, and says so', async () => {
    const pdf = await onePage([
      { text: 'ZX-77', x: 50, y: 56, size: 24, bold: true },
      { text: 'General-purpose building block', x: 50, y: 90, size: 12 },
      ...section({
        top: 140,
        columns: FULL_COLUMNS,
        rows: [FULL_HEADER, ['Slew rate', 'SR', null, null, '9', null, 'V/µs'], ['Gain bandwidth product', 'GBW', null, null, '3', null, 'MHz'], ['Input bias current', 'IB', null, null, '80', null, 'nA']],
      }),
    ]);
    const ex = await extractDatasheet(pdf);
    expect(ex.identity.family).toMatchObject({ value: 'op-amp', source: null });
    expect(ex.identity.family!.confidence).toBeLessThan(0.9);
    expect(ex.warnings.join(' ')).toMatch(/title does not say/);
    expect(proposal(ex, 'slewRate')!.value.typ).toBe(9e6);
  });
});

describe('extractDatasheet: decoys and identity', () => {
  it('reads the identity and ignores ordering codes, revisions, dates, page numbers and package dimensions', async () => {
    const pdf = await pages(
      [
        ...OP_AMP_TITLE,
        { text: 'QX-DS-0412 · Rev. C · 2024-03-01', x: 50, y: 110, size: 7.5 },
        { text: 'Pin configuration', x: 50, y: 140, size: 10.5, bold: true },
        ...section({
          top: 158,
          columns: [60, 90, 160],
          rows: [['Pin', 'Name', 'Function'], ['1', 'OUT A', 'Output A'], ['2', '−IN A', 'Inverting input A'], ['3', '+IN A', 'Non-inverting input A'], ['4', 'V−', 'Negative supply'], ['8', 'V+', 'Positive supply']],
        }),
        ...section({ top: 270, heading: 'Electrical characteristics', columns: FULL_COLUMNS, rows: [FULL_HEADER, ['Slew rate', 'SR', null, null, '9', null, 'V/µs']] }),
        ...paragraph(320, ['Available in DIP-8 and SOIC-8 packages.']),
        ...footer('© 2024 Quillon Devices Ltd.', 1),
      ],
      [
        ...section({ top: 60, heading: 'Package dimensions', columns: [50, 160, 230, 300, 370], rows: [['Dimension', 'Min', 'Nom', 'Max', 'Unit'], ['A', '3.2', '3.4', '3.6', 'mm'], ['D', '9.0', '9.3', '9.6', 'mm']] }),
        ...section({ top: 160, heading: 'Ordering information', columns: [50, 180, 290, 380], rows: [['Order code', 'Package', 'Marking', 'Packing'], ['QX4102-D8', 'DIP-8', 'QX4102', 'Tube, 50'], ['QX4102-S8-TR', 'SOIC-8', 'QX4102', 'Reel, 2500']] }),
        ...section({ top: 260, heading: 'Revision history', columns: [50, 120, 220], rows: [['Revision', 'Date', 'Changes'], ['A', '2021-05-01', 'Initial release'], ['C', '2024-03-01', 'Slew rate 12 V/µs corrected']] }),
        ...footer('© 2024 Quillon Devices Ltd.', 2),
      ],
    );
    const ex = await extractDatasheet(pdf);
    expect(ex.pageCount).toBe(2);
    expect(ex.proposals.map((p) => p.key).sort()).toEqual(['channels', 'slewRate']);
    expect(proposal(ex, 'slewRate')!.value.typ).toBe(9e6);
    expect(ex.identity.partNumber?.value).toBe('QX4102');
    expect(ex.identity.manufacturer?.value).toBe('Quillon Devices');
    expect(ex.identity.package?.value).toBe('DIP-8');
    expect(ex.identity.pinMap?.value).toEqual({ '1': 'OUT A', '2': '−IN A', '3': '+IN A', '4': 'V−', '8': 'V+' });
    expect(ex.identity.pinMap?.source?.page).toBe(1);
  });

  it('summarises with canonical units, and leaves them off unitless parameters', async () => {
    const pdf = await onePage([
      ...OP_AMP_TITLE,
      ...section({ top: 140, columns: FULL_COLUMNS, rows: [FULL_HEADER, ['Slew rate', 'SR', null, '6', '9', null, 'V/µs']] }),
    ]);
    const summary = summarise(await extractDatasheet(pdf));
    expect(summary).toEqual({
      family: 'op-amp',
      partNumber: 'QX4102',
      manufacturer: 'Quillon Devices',
      parameters: { channels: { typ: 2 }, slewRate: { min: 6e6, typ: 9e6, unit: 'V/s' } },
    });
  });
});
