import { z } from 'zod';
import { uuidSchema } from '../common/ids.js';
import { pageOf } from '../common/pagination.js';
import { personRefSchema } from '../library/pages.js';
import { acceptanceRuleSchema } from '../methods/acceptance.js';
import { derivationStepSchema, verdictSchema } from '../methods/evaluation.js';
import { lengthUnitSchema } from '../methods/length-unit.js';

const referenceText = (label: string, max: number) =>
  z.string({ message: `${label} is text` }).trim().max(max, `${label} must be at most ${max} characters`).optional();

/** What the reader writes down to find the record again: which part and drawing it was for. */
export const recordReferenceSchema = z.strictObject({
  partNumber: referenceText('Part number', 100),
  drawing: referenceText('Drawing', 100),
  note: referenceText('Note', 2000),
});
export type RecordReference = z.infer<typeof recordReferenceSchema>;

/**
 * Saves a run of one calculator block. The server evaluates it again: method and acceptance
 * rule come from the block in that revision, locked inputs from the block's defaults.
 */
export const createRecordRequestSchema = z.strictObject({
  pageId: uuidSchema,
  revisionId: uuidSchema,
  blockId: uuidSchema,
  inputs: z.record(z.string(), z.unknown(), { message: 'Inputs must be an object' }),
  /** Defaults to the block's unit. */
  unit: lengthUnitSchema.optional(),
  reference: recordReferenceSchema.default({}),
});
export type CreateRecordRequest = z.input<typeof createRecordRequestSchema>;

export const calculationRecordSchema = z.object({
  id: z.string(),
  page: z.object({ id: z.string(), documentNumber: z.string(), title: z.string() }),
  /**
   * `sequence` counts the page's revisions from 1; `revisionLetter` is the release letter the record
   * cites (records are made on released revisions); `state` is the revision's state now, not when recorded.
   */
  revision: z.object({ id: z.string(), sequence: z.number().int(), revisionLetter: z.string().nullable(), state: z.string() }),
  blockId: z.string(),
  method: z.string(),
  methodVersion: z.number().int(),
  unit: lengthUnitSchema,
  inputs: z.record(z.string(), z.unknown()),
  outputs: z.record(z.string(), z.unknown()),
  verdict: verdictSchema.nullable(),
  warnings: z.array(z.string()),
  steps: z.array(derivationStepSchema),
  acceptance: acceptanceRuleSchema.nullable(),
  reference: recordReferenceSchema,
  createdBy: personRefSchema.nullable(),
  createdAt: z.string(),
});
export type CalculationRecord = z.infer<typeof calculationRecordSchema>;

export const recordVerdictFilters = ['pass', 'fail', 'none'] as const;
export const recordScopes = ['mine', 'all'] as const;

const isoDateTime = z.iso.datetime({ message: 'Use an ISO 8601 date-time' });

/** `scope=all` is for admins; everyone else sees their own records. */
export const recordFilterSchema = z.strictObject({
  scope: z.enum(recordScopes, { message: 'Scope is mine or all' }).default('mine'),
  pageId: uuidSchema.optional(),
  method: z.string().max(100, 'Method id is too long').optional(),
  verdict: z.enum(recordVerdictFilters, { message: 'Verdict is pass, fail or none' }).optional(),
  from: isoDateTime.optional(),
  to: isoDateTime.optional(),
  /** Document numbers containing this text (case-insensitive). */
  documentNumber: z.string({ message: 'Document number is text' }).trim().max(40, 'Document number is at most 40 characters').optional(),
  /** Only these records: ids separated by commas (a selection to export). */
  ids: z
    .string({ message: 'Ids are text' })
    .transform((text) => [...new Set(text.split(',').map((id) => id.trim()).filter(Boolean))])
    .pipe(z.array(uuidSchema).min(1, 'Give at least one id').max(200, 'Export at most 200 records by id'))
    .optional(),
  /** Part number, drawing or note containing this text (case-insensitive). */
  reference: z.string({ message: 'Reference is text' }).trim().max(100, 'Reference text is at most 100 characters').optional(),
});
export type RecordFilter = z.infer<typeof recordFilterSchema>;

export const recordListQuerySchema = recordFilterSchema.extend({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});
export type RecordListQuery = z.infer<typeof recordListQuerySchema>;

export const recordListSchema = pageOf(calculationRecordSchema);
export type RecordList = z.infer<typeof recordListSchema>;
