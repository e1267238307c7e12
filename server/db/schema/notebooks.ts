import { boolean, integer, pgEnum, pgTable, primaryKey, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { membershipRoles } from '../../../shared/schemas/common';
import { pageStatuses } from '../../../shared/schemas/pages';
import { users } from './users';

export const membershipRoleEnum = pgEnum('membership_role', membershipRoles);
export const pageStatusEnum = pgEnum('page_status', pageStatuses);

export const notebooks = pgTable('notebooks', {
  id: uuid('id').primaryKey().defaultRandom(),
  title: text('title').notNull(),
  description: text('description').notNull().default(''),
  createdBy: uuid('created_by').references(() => users.id),
  /** Pages are numbered like a bound paper notebook: the next page gets this number. */
  nextPageNumber: integer('next_page_number').notNull().default(1),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export const memberships = pgTable(
  'memberships',
  {
    notebookId: uuid('notebook_id')
      .notNull()
      .references(() => notebooks.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: membershipRoleEnum('role').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.notebookId, t.userId] })],
);

export const pages = pgTable(
  'pages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    notebookId: uuid('notebook_id')
      .notNull()
      .references(() => notebooks.id),
    number: integer('number').notNull(),
    title: text('title').notNull(),
    authorId: uuid('author_id')
      .notNull()
      .references(() => users.id),
    status: pageStatusEnum('status').notNull().default('draft'),
    /** Set when the page is signed; the API and the collaboration server refuse changes. */
    locked: boolean('locked').notNull().default(false),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [unique('pages_notebook_number').on(t.notebookId, t.number)],
);

export type PageRow = typeof pages.$inferSelect;
