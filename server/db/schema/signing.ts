import { index, integer, jsonb, pgEnum, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { signatureRoles } from '../../../shared/schemas/signing';
import { pages } from './notebooks';
import { users } from './users';

export const signatureRoleEnum = pgEnum('signature_role', signatureRoles);
export const countersignStateEnum = pgEnum('countersign_state', ['waiting', 'countersigned', 'returned']);

/**
 * Text appended below a signed page; the original never changes (21 CFR 11.10(e): changes must
 * not obscure what was recorded before). Written once, together with its author's signature.
 */
export const addenda = pgTable(
  'addenda',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id),
    /** 1, 2, … per page, in the order they were added. */
    number: integer('number').notNull(),
    authorId: uuid('author_id')
      .notNull()
      .references(() => users.id),
    authorName: text('author_name').notNull(),
    text: text('text').notNull(),
    /** Files uploaded after signing that this addendum covers (by attachment id). */
    attachmentIds: jsonb('attachment_ids').$type<string[]>().notNull().default([]),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull(),
  },
  (t) => [unique('addenda_page_number').on(t.pageId, t.number)],
);

/**
 * One electronic signature. It carries the manifestation that 21 CFR 11.50(a) asks for (printed
 * name, date and time, meaning) and the SHA-256 of the canonical serialisation that was signed,
 * which links it to exactly that content (11.70). The serialisation itself is kept too, so a
 * later check can say what changed, not only that something did.
 */
export const signatures = pgTable(
  'signatures',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id),
    /** Null: the signature covers the page itself; otherwise this addendum. */
    addendumId: uuid('addendum_id').references(() => addenda.id),
    role: signatureRoleEnum('role').notNull(),
    signerId: uuid('signer_id')
      .notNull()
      .references(() => users.id),
    signerName: text('signer_name').notNull(),
    signedAt: timestamp('signed_at', { withTimezone: true }).notNull(),
    meaningCode: text('meaning_code').notNull(),
    meaning: text('meaning').notNull(),
    contentHash: text('content_hash').notNull(),
    signedContent: text('signed_content').notNull(),
  },
  (t) => [index('signatures_page').on(t.pageId)],
);

/** A signer's request that a supervisor countersign; the supervisor's queue reads the waiting ones. */
export const countersignRequests = pgTable(
  'countersign_requests',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    pageId: uuid('page_id')
      .notNull()
      .references(() => pages.id),
    addendumId: uuid('addendum_id').references(() => addenda.id),
    authorSignatureId: uuid('author_signature_id')
      .notNull()
      .references(() => signatures.id),
    supervisorId: uuid('supervisor_id')
      .notNull()
      .references(() => users.id),
    requestedAt: timestamp('requested_at', { withTimezone: true }).notNull(),
    state: countersignStateEnum('state').notNull().default('waiting'),
    resolvedAt: timestamp('resolved_at', { withTimezone: true }),
  },
  (t) => [index('countersign_requests_queue').on(t.supervisorId, t.state, t.requestedAt)],
);

/** A supervisor sent the work back with a comment instead of countersigning. */
export const pageReturns = pgTable('page_returns', {
  id: uuid('id').primaryKey().defaultRandom(),
  requestId: uuid('request_id')
    .notNull()
    .references(() => countersignRequests.id),
  pageId: uuid('page_id')
    .notNull()
    .references(() => pages.id),
  addendumId: uuid('addendum_id').references(() => addenda.id),
  returnedBy: uuid('returned_by')
    .notNull()
    .references(() => users.id),
  returnedByName: text('returned_by_name').notNull(),
  comment: text('comment').notNull(),
  returnedAt: timestamp('returned_at', { withTimezone: true }).notNull(),
});

export type SignatureRow = typeof signatures.$inferSelect;
export type AddendumRow = typeof addenda.$inferSelect;
export type CountersignRequestRow = typeof countersignRequests.$inferSelect;
