import { asc, eq, inArray, or } from 'drizzle-orm';
import type { AuditEventView } from '../../shared/schemas/signing';
import type { Database } from '../db/client';
import { auditEvents, pages, type AuditEventRow } from '../db/schema';

export function toEventView(row: AuditEventRow): AuditEventView {
  return {
    id: row.id,
    occurredAt: row.occurredAt.toISOString(),
    type: row.type,
    actor: row.actorId ? { id: row.actorId, name: row.actorName ?? '' } : null,
    notebookId: row.notebookId,
    pageId: row.pageId,
    details: row.details as Record<string, unknown>,
    hash: row.hash,
    previousHash: row.previousHash,
  };
}

export async function pageTrail(db: Database, pageId: string): Promise<AuditEventView[]> {
  const rows = await db.select().from(auditEvents).where(eq(auditEvents.pageId, pageId)).orderBy(asc(auditEvents.id));
  return rows.map(toEventView);
}

/** The notebook's own events and those of all its pages (page events may lack the notebook id). */
export async function notebookTrail(db: Database, notebookId: string): Promise<AuditEventView[]> {
  const pageIds = db.select({ id: pages.id }).from(pages).where(eq(pages.notebookId, notebookId));
  const rows = await db
    .select()
    .from(auditEvents)
    .where(or(eq(auditEvents.notebookId, notebookId), inArray(auditEvents.pageId, pageIds)))
    .orderBy(asc(auditEvents.id));
  return rows.map(toEventView);
}
