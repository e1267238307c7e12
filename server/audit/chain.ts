import { asc, gt } from 'drizzle-orm';
import type { ChainCheck } from '../../shared/schemas/signing';
import type { Database } from '../db/client';
import { auditEvents, type AuditEventRow } from '../db/schema';
import { GENESIS_HASH, hashAuditEvent } from './record';

const BATCH = 2000;

/** Recomputes one stored event's hash from its stored fields. */
export function recomputeHash(row: AuditEventRow): string {
  return hashAuditEvent({
    occurredAt: row.occurredAt,
    type: row.type,
    actorId: row.actorId,
    actorName: row.actorName,
    notebookId: row.notebookId,
    pageId: row.pageId,
    details: row.details,
    previousHash: row.previousHash,
  });
}

/**
 * Walks the whole trail from the first event: each event must hash to its stored hash and point
 * at the hash of the event before it. Any change to a stored event, or a removed event, shows as
 * the first place where this fails (21 CFR 11.10(e): the trail must be trustworthy; 11.10(a):
 * the ability to discern altered records).
 */
export async function verifyChain(db: Pick<Database, 'select'>): Promise<ChainCheck> {
  let previous = GENESIS_HASH;
  let lastId = 0;
  let checked = 0;
  for (;;) {
    const rows = await db.select().from(auditEvents).where(gt(auditEvents.id, lastId)).orderBy(asc(auditEvents.id)).limit(BATCH);
    for (const row of rows) {
      if (row.previousHash !== previous) {
        return { intact: false, checked, firstBrokenEventId: row.id, problem: `Event ${row.id} does not follow the event recorded before it (one was changed or removed)` };
      }
      if (recomputeHash(row) !== row.hash) {
        return { intact: false, checked, firstBrokenEventId: row.id, problem: `Event ${row.id} was changed after it was recorded` };
      }
      previous = row.hash;
      checked++;
    }
    if (rows.length < BATCH) return { intact: true, checked, firstBrokenEventId: null, problem: null };
    lastId = rows[rows.length - 1].id;
  }
}
