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
