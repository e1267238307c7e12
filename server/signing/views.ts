import { and, asc, eq, ne } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { User } from 'lucia';
import type { Countersigner, PageRecord, QueueItem } from '../../shared/schemas/signing';
import type { PageAccess } from '../auth/access';
import type { Database } from '../db/client';
import { addenda, countersignRequests, memberships, notebooks, pageReturns, pages, signatures, users } from '../db/schema';
import { withdrawnSignatureIds } from './verify';

const supervisors = alias(users, 'supervisors');
const authors = alias(users, 'authors');

/** Everything the record panel shows for a page, and what the caller may do next. */
export async function pageRecord(db: Database, user: User, access: PageAccess): Promise<PageRecord> {
  const page = access.page;
  const [signatureRows, requestRows, returnRows, addendumRows, withdrawn] = await Promise.all([
    db.select().from(signatures).where(eq(signatures.pageId, page.id)).orderBy(asc(signatures.signedAt)),
    db
      .select({ request: countersignRequests, supervisor: { id: supervisors.id, name: supervisors.name } })
      .from(countersignRequests)
      .innerJoin(supervisors, eq(supervisors.id, countersignRequests.supervisorId))
      .where(eq(countersignRequests.pageId, page.id))
      .orderBy(asc(countersignRequests.requestedAt)),
    db.select().from(pageReturns).where(eq(pageReturns.pageId, page.id)).orderBy(asc(pageReturns.returnedAt)),
    db.select().from(addenda).where(eq(addenda.pageId, page.id)).orderBy(asc(addenda.number)),
    withdrawnSignatureIds(db, page.id),
  ]);
  const waitingForMe = requestRows.some(
    (r) => r.request.state === 'waiting' && r.request.supervisorId === user.id && user.role === 'supervisor',
  );
  return {
    pageId: page.id,
    status: page.status,
    locked: page.locked,
    signatures: signatureRows.map((s) => ({
      id: s.id,
      role: s.role,
      addendumId: s.addendumId,
      signer: { id: s.signerId, name: s.signerName },
      signedAt: s.signedAt.toISOString(),
      meaning: s.meaning,
      contentHash: s.contentHash,
      withdrawn: withdrawn.has(s.id),
    })),
    requests: requestRows.map(({ request, supervisor }) => ({
      id: request.id,
      pageId: request.pageId,
      addendumId: request.addendumId,
      supervisor,
      requestedAt: request.requestedAt.toISOString(),
      state: request.state,
    })),
    returns: returnRows.map((r) => ({
      id: r.id,
      addendumId: r.addendumId,
      returnedBy: { id: r.returnedBy, name: r.returnedByName },
      comment: r.comment,
      returnedAt: r.returnedAt.toISOString(),
    })),
    addenda: addendumRows.map((a) => ({
      id: a.id,
      number: a.number,
      author: { id: a.authorId, name: a.authorName },
      text: a.text,
      createdAt: a.createdAt.toISOString(),
    })),
    can: {
      sign: access.canWrite && !page.locked && page.status === 'draft' && page.authorId === user.id,
      countersign: waitingForMe,
      addAddendum: access.canWrite && page.locked,
    },
  };
}

/** Supervisors of the notebook who could countersign for `signerId`. */
export async function countersigners(db: Database, notebookId: string, signerId: string): Promise<Countersigner[]> {
  return db
    .select({ id: users.id, name: users.name })
    .from(users)
    .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.notebookId, notebookId)))
    .where(and(eq(users.role, 'supervisor'), ne(users.id, signerId)))
    .orderBy(asc(users.name));
}

/** Work waiting for one supervisor, oldest first, with how long each has waited. */
export async function countersignQueue(db: Database, supervisorId: string): Promise<QueueItem[]> {
  const rows = await db
    .select({
      request: countersignRequests,
      page: { id: pages.id, number: pages.number, title: pages.title, notebookId: pages.notebookId },
      notebookTitle: notebooks.title,
      addendumNumber: addenda.number,
      addendumAuthor: { id: addenda.authorId, name: addenda.authorName },
      author: { id: authors.id, name: authors.name },
    })
    .from(countersignRequests)
    .innerJoin(pages, eq(pages.id, countersignRequests.pageId))
    .innerJoin(notebooks, eq(notebooks.id, pages.notebookId))
    .innerJoin(authors, eq(authors.id, pages.authorId))
    .leftJoin(addenda, eq(addenda.id, countersignRequests.addendumId))
    .where(and(eq(countersignRequests.supervisorId, supervisorId), eq(countersignRequests.state, 'waiting')))
    .orderBy(asc(countersignRequests.requestedAt));
  const at = Date.now();
  return rows.map((r) => ({
    requestId: r.request.id,
    pageId: r.page.id,
    addendumId: r.request.addendumId,
    addendumNumber: r.addendumNumber,
    notebookId: r.page.notebookId,
    notebookTitle: r.notebookTitle,
    pageNumber: r.page.number,
    pageTitle: r.page.title,
    author: r.addendumAuthor?.id ? { id: r.addendumAuthor.id, name: r.addendumAuthor.name } : r.author,
    requestedAt: r.request.requestedAt.toISOString(),
    waitingSeconds: Math.max(0, Math.floor((at - r.request.requestedAt.getTime()) / 1000)),
  }));
}
