import {
  PIN_LAYOUTS_BY_FAMILY,
  PositionRequirementsSchema,
  formatQuantity,
  ledCurrent,
  parseQuantity,
  parseSupplySpan,
  requiredSlewRate,
  resistanceRangeForGain,
  type FamilyKey,
  type PositionRequirements,
  type PositionRequirementsInput,
} from '@understudy/shared-types';

export type PositionFamily = Exclude<FamilyKey, 'optocoupler'>;
export const POSITION_FAMILIES: readonly PositionFamily[] = ['op-amp', 'photoresistor', 'led', 'potentiometer'];

/** What the requirements form holds: text as typed, so "4k7" and "20 kHz" survive until they are read. */
export interface RequirementsFormValues {
  family: PositionFamily;
  supplyKind: 'single' | 'dual';
  supplyVolts: string;
  halfSupplyBias: boolean;
  signalPeak: string;
  signalFrequency: string;
  ledOutput: string;
  ledForward: string;
  ledSeries: string;
  feedback: string;
  gainMin: string;
  gainMax: string;
  pinLayout: string;
  allowObsolete: boolean;
}

export type RequirementsField = keyof RequirementsFormValues;

export const EMPTY_REQUIREMENTS: RequirementsFormValues = {
  family: 'op-amp',
  supplyKind: 'single',
  supplyVolts: '',
  halfSupplyBias: false,
  signalPeak: '',
  signalFrequency: '',
  ledOutput: '',
  ledForward: '',
  ledSeries: '',
  feedback: '',
  gainMin: '',
  gainMax: '',
  pinLayout: '',
  allowObsolete: false,
};

/** Which groups of the form apply to a family; the others are neither shown nor sent. */
export const GROUPS_BY_FAMILY: Record<PositionFamily, ReadonlyArray<'supply' | 'signal' | 'ledLoad' | 'invertingGain'>> = {
  'op-amp': ['supply', 'signal', 'ledLoad'],
  // The supply sets the voltage a cell must stand.
  photoresistor: ['supply', 'invertingGain'],
  led: ['ledLoad'],
  potentiometer: [],
};

export interface Derivations {
  /** Total span between the rails, volts. */
  supplySpan?: number;
  slewRate?: number;
  ledCurrent?: number;
  resistance?: { min: number; max: number };
}

export interface ReadResult {
  /** What can be sent now, or null while a field in a group that has been started cannot be read. */
  requirements: PositionRequirementsInput | null;
  errors: Partial<Record<RequirementsField, string>>;
  derived: Derivations;
}

type Errors = ReadResult['errors'];

function quantity(text: string, unit: string, field: RequirementsField, errors: Errors, opts: { positive?: boolean } = {}): number | undefined {
  const r = parseQuantity(text.trim(), { unit });
  if (!r.ok) {
    errors[field] = r.error;
    return undefined;
  }
  if ((opts.positive ?? true) && !(r.value > 0)) {
    errors[field] = 'Enter a value above zero';
    return undefined;
  }
  return r.value;
}

/** All of a group's fields are blank: the group is left out. Some are filled: every one must then be readable. */
function started(values: RequirementsFormValues, fields: readonly RequirementsField[]): boolean {
  return fields.some((f) => String(values[f]).trim() !== '');
}

function requireAll(values: RequirementsFormValues, fields: readonly RequirementsField[], errors: Errors): boolean {
  let ok = true;
  for (const f of fields) {
    if (String(values[f]).trim() === '') {
      errors[f] = 'Fill this in too, or clear the group';
      ok = false;
    }
  }
  return ok;
}

function readSupply(values: RequirementsFormValues, errors: Errors): number | undefined {
  const text = values.supplyVolts.trim();
  if (values.supplyKind === 'dual') {
    // Each rail: "15", "±15 V" and "15 V" all mean ±15 V, 30 V between the rails.
    const r = parseQuantity(text.replace(/^(±|\+\/-|\+-)/, ''), { unit: 'V' });
    if (!r.ok) {
      errors.supplyVolts = r.error;
      return undefined;
    }
    if (!(r.value > 0)) {
      errors.supplyVolts = 'Enter a value above zero';
      return undefined;
    }
    return 2 * r.value;
  }
  const r = parseSupplySpan(text, { unit: 'V' });
  if (!r.ok) {
    errors.supplyVolts = r.error;
    return undefined;
  }
  if (r.min !== r.max) {
    errors.supplyVolts = 'Enter the one supply the circuit runs on, such as 9 V';
    return undefined;
  }
  if (!(r.max > 0)) {
    errors.supplyVolts = 'Enter a value above zero';
    return undefined;
  }
  return r.max;
}

/** Reads the form into the body POST /api/alternates/rank takes, and the figures it implies, shown as they are typed. */
export function readRequirements(values: RequirementsFormValues): ReadResult {
  const errors: Errors = {};
  const derived: Derivations = {};
  const groups = GROUPS_BY_FAMILY[values.family];
  const body: PositionRequirementsInput = { family: values.family, allowObsolete: values.allowObsolete };
  let complete = true;

  if (groups.includes('supply') && values.supplyVolts.trim() !== '') {
    const volts = readSupply(values, errors);
    if (volts === undefined) complete = false;
    else {
      derived.supplySpan = volts;
      // Half-supply bias only means something for an op amp's inputs on a single rail.
      const bias = values.family === 'op-amp' && values.supplyKind === 'single' && values.halfSupplyBias;
      body.supply = { kind: values.supplyKind, volts, halfSupplyBias: bias };
    }
  }

  const signalFields = ['signalPeak', 'signalFrequency'] as const;
  if (groups.includes('signal') && started(values, signalFields)) {
    if (!requireAll(values, signalFields, errors)) complete = false;
    const peakVolts = values.signalPeak.trim() ? quantity(values.signalPeak, 'V', 'signalPeak', errors) : undefined;
    const frequencyHz = values.signalFrequency.trim() ? quantity(values.signalFrequency, 'Hz', 'signalFrequency', errors) : undefined;
    if (peakVolts === undefined || frequencyHz === undefined) complete = false;
    else {
      derived.slewRate = requiredSlewRate(peakVolts, frequencyHz);
      body.signal = { peakVolts, frequencyHz };
    }
  }

  const ledFields = ['ledOutput', 'ledForward', 'ledSeries'] as const;
  if (groups.includes('ledLoad') && started(values, ledFields)) {
    if (!requireAll(values, ledFields, errors)) complete = false;
    const outputVolts = values.ledOutput.trim() ? quantity(values.ledOutput, 'V', 'ledOutput', errors) : undefined;
    const forwardVolts = values.ledForward.trim() ? quantity(values.ledForward, 'V', 'ledForward', errors) : undefined;
    const seriesOhms = values.ledSeries.trim() ? quantity(values.ledSeries, 'Ω', 'ledSeries', errors) : undefined;
    if (outputVolts === undefined || forwardVolts === undefined || seriesOhms === undefined) complete = false;
    else {
      derived.ledCurrent = ledCurrent(outputVolts, forwardVolts, seriesOhms);
      body.ledLoad = { outputVolts, forwardVolts, seriesOhms };
    }
  }

  const gainFields = ['feedback', 'gainMin', 'gainMax'] as const;
  if (groups.includes('invertingGain') && started(values, gainFields)) {
    if (!requireAll(values, gainFields, errors)) complete = false;
    const feedbackOhms = values.feedback.trim() ? quantity(values.feedback, 'Ω', 'feedback', errors) : undefined;
    const gainMin = values.gainMin.trim() ? quantity(values.gainMin, '', 'gainMin', errors) : undefined;
    const gainMax = values.gainMax.trim() ? quantity(values.gainMax, '', 'gainMax', errors) : undefined;
    if (feedbackOhms === undefined || gainMin === undefined || gainMax === undefined) complete = false;
    else if (gainMin > gainMax) {
      errors.gainMax = 'The largest gain must be at least the smallest';
      complete = false;
    } else {
      derived.resistance = resistanceRangeForGain(feedbackOhms, gainMin, gainMax);
      body.invertingGain = { feedbackOhms, gainMin, gainMax };
    }
  }

  if (values.pinLayout && (PIN_LAYOUTS_BY_FAMILY[values.family] as readonly string[]).includes(values.pinLayout)) {
    body.requirePinLayout = values.pinLayout;
  }

  // The shared schema has the last word, so the form never sends what the server would refuse.
  if (complete && !PositionRequirementsSchema.safeParse(body).success) complete = false;
  return { requirements: complete ? body : null, errors, derived };
}

/** A stored number as people would type it (20000 Hz → "20 kHz"); twelve digits, so it reads back unchanged. */
function typed(value: number, unit = ''): string {
  return unit === '' ? String(Number(value.toPrecision(12))) : formatQuantity(value, unit, { digits: 12 });
}

/** A saved position back into form text, to reopen and rerun it. */
export function valuesFromRequirements(req: PositionRequirementsInput): RequirementsFormValues {
  const family = (POSITION_FAMILIES as readonly string[]).includes(req.family) ? (req.family as PositionFamily) : 'op-amp';
  const dual = req.supply?.kind === 'dual';
  return {
    ...EMPTY_REQUIREMENTS,
    family,
    supplyKind: dual ? 'dual' : 'single',
    supplyVolts: req.supply ? `${dual ? '±' : ''}${typed(dual ? req.supply.volts / 2 : req.supply.volts, 'V')}` : '',
    halfSupplyBias: req.supply?.halfSupplyBias ?? false,
    signalPeak: req.signal ? typed(req.signal.peakVolts, 'V') : '',
    signalFrequency: req.signal ? typed(req.signal.frequencyHz, 'Hz') : '',
    ledOutput: req.ledLoad ? typed(req.ledLoad.outputVolts, 'V') : '',
    ledForward: req.ledLoad ? typed(req.ledLoad.forwardVolts, 'V') : '',
    ledSeries: req.ledLoad ? typed(req.ledLoad.seriesOhms, 'Ω') : '',
    feedback: req.invertingGain ? typed(req.invertingGain.feedbackOhms, 'Ω') : '',
    gainMin: req.invertingGain ? typed(req.invertingGain.gainMin) : '',
    gainMax: req.invertingGain ? typed(req.invertingGain.gainMax) : '',
    pinLayout: req.requirePinLayout ?? '',
    allowObsolete: req.allowObsolete ?? false,
  };
}

/** Whether two sets of requirements ask the same, defaults filled in. */
export function sameRequirements(a: PositionRequirementsInput, b: PositionRequirementsInput): boolean {
  const pa = PositionRequirementsSchema.safeParse(a);
  const pb = PositionRequirementsSchema.safeParse(b);
  if (!pa.success || !pb.success) return false;
  return canonical(pa.data) === canonical(pb.data);
}

function canonical(req: PositionRequirements): string {
  return JSON.stringify(req, (_key, value: unknown) =>
    value && typeof value === 'object' && !Array.isArray(value)
      ? Object.fromEntries(Object.entries(value as Record<string, unknown>).sort(([x], [y]) => x.localeCompare(y)))
      : value,
  );
}
