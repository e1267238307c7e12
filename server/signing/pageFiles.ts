import { and, eq, sql } from 'drizzle-orm';
import type { Database } from '../db/client';
import { addenda, attachments, auditEvents } from '../db/schema';

/** True for a file of `pageId` that no addendum of that page lists among its files. */
function claimedByNoAddendum(pageId: string) {
  return sql`not exists (select 1 from ${addenda} where ${addenda.pageId} = ${pageId} and ${addenda.attachmentIds} @> jsonb_build_array(${attachments.id}::text))`;
}

/**
 * The rule that keeps every file of a page under a signature (21 CFR 11.70: a signature is linked
 * to its record, so the record it is linked to must be the whole page): a file uploaded while the
 * page is signed waits, as `addendum = true`, for an addendum to claim it. When the page becomes a
 * draft again (returned, or a signing attempt that failed), the files no addendum claimed belong to
 * the page once more, so the next page signature covers them. Returns the ids handed back.
 */
export async function returnUnclaimedFilesToPage(db: Pick<Database, 'update'>, pageId: string): Promise<string[]> {
  const rows = await db
    .update(attachments)
    .set({ addendum: false })
    .where(and(eq(attachments.pageId, pageId), eq(attachments.addendum, true), claimedByNoAddendum(pageId)))
    .returning({ id: attachments.id });
  return rows.map((r) => r.id);
}

/**
 * Files a page return left outside every signature: added before the page was returned, yet still
 * waiting for an addendum. Only returns made before the rule above existed leave such files; the
 * audit trail's sequence (not clocks) says what came before the return.
 */
export async function filesLeftOutByReturn(db: Pick<Database, 'select'>, pageId: string): Promise<{ id: string; name: string }[]> {
  const added = sql`(select ${auditEvents.id} from ${auditEvents} where ${auditEvents.pageId} = ${pageId}
    and ${auditEvents.type} = 'attachment.added' and ${auditEvents.details}->>'attachmentId' = ${attachments.id}::text)`;
  const lastReturn = sql`(select max(${auditEvents.id}) from ${auditEvents} where ${auditEvents.pageId} = ${pageId}
    and ${auditEvents.type} = 'page.returned')`;
  return db
    .select({ id: attachments.id, name: attachments.displayName })
    .from(attachments)
    .where(and(eq(attachments.pageId, pageId), eq(attachments.addendum, true), claimedByNoAddendum(pageId), sql`${added} < ${lastReturn}`));
}
