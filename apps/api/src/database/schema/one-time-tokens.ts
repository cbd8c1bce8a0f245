import { sql } from 'drizzle-orm';
import { check, index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from './users.js';

export type OneTimeTokenPurpose = 'invite' | 'password_reset';

/** Invitation and password-reset links. Only a SHA-256 of the token is stored. */
export const oneTimeTokens = pgTable(
  'one_time_tokens',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    purpose: text('purpose').$type<OneTimeTokenPurpose>().notNull(),
    tokenHash: text('token_hash').notNull().unique(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
  },
  (table) => [
    check('one_time_tokens_purpose_check', sql`${table.purpose} in ('invite', 'password_reset')`),
    index('one_time_tokens_user_idx').on(table.userId, table.purpose),
  ],
);

export type OneTimeTokenRow = typeof oneTimeTokens.$inferSelect;
