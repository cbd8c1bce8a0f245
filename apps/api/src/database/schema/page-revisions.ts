import type { RevisionState } from '@limitbook/contracts';
import type { LimitbookDocument } from '@limitbook/editor-schema';
import { sql } from 'drizzle-orm';
import { check, customType, index, integer, jsonb, pgTable, text, timestamp, unique, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { pages } from './pages.js';
import { users } from './users.js';

const tsvector = customType<{ data: string }>({ dataType: () => 'tsvector' });

/**
 * One revision of a page: its title and body as ProseMirror JSON. A page has at most one
 * open revision (draft or in review); saves of a draft bump `version` (optimistic locking).
 * Released and superseded revisions are never written again, apart from being superseded. The search columns are
 * written together with the body by the repository, on every save.
 */
export const pageRevisions = pgTable(
  'page_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id, { onDelete: 'cascade' }),
    /** 1, 2, 3… per page in order of creation; revision letters are given at release, separately. */
    sequence: integer('sequence').notNull(),
    state: text('state').$type<RevisionState>().notNull(),
    title: text('title').notNull(),
    document: jsonb('document').$type<LimitbookDocument>().notNull(),
    /** Plain text of the body, one block per line: what search snippets are cut from. */
    searchText: text('search_text').notNull(),
    /** Calculator block captions, weighted above body text. */
    searchCaptions: text('search_captions').notNull(),
    /** Document number and title (A), captions (B), body (C). */
    searchVector: tsvector('search_vector').notNull(),
    version: integer('version').notNull().default(1),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedBy: uuid('updated_by').references(() => users.id, { onDelete: 'set null' }),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    /** On a released revision: its approver and release date. */
    publishedBy: uuid('published_by').references(() => users.id, { onDelete: 'set null' }),
    publishedAt: timestamp('published_at', { withTimezone: true }),
    /** Given at release (A, B, C…); null while draft or in review. */
    revisionLetter: text('revision_letter'),
    /** The last submission for review: who, when, whom they asked, and their note. */
    submittedBy: uuid('submitted_by').references(() => users.id, { onDelete: 'set null' }),
    submittedAt: timestamp('submitted_at', { withTimezone: true }),
    reviewerIds: uuid('reviewer_ids').array().notNull().default(sql`'{}'::uuid[]`),
    submitNote: text('submit_note'),
    /** The reviewer's last word: the approval comment, or why it was sent back. */
    reviewComment: text('review_comment'),
    supersededAt: timestamp('superseded_at', { withTimezone: true }),
    /** The revision this draft was restored from, when an admin restored an older one. */
    restoredFromId: uuid('restored_from_id'),
  },
  (table) => [
    unique('page_revisions_page_sequence_unique').on(table.pageId, table.sequence),
    // One open revision per page: a draft, or the same revision while in review.
    uniqueIndex('page_revisions_one_draft_idx').on(table.pageId).where(sql`${table.state} in ('draft', 'in_review')`),
    unique('page_revisions_page_letter_unique').on(table.pageId, table.revisionLetter),
    // fastupdate off: PGlite never runs autovacuum, so a pending list would grow unmerged and the planner would skip the index.
    index('page_revisions_search_idx').using('gin', table.searchVector).with({ fastupdate: false }),
    check('page_revisions_state_check', sql`${table.state} in ('draft', 'in_review', 'released', 'superseded')`),
    check('page_revisions_version_check', sql`${table.version} >= 1`),
  ],
);

export type PageRevisionRow = typeof pageRevisions.$inferSelect;
export type NewPageRevisionRow = typeof pageRevisions.$inferInsert;
