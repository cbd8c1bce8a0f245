import { type Role, type UserStatus } from '@limitbook/contracts';
import { sql } from 'drizzle-orm';
import { check, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    /** Stored lower-cased; sign-in compares lower-cased input. */
    email: text('email').notNull().unique(),
    name: text('name').notNull(),
    role: text('role').$type<Role>().notNull(),
    status: text('status').$type<UserStatus>().notNull(),
    /** Null until an invited user sets a password. */
    passwordHash: text('password_hash'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    lastSignInAt: timestamp('last_sign_in_at', { withTimezone: true }),
  },
  (table) => [
    check('users_role_check', sql`${table.role} in ('admin', 'author', 'reviewer', 'reader')`),
    check('users_status_check', sql`${table.status} in ('invited', 'active', 'deactivated')`),
  ],
);

export type UserRow = typeof users.$inferSelect;
export type NewUserRow = typeof users.$inferInsert;
