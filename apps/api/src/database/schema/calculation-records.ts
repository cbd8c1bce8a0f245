import type { AcceptanceRule, DerivationStep, LengthUnit, RecordReference, Verdict } from '@limitbook/contracts';
import { index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { pageRevisions } from './page-revisions.js';
import { pages } from './pages.js';
import { users } from './users.js';

/**
 * A saved run of a calculator block, evaluated by the server. Everything needed to read it
 * again later is copied in (method version, acceptance rule, derivation), because the page
 * and the method move on while the record must keep saying what was computed then.
 */
export const calculationRecords = pgTable(
  'calculation_records',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id, { onDelete: 'restrict' }),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => pageRevisions.id, { onDelete: 'restrict' }),
    /** The block's stable id: the same across revisions, which is what the impact check follows. */
    blockId: uuid('block_id').notNull(),
    methodId: text('method_id').notNull(),
    methodVersion: integer('method_version').notNull(),
    unit: text('unit').$type<LengthUnit>().notNull(),
    inputs: jsonb('inputs').$type<Record<string, unknown>>().notNull(),
    outputs: jsonb('outputs').$type<Record<string, unknown>>().notNull(),
    verdict: jsonb('verdict').$type<Verdict>(),
    steps: jsonb('steps').$type<DerivationStep[]>().notNull(),
    warnings: text('warnings').array().notNull(),
    acceptance: jsonb('acceptance').$type<AcceptanceRule>(),
    reference: jsonb('reference').$type<RecordReference>().notNull(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (table) => [
    index('calculation_records_creator_idx').on(table.createdBy, table.createdAt),
    index('calculation_records_revision_block_idx').on(table.revisionId, table.blockId),
    index('calculation_records_page_idx').on(table.pageId),
    index('calculation_records_created_idx').on(table.createdAt),
  ],
);

export type CalculationRecordRow = typeof calculationRecords.$inferSelect;
export type NewCalculationRecordRow = typeof calculationRecords.$inferInsert;
