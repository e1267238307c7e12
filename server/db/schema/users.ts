import { pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { roles } from '../../../shared/schemas/common';

export const roleEnum = pgEnum('role', roles);

export const users = pgTable('users', {
  id: uuid('id').primaryKey().defaultRandom(),
  email: text('email').notNull().unique(),
  name: text('name').notNull(),
  role: roleEnum('role').notNull(),
  /** Argon2id hash; null until the invitee has chosen a password. */
  passwordHash: text('password_hash'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export type UserRow = typeof users.$inferSelect;
