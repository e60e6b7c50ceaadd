import { z } from 'zod';
import { FamilyKeySchema, ParameterValueSchema } from './families';
import { LifecycleSchema, PartDtoSchema, RohsStatusSchema } from './parts';

/**
 * The substitution contract. Scoring itself lives in ./substitution (pure functions, shared so the page can
 * re-rank at once when a weight moves); this file holds what travels over the wire.
 */

/** A criterion's weight: 0 ignores it, 5 makes it dominate. */
export const WeightSchema = z.number().min(0).max(5);
export const WeightsSchema = z.record(z.string(), WeightSchema);
export type Weights = z.infer<typeof WeightsSchema>;

/** One line of a candidate's explanation. `points` is what this criterion cost (≤ 0) out of the 100. */
export const BreakdownLineSchema = z.object({
  criterion: z.string(),
  label: z.string(),
  original: z.string().nullable(),
  candidate: z.string().nullable(),
  points: z.number(),
  /** The most this criterion could cost with the weights in force. */
  maxPoints: z.number(),
  reason: z.string(),
});
export type BreakdownLine = z.infer<typeof BreakdownLineSchema>;

export const PINOUT_CLASSES = ['drop-in', 'adapter', 'incompatible', 'unknown'] as const;
export const PinoutClassSchema = z.enum(PINOUT_CLASSES);
export type PinoutClass = z.infer<typeof PinoutClassSchema>;
export const PINOUT_CLASS_LABELS: Record<PinoutClass, string> = {
  'drop-in': 'Drop-in',
  adapter: 'Same pins, other places',
  incompatible: 'Not pin compatible',
  unknown: 'Pinout unknown',
};

export const PinoutComparisonSchema = z.object({
  class: PinoutClassSchema,
  /** A package change (DIP-8 → SOIC-8) is reported apart from pin functions. */
  packageChange: z.object({ from: z.string(), to: z.string() }).nullable(),
  /** Pin numbers whose function differs between the two. */
  differingPins: z.array(z.string()),
  summary: z.string(),
});
export type PinoutComparison = z.infer<typeof PinoutComparisonSchema>;

export const EQUIVALENT_STATUSES = ['approved', 'rejected'] as const;
export const EquivalentStatusSchema = z.enum(EQUIVALENT_STATUSES);
export type EquivalentStatus = z.infer<typeof EquivalentStatusSchema>;

/** An editor's ruling on a pair, for a stated use ("fuzz gain stage", "any"); pairs are unordered. */
export const EquivalentDtoSchema = z.object({
  id: z.uuid(),
  partId: z.uuid(),
  equivalentId: z.uuid(),
  status: EquivalentStatusSchema,
  use: z.string(),
  note: z.string(),
  decidedBy: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type EquivalentDto = z.infer<typeof EquivalentDtoSchema>;
export const EquivalentBodySchema = z.object({
  partId: z.uuid(),
  equivalentId: z.uuid(),
  status: EquivalentStatusSchema,
  use: z.string().trim().min(1, 'Say what use this ruling is for').max(200),
  note: z.string().trim().max(2000).default(''),
});
export type EquivalentBody = z.input<typeof EquivalentBodySchema>;
/** Only what changes; no defaults, so an omitted note is kept rather than cleared. */
export const EquivalentUpdateBodySchema = z.object({
  status: EquivalentStatusSchema.optional(),
  use: z.string().trim().min(1, 'Say what use this ruling is for').max(200).optional(),
  note: z.string().trim().max(2000).optional(),
});

/** The part fields a ranking needs, without history. */
export const CandidatePartSchema = PartDtoSchema.pick({
  id: true,
  family: true,
  manufacturer: true,
  partNumber: true,
  description: true,
  lifecycle: true,
  rohsStatus: true,
  package: true,
  pinLayout: true,
  pinMap: true,
  parameters: true,
});
export type CandidatePart = z.infer<typeof CandidatePartSchema>;

export const RankedAlternateSchema = z.object({
  part: CandidatePartSchema,
  score: z.number().min(0).max(100),
  breakdown: z.array(BreakdownLineSchema),
  pinout: PinoutComparisonSchema,
  /** The approved or rejected ruling on this pair, if an editor made one. */
  equivalent: EquivalentDtoSchema.nullable(),
});
export type RankedAlternate = z.infer<typeof RankedAlternateSchema>;

export const UnsuitableSchema = z.object({ part: CandidatePartSchema, reasons: z.array(z.string()).min(1) });
export type Unsuitable = z.infer<typeof UnsuitableSchema>;

const flag = z.enum(['0', '1', 'true', 'false']).transform((v) => v === '1' || v === 'true');

/**
 * `weights` travels as `criterion:weight` pairs ("slewRate:4,noise:0"); `supply` is the operating supply the
 * candidate's range must cover ("9 V", "±15 V", "9..18 V"), defaulting to none (coverage is then only scored).
 */
export const AlternatesQuerySchema = z.object({
  weights: z.string().max(500).optional(),
  supply: z.string().max(40).optional(),
  requireDropIn: flag.default(false),
  allowObsolete: flag.default(false),
  /** For a photoresistor: the LED it is lit by, to compare spectral peaks. */
  pairedWith: z.uuid().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(25),
});
export type AlternatesQuery = z.input<typeof AlternatesQuerySchema>;

/** What a home-made LED and photoresistor pair is estimated to do (estimateOptocoupler), with what was assumed. */
export const OptoEstimateSchema = z.object({
  resistanceOhms: z.object({ low: z.number(), typical: z.number(), high: z.number() }),
  /** On-axis illuminance at the cell, before the spectral correction. */
  illuminanceLux: z.number(),
  /** The cell's relative response at the LED's peak, 0..1. */
  spectralFactor: z.number().min(0).max(1),
  assumptions: z.array(z.string()),
  note: z.string(),
});

/**
 * An LED and a photoresistor offered together in place of a resistive optocoupler, scored as the optocoupler they
 * would make: on resistance from the estimate, off resistance from the cell's dark resistance, timings from the cell.
 */
export const RankedPairSchema = z.object({
  /** `${led.id}+${cell.id}`: the pair has no catalog id of its own. */
  id: z.string(),
  led: CandidatePartSchema,
  cell: CandidatePartSchema,
  /** "LED PN + CELL PN". */
  partNumber: z.string(),
  /** The worse of the two parts'. */
  lifecycle: LifecycleSchema,
  rohsStatus: RohsStatusSchema,
  score: z.number().min(0).max(100),
  breakdown: z.array(BreakdownLineSchema),
  /** Always two parts in place of one package: a layout change, never a drop-in. */
  pinout: PinoutComparisonSchema,
  /** The LED current and LED-to-cell spacing the estimate was made at. */
  driveCurrentA: z.number().positive(),
  spacingM: z.number().positive(),
  estimate: OptoEstimateSchema,
});
export type RankedPair = z.infer<typeof RankedPairSchema>;

export const RankedPairsSchema = z.object({
  items: z.array(RankedPairSchema),
  /** Pairs formed from the shortlisted LEDs and cells, ranked or turned down. */
  considered: z.number().int(),
  /** How the pairs were made (drive current, spacing) and why some or all were turned down, in plain words. */
  note: z.string(),
});
export type RankedPairs = z.infer<typeof RankedPairsSchema>;

export const AlternatesResponseSchema = z.object({
  original: CandidatePartSchema,
  weights: WeightsSchema,
  /** Candidates of the family that passed the SQL filters and were scored. */
  considered: z.number().int(),
  items: z.array(RankedAlternateSchema),
  unsuitable: z.array(UnsuitableSchema),
  /** For a resistive optocoupler, LED + photoresistor pairs that could stand in for it; null for other families. */
  pairs: RankedPairsSchema.nullable().optional(),
});
export type AlternatesResponse = z.infer<typeof AlternatesResponseSchema>;

// ---------------------------------------------------------------------------------------------------------------
// Ranking against a circuit's own requirements ("a position" in a design)

const positive = z.number().positive();

export const PositionRequirementsSchema = z.object({
  family: FamilyKeySchema.exclude(['optocoupler']),
  /** Total span between the rails; a single supply has its negative rail at ground. */
  supply: z.object({ kind: z.enum(['single', 'dual']), volts: positive, halfSupplyBias: z.boolean().default(false) }).optional(),
  /** The largest signal: the slew rate it needs follows as SR = 2π·f·Vpeak. */
  signal: z.object({ peakVolts: positive, frequencyHz: positive }).optional(),
  /** An LED driven from the output through a resistor: I = (Vout − Vf) / R. */
  ledLoad: z.object({ outputVolts: positive, forwardVolts: positive, seriesOhms: positive }).optional(),
  /** A photoresistor as the input resistor of an inverting stage: |gain| = Rf / R. */
  invertingGain: z.object({ feedbackOhms: positive, gainMin: positive, gainMax: positive }).optional(),
  requirePinLayout: z.string().max(48).optional(),
  allowObsolete: z.boolean().default(false),
});
export type PositionRequirements = z.infer<typeof PositionRequirementsSchema>;
export type PositionRequirementsInput = z.input<typeof PositionRequirementsSchema>;

/** A quantity the requirements imply, with the formula it came from. */
export const DerivedNeedSchema = z.object({
  key: z.string(),
  label: z.string(),
  /** In SI base units; `range` for a resistance range. */
  value: ParameterValueSchema,
  unit: z.string(),
  formula: z.string(),
  explanation: z.string(),
});
export type DerivedNeed = z.infer<typeof DerivedNeedSchema>;

/** How one part meets one need: the margin is actual/needed − 1 for "at least" needs (+0.5 = 50 % to spare). */
export const MarginSchema = z.object({
  need: z.string(),
  label: z.string(),
  needed: z.string(),
  actual: z.string().nullable(),
  margin: z.number().nullable(),
  ok: z.boolean(),
  reason: z.string(),
});
export type Margin = z.infer<typeof MarginSchema>;

export const PositionMatchSchema = z.object({
  part: CandidatePartSchema,
  score: z.number().min(0).max(100),
  margins: z.array(MarginSchema),
  equivalentOf: z.array(z.uuid()).default([]),
});
export type PositionMatch = z.infer<typeof PositionMatchSchema>;

export const PositionResultsSchema = z.object({
  derived: z.array(DerivedNeedSchema),
  considered: z.number().int(),
  items: z.array(PositionMatchSchema),
  unsuitable: z.array(UnsuitableSchema),
});
export type PositionResults = z.infer<typeof PositionResultsSchema>;

/** A saved, named position of a design, so a team can rerun it when stock or the catalog changes. */
export const RequirementSetBodySchema = z.object({
  name: z.string().trim().min(1, 'Name this position').max(120),
  design: z.string().trim().max(120).default(''),
  requirements: PositionRequirementsSchema,
});
export type RequirementSetBody = z.input<typeof RequirementSetBodySchema>;
/** Only what changes; no defaults, so an omitted design is kept rather than cleared. */
export const RequirementSetUpdateBodySchema = z.object({
  name: z.string().trim().min(1, 'Name this position').max(120).optional(),
  design: z.string().trim().max(120).optional(),
  requirements: PositionRequirementsSchema.optional(),
});
export const RequirementSetDtoSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  design: z.string(),
  requirements: PositionRequirementsSchema,
  owner: z.object({ id: z.uuid(), name: z.string() }),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type RequirementSetDto = z.infer<typeof RequirementSetDtoSchema>;
