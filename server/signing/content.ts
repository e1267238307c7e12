import { and, eq, inArray } from 'drizzle-orm';
import type { Database } from '../db/client';
import { attachments, pageContent, type AddendumRow, type PageRow } from '../db/schema';
import type { AddendumRecordContent, PageRecordContent, RecordAttachment, RecordStructure } from './canonical';

type Reader = Pick<Database, 'select'>;

/** What signing needs from the collaboration server (server/collab, see INTERFACES.md). */
export interface SigningHub {
  setPageLocked(pageId: string, locked: boolean): Promise<void>;
  currentContent(pageId: string): Promise<{ text: string; json: unknown; structures: RecordStructure[] }>;
  takeSnapshot(pageId: string, reason: string): Promise<string>;
}

/** A file as a signature covers it. */
const recordAttachmentColumns = { id: attachments.id, name: attachments.displayName, sha256: attachments.sha256, size: attachments.size };

function pageIdentity(page: PageRow): PageRecordContent['page'] {
  return { id: page.id, notebookId: page.notebookId, number: page.number, title: page.title };
}

/**
 * Files that belong to the page: all but those uploaded while it was signed and still waiting for,
 * or claimed by, an addendum (see returnUnclaimedFilesToPage for when they come back to the page).
 */
async function originalAttachments(db: Reader, pageId: string): Promise<RecordAttachment[]> {
  return db
    .select(recordAttachmentColumns)
    .from(attachments)
    .where(and(eq(attachments.pageId, pageId), eq(attachments.addendum, false)));
}

function structuresOf(list: RecordStructure[] | null | undefined): RecordStructure[] {
  return (list ?? []).map(({ key, molfile, smiles }) => ({ key, molfile, smiles }));
}

/** The page as it is this moment, pending edits included: what a new signature covers. */
export async function livePageContent(db: Reader, hub: SigningHub, page: PageRow): Promise<PageRecordContent> {
  const current = await hub.currentContent(page.id);
  return {
    kind: 'page',
    page: pageIdentity(page),
    text: current.text,
    structures: structuresOf(current.structures),
    attachments: await originalAttachments(db, page.id),
  };
}

/** The page as stored in the database: what verification recomputes the hash from. */
export async function storedPageContent(db: Reader, page: PageRow): Promise<PageRecordContent> {
  const [row] = await db.select().from(pageContent).where(eq(pageContent.pageId, page.id));
  return {
    kind: 'page',
    page: pageIdentity(page),
    text: row?.text ?? '',
    structures: structuresOf(row?.structures),
    attachments: await originalAttachments(db, page.id),
  };
}

export async function addendumContent(db: Reader, addendum: AddendumRow): Promise<AddendumRecordContent> {
  const files = addendum.attachmentIds.length
    ? await db
        .select(recordAttachmentColumns)
        .from(attachments)
        .where(and(eq(attachments.pageId, addendum.pageId), inArray(attachments.id, addendum.attachmentIds)))
    : [];
  return {
    kind: 'addendum',
    pageId: addendum.pageId,
    addendum: {
      id: addendum.id,
      number: addendum.number,
      authorName: addendum.authorName,
      createdAt: addendum.createdAt.toISOString(),
      text: addendum.text,
    },
    attachments: files,
  };
}
