import { jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/** Messages received by the local mail catcher, readable by admins in the app. */
export const caughtMail = pgTable('caught_mail', {
  id: uuid('id').primaryKey().defaultRandom(),
  from: text('from_address').notNull(),
  to: jsonb('to_addresses').$type<string[]>().notNull(),
  subject: text('subject').notNull(),
  text: text('text_body').notNull(),
  html: text('html_body'),
  receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
});
