import type { RevisionState } from '@limitbook/contracts';
import type { LimitbookDocument } from '@limitbook/editor-schema';
import { sql } from 'drizzle-orm';
import { check, customType, index, integer, jsonb, pgTable, text, timestamp, unique, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { pages } from './pages.js';
import { users } from './users.js';

const tsvector = customType<{ data: string }>({ dataType: () => 'tsvector' });

/**
 * One revision of a page: its title and body as ProseMirror JSON. A page has at most one
 * draft; saves of a draft bump `version` (optimistic locking). The search columns are
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
    publishedBy: uuid('published_by').references(() => users.id, { onDelete: 'set null' }),
    publishedAt: timestamp('published_at', { withTimezone: true }),
  },
  (table) => [
    unique('page_revisions_page_sequence_unique').on(table.pageId, table.sequence),
    uniqueIndex('page_revisions_one_draft_idx').on(table.pageId).where(sql`${table.state} = 'draft'`),
    index('page_revisions_search_idx').using('gin', table.searchVector),
    check('page_revisions_state_check', sql`${table.state} in ('draft', 'published')`),
    check('page_revisions_version_check', sql`${table.version} >= 1`),
  ],
);

export type PageRevisionRow = typeof pageRevisions.$inferSelect;
export type NewPageRevisionRow = typeof pageRevisions.$inferInsert;
