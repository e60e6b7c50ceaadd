import { z } from 'zod';
import { RankedAlternateSchema } from './alternates';
import { FamilyKeySchema } from './families';
import { LifecycleSchema, RohsStatusSchema } from './parts';

// ---------------------------------------------------------------------------------------------------------------
// Bills of materials: the contract between the BOM check API and its screens.

export const BOM_LIMITS = {
  /** An upload or a paste; a 10,000-line BOM with long notes stays well under it. */
  maxBytes: 5 * 1024 * 1024,
  /** Data lines (the header row not counted). */
  maxLines: 10_000,
  maxColumns: 60,
  maxNameLength: 120,
  maxNoteLength: 2000,
  /** Closest catalog parts offered for a line that matches none exactly. */
  candidatesPerLine: 3,
  /** Alternates offered per line, after the approved equivalents. */
  alternatesPerLine: 3,
} as const;

/** What a column can be mapped to. Only the part number is required. */
export const BOM_FIELDS = ['partNumber', 'manufacturer', 'quantity', 'designators', 'notes'] as const;
export const BomFieldSchema = z.enum(BOM_FIELDS);
export type BomField = z.infer<typeof BomFieldSchema>;
export const BOM_FIELD_LABELS: Record<BomField, string> = {
  partNumber: 'Part number',
  manufacturer: 'Manufacturer',
  quantity: 'Quantity',
  designators: 'Reference designators',
  notes: 'Notes',
};

/** Column index (0-based) per field; a field left out is not in the file. */
export const BomMappingSchema = z.object({
  partNumber: z.number().int().min(0),
  manufacturer: z.number().int().min(0).optional(),
  quantity: z.number().int().min(0).optional(),
  designators: z.number().int().min(0).optional(),
  notes: z.number().int().min(0).optional(),
});
export type BomMapping = z.infer<typeof BomMappingSchema>;

/** The delimiters a spreadsheet export or a paste uses. */
export const BOM_DELIMITERS = [',', ';', '\t', '|'] as const;
export const BomDelimiterSchema = z.enum(BOM_DELIMITERS);
export type BomDelimiter = z.infer<typeof BomDelimiterSchema>;
export const BOM_DELIMITER_LABELS: Record<BomDelimiter, string> = { ',': 'Comma', ';': 'Semicolon', '\t': 'Tab', '|': 'Vertical bar' };

/**
 * Why a BOM cannot be read at all. Problems on single lines (a bad quantity, a repeated designator) are kept on
 * the line instead, so nothing is lost.
 */
export const BOM_REJECTIONS = ['empty', 'too-large', 'too-many-lines', 'too-many-columns', 'unreadable', 'no-part-number-column', 'no-part-numbers'] as const;
export type BomRejection = (typeof BOM_REJECTIONS)[number];

/** A 400/413 answer's details: what is wrong, and where when it is one row. */
export const BomRejectionDetailsSchema = z.object({
  reason: z.enum(BOM_REJECTIONS),
  rows: z.array(z.object({ row: z.number().int(), message: z.string() })).default([]),
});

// --- Preview: reading a file before it is saved ------------------------------------------------------------

export const BomPreviewBodySchema = z.object({
  /** Pasted text. A file upload sends multipart `file` instead. */
  text: z.string().max(BOM_LIMITS.maxBytes),
  delimiter: BomDelimiterSchema.optional(),
  hasHeader: z.boolean().optional(),
});
export type BomPreviewBody = z.input<typeof BomPreviewBodySchema>;

export const BomColumnSchema = z.object({
  index: z.number().int(),
  /** The header text, or null when the file has no header row. */
  header: z.string().nullable(),
  /** A few values from the first rows, to recognise the column by. */
  samples: z.array(z.string()),
});
export type BomColumn = z.infer<typeof BomColumnSchema>;

export const MAPPING_SOURCES = ['remembered', 'headers', 'content'] as const;

export const BomPreviewSchema = z.object({
  /** The decoded text, sent back on save so the server reads exactly what was previewed. */
  text: z.string(),
  /** The encoding the bytes were read in ("utf-8", "windows-1252", "utf-16le"…); "text" for a paste. */
  encoding: z.string(),
  delimiter: BomDelimiterSchema,
  hasHeader: z.boolean(),
  columns: z.array(BomColumnSchema),
  /** Data lines, header excluded. */
  lineCount: z.number().int(),
  /** The first rows as read, for the mapping screen. */
  sampleRows: z.array(z.array(z.string())),
  mapping: BomMappingSchema.partial(),
  /** Where each mapped field came from: the user's last mapping, the header words, or the values themselves. */
  mappingSource: z.partialRecord(BomFieldSchema, z.enum(MAPPING_SOURCES)),
});
export type BomPreview = z.infer<typeof BomPreviewSchema>;

/** The last mapping a user confirmed, remembered by header text (and by position for a file without headers). */
export const RememberedMappingSchema = z.object({
  byHeader: z.partialRecord(BomFieldSchema, z.string()).default({}),
  byIndex: z.partialRecord(BomFieldSchema, z.number().int().min(0)).default({}),
});
export type RememberedMapping = z.infer<typeof RememberedMappingSchema>;

// --- Saving and reading a BOM -------------------------------------------------------------------------------

export const BomCreateBodySchema = z.object({
  name: z.string().trim().min(1).max(BOM_LIMITS.maxNameLength),
  text: z.string().max(BOM_LIMITS.maxBytes),
  fileName: z.string().max(255).nullable().default(null),
  encoding: z.string().max(40).default('text'),
  delimiter: BomDelimiterSchema,
  hasHeader: z.boolean(),
  mapping: BomMappingSchema,
});
export type BomCreateBody = z.input<typeof BomCreateBodySchema>;

export const BomUpdateBodySchema = z.object({
  name: z.string().trim().min(1).max(BOM_LIMITS.maxNameLength).optional(),
  /** Whether lifecycle changes and new approved equivalents of its parts alert the owner. */
  watched: z.boolean().optional(),
});
export type BomUpdateBody = z.input<typeof BomUpdateBodySchema>;

export const BomShareBodySchema = z.object({ userIds: z.array(z.uuid()).max(50) });
export type BomShareBody = z.input<typeof BomShareBodySchema>;

export const PersonRefSchema = z.object({ id: z.uuid(), name: z.string() });
export type PersonRef = z.infer<typeof PersonRefSchema>;
export const ColleagueSchema = PersonRefSchema.extend({ email: z.string() });
export type Colleague = z.infer<typeof ColleagueSchema>;

/** A catalog part as a BOM line shows it: enough to judge the risk at a glance. */
export const BomPartSchema = z.object({
  id: z.uuid(),
  family: FamilyKeySchema,
  partNumber: z.string(),
  manufacturer: z.string(),
  description: z.string(),
  lifecycle: LifecycleSchema,
  rohsStatus: RohsStatusSchema,
  /** A photoresistor (or optocoupler) with a cadmium cell: the cadmium caution applies. */
  cadmium: z.boolean(),
});
export type BomPart = z.infer<typeof BomPartSchema>;

/**
 * How a line found its part:
 * - exact: the same part number once case, spaces and dashes are ignored;
 * - suffix: the same once a packing or package suffix ("-TR", "/REEL", "SOIC8") is also set aside;
 * - confirmed: the user picked the part (from the candidates or a search);
 * - candidates: no match, but close part numbers to confirm;
 * - unmatched: nothing close in the catalog.
 */
export const MATCH_KINDS = ['exact', 'suffix', 'confirmed', 'candidates', 'unmatched'] as const;
export const MatchKindSchema = z.enum(MATCH_KINDS);
export type MatchKind = z.infer<typeof MatchKindSchema>;

export const BomCandidateSchema = z.object({
  part: BomPartSchema,
  /** 0..1, how alike the part numbers are. */
  similarity: z.number().min(0).max(1),
});
export type BomCandidate = z.infer<typeof BomCandidateSchema>;

export const BomLineProblemSchema = z.object({
  field: z.union([BomFieldSchema, z.literal('row')]),
  message: z.string(),
});
export type BomLineProblem = z.infer<typeof BomLineProblemSchema>;

/**
 * One line's verdict, worst first when sorting: unmatched and to-confirm lines need the user; at-risk lines need
 * a replacement (obsolete, last-time buy, not recommended, non-compliant or cadmium); ok lines are fine to order.
 */
export const LINE_STATUSES = ['unmatched', 'confirm', 'at-risk', 'attention', 'ok'] as const;
export const LineStatusSchema = z.enum(LINE_STATUSES);
export type LineStatus = z.infer<typeof LineStatusSchema>;
export const LINE_STATUS_LABELS: Record<LineStatus, string> = {
  unmatched: 'Not in catalog',
  confirm: 'Confirm match',
  'at-risk': 'At risk',
  attention: 'Check line',
  ok: 'OK',
};

export const ApprovedEquivalentRefSchema = z.object({
  part: BomPartSchema,
  use: z.string(),
  note: z.string(),
});
export type ApprovedEquivalentRef = z.infer<typeof ApprovedEquivalentRefSchema>;

export const BomReplacementSchema = z.object({
  part: BomPartSchema,
  note: z.string(),
  chosenBy: PersonRefSchema.nullable(),
  chosenAt: z.iso.datetime(),
});
export type BomReplacement = z.infer<typeof BomReplacementSchema>;

export const BomLineDtoSchema = z.object({
  id: z.uuid(),
  /** The row as a spreadsheet numbers it (the header is row 1 when there is one). */
  row: z.number().int(),
  /** Every cell of the original row, untouched, so an export gives back what came in. */
  cells: z.array(z.string()),
  partNumber: z.string(),
  manufacturer: z.string().nullable(),
  quantity: z.number().nullable(),
  designators: z.array(z.string()),
  notes: z.string(),
  match: z.object({
    kind: MatchKindSchema,
    part: BomPartSchema.nullable(),
    /** Why it matched the way it did, e.g. "packing suffix -TR set aside". */
    detail: z.string().nullable(),
    candidates: z.array(BomCandidateSchema),
  }),
  problems: z.array(BomLineProblemSchema),
  status: LineStatusSchema,
  /** One line in plain words: "Obsolete; 1 approved equivalent", "Cadmium cell: check RoHS exemptions". */
  risk: z.string(),
  approvedEquivalents: z.array(ApprovedEquivalentRefSchema),
  replacement: BomReplacementSchema.nullable(),
});
export type BomLineDto = z.infer<typeof BomLineDtoSchema>;

/** The counts behind the BOM's one-line risk summary. */
export const BomSummarySchema = z.object({
  lines: z.number().int(),
  ok: z.number().int(),
  obsolete: z.number().int(),
  nrnd: z.number().int(),
  lastTimeBuy: z.number().int(),
  nonCompliant: z.number().int(),
  cadmium: z.number().int(),
  unmatched: z.number().int(),
  toConfirm: z.number().int(),
  withProblems: z.number().int(),
  replaced: z.number().int(),
  /** "3 obsolete, 1 last-time buy, 2 cadmium, 1 not in catalog — 2 replacements chosen". */
  text: z.string(),
});
export type BomSummary = z.infer<typeof BomSummarySchema>;

export const BomCheckDtoSchema = z.object({
  id: z.uuid(),
  checkedAt: z.iso.datetime(),
  checkedBy: PersonRefSchema.nullable(),
  /** "upload", "manual" (the Check again button), or "change" (a watched part changed). */
  trigger: z.enum(['upload', 'manual', 'change']),
  summary: BomSummarySchema,
  /** Lines whose status differs from the check before, in words. */
  changes: z.array(z.string()),
  durationMs: z.number().int(),
});
export type BomCheckDto = z.infer<typeof BomCheckDtoSchema>;

export const BomDtoSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  owner: PersonRefSchema,
  sharedWith: z.array(PersonRefSchema),
  fileName: z.string().nullable(),
  watched: z.boolean(),
  lineCount: z.number().int(),
  summary: BomSummarySchema,
  lastCheckedAt: z.iso.datetime().nullable(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type BomDto = z.infer<typeof BomDtoSchema>;

export const BomListResponseSchema = z.object({ items: z.array(BomDtoSchema) });
export type BomListResponse = z.infer<typeof BomListResponseSchema>;

export const BomListQuerySchema = z.object({
  /** mine: owned; shared: shared with me; all: everything the caller may read (editors and admins: every BOM). */
  scope: z.enum(['mine', 'shared', 'all']).default('all'),
});

export const BomDetailDtoSchema = BomDtoSchema.extend({
  encoding: z.string(),
  delimiter: BomDelimiterSchema,
  hasHeader: z.boolean(),
  /** Header texts, or "Column 1"… when there is no header row. */
  columns: z.array(z.string()),
  mapping: BomMappingSchema,
  lines: z.array(BomLineDtoSchema),
  checks: z.array(BomCheckDtoSchema),
});
export type BomDetailDto = z.infer<typeof BomDetailDtoSchema>;

/** Confirm a match (a candidate or any catalog part), clear one (null), and/or choose a replacement with a note. */
export const BomLineUpdateBodySchema = z.object({
  partId: z.uuid().nullable().optional(),
  replacementPartId: z.uuid().nullable().optional(),
  replacementNote: z.string().max(BOM_LIMITS.maxNoteLength).optional(),
});
export type BomLineUpdateBody = z.input<typeof BomLineUpdateBodySchema>;

/** What may go in a line's place: approved equivalents first, then the substitution engine's best. */
export const BomLineOptionsSchema = z.object({
  approvedEquivalents: z.array(ApprovedEquivalentRefSchema),
  alternates: z.array(RankedAlternateSchema),
});
export type BomLineOptions = z.infer<typeof BomLineOptionsSchema>;

/** The columns a checked-BOM export adds after the original ones. */
export const BOM_EXPORT_COLUMNS = ['Understudy status', 'Matched part', 'Lifecycle', 'RoHS', 'Risk', 'Replacement', 'Replacement note'] as const;

// --- Watch and alert ------------------------------------------------------------------------------------------

export const ALERT_DELIVERIES = ['immediate', 'daily', 'off'] as const;
export const AlertDeliverySchema = z.enum(ALERT_DELIVERIES);
export type AlertDelivery = z.infer<typeof AlertDeliverySchema>;
export const ALERT_DELIVERY_LABELS: Record<AlertDelivery, string> = {
  immediate: 'E-mail me at once',
  daily: 'One e-mail a day (digest)',
  off: 'No e-mail, notices in the app only',
};

export const AlertPreferencesSchema = z.object({ delivery: AlertDeliverySchema });
export type AlertPreferences = z.infer<typeof AlertPreferencesSchema>;

/** What happened to a part that saved BOMs use. */
export const PART_CHANGE_KINDS = ['lifecycle', 'approved-equivalent'] as const;
export const PartChangeKindSchema = z.enum(PART_CHANGE_KINDS);
export type PartChangeKind = z.infer<typeof PartChangeKindSchema>;

export const NotificationDtoSchema = z.object({
  id: z.uuid(),
  kind: PartChangeKindSchema,
  /** "HV4558 is now obsolete" */
  title: z.string(),
  /** Which of the person's BOMs use it, and what to do. */
  body: z.string(),
  part: z.object({ id: z.uuid(), partNumber: z.string() }),
  boms: z.array(z.object({ id: z.uuid(), name: z.string(), lines: z.number().int() })),
  createdAt: z.iso.datetime(),
  readAt: z.iso.datetime().nullable(),
  emailedAt: z.iso.datetime().nullable(),
});
export type NotificationDto = z.infer<typeof NotificationDtoSchema>;

export const NotificationListResponseSchema = z.object({
  items: z.array(NotificationDtoSchema),
  unread: z.number().int(),
});
export type NotificationListResponse = z.infer<typeof NotificationListResponseSchema>;
