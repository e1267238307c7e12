import { bigint, bigserial, customType, index, jsonb, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { pages } from './notebooks';
import { users } from './users';

/** Yjs updates and states are binary; node-postgres hands bytea over as a Buffer. */
const bytea = customType<{ data: Uint8Array; driverData: Buffer }>({
  dataType: () => 'bytea',
  toDriver: (value) => Buffer.from(value.buffer, value.byteOffset, value.byteLength),
  fromDriver: (value) => new Uint8Array(value.buffer, value.byteOffset, value.byteLength),
});

/**
 * Every Yjs update the collaboration server accepted, appended (and committed) before it is
 * relayed to anyone, so a crash never loses an update a client has seen acknowledged.
 * Compaction folds the oldest rows into `collab_documents` and deletes them.
 */
export const collabUpdates = pgTable(
  'collab_updates',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id, { onDelete: 'cascade' }),
    update: bytea('update').notNull(),
    userId: uuid('user_id').references(() => users.id),
    receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('collab_updates_page').on(t.pageId, t.id)],
);

/** The compacted Yjs state of a page: every update up to `throughUpdateId` merged into one. */
export const collabDocuments = pgTable('collab_documents', {
  pageId: uuid('page_id')
    .primaryKey()
    .references(() => pages.id, { onDelete: 'cascade' }),
  state: bytea('state').notNull(),
  throughUpdateId: bigint('through_update_id', { mode: 'number' }).notNull(),
  compactedAt: timestamp('compacted_at', { withTimezone: true }).notNull().defaultNow(),
});

/**
 * Editing sessions still open (someone's updates arriving on a page). Kept in the database, not in
 * memory, so a session cut short by a crash is still closed into the audit trail afterwards.
 */
export const collabEditingSessions = pgTable(
  'collab_editing_sessions',
  {
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id, { onDelete: 'cascade' }),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id),
    firstUpdateAt: timestamp('first_update_at', { withTimezone: true }).notNull(),
    lastUpdateAt: timestamp('last_update_at', { withTimezone: true }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.pageId, t.userId] })],
);

/** Page history: the full Yjs state at a moment, and who had edited since the previous one. */
export const pageSnapshots = pgTable(
  'page_snapshots',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id, { onDelete: 'cascade' }),
    takenAt: timestamp('taken_at', { withTimezone: true }).notNull().defaultNow(),
    reason: text('reason').notNull(),
    state: bytea('state').notNull(),
    authorIds: uuid('author_ids').array().notNull().default([]),
  },
  (t) => [index('page_snapshots_page').on(t.pageId, t.takenAt)],
);

export interface ProjectedStructure {
  key: string;
  molfile: string;
  smiles: string;
}

/** The page as plain text and Lexical JSON, kept current for search and for the record. */
export const pageContent = pgTable('page_content', {
  pageId: uuid('page_id')
    .primaryKey()
    .references(() => pages.id, { onDelete: 'cascade' }),
  text: text('text').notNull(),
  json: jsonb('json').notNull(),
  structures: jsonb('structures').$type<ProjectedStructure[]>().notNull(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

export type PageContentRow = typeof pageContent.$inferSelect;
