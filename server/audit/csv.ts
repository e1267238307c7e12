import { stringify } from 'csv-stringify/sync';
import type { AuditEventView } from '../../shared/schemas/signing';
import { canonicalJson } from './record';

const COLUMNS = ['event_id', 'occurred_at_utc', 'type', 'actor_id', 'actor_name', 'notebook_id', 'page_id', 'details', 'previous_hash', 'hash'];

/**
 * The trail as CSV (RFC 4180) for inspection outside the app (21 CFR 11.10(b): accurate and
 * complete copies in human-readable and electronic form). Includes the hashes so the copy can
 * be checked against the chain. Cells are not prefixed against spreadsheet formula reading (a
 * cell starting with =, +, - or @): that would alter the copy; DEVELOPERS.md says how to open it safely.
 */
export function auditCsv(events: AuditEventView[]): string {
  const rows = events.map((e) => [
    e.id,
    e.occurredAt,
    e.type,
    e.actor?.id ?? '',
    e.actor?.name ?? '',
    e.notebookId ?? '',
    e.pageId ?? '',
    canonicalJson(e.details),
    e.previousHash,
    e.hash,
  ]);
  return stringify([COLUMNS, ...rows]);
}
