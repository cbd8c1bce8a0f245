import type { ImpactBlockChange, ImpactEntry } from '@limitbook/contracts';
import { index, integer, jsonb, pgTable, timestamp, uuid } from 'drizzle-orm/pg-core';
import { pageRevisions } from './page-revisions.js';
import { pages } from './pages.js';
import { users } from './users.js';

/** The outcome of re-running a page's records from one revision under the settings of another. */
export const impactReports = pgTable(
  'impact_reports',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id, { onDelete: 'cascade' }),
    fromRevisionId: uuid('from_revision_id')
      .notNull()
      .references(() => pageRevisions.id, { onDelete: 'cascade' }),
    toRevisionId: uuid('to_revision_id')
      .notNull()
      .references(() => pageRevisions.id, { onDelete: 'cascade' }),
    changedBlocks: jsonb('changed_blocks').$type<ImpactBlockChange[]>().notNull(),
    recordsChecked: integer('records_checked').notNull(),
    affected: jsonb('affected').$type<ImpactEntry[]>().notNull(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [index('impact_reports_page_idx').on(table.pageId, table.createdAt)],
);

export type ImpactReportRow = typeof impactReports.$inferSelect;
