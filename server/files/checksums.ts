import { asc, eq } from 'drizzle-orm';
import type { Database } from '../db/client';
import { attachments } from '../db/schema';

/**
 * The files of a page as signatures cover them: checksums taken while the bytes streamed into
 * storage, in upload order (ties broken by id so the order never depends on the query plan).
 */
export async function pageAttachmentChecksums(
  db: Database,
  pageId: string,
): Promise<{ id: string; name: string; sha256: string; size: number }[]> {
  return db
    .select({ id: attachments.id, name: attachments.displayName, sha256: attachments.sha256, size: attachments.size })
    .from(attachments)
    .where(eq(attachments.pageId, pageId))
    .orderBy(asc(attachments.createdAt), asc(attachments.id));
}
