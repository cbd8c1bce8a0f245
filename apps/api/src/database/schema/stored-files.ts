import { bigint, index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from './users.js';

/** An uploaded file's metadata; the bytes live in file storage under `storageKey`. */
export const storedFiles = pgTable(
  'stored_files',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    /** The name it was uploaded with, for Content-Disposition and attachment labels. */
    name: text('name').notNull(),
    /** Decided from the bytes, never from the name or the client's header. */
    contentType: text('content_type').notNull(),
    size: bigint('size', { mode: 'number' }).notNull(),
    sha256: text('sha256').notNull(),
    storageKey: text('storage_key').notNull().unique(),
    uploadedBy: uuid('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('stored_files_sha256_idx').on(table.sha256)],
);

export type StoredFileRow = typeof storedFiles.$inferSelect;
export type NewStoredFileRow = typeof storedFiles.$inferInsert;
