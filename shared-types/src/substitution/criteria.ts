import type { Weights } from '../alternates';
import type { FamilyKey } from '../families';
import { ledPackageRule, lightResistanceRule, luminousIntensityRule, potResistanceRule, spectralPeakRule } from './family-rules';
import { keepsFeature, lifecycleRule, numeric, pinoutRule, rohsRule, sameChoice, supplyCoverage, type Rule } from './rules';
import type { Criterion } from './types';
import { MAX_FIRST, MIN_FIRST, TYP_FIRST } from './values';

// A factor of four, in decades: doubling a tolerance or halving a power rating costs half.
const FOUR = Math.log10(4);

const RULES: Record<FamilyKey, readonly Rule[]> = {
  'op-amp': [
    supplyCoverage('op-amp', {
      key: 'supply',
      defaultWeight: 3,
      description: "How much of the operating supply (or, without one, of the original's supply range) the part's range covers.",
    }),
    keepsFeature('op-amp', {
      key: 'singleSupply',
      param: 'singleSupply',
      has: 'single-supply capable',
      lacks: 'not single-supply capable',
      defaultWeight: 1,
      description: 'Losing single-supply operation the original had costs the whole share.',
    }),
    numeric('op-amp', {
      key: 'slewRate',
      param: 'slewRate',
      order: TYP_FIRST,
      curve: 'more',
      scale: 1,
      defaultWeight: 2,
      description: 'Faster is not worse; slower loses on a log scale, all of it at a tenth of the original.',
    }),
    numeric('op-amp', {
      key: 'gainBandwidth',
      param: 'gainBandwidth',
      order: TYP_FIRST,
      curve: 'more',
      scale: 1,
      defaultWeight: 2,
      description: 'Wider is not worse; narrower loses on a log scale, all of it at a tenth of the original.',
    }),
    numeric('op-amp', {
      key: 'noise',
      param: 'inputNoiseDensity',
      label: 'Noise',
      order: TYP_FIRST,
      curve: 'less',
      scale: 1,
      defaultWeight: 2,
      description: 'Quieter is not worse; noisier loses on a log scale, all of it at ten times (20 dB) the original.',
    }),
    numeric('op-amp', {
      key: 'offsetVoltage',
      param: 'inputOffsetVoltage',
      order: TYP_FIRST,
      curve: 'less',
      scale: 1,
      defaultWeight: 1,
      description: 'Lower is not worse; higher loses on a log scale, all of it at ten times the original.',
    }),
    numeric('op-amp', {
      key: 'biasCurrent',
      param: 'inputBiasCurrent',
      order: TYP_FIRST,
      curve: 'less',
      scale: 3,
      defaultWeight: 1,
      description: 'Lower is not worse; higher loses over three decades, so a bipolar input in nA for a FET input in pA loses it all.',
    }),
    numeric('op-amp', {
      key: 'outputCurrent',
      param: 'outputCurrent',
      order: TYP_FIRST,
      curve: 'more',
      scale: 1,
      defaultWeight: 1,
      description: 'More is not worse; less loses on a log scale, all of it at a tenth of the original.',
    }),
    keepsFeature('op-amp', {
      key: 'railToRailInput',
      param: 'railToRailInput',
      has: 'rail-to-rail input',
      lacks: 'not rail-to-rail at the input',
      defaultWeight: 1,
      description: 'Losing a rail-to-rail input the original had costs the whole share.',
    }),
    keepsFeature('op-amp', {
      key: 'railToRailOutput',
      param: 'railToRailOutput',
      has: 'rail-to-rail output',
      lacks: 'not rail-to-rail at the output',
      defaultWeight: 1,
      description: 'Losing a rail-to-rail output the original had costs the whole share.',
    }),
    pinoutRule('op-amp', {
      key: 'pinout',
      defaultWeight: 3,
      description: 'Drop-in scores fully, the same pins elsewhere (an adapter) or an unknown map half, incompatible nothing; a package change is noted.',
    }),
    lifecycleRule(),
    rohsRule(),
  ],
  photoresistor: [
    numeric('photoresistor', {
      key: 'darkResistance',
      param: 'darkResistance',
      order: MIN_FIRST,
      curve: 'more',
      scale: 1,
      defaultWeight: 2,
      description: 'Higher is not worse (it leaks less with the light off); lower loses on a log scale, all of it a decade down.',
    }),
    lightResistanceRule({
      key: 'lightResistance',
      defaultWeight: 3,
      description: "Ranges at 10 lx on a log scale: half from how far apart their centres are (all of it at a decade), half from how much of the original's range is covered.",
    }),
    numeric('photoresistor', {
      key: 'gamma',
      param: 'gamma',
      order: TYP_FIRST,
      curve: 'near-linear',
      scale: 0.5,
      defaultWeight: 1,
      description: 'Either way loses, all of it at a difference of 0.5.',
    }),
    numeric('photoresistor', {
      key: 'riseTime',
      param: 'riseTime',
      order: TYP_FIRST,
      curve: 'near-log',
      scale: 1,
      defaultWeight: 1,
      description: 'Faster or slower changes the feel; either way loses on a log scale, all of it at ten times.',
    }),
    numeric('photoresistor', {
      key: 'decayTime',
      param: 'decayTime',
      order: TYP_FIRST,
      curve: 'near-log',
      scale: 1,
      defaultWeight: 2,
      description: 'The lag a listener hears; either way loses on a log scale, all of it at ten times.',
    }),
    spectralPeakRule({
      key: 'spectralPeak',
      defaultWeight: 2,
      description: "Relative response at the paired LED's peak (else the original's), on a bell curve about 100 nm wide at half response.",
    }),
    rohsRule(),
    lifecycleRule(),
  ],
  led: [
    numeric('led', {
      key: 'peakWavelength',
      param: 'peakWavelength',
      order: TYP_FIRST,
      curve: 'near-linear',
      scale: 50e-9,
      defaultWeight: 3,
      description: 'Either way loses linearly, all of it 50 nm away.',
    }),
    numeric('led', {
      key: 'forwardVoltage',
      param: 'forwardVoltage',
      order: TYP_FIRST,
      curve: 'near-linear',
      scale: 1,
      defaultWeight: 1,
      description: 'Another forward voltage changes the current through the same series resistor; all lost at 1 V apart.',
    }),
    numeric('led', {
      key: 'forwardCurrent',
      param: 'forwardCurrent',
      label: 'Rated current',
      order: MAX_FIRST,
      curve: 'more',
      scale: 1,
      defaultWeight: 1,
      description: 'A higher rating is not worse; a lower one loses on a log scale, all of it at a tenth.',
    }),
    luminousIntensityRule({
      key: 'luminousIntensity',
      defaultWeight: 2,
      description: "Either way loses on a log scale (all of it at ten times), brought to the original's test current first.",
    }),
    numeric('led', {
      key: 'viewingAngle',
      param: 'viewingAngle',
      order: TYP_FIRST,
      curve: 'near-linear',
      scale: 60,
      defaultWeight: 1,
      description: 'Either way loses linearly, all of it 60° apart.',
    }),
    ledPackageRule({
      key: 'package',
      defaultWeight: 2,
      description: 'The same package fits; another size of the same mounting scores half; through-hole for surface-mount nothing.',
    }),
    lifecycleRule(),
    rohsRule(),
  ],
  potentiometer: [
    potResistanceRule({
      key: 'resistance',
      defaultWeight: 3,
      description: "Exact scores fully; the nearest E6 value or one inside the original's tolerance 0.8; otherwise 2× off scores 0.2.",
    }),
    numeric('potentiometer', {
      key: 'tolerance',
      param: 'tolerance',
      order: TYP_FIRST,
      curve: 'less',
      scale: FOUR,
      defaultWeight: 1,
      description: 'Tighter is not worse; double the tolerance loses half, four times all of it.',
    }),
    numeric('potentiometer', {
      key: 'powerRating',
      param: 'powerRating',
      order: MAX_FIRST,
      curve: 'more',
      scale: FOUR,
      defaultWeight: 1,
      description: 'More is fine; half the rating loses half, a quarter all of it.',
    }),
    sameChoice('potentiometer', { key: 'shaftType', param: 'shaftType', defaultWeight: 1, description: 'The same shaft takes the same knobs.' }),
    sameChoice('potentiometer', { key: 'mounting', param: 'mounting', defaultWeight: 2, description: 'The same mounting fits the same board or panel.' }),
    numeric('potentiometer', {
      key: 'bodySize',
      param: 'bodySize',
      order: TYP_FIRST,
      curve: 'near-linear',
      scale: 8e-3,
      defaultWeight: 1,
      description: 'Either way loses linearly, all of it 8 mm apart (16 mm for 24 mm).',
    }),
    lifecycleRule(),
    rohsRule(),
  ],
  optocoupler: [
    numeric('optocoupler', {
      key: 'onResistance',
      param: 'onResistance',
      order: TYP_FIRST,
      curve: 'near-log',
      scale: 1,
      defaultWeight: 3,
      description: 'Either way loses on a log scale, all of it at ten times.',
    }),
    numeric('optocoupler', {
      key: 'offResistance',
      param: 'offResistance',
      order: MIN_FIRST,
      curve: 'more',
      scale: 1,
      defaultWeight: 2,
      description: 'Higher is not worse; lower loses on a log scale, all of it a decade down.',
    }),
    numeric('optocoupler', {
      key: 'turnOnTime',
      param: 'turnOnTime',
      order: TYP_FIRST,
      curve: 'near-log',
      scale: 1,
      defaultWeight: 1,
      description: 'Either way loses on a log scale, all of it at ten times.',
    }),
    numeric('optocoupler', {
      key: 'turnOffTime',
      param: 'turnOffTime',
      order: TYP_FIRST,
      curve: 'near-log',
      scale: 1,
      defaultWeight: 2,
      description: 'Either way loses on a log scale, all of it at ten times.',
    }),
    numeric('optocoupler', {
      key: 'ledMaxCurrent',
      param: 'ledMaxCurrent',
      order: MAX_FIRST,
      curve: 'more',
      scale: 1,
      defaultWeight: 1,
      description: 'A higher rating is not worse; a lower one loses on a log scale, all of it at a tenth.',
    }),
    pinoutRule('optocoupler', {
      key: 'pinout',
      defaultWeight: 2,
      description: 'Drop-in scores fully, the same pins elsewhere or an unknown map half, incompatible nothing.',
    }),
    lifecycleRule(),
    rohsRule(),
  ],
};

const CRITERIA: Record<FamilyKey, readonly Criterion[]> = Object.fromEntries(
  Object.entries(RULES).map(([family, rules]) => [
    family,
    Object.freeze(
      rules.map(({ key, label, family: f, defaultWeight, description }) => Object.freeze({ key, label, family: f, defaultWeight, description })),
    ),
  ]),
) as Record<FamilyKey, readonly Criterion[]>;

export function rulesFor(family: FamilyKey): readonly Rule[] {
  const rules = RULES[family];
  if (!rules) throw new RangeError(`Unknown part family "${String(family)}"`);
  return rules;
}

/** The criteria a family's candidates are scored on, in display order. */
export function criteriaFor(family: FamilyKey): readonly Criterion[] {
  rulesFor(family);
  return CRITERIA[family];
}

export function defaultWeights(family: FamilyKey): Weights {
  return Object.fromEntries(criteriaFor(family).map((c) => [c.key, c.defaultWeight]));
}
