import { z } from 'zod';
import { uuidSchema } from '../common/ids.js';
import { personRefSchema } from '../library/pages.js';

export const impactCheckRequestSchema = z
  .strictObject({ fromRevisionId: uuidSchema, toRevisionId: uuidSchema })
  .refine((body) => body.fromRevisionId !== body.toRevisionId, { path: ['toRevisionId'], message: 'Pick a different revision to compare with' });
export type ImpactCheckRequest = z.infer<typeof impactCheckRequestSchema>;

/** A calculator block present in both revisions whose settings differ, with what changed. */
export const impactBlockChangeSchema = z.object({
  blockId: z.string(),
  caption: z.string(),
  changes: z.array(z.enum(['method', 'methodVersion', 'unit', 'lockedInputs', 'acceptance'])),
});
export type ImpactBlockChange = z.infer<typeof impactBlockChangeSchema>;

const impactOutcomeSchema = z.object({
  /** Null when there is no verdict (no rule, no method checks) or the run failed. */
  pass: z.boolean().nullable(),
  keyOutputs: z.record(z.string(), z.unknown()),
  /** Why the record could not be evaluated under the new settings. */
  error: z.string().optional(),
});

export const impactEntrySchema = z.object({
  recordId: z.string(),
  blockId: z.string(),
  owner: personRefSchema.nullable(),
  before: impactOutcomeSchema,
  after: impactOutcomeSchema,
});
export type ImpactEntry = z.infer<typeof impactEntrySchema>;

export const impactReportSchema = z.object({
  id: z.string(),
  pageId: z.string(),
  fromRevisionId: z.string(),
  toRevisionId: z.string(),
  changedBlocks: z.array(impactBlockChangeSchema),
  /** Records made under the old revision on a changed block, all re-evaluated. */
  recordsChecked: z.number().int(),
  /** Only the records whose verdict or key outputs change. */
  affected: z.array(impactEntrySchema),
  createdBy: personRefSchema.nullable(),
  createdAt: z.string(),
});
export type ImpactReport = z.infer<typeof impactReportSchema>;

/**
 * The impact check of a release (`GET /api/pages/:id/revisions/:revisionId/impact`): `none` when
 * the revision replaced no earlier release (nothing to check), `pending` while the check that
 * runs after approval has not stored its report yet, `ready` with the latest report.
 */
export const releaseImpactSchema = z.object({
  status: z.enum(['none', 'pending', 'ready']),
  report: impactReportSchema.nullable(),
});
export type ReleaseImpact = z.infer<typeof releaseImpactSchema>;

/** A later release under which one record comes out differently (`GET /api/records/:id/impact`). */
export const recordImpactSchema = z.object({
  reportId: z.string(),
  toRevision: z.object({ id: z.string(), revisionLetter: z.string().nullable() }),
  checkedAt: z.string(),
  before: impactOutcomeSchema,
  after: impactOutcomeSchema,
});
export type RecordImpact = z.infer<typeof recordImpactSchema>;
export const recordImpactListSchema = z.object({ items: z.array(recordImpactSchema) });
export type RecordImpactList = z.infer<typeof recordImpactListSchema>;
