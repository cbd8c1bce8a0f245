import { z } from 'zod';
import { errorBodySchema } from '../common/error.js';
import { uuidSchema } from '../common/ids.js';
import { pageQuerySchema, pageOf } from '../common/pagination.js';
import { collectionKeySchema, collectionRefSchema } from './collections.js';

/** A document number such as `BW-STD-112`: letters first, then hyphen-separated groups; stored upper-case. */
export const documentNumberSchema = z
  .string({ message: 'Document number is required' })
  .trim()
  .max(40, 'Document number must be at most 40 characters')
  .transform((value) => value.toUpperCase())
  .pipe(z.string().regex(/^[A-Z][A-Z0-9]*(-[A-Z0-9]+)+$/, 'Use a document number such as BW-STD-112'));

export const pageTagSchema = z
  .string({ message: 'Tags are text' })
  .trim()
  .min(1, 'A tag cannot be empty')
  .max(40, 'A tag must be at most 40 characters')
  .regex(/^[\p{L}\p{N}][\p{L}\p{N} ._/+-]*$/u, 'Tags hold letters, digits, spaces and . _ / + -');

export const maxPageTags = 20;

export const pageTagsSchema = z
  .array(pageTagSchema, { message: 'Tags must be a list' })
  .max(maxPageTags, `A page has at most ${maxPageTags} tags`)
  .transform((tags) => [...new Set(tags)]);

export const pageTitleSchema = z.string({ message: 'Title is required' }).trim().min(1, 'Title is required').max(200, 'Title must be at most 200 characters');

/**
 * A page body: ProseMirror JSON whose root is a `doc`. Only its outline is checked here;
 * the server checks every node, mark and attribute against the editor's schema and reports
 * problems under `document.<path>`, e.g. `document.content.3.attrs.href`.
 */
export const pageDocumentSchema = z.looseObject({
  type: z.literal('doc', { message: 'The root node must be a doc' }),
  content: z.array(z.unknown(), { message: 'Content must be a list of nodes' }).optional(),
});
export type PageDocument = z.infer<typeof pageDocumentSchema>;

/** Draft → in review → released → superseded; the last two never change again. */
export const revisionStates = ['draft', 'in_review', 'released', 'superseded'] as const;
export const revisionStateSchema = z.enum(revisionStates);
export type RevisionState = z.infer<typeof revisionStateSchema>;

export const personRefSchema = z.object({ id: z.string(), name: z.string(), email: z.string() });
export type PersonRef = z.infer<typeof personRefSchema>;

/** Who asked for review, whom, with what note; and the reviewer's comment once they answered. */
export const revisionReviewSchema = z.object({
  submittedAt: z.string().nullable(),
  submittedBy: personRefSchema.nullable(),
  reviewers: z.array(personRefSchema),
  note: z.string().nullable(),
  comment: z.string().nullable(),
});
export type RevisionReview = z.infer<typeof revisionReviewSchema>;

export const pageRevisionSchema = z.object({
  id: z.string(),
  state: revisionStateSchema,
  /** 1, 2, 3… in order of creation. */
  sequence: z.number().int(),
  /** Given at release (A, B … Y, AA …); null while draft or in review. */
  revisionLetter: z.string().nullable(),
  title: z.string(),
  document: pageDocumentSchema,
  /** Goes up by one on every save of a draft; send it back as `baseVersion`. */
  version: z.number().int(),
  createdAt: z.string(),
  updatedAt: z.string(),
  createdBy: personRefSchema.nullable(),
  /** Release date (null until released). */
  publishedAt: z.string().nullable(),
  /** The approver who released it. */
  publishedBy: personRefSchema.nullable(),
  supersededAt: z.string().nullable(),
  review: revisionReviewSchema,
  /** Set on a draft an admin restored from an older revision. */
  restoredFromId: z.string().nullable(),
});
export type PageRevision = z.infer<typeof pageRevisionSchema>;

export const revisionSummarySchema = z.object({
  id: z.string(),
  state: revisionStateSchema,
  revisionLetter: z.string().nullable(),
  title: z.string(),
  version: z.number().int(),
  updatedAt: z.string(),
  publishedAt: z.string().nullable(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

export const pageObsoleteSchema = z.object({ at: z.string(), by: personRefSchema.nullable(), reason: z.string() });
export type PageObsolete = z.infer<typeof pageObsoleteSchema>;

export const pageSchema = z.object({
  id: z.string(),
  documentNumber: z.string(),
  collection: collectionRefSchema,
  owner: personRefSchema.nullable(),
  tags: z.array(z.string()),
  createdAt: z.string(),
  updatedAt: z.string(),
  /** The latest released revision, the one readers see; null until the first release. */
  published: revisionSummarySchema.nullable(),
  /**
   * The open revision: a draft (authors and admins) or one in review (authors, admins and
   * reviewers); null for everyone else.
   */
  draft: revisionSummarySchema.nullable(),
  /** Set while the page is obsolete: show a banner. */
  obsolete: pageObsoleteSchema.nullable(),
  /** Whether the caller watches the page (mail on each release). */
  watching: z.boolean(),
  /** The revision asked for with `view` (the released one by default, else the open one). */
  revision: pageRevisionSchema,
  /**
   * Signed addresses of the uploaded files the shown revision uses (image `src` and
   * attachment `fileId`), keyed by file id: use them in `<img>` and download links, which
   * cannot send a bearer token. Valid for at least an hour; fetch the page again for fresh ones.
   */
  fileUrls: z.record(z.string(), z.string()),
});
export type Page = z.infer<typeof pageSchema>;

export const pageSummarySchema = z.object({
  id: z.string(),
  documentNumber: z.string(),
  /** The published title, or the draft's for a page never published. */
  title: z.string(),
  collection: collectionRefSchema,
  owner: personRefSchema.nullable(),
  tags: z.array(z.string()),
  updatedAt: z.string(),
  publishedAt: z.string().nullable(),
  /** Letter of the latest release; null before the first. */
  revisionLetter: z.string().nullable(),
  /** Whether a draft is open; always false for readers and reviewers. */
  hasDraft: z.boolean(),
  obsolete: z.boolean(),
});
export type PageSummary = z.infer<typeof pageSummarySchema>;

export const pageListSchema = pageOf(pageSummarySchema);
export type PageList = z.infer<typeof pageListSchema>;

export const pageSorts = ['number', 'recent'] as const;

/** A query-string switch: `true` or `false`, off when left out. */
export const queryFlagSchema = z
  .enum(['true', 'false'], { message: 'Use true or false' })
  .optional()
  .transform((value) => value === 'true');

export const pageListQuerySchema = pageQuerySchema.extend({
  collection: collectionKeySchema.optional(),
  tag: pageTagSchema.optional(),
  /** `number` orders by document number; `recent` by last change, newest first. */
  sort: z.enum(pageSorts, { message: `Sort by ${pageSorts.join(' or ')}` }).default('number'),
  /** `true` lists obsolete pages too; they are left out by default. */
  includeObsolete: queryFlagSchema,
});
export type PageListQuery = z.infer<typeof pageListQuerySchema>;

/** A page is addressed by its id or its document number. */
export const pageRefParamsSchema = z.strictObject({
  ref: z.union([uuidSchema, documentNumberSchema], { message: 'Use a page id or a document number' }),
});

export const pageViewQuerySchema = z.strictObject({
  /** `published`: the latest release; `draft`: the open revision (draft or in review). */
  view: z.enum(['published', 'draft'], { message: 'View is published or draft' }).optional(),
});
export type PageViewQuery = z.infer<typeof pageViewQuerySchema>;

export const createPageRequestSchema = z.strictObject({
  documentNumber: documentNumberSchema,
  collectionId: uuidSchema,
  title: pageTitleSchema,
  tags: pageTagsSchema.default([]),
  /** The first draft's body; an empty page when left out. */
  document: pageDocumentSchema.optional(),
  /** Defaults to the author creating the page. */
  ownerId: uuidSchema.optional(),
});
export type CreatePageRequest = z.input<typeof createPageRequestSchema>;

export const updatePageRequestSchema = z
  .strictObject({
    collectionId: uuidSchema.optional(),
    tags: pageTagsSchema.optional(),
    ownerId: uuidSchema.optional(),
  })
  .refine((body) => Object.keys(body).length > 0, { message: 'Nothing to change' });
export type UpdatePageRequest = z.input<typeof updatePageRequestSchema>;

const baseVersionSchema = z.number({ message: 'Base version is required' }).int('Base version is a whole number').min(1, 'Base version starts at 1');

export const saveDraftRequestSchema = z.strictObject({
  /** The draft version the edit started from; a save over a newer version is refused with 409. */
  baseVersion: baseVersionSchema,
  title: pageTitleSchema,
  document: pageDocumentSchema,
});
export type SaveDraftRequest = z.infer<typeof saveDraftRequestSchema>;


/** The 409 answer to a stale save: who saved the draft last, when, and its version now. */
export const draftConflictBodySchema = errorBodySchema.extend({
  current: z.object({ version: z.number().int(), updatedAt: z.string(), updatedBy: personRefSchema.nullable() }),
});
export type DraftConflictBody = z.infer<typeof draftConflictBodySchema>;

export const tagListSchema = z.object({ items: z.array(z.object({ tag: z.string(), count: z.number().int() })) });
export type TagList = z.infer<typeof tagListSchema>;
