import { z } from 'zod';
import { FAMILY_KEYS, FamilyKeySchema, parametersSchemaFor, ParameterValueSchema, type FamilyKey } from './families';

export const LIFECYCLES = ['active', 'nrnd', 'last-time-buy', 'obsolete'] as const;
export const LifecycleSchema = z.enum(LIFECYCLES);
export type Lifecycle = z.infer<typeof LifecycleSchema>;
export const LIFECYCLE_LABELS: Record<Lifecycle, string> = {
  active: 'Active',
  nrnd: 'Not recommended for new designs',
  'last-time-buy': 'Last-time buy',
  obsolete: 'Obsolete',
};

export const ROHS_STATUSES = ['compliant', 'exempt', 'non-compliant', 'unknown'] as const;
export const RohsStatusSchema = z.enum(ROHS_STATUSES);
export type RohsStatus = z.infer<typeof RohsStatusSchema>;
export const ROHS_LABELS: Record<RohsStatus, string> = {
  compliant: 'RoHS compliant',
  exempt: 'RoHS exemption',
  'non-compliant': 'Not RoHS compliant',
  unknown: 'RoHS status unknown',
};

/** Part numbers compare without case, spaces, dashes, dots or slashes: "cv 2207" is CV2207. */
export function partNumberKey(partNumber: string): string {
  return partNumber.toLowerCase().replace(/[^a-z0-9]/g, '');
}

const PinMapSchema = z.record(z.string().regex(/^\d{1,3}$/, 'Pin numbers are whole numbers'), z.string().trim().min(1).max(24));

/** The editable fields, without defaults: an update sends only what changed. */
const PartFieldsSchema = z.object({
  manufacturer: z.string().trim().min(1, 'Enter the manufacturer').max(120),
  partNumber: z.string().trim().min(1, 'Enter the part number').max(64),
  description: z.string().trim().max(2000),
  lifecycle: LifecycleSchema,
  rohsStatus: RohsStatusSchema,
  rohsNote: z.string().trim().max(500),
  package: z.string().trim().max(40),
  /** A shared layout key from PIN_LAYOUTS; pinMap then defaults to that layout. */
  pinLayout: z.string().trim().max(48).nullable(),
  pinMap: PinMapSchema,
  parameters: z.record(z.string(), ParameterValueSchema),
  tags: z.array(z.string().trim().min(1).max(40)).max(20),
});

const f = PartFieldsSchema.shape;
const PartCreateFieldsSchema = z.object({
  ...f,
  description: f.description.default(''),
  lifecycle: f.lifecycle.default('active'),
  rohsStatus: f.rohsStatus.default('unknown'),
  rohsNote: f.rohsNote.default(''),
  package: f.package.default(''),
  pinLayout: f.pinLayout.default(null),
  pinMap: f.pinMap.default({}),
  parameters: f.parameters.default({}),
  tags: f.tags.default([]),
});

function checkParameters(family: FamilyKey, parameters: unknown, ctx: z.core.$RefinementCtx) {
  const result = parametersSchemaFor(family).safeParse(parameters);
  if (!result.success) {
    for (const issue of result.error.issues) ctx.addIssue({ code: 'custom', path: ['parameters', ...issue.path.map(String)], message: issue.message });
  }
}

export const PartCreateBodySchema = PartCreateFieldsSchema.extend({ family: FamilyKeySchema }).superRefine((body, ctx) =>
  checkParameters(body.family, body.parameters, ctx),
);
export type PartCreateBody = z.input<typeof PartCreateBodySchema>;
export type PartCreateInput = z.output<typeof PartCreateBodySchema>;

/** Family cannot change; `version` is the one the editor started from (optimistic concurrency). */
export const PartUpdateBodySchema = PartFieldsSchema.partial()
  .extend({ version: z.number().int().min(1) })
  .strict();
export type PartUpdateBody = z.input<typeof PartUpdateBodySchema>;

export const ManufacturerDtoSchema = z.object({ id: z.uuid(), name: z.string() });
export type ManufacturerDto = z.infer<typeof ManufacturerDtoSchema>;

export const PartDtoSchema = z.object({
  id: z.uuid(),
  family: z.enum(FAMILY_KEYS),
  manufacturer: ManufacturerDtoSchema,
  partNumber: z.string(),
  description: z.string(),
  lifecycle: LifecycleSchema,
  rohsStatus: RohsStatusSchema,
  rohsNote: z.string(),
  package: z.string(),
  pinLayout: z.string().nullable(),
  pinMap: z.record(z.string(), z.string()),
  parameters: z.record(z.string(), ParameterValueSchema),
  tags: z.array(z.string()),
  version: z.number().int(),
  archived: z.boolean(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type PartDto = z.infer<typeof PartDtoSchema>;

export const PartListResponseSchema = z.object({
  items: z.array(PartDtoSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type PartListResponse = z.infer<typeof PartListResponseSchema>;

export const RevisionChangeSchema = z.object({ field: z.string(), before: z.unknown(), after: z.unknown() });
export type RevisionChange = z.infer<typeof RevisionChangeSchema>;

export const PartRevisionDtoSchema = z.object({
  id: z.uuid(),
  version: z.number().int(),
  actor: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  source: z.string(),
  /** The datasheet whose reviewed values this revision applied, if any. */
  datasheet: z.object({ id: z.uuid(), fileName: z.string() }).nullable().default(null),
  changes: z.array(RevisionChangeSchema),
  createdAt: z.iso.datetime(),
});
export type PartRevisionDto = z.infer<typeof PartRevisionDtoSchema>;
export const PartRevisionListResponseSchema = z.object({ items: z.array(PartRevisionDtoSchema) });

/** The 409 body of a stale edit: the part as it is now, so the form can show what changed meanwhile. */
export const PartConflictSchema = z.object({
  error: z.object({ code: z.literal('version_conflict'), message: z.string() }),
  current: PartDtoSchema,
});
export type PartConflict = z.infer<typeof PartConflictSchema>;

export const SORT_DIRECTIONS = ['asc', 'desc'] as const;

/**
 * The fixed part of a search. Numeric parameter filters travel as `<key>.min` / `<key>.max`, in SI base units or in
 * engineering notation ("5V/us", "9"); text, enum and boolean filters as `<key>=value[,value]`.
 * `sort` is a column (`partNumber`, `manufacturer`, `lifecycle`, or a parameter key), `-` in front for descending.
 */
export const PartListQuerySchema = z.object({
  family: FamilyKeySchema.optional(),
  q: z.string().trim().max(200).optional(),
  lifecycle: z.string().optional(),
  rohs: z.string().optional(),
  includeArchived: z.enum(['0', '1', 'true', 'false']).optional(),
  sort: z.string().max(64).optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type PartListQuery = z.infer<typeof PartListQuerySchema>;

export const ImportReportSchema = z.object({
  dryRun: z.boolean(),
  total: z.number().int(),
  created: z.number().int(),
  updated: z.number().int(),
  errors: z.array(z.object({ row: z.number().int(), partNumber: z.string().nullable(), message: z.string() })),
});
export type ImportReport = z.infer<typeof ImportReportSchema>;

/**
 * How a numeric filter reads, from the parameter's own slots. A parameter given as a range (supply span, operating
 * temperature, light resistance: min and max, no typ) matches when the part's range covers the asked range — "runs
 * on 9 V" means min ≤ 9 and max ≥ 9. Any other parameter matches when its representative value (typ, else min,
 * else max) lies between the bounds.
 */
export type NumericFilterMode = 'covers' | 'between';
export function numericFilterMode(slots: readonly string[] | undefined): NumericFilterMode {
  const s = slots ?? ['min', 'typ', 'max'];
  return s.includes('min') && s.includes('max') && !s.includes('typ') ? 'covers' : 'between';
}

/**
 * A voltage given as a range is a supply span: "±4.5 V" is typed for it and means 9 V between the rails. Read off the
 * definition (a range in volts) so the search form and the server agree.
 */
export function isSupplySpan(def: { kind: string; unit?: string; slots?: readonly string[] }): boolean {
  return def.kind === 'number' && def.unit === 'V' && numericFilterMode(def.slots) === 'covers';
}

export function representativeValue(v: { min?: number; typ?: number; max?: number } | undefined): number | undefined {
  return v?.typ ?? v?.min ?? v?.max;
}

export const MAX_COMPARE = 6;
