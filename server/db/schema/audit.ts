import { bigserial, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/**
 * Append-only audit trail (21 CFR 11.10(e)): each event carries the hash of the previous one, so
 * any later change to a stored event breaks the chain.
 */
export const auditEvents = pgTable('audit_events', {
  id: bigserial('id', { mode: 'number' }).primaryKey(),
  occurredAt: timestamp('occurred_at', { withTimezone: true }).notNull(),
  type: text('type').notNull(),
  actorId: uuid('actor_id'),
  actorName: text('actor_name'),
  notebookId: uuid('notebook_id'),
  pageId: uuid('page_id'),
  details: jsonb('details').notNull().default({}),
  previousHash: text('previous_hash').notNull(),
  hash: text('hash').notNull().unique(),
});

export type AuditEventRow = typeof auditEvents.$inferSelect;
