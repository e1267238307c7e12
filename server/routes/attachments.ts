import { and, asc, eq, sql } from 'drizzle-orm';
import { Router, type Response } from 'express';
import { pipeline } from 'node:stream/promises';
import type { User } from 'lucia';
import type { AttachmentSummary, SpectrumData } from '../../shared/schemas/attachments';
import { appendInTransaction } from '../audit/record';
import { pageAccess, type PageAccess } from '../auth/access';
import { currentUser } from '../auth/middleware';
import type { AppDeps } from '../context';
import { attachments, pages, users, type AttachmentRow } from '../db/schema';
import { attachmentAddedDetails } from '../files/addedEvent';
import { checkDeclaredSize, receiveFiles } from '../files/receiveUpload';
import { openObject, removeObject } from '../files/storage';
import { conflict, forbidden, HttpError, notFound } from '../http/errors';
import { idParam } from '../http/params';

/** Everything but the full spectrum data, which only the spectrum endpoint sends. */
const listColumns = {
  id: attachments.id,
  pageId: attachments.pageId,
  uploaderId: attachments.uploaderId,
  originalName: attachments.originalName,
  displayName: attachments.displayName,
  size: attachments.size,
  mediaType: attachments.mediaType,
  sha256: attachments.sha256,
  storageKey: attachments.storageKey,
  parseError: attachments.parseError,
  addendum: attachments.addendum,
  createdAt: attachments.createdAt,
  spectrumSummary: sql<AttachmentSummary['spectrum']>`${attachments.spectrum} - 'data'`,
  uploaderName: users.name,
};
type ListRow = Omit<AttachmentRow, 'spectrum'> & { spectrumSummary: AttachmentSummary['spectrum']; uploaderName: string };

function mayDelete(row: Pick<AttachmentRow, 'uploaderId'>, access: PageAccess, user: User): boolean {
  return access.canWrite && !access.page.locked && (row.uploaderId === user.id || access.canManage);
}

function summary(row: ListRow, access: PageAccess, user: User): AttachmentSummary {
  return {
    id: row.id,
    pageId: row.pageId,
    originalName: row.originalName,
    displayName: row.displayName,
    size: row.size,
    mediaType: row.mediaType,
    sha256: row.sha256,
    uploader: { id: row.uploaderId, name: row.uploaderName },
    createdAt: row.createdAt.toISOString(),
    addendum: row.addendum,
    spectrum: row.spectrumSummary,
    parseError: row.parseError,
    canDelete: mayDelete(row, access, user),
  };
}

/** RFC 6266 / RFC 5987: an ASCII fallback plus the exact UTF-8 name. */
function contentDisposition(name: string): string {
  const fallback = name.replace(/[^\x20-\x7e]/g, '_').replace(/["\\%]/g, '_');
  return `attachment; filename="${fallback}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

export function attachmentRoutes(deps: AppDeps): Router {
  const { db, storage } = deps;
  const router = Router();

  async function listRows(where: ReturnType<typeof eq>): Promise<ListRow[]> {
    return db
      .select(listColumns)
      .from(attachments)
      .innerJoin(users, eq(users.id, attachments.uploaderId))
      .where(where)
      .orderBy(asc(attachments.createdAt), asc(attachments.id));
  }

  /** Resolves an attachment and the caller's access to its page; non-members learn nothing (404). */
  async function attachmentFor(res: Response, id: string): Promise<{ row: ListRow; access: PageAccess; user: User }> {
    const user = currentUser(res);
    const [row] = await listRows(eq(attachments.id, id));
    if (!row) throw notFound('Attachment');
    const access = await pageAccess(db, user, row.pageId).catch(() => {
      throw notFound('Attachment');
    });
    return { row, access, user };
  }

  router.post('/pages/:id/attachments', async (req, res) => {
    const user = currentUser(res);
    const access = await pageAccess(db, user, idParam(req, 'id', 'Page'));
    if (!access.canWrite) throw forbidden('You can read this page but not add files to it');
    checkDeclaredSize(req, deps.config.UPLOAD_MAX_BYTES);
    const files = await receiveFiles(req, storage, deps.config.UPLOAD_MAX_BYTES);
    try {
      await db.transaction(async (tx) => {
        // Whether the page is signed is read in the same statement as the insert, so a file that
        // lands after a signature is always an addendum, never silently part of the signed record.
        // FOR SHARE holds signing's lock claim (and a return) back until this commits, so signing
        // reads the file's row with the page's content, or the file sees the page locked.
        const inserted = await tx
          .insert(attachments)
          .values(
            files.map((file) => ({
              ...file,
              pageId: access.page.id,
              uploaderId: user.id,
              // Evaluated per row, so files of one request keep the order they were sent in.
              createdAt: sql`clock_timestamp()`,
              addendum: sql`(select ${pages.locked} from ${pages} where ${pages.id} = ${access.page.id} for share)`,
            })),
          )
          .returning({ id: attachments.id, addendum: attachments.addendum });
        for (const [i, file] of files.entries()) {
          await appendInTransaction(tx, {
            type: 'attachment.added',
            actor: user,
            notebookId: access.notebookId,
            pageId: access.page.id,
            details: attachmentAddedDetails(file, inserted[i].addendum),
          });
        }
      });
    } catch (error) {
      await Promise.all(files.map((file) => removeObject(storage, file.storageKey)));
      throw error;
    }
    const rows = new Map((await listRows(eq(attachments.pageId, access.page.id))).map((row) => [row.id, row]));
    // In the order they were sent: files of one request share their creation time.
    res.status(201).json(files.map((file) => summary(rows.get(file.id)!, access, user)));
  });

  router.get('/pages/:id/attachments', async (req, res) => {
    const user = currentUser(res);
    const access = await pageAccess(db, user, idParam(req, 'id', 'Page'));
    const rows = await listRows(eq(attachments.pageId, access.page.id));
    res.json(rows.map((row) => summary(row, access, user)));
  });

  router.get('/attachments/:id', async (req, res) => {
    const { row, access, user } = await attachmentFor(res, idParam(req, 'id', 'Attachment'));
    res.json(summary(row, access, user));
  });

  router.get('/attachments/:id/content', async (req, res) => {
    const { row } = await attachmentFor(res, idParam(req, 'id', 'Attachment'));
    // Stored bytes never change, so their checksum is a perfect validator for thumbnails and re-downloads.
    const etag = `"${row.sha256}"`;
    res.setHeader('ETag', etag);
    res.setHeader('Cache-Control', 'private, no-cache');
    if (req.headers['if-none-match'] === etag) {
      res.status(304).end();
      return;
    }
    const body = await openObject(storage, row.storageKey).catch(() => {
      throw new HttpError(503, 'storage_unavailable', 'The file store did not return this file; try again later');
    });
    res.setHeader('Content-Type', row.mediaType);
    res.setHeader('Content-Length', String(row.size));
    res.setHeader('Content-Disposition', contentDisposition(row.displayName));
    res.setHeader('X-Checksum-SHA256', row.sha256);
    // Uploaded HTML or SVG must never run as part of our origin.
    res.setHeader('Content-Security-Policy', "default-src 'none'; sandbox");
    await pipeline(body, res);
  });

  router.get('/attachments/:id/spectrum', async (req, res) => {
    const { row } = await attachmentFor(res, idParam(req, 'id', 'Attachment'));
    if (!row.spectrumSummary) {
      throw new HttpError(404, 'not_a_spectrum', row.parseError ? `This file could not be read as a spectrum: ${row.parseError}` : 'This file is not a spectrum');
    }
    const [stored] = await db.select({ spectrum: attachments.spectrum }).from(attachments).where(eq(attachments.id, row.id));
    if (!stored?.spectrum) throw notFound('Attachment');
    const { preview: _preview, ...spectrum } = stored.spectrum;
    res.setHeader('Cache-Control', 'private, max-age=3600');
    res.json(spectrum satisfies SpectrumData);
  });

  router.delete('/attachments/:id', async (req, res) => {
    const { row, access, user } = await attachmentFor(res, idParam(req, 'id', 'Attachment'));
    if (!access.canWrite) throw forbidden('You can read this page but not remove its files');
    if (access.page.locked) throw conflict('page_locked', 'This page is signed; its files are part of the record and cannot be removed');
    if (!mayDelete(row, access, user)) throw forbidden('Only the person who added a file or the notebook owner can remove it');
    const removed = await db.transaction(async (tx) => {
      // The lock is checked again inside the delete, so a signature that lands meanwhile wins.
      const [gone] = await tx
        .delete(attachments)
        .where(and(eq(attachments.id, row.id), sql`not exists (select 1 from ${pages} where ${pages.id} = ${row.pageId} and ${pages.locked})`))
        .returning({ id: attachments.id });
      if (!gone) return false;
      await appendInTransaction(tx, {
        type: 'attachment.removed',
        actor: user,
        notebookId: access.notebookId,
        pageId: row.pageId,
        details: { attachmentId: row.id, name: row.displayName, size: row.size, sha256: row.sha256 },
      });
      return true;
    });
    if (!removed) throw conflict('page_locked', 'This page was signed meanwhile; its files can no longer be removed');
    await removeObject(storage, row.storageKey);
    res.status(204).end();
  });

  return router;
}
