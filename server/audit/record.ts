import { createHash } from 'node:crypto';
import { desc, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { auditEvents } from '../db/schema';

export interface AuditEventInput {
  type: string;
  actor?: { id: string; name: string } | null;
  notebookId?: string | null;
  pageId?: string | null;
  details?: Record<string, unknown>;
}

export const GENESIS_HASH = '0'.repeat(64);

/** Stable JSON: keys sorted, so the same event always hashes the same. */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value);
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, v]) => v !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
}

export function hashAuditEvent(event: {
  occurredAt: Date;
  type: string;
  actorId: string | null;
  actorName: string | null;
  notebookId: string | null;
  pageId: string | null;
  details: unknown;
  previousHash: string;
}): string {
  const body = canonicalJson({ ...event, occurredAt: event.occurredAt.toISOString() });
  return createHash('sha256').update(body).digest('hex');
}

type Executor = Pick<Database, 'select' | 'insert' | 'execute'>;

/**
 * Appends one event to the hash-chained audit trail (21 CFR 11.10(e)). A transaction-scoped
 * advisory lock serialises writers so the chain never forks.
 */
export async function recordAuditEvent(db: Database, input: AuditEventInput): Promise<void> {
  await db.transaction(async (tx) => appendInTransaction(tx, input));
}

export async function appendInTransaction(tx: Executor, input: AuditEventInput): Promise<void> {
  await tx.execute(sql`select pg_advisory_xact_lock(7300001)`);
  const [last] = await tx.select({ hash: auditEvents.hash }).from(auditEvents).orderBy(desc(auditEvents.id)).limit(1);
  const event = {
    // A JS Date holds whole milliseconds, which PostgreSQL stores exactly, so the hash of the
    // stored event equals the hash computed here.
    occurredAt: new Date(),
    type: input.type,
    actorId: input.actor?.id ?? null,
    actorName: input.actor?.name ?? null,
    notebookId: input.notebookId ?? null,
    pageId: input.pageId ?? null,
    details: input.details ?? {},
    previousHash: last?.hash ?? GENESIS_HASH,
  };
  await tx.insert(auditEvents).values({ ...event, hash: hashAuditEvent(event) });
}
