import type { DesignDefinition, RevisionState } from '@limitbook/contracts';
import { sql } from 'drizzle-orm';
import { check, index, integer, jsonb, pgTable, text, timestamp, unique, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { users } from './users.js';

/**
 * An in-house method (`house:<slug>`): its identity and owner. What it computes lives in its
 * revisions; released revisions carry the method version numbers (1, 2, 3…) pages pin.
 */
export const methodDesigns = pgTable('method_designs', {
  id: uuid('id').primaryKey().defaultRandom(),
  /** Chosen by the author, never changed: calculator blocks and records cite `house:<slug>`. */
  slug: text('slug').notNull().unique(),
  ownerId: uuid('owner_id').references(() => users.id, { onDelete: 'set null' }),
  createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

export type MethodDesignRow = typeof methodDesigns.$inferSelect;

/**
 * One revision of an in-house method. At most one is open (draft or in review); saves bump
 * `version` (optimistic locking). Released and superseded revisions are never written again,
 * apart from being superseded.
 */
export const methodDesignRevisions = pgTable(
  'method_design_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    designId: uuid('design_id')
      .notNull()
      .references(() => methodDesigns.id, { onDelete: 'cascade' }),
    state: text('state').$type<RevisionState>().notNull(),
    /** Given at release: 1, 2, 3… per method. */
    methodVersion: integer('method_version'),
    definition: jsonb('definition').$type<DesignDefinition>().notNull(),
    version: integer('version').notNull().default(1),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedBy: uuid('updated_by').references(() => users.id, { onDelete: 'set null' }),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    releasedBy: uuid('released_by').references(() => users.id, { onDelete: 'set null' }),
    releasedAt: timestamp('released_at', { withTimezone: true }),
    submittedBy: uuid('submitted_by').references(() => users.id, { onDelete: 'set null' }),
    submittedAt: timestamp('submitted_at', { withTimezone: true }),
    reviewerIds: uuid('reviewer_ids').array().notNull().default(sql`'{}'::uuid[]`),
    submitNote: text('submit_note'),
    reviewComment: text('review_comment'),
    supersededAt: timestamp('superseded_at', { withTimezone: true }),
    restoredFromVersion: integer('restored_from_version'),
  },
  (table) => [
    unique('method_design_revisions_version_unique').on(table.designId, table.methodVersion),
    uniqueIndex('method_design_revisions_one_open_idx').on(table.designId).where(sql`${table.state} in ('draft', 'in_review')`),
    index('method_design_revisions_design_idx').on(table.designId),
    check('method_design_revisions_state_check', sql`${table.state} in ('draft', 'in_review', 'released', 'superseded')`),
    check('method_design_revisions_released_version_check', sql`(${table.state} in ('released', 'superseded')) = (${table.methodVersion} is not null)`),
  ],
);

export type MethodDesignRevisionRow = typeof methodDesignRevisions.$inferSelect;
export type NewMethodDesignRevisionRow = typeof methodDesignRevisions.$inferInsert;
