import { index, pgTable, primaryKey, timestamp, uuid } from 'drizzle-orm/pg-core';
import { pages } from './pages.js';
import { users } from './users.js';

/** Who gets mail when a page has a new release. */
export const pageWatches = pgTable(
  'page_watches',
  {
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [primaryKey({ columns: [table.pageId, table.userId] }), index('page_watches_user_idx').on(table.userId)],
);

export type PageWatchRow = typeof pageWatches.$inferSelect;
