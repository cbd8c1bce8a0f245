import { sql } from 'drizzle-orm';
import { type AnyPgColumn, index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { collections } from './collections.js';
import { pageRevisions } from './page-revisions.js';
import { users } from './users.js';

/**
 * A standard: its identity and filing (document number, collection, owner, tags). What it
 * says lives in its revisions; `currentPublishedRevisionId` is the latest released one, which
 * readers see.
 */
export const pages = pgTable(
  'pages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    /** Upper-case, unique, never changed once created: records and drawings cite it. */
    documentNumber: text('document_number').notNull().unique(),
    collectionId: uuid('collection_id')
      .notNull()
      .references(() => collections.id, { onDelete: 'restrict' }),
    ownerId: uuid('owner_id').references(() => users.id, { onDelete: 'set null' }),
    tags: text('tags').array().notNull().default(sql`'{}'::text[]`),
    currentPublishedRevisionId: uuid('current_published_revision_id').references((): AnyPgColumn => pageRevisions.id, { onDelete: 'set null' }),
    /** Set while the page is obsolete: hidden from lists and search, still readable. */
    obsoleteAt: timestamp('obsolete_at', { withTimezone: true }),
    obsoleteBy: uuid('obsolete_by').references(() => users.id, { onDelete: 'set null' }),
    obsoleteReason: text('obsolete_reason'),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    index('pages_collection_idx').on(table.collectionId),
    index('pages_tags_idx').using('gin', table.tags),
    // Prefix search on document numbers (`BW-STD-1%`) needs an index usable by LIKE.
    index('pages_document_number_prefix_idx').on(table.documentNumber.op('text_pattern_ops')),
    index('pages_updated_idx').on(table.updatedAt),
  ],
);

export type PageRow = typeof pages.$inferSelect;
export type NewPageRow = typeof pages.$inferInsert;
