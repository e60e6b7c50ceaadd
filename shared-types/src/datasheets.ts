import { z } from 'zod';
import { FamilyKeySchema, ParameterValueSchema, type ParameterValue } from './families';
import { PartDtoSchema, PartRevisionDtoSchema } from './parts';

/** Upload limits; the server reads its own size limit from the environment, this is the default. */
export const DATASHEET_LIMITS = {
  maxBytes: 25 * 1024 * 1024,
  maxFilesPerUpload: 10,
  maxPages: 200,
} as const;

/** A datasheet's way through the parser: queued → parsing → ready (for review) → applied, or failed. */
export const DATASHEET_STATUSES = ['queued', 'parsing', 'ready', 'applied', 'failed'] as const;
export const DatasheetStatusSchema = z.enum(DATASHEET_STATUSES);
export type DatasheetStatus = z.infer<typeof DatasheetStatusSchema>;
export const DATASHEET_STATUS_LABELS: Record<DatasheetStatus, string> = {
  queued: 'Queued',
  parsing: 'Parsing',
  ready: 'Ready for review',
  applied: 'Applied',
  failed: 'Failed',
};

/** A rectangle on a page in PDF points, measured from the page's top-left corner. */
export const PageBoxSchema = z.object({ x: z.number(), y: z.number(), width: z.number(), height: z.number() });
export type PageBox = z.infer<typeof PageBoxSchema>;

/** Where a finding came from: the page (1-based), the text it was read from, and that text's box when known. */
export const ExtractionSourceSchema = z.object({
  page: z.number().int().min(1),
  snippet: z.string(),
  boxes: z.array(PageBoxSchema).default([]),
});
export type ExtractionSource = z.infer<typeof ExtractionSourceSchema>;

/** Confidence from 0 (a guess) to 1 (read from a labelled table cell with its unit). */
const ConfidenceSchema = z.number().min(0).max(1);

function findingSchema<T extends z.ZodType>(value: T) {
  return z.object({ value, confidence: ConfidenceSchema, source: ExtractionSourceSchema.nullable() });
}
export const PinMapFindingSchema = findingSchema(z.record(z.string(), z.string()));

/** What the document says it is about. */
export const DatasheetIdentitySchema = z.object({
  family: findingSchema(FamilyKeySchema).nullable(),
  partNumber: findingSchema(z.string()).nullable(),
  manufacturer: findingSchema(z.string()).nullable(),
  package: findingSchema(z.string()).nullable(),
  pinMap: PinMapFindingSchema.nullable(),
});
export type DatasheetIdentity = z.infer<typeof DatasheetIdentitySchema>;

export const PROPOSAL_DECISIONS = ['pending', 'accepted', 'edited', 'rejected'] as const;
export const ProposalDecisionSchema = z.enum(PROPOSAL_DECISIONS);
export type ProposalDecision = z.infer<typeof ProposalDecisionSchema>;

/** Where in the document a value was read: a characteristics table, an absolute-maximum table (never taken as an
 * operating value, only kept for limits such as a photocell's maximum voltage), or running prose. */
export const PROPOSAL_ORIGINS = ['table', 'prose', 'absolute-maximum'] as const;

/**
 * One proposed parameter value. `value` is in SI base units (the shared definition's unit), with the test conditions
 * the table stated; `statedUnit` is the unit as the document printed it ("V/us", "kohm").
 */
export const ParameterProposalSchema = z.object({
  id: z.string().min(1),
  key: z.string().min(1),
  value: ParameterValueSchema,
  statedUnit: z.string().nullable(),
  origin: z.enum(PROPOSAL_ORIGINS),
  /** The conditions as printed ("TA = 25 °C, VS = ±15 V"), for the reviewer. */
  conditionsText: z.string().nullable(),
  confidence: ConfidenceSchema,
  source: ExtractionSourceSchema,
  decision: ProposalDecisionSchema.default('pending'),
  /** The reviewer's corrected value when decision is 'edited'. */
  editedValue: ParameterValueSchema.nullable().default(null),
});
export type ParameterProposal = z.infer<typeof ParameterProposalSchema>;

/**
 * The values an apply writes: accepted as read or edited as corrected, pending and rejected left out; for a
 * parameter kept twice the later proposal wins. The server applies exactly this; the review screen previews it.
 */
export function reviewedParameters(proposals: readonly ParameterProposal[]): Record<string, ParameterValue> {
  const out: Record<string, ParameterValue> = {};
  for (const p of proposals) {
    if (p.decision === 'accepted') out[p.key] = p.value;
    else if (p.decision === 'edited' && p.editedValue) out[p.key] = p.editedValue;
  }
  return out;
}

/** The parser's whole answer for one document. */
export const DatasheetExtractionSchema = z.object({
  pageCount: z.number().int().min(1),
  /** Page sizes in PDF points, so a viewer can place source boxes over its own rendering. */
  pages: z.array(z.object({ width: z.number(), height: z.number() })),
  identity: DatasheetIdentitySchema,
  proposals: z.array(ParameterProposalSchema),
  warnings: z.array(z.string()),
});
export type DatasheetExtraction = z.infer<typeof DatasheetExtractionSchema>;

/**
 * The batch CLI's one line of output: parameter keys of the shared definitions, each numeric slot in SI base units
 * with the canonical `unit` named wherever the parameter has one.
 */
export const DatasheetSummarySchema = z.object({
  family: FamilyKeySchema.nullable(),
  partNumber: z.string().nullable(),
  manufacturer: z.string().nullable(),
  parameters: z.record(
    z.string(),
    z.object({
      min: z.number().optional(),
      typ: z.number().optional(),
      max: z.number().optional(),
      value: z.union([z.string(), z.boolean()]).optional(),
      unit: z.string().optional(),
    }),
  ),
});
export type DatasheetSummary = z.infer<typeof DatasheetSummarySchema>;

const PartRefSchema = z.object({ id: z.uuid(), partNumber: z.string(), manufacturer: z.string() });

/** A stored datasheet as lists show it (without the extraction). */
export const DatasheetListItemSchema = z.object({
  id: z.uuid(),
  fileName: z.string(),
  byteSize: z.number().int(),
  sha256: z.string().regex(/^[0-9a-f]{64}$/),
  pageCount: z.number().int(),
  status: DatasheetStatusSchema,
  failureReason: z.string().nullable(),
  part: PartRefSchema.nullable(),
  uploadedBy: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  proposalCount: z.number().int(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  parsedAt: z.iso.datetime().nullable(),
  appliedAt: z.iso.datetime().nullable(),
});
export type DatasheetListItem = z.infer<typeof DatasheetListItemSchema>;

export const DatasheetDtoSchema = DatasheetListItemSchema.extend({ extraction: DatasheetExtractionSchema.nullable() });
export type DatasheetDto = z.infer<typeof DatasheetDtoSchema>;

export const DatasheetListQuerySchema = z.object({
  partId: z.uuid().optional(),
  status: DatasheetStatusSchema.optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type DatasheetListQuery = z.infer<typeof DatasheetListQuerySchema>;
export const DatasheetListResponseSchema = z.object({ items: z.array(DatasheetListItemSchema) });

/** Optional multipart text field of an upload: attach the new datasheets to this part. */
export const DatasheetUploadFieldsSchema = z.object({ partId: z.uuid().optional() });
export const DatasheetUploadResponseSchema = z.object({ items: z.array(DatasheetListItemSchema) });

/** Why one file of an upload was refused; the whole upload is refused with every file's reason. */
export const UPLOAD_REJECTIONS = [
  'empty',
  'not-pdf',
  'truncated',
  'encrypted',
  'unreadable',
  'no-text',
  'too-many-pages',
  'too-large',
  'duplicate',
] as const;
export const UploadRejectionSchema = z.object({
  fileName: z.string(),
  code: z.enum(UPLOAD_REJECTIONS),
  message: z.string(),
  /** For a duplicate: the datasheet already holding the same bytes. */
  existingId: z.uuid().optional(),
});
export type UploadRejection = z.infer<typeof UploadRejectionSchema>;

export const ProposalParamsSchema = z.object({ id: z.uuid(), proposalId: z.string().min(1).max(40) });
export const ProposalReviewBodySchema = z.discriminatedUnion('decision', [
  z.object({ decision: z.literal('pending') }),
  z.object({ decision: z.literal('accepted') }),
  z.object({ decision: z.literal('rejected') }),
  z.object({ decision: z.literal('edited'), value: ParameterValueSchema }),
]);
export type ProposalReviewBody = z.infer<typeof ProposalReviewBodySchema>;

/**
 * Apply the accepted and edited proposals: to an existing part (with the version the editor saw, as every edit) or
 * as a new part from the reviewed identity. Pending and rejected proposals are left out.
 */
export const DatasheetApplyBodySchema = z.discriminatedUnion('target', [
  z.object({ target: z.literal('existing'), partId: z.uuid(), version: z.number().int().min(1) }),
  z.object({
    target: z.literal('new'),
    family: FamilyKeySchema,
    partNumber: z.string().trim().min(1, 'Enter the part number').max(64),
    manufacturer: z.string().trim().min(1, 'Enter the manufacturer').max(120),
    package: z.string().trim().max(40).default(''),
    description: z.string().trim().max(2000).default(''),
  }),
]);
export type DatasheetApplyBody = z.input<typeof DatasheetApplyBodySchema>;

export const DatasheetApplyResponseSchema = z.object({
  datasheet: DatasheetDtoSchema,
  part: PartDtoSchema,
  revision: PartRevisionDtoSchema.nullable(),
});
export type DatasheetApplyResponse = z.infer<typeof DatasheetApplyResponseSchema>;
