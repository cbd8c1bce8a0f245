import { z } from 'zod';
import { uuidSchema } from '../common/ids.js';
import { collectionRefSchema } from './collections.js';
import { personRefSchema, revisionReviewSchema, revisionStateSchema } from './pages.js';

const commentSchema = (label: string) => z.string({ message: `${label} is text` }).trim().max(4000, `${label} must be at most 4000 characters`);

export const submitForReviewRequestSchema = z.strictObject({
  /** Reviewers (role reviewer or admin) to ask; each gets a mail. The author cannot review their own draft. */
  reviewerIds: z
    .array(uuidSchema, { message: 'Pick at least one reviewer' })
    .min(1, 'Pick at least one reviewer')
    .max(20, 'Ask at most 20 reviewers')
    .transform((ids) => [...new Set(ids)]),
  note: commentSchema('The note').optional(),
});
export type SubmitForReviewRequest = z.input<typeof submitForReviewRequestSchema>;

export const approveRequestSchema = z.strictObject({
  /**
   * The version of the revision the reviewer read: if it was withdrawn, edited and submitted
   * again meanwhile, the approval is refused with 409 instead of releasing unseen text.
   */
  baseVersion: z.number({ message: 'Base version is required' }).int('Base version is a whole number').min(1, 'Base version starts at 1'),
  comment: commentSchema('The comment').optional(),
});
export type ApproveRequest = z.infer<typeof approveRequestSchema>;

export const sendBackRequestSchema = z.strictObject({
  comment: z.string({ message: 'Say what needs to change' }).trim().min(1, 'Say what needs to change').max(4000, 'The comment must be at most 4000 characters'),
});
export type SendBackRequest = z.infer<typeof sendBackRequestSchema>;

export const revisionParamsSchema = z.strictObject({ id: uuidSchema, revisionId: uuidSchema });
export type RevisionParams = z.infer<typeof revisionParamsSchema>;

/** One line of a page's revision history. */
export const revisionHistoryEntrySchema = z.object({
  id: z.string(),
  sequence: z.number().int(),
  revisionLetter: z.string().nullable(),
  state: revisionStateSchema,
  title: z.string(),
  version: z.number().int(),
  createdAt: z.string(),
  createdBy: personRefSchema.nullable(),
  updatedAt: z.string(),
  updatedBy: personRefSchema.nullable(),
  /** Release date and approver. */
  releasedAt: z.string().nullable(),
  approvedBy: personRefSchema.nullable(),
  supersededAt: z.string().nullable(),
  review: revisionReviewSchema,
  restoredFromId: z.string().nullable(),
});
export type RevisionHistoryEntry = z.infer<typeof revisionHistoryEntrySchema>;

/** Newest first. Readers get released and superseded revisions only. */
export const revisionHistorySchema = z.object({ items: z.array(revisionHistoryEntrySchema) });
export type RevisionHistory = z.infer<typeof revisionHistorySchema>;

export const compareQuerySchema = z.strictObject({ from: uuidSchema, to: uuidSchema });
export type CompareQuery = z.infer<typeof compareQuerySchema>;

export const textChangeSchema = z.object({ kind: z.enum(['added', 'removed', 'unchanged']), text: z.string() });
export type TextChange = z.infer<typeof textChangeSchema>;

/** One row of the calculator-settings table: a setting of one block, before and after (null where absent). */
export const blockSettingChangeSchema = z.object({
  /** `method`, `unit`, `caption`, `acceptance`, `default`, `locked`. */
  setting: z.enum(['method', 'unit', 'caption', 'acceptance', 'default', 'locked']),
  /** The input path for `default` and `locked` rows, else null. */
  path: z.string().nullable(),
  from: z.string().nullable(),
  to: z.string().nullable(),
});
export type BlockSettingChange = z.infer<typeof blockSettingChangeSchema>;

export const blockChangeSchema = z.object({
  blockId: z.string(),
  change: z.enum(['added', 'removed', 'changed']),
  /** Method id and version on the newer side (the older one for a removed block). */
  method: z.string(),
  caption: z.string().nullable(),
  rows: z.array(blockSettingChangeSchema),
});
export type BlockChange = z.infer<typeof blockChangeSchema>;

export const revisionRefSchema = z.object({ id: z.string(), revisionLetter: z.string().nullable(), state: revisionStateSchema, sequence: z.number().int() });

export const revisionCompareSchema = z.object({
  from: revisionRefSchema,
  to: revisionRefSchema,
  title: z.object({ from: z.string(), to: z.string(), changed: z.boolean() }),
  /** Line by line; a changed line comes as its removed then its added form. */
  text: z.array(textChangeSchema),
  /** Calculator blocks matched by blockId; unchanged blocks are left out. */
  blocks: z.array(blockChangeSchema),
});
export type RevisionCompare = z.infer<typeof revisionCompareSchema>;

export const obsoleteRequestSchema = z.strictObject({
  reason: z.string({ message: 'Give a reason' }).trim().min(1, 'Give a reason').max(2000, 'The reason must be at most 2000 characters'),
});
export type ObsoleteRequest = z.infer<typeof obsoleteRequestSchema>;

export const watchStatusSchema = z.object({ pageId: z.string(), watching: z.boolean() });
export type WatchStatus = z.infer<typeof watchStatusSchema>;

export const watchedPageSchema = z.object({
  id: z.string(),
  documentNumber: z.string(),
  title: z.string(),
  collection: collectionRefSchema,
  revisionLetter: z.string().nullable(),
  releasedAt: z.string().nullable(),
  obsolete: z.boolean(),
  watchedAt: z.string(),
});
export type WatchedPage = z.infer<typeof watchedPageSchema>;

export const watchedPageListSchema = z.object({ items: z.array(watchedPageSchema) });
export type WatchedPageList = z.infer<typeof watchedPageListSchema>;

/** Someone who may be asked to review: an active user with role reviewer or admin. */
export const reviewerCandidateSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: z.enum(['reviewer', 'admin']),
});
export type ReviewerCandidate = z.infer<typeof reviewerCandidateSchema>;

/** `GET /api/reviewers` (authors and admins): everyone who can be asked to review, by name. */
export const reviewerListSchema = z.object({ items: z.array(reviewerCandidateSchema) });
export type ReviewerList = z.infer<typeof reviewerListSchema>;
