import { index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/** Mail received by the in-process SMTP catcher when no SMTP server is configured. */
export const capturedMail = pgTable(
  'captured_mail',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
    from: text('from_address').notNull(),
    to: jsonb('to_addresses').$type<string[]>().notNull(),
    subject: text('subject').notNull(),
    text: text('text_body').notNull(),
    html: text('html_body'),
    sizeBytes: integer('size_bytes').notNull(),
  },
  (table) => [index('captured_mail_received_idx').on(table.receivedAt)],
);

export type CapturedMailRow = typeof capturedMail.$inferSelect;
export type NewCapturedMailRow = typeof capturedMail.$inferInsert;
