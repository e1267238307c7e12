import { and, eq, isNull, sql } from 'drizzle-orm';
import type { User } from 'lucia';
import {
  signatureMeanings,
  type AddendumInput,
  type CountersignInput,
  type ReturnInput,
  type SignPageInput,
} from '../../shared/schemas/signing';
import { appendInTransaction } from '../audit/record';
import type { PageAccess } from '../auth/access';
import type { AppDeps } from '../context';
import type { Database } from '../db/client';
import {
  addenda,
  attachments,
  countersignRequests,
  memberships,
  notebooks,
  pageReturns,
  pages,
  signatures,
  users,
  type AddendumRow,
  type CountersignRequestRow,
  type PageRow,
} from '../db/schema';
import { conflict, forbidden, HttpError } from '../http/errors';
import { recordHash, type RecordContent } from './canonical';
import { addendumContent, livePageContent, storedPageContent, type SigningHub } from './content';
import { confirmSigner } from './identity';
import { returnUnclaimedFilesToPage } from './pageFiles';
import { notifyCountersigned, notifyCountersignRequested, notifyReturned } from './notify';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];
type Signer = { id: string; name: string };

/** Timestamps are kept to the millisecond, the precision the audit chain hashes. */
const now = () => new Date(Math.floor(Date.now()));

async function pageRef(db: Database, pageId: string) {
  const [row] = await db
    .select({ id: pages.id, number: pages.number, title: pages.title, notebookTitle: notebooks.title })
    .from(pages)
    .innerJoin(notebooks, eq(notebooks.id, pages.notebookId))
    .where(eq(pages.id, pageId));
  return row;
}

async function person(db: Database, id: string) {
  const [row] = await db.select({ id: users.id, name: users.name, email: users.email }).from(users).where(eq(users.id, id));
  return row;
}

/** The supervisor a signer names must be able to read the page and must not be the signer. */
async function chosenCountersigner(db: Database, notebookId: string, signerId: string, supervisorId: string) {
  const [row] = await db
    .select({ id: users.id, name: users.name, email: users.email, role: users.role })
    .from(users)
    .innerJoin(memberships, and(eq(memberships.userId, users.id), eq(memberships.notebookId, notebookId)))
    .where(eq(users.id, supervisorId));
  if (!row || row.role !== 'supervisor' || row.id === signerId) {
    throw new HttpError(422, 'not_a_countersigner', 'Choose a supervisor who is a member of this notebook (not yourself) to countersign', {
      fields: { supervisorId: 'must be a supervisor of this notebook' },
    });
  }
  return row;
}

async function insertSignature(
  tx: Tx,
  values: { pageId: string; addendumId: string | null; role: 'author' | 'witness'; signer: Signer; meaningCode: keyof typeof signatureMeanings; content: RecordContent },
) {
  const { serialised, hash } = recordHash(values.content);
  const [signature] = await tx
    .insert(signatures)
    .values({
      pageId: values.pageId,
      addendumId: values.addendumId,
      role: values.role,
      signerId: values.signer.id,
      // 11.50(a)(1): the printed name as it was at signing, not whatever the account says later.
      signerName: values.signer.name,
      signedAt: now(),
      meaningCode: values.meaningCode,
      meaning: signatureMeanings[values.meaningCode].label,
      contentHash: hash,
      signedContent: serialised,
    })
    .returning();
  return signature;
}

/** What the audit trail keeps of a signature; verification compares the stored row against it. */
export function signatureAuditDetails(s: typeof signatures.$inferSelect) {
  return {
    signatureId: s.id,
    role: s.role,
    addendumId: s.addendumId,
    signerId: s.signerId,
    signerName: s.signerName,
    signedAt: s.signedAt.toISOString(),
    meaning: s.meaning,
    contentHash: s.contentHash,
  };
}

/** After commit: a failing history snapshot must not turn a recorded signature into an error. */
async function snapshot(hub: SigningHub, pageId: string, reason: string) {
  try {
    await hub.takeSnapshot(pageId, reason);
  } catch (error) {
    console.error(`signing: snapshot "${reason}" of page ${pageId} failed`, error);
  }
}

/**
 * The database part of signing a page: lock it, store the signature and the countersign request,
 * append both to the audit trail. Used by the route (after the password check) and the demo seed.
 */
export async function writePageSignature(
  tx: Tx,
  args: { page: PageRow; signer: Signer; meaning: SignPageInput['meaning']; content: RecordContent; supervisor: { id: string; name: string } },
): Promise<string> {
  const { page, signer, supervisor } = args;
  const [locked] = await tx
    .update(pages)
    .set({ locked: true, status: 'signed', updatedAt: now() })
    .where(and(eq(pages.id, page.id), eq(pages.status, 'draft')))
    .returning();
  if (!locked) throw conflict('already_signed', 'This page was signed meanwhile; nothing was changed');
  const signature = await insertSignature(tx, { pageId: page.id, addendumId: null, role: 'author', signer, meaningCode: args.meaning, content: args.content });
  const [request] = await tx
    .insert(countersignRequests)
    .values({ pageId: page.id, authorSignatureId: signature.id, supervisorId: supervisor.id, requestedAt: signature.signedAt })
    .returning();
  const common = { actor: signer, notebookId: page.notebookId, pageId: page.id };
  await appendInTransaction(tx, { ...common, type: 'page.signed', details: signatureAuditDetails(signature) });
  await appendInTransaction(tx, {
    ...common,
    type: 'countersign.requested',
    details: { requestId: request.id, supervisorId: supervisor.id, supervisorName: supervisor.name },
  });
  return signature.id;
}

/** Settles a waiting request exactly once; a second reviewer racing the first gets a conflict. */
async function resolveRequest(tx: Tx, requestId: string, state: 'countersigned' | 'returned') {
  const [claimed] = await tx
    .update(countersignRequests)
    .set({ state, resolvedAt: now() })
    .where(and(eq(countersignRequests.id, requestId), eq(countersignRequests.state, 'waiting')))
    .returning();
  if (!claimed) throw conflict('nothing_to_countersign', 'This was countersigned or returned meanwhile');
}

/** The database part of countersigning: claim the request, store the witness signature, audit it. */
export async function writeCountersignature(
  tx: Tx,
  args: { page: PageRow; addendum: AddendumRow | null; request: CountersignRequestRow; signer: Signer; meaning: CountersignInput['meaning']; content: RecordContent },
): Promise<string> {
  const { page, addendum, request, signer } = args;
  await resolveRequest(tx, request.id, 'countersigned');
  const signature = await insertSignature(tx, { pageId: page.id, addendumId: addendum?.id ?? null, role: 'witness', signer, meaningCode: args.meaning, content: args.content });
  if (!addendum) await tx.update(pages).set({ status: 'witnessed', updatedAt: now() }).where(eq(pages.id, page.id));
  await appendInTransaction(tx, {
    type: addendum ? 'addendum.countersigned' : 'page.countersigned',
    actor: signer,
    notebookId: page.notebookId,
    pageId: page.id,
    details: { ...signatureAuditDetails(signature), requestId: request.id },
  });
  return signature.id;
}

export async function signPage(deps: AppDeps, hub: SigningHub, user: User, access: PageAccess, input: SignPageInput) {
  const { db } = deps;
  const page = access.page;
  if (!access.canWrite) throw forbidden('You can read this page but not sign it');
  if (page.authorId !== user.id) throw forbidden('Only the author of a page signs it; nobody signs for someone else');
  if (page.locked || page.status !== 'draft') throw conflict('already_signed', 'This page is signed already; add an addendum instead');
  await confirmSigner(deps, user, input, { action: 'sign', notebookId: page.notebookId, pageId: page.id });
  const supervisor = await chosenCountersigner(db, page.notebookId, user.id, input.supervisorId);

  // Claim the lock in the database first (the collaboration server takes it as the truth for new
  // connections), then stop the open editors and read the content: nothing slips in unsigned.
  const claimed = await db.transaction(async (tx) => {
    const [row] = await tx
      .update(pages)
      .set({ locked: true })
      .where(and(eq(pages.id, page.id), eq(pages.status, 'draft'), eq(pages.locked, false)))
      .returning();
    // Files left waiting for an addendum by an earlier lock (a failed attempt, or a return made
    // before returns handed them back) are the page's: this signature covers them.
    if (row) await returnUnclaimedFilesToPage(tx, page.id);
    return row;
  });
  if (!claimed) throw conflict('already_signed', 'This page was signed meanwhile; nothing was changed');
  let signatureId: string;
  try {
    await hub.setPageLocked(page.id, true);
    const content = await livePageContent(db, hub, claimed);
    signatureId = await db.transaction((tx) => writePageSignature(tx, { page: claimed, signer: user, meaning: input.meaning, content, supervisor }));
  } catch (error) {
    await db.update(pages).set({ locked: false }).where(and(eq(pages.id, page.id), eq(pages.status, 'draft')));
    await hub.setPageLocked(page.id, false);
    throw error;
  }
  await snapshot(hub, page.id, 'signed');
  await notifyCountersignRequested(deps, supervisor, user.name, await pageRef(db, page.id), null);
  return signatureId;
}

async function waitingRequest(db: Database, pageId: string, addendumId: string | null): Promise<CountersignRequestRow> {
  const [request] = await db
    .select()
    .from(countersignRequests)
    .where(
      and(
        eq(countersignRequests.pageId, pageId),
        addendumId ? eq(countersignRequests.addendumId, addendumId) : isNull(countersignRequests.addendumId),
        eq(countersignRequests.state, 'waiting'),
      ),
    );
  if (!request) throw conflict('nothing_to_countersign', addendumId ? 'This addendum is not waiting for a countersignature' : 'This page is not waiting for a countersignature');
  return request;
}

/** Who may act on a countersign request: the supervisor it names, never the author of the work. */
async function assertReviewer(db: Database, user: User, request: CountersignRequestRow, authorId: string) {
  if (user.role !== 'supervisor') throw forbidden('Only supervisors countersign or return work');
  if (user.id === authorId) throw forbidden('You cannot countersign or return your own work');
  if (request.supervisorId !== user.id) {
    const named = await person(db, request.supervisorId);
    throw forbidden(`This waits for ${named?.name ?? 'another supervisor'}; only they can countersign or return it`);
  }
}

export async function countersign(
  deps: AppDeps,
  hub: SigningHub,
  user: User,
  access: PageAccess,
  input: CountersignInput,
  addendum: AddendumRow | null,
) {
  const { db } = deps;
  const page = access.page;
  const request = await waitingRequest(db, page.id, addendum?.id ?? null);
  const authorId = addendum?.authorId ?? page.authorId;
  await assertReviewer(db, user, request, authorId);
  await confirmSigner(deps, user, input, { action: 'countersign', notebookId: page.notebookId, pageId: page.id });

  const content = addendum ? await addendumContent(db, addendum) : await storedPageContent(db, page);
  const [authorSignature] = await db.select().from(signatures).where(eq(signatures.id, request.authorSignatureId));
  // A witness attests to what the author signed; if that content no longer matches, nobody should countersign it.
  if (recordHash(content).hash !== authorSignature.contentHash) {
    throw conflict('record_changed', 'The content no longer matches what the author signed; check the record before countersigning');
  }

  const signatureId = await db.transaction((tx) =>
    writeCountersignature(tx, { page, addendum, request, signer: user, meaning: input.meaning, content }),
  );
  if (!addendum) await snapshot(hub, page.id, 'countersigned');
  const author = await person(db, authorId);
  await notifyCountersigned(deps, author, user.name, await pageRef(db, page.id), addendum?.number ?? null);
  return signatureId;
}

export async function returnWork(deps: AppDeps, hub: SigningHub, user: User, access: PageAccess, input: ReturnInput, addendum: AddendumRow | null) {
  const { db } = deps;
  const page = access.page;
  const request = await waitingRequest(db, page.id, addendum?.id ?? null);
  const authorId = addendum?.authorId ?? page.authorId;
  await assertReviewer(db, user, request, authorId);

  await db.transaction(async (tx) => {
    await resolveRequest(tx, request.id, 'returned');
    const [returned] = await tx
      .insert(pageReturns)
      .values({ requestId: request.id, pageId: page.id, addendumId: addendum?.id ?? null, returnedBy: user.id, returnedByName: user.name, comment: input.comment, returnedAt: now() })
      .returning();
    // A returned page goes back to its author as a draft, with the files no addendum claimed; a
    // returned addendum stays (it is already part of the record).
    let filesBackOnPage: string[] = [];
    if (!addendum) {
      await tx.update(pages).set({ status: 'draft', locked: false, updatedAt: now() }).where(eq(pages.id, page.id));
      filesBackOnPage = await returnUnclaimedFilesToPage(tx, page.id);
    }
    await appendInTransaction(tx, {
      type: addendum ? 'addendum.returned' : 'page.returned',
      actor: user,
      notebookId: page.notebookId,
      pageId: page.id,
      details: {
        requestId: request.id,
        returnId: returned.id,
        addendumId: addendum?.id ?? null,
        comment: input.comment,
        ...(addendum ? {} : { filesBackOnPage }),
      },
    });
  });
  if (!addendum) await hub.setPageLocked(page.id, false);
  const author = await person(db, authorId);
  await notifyReturned(deps, author, user.name, await pageRef(db, page.id), input.comment, addendum?.number ?? null);
}

export async function addAddendum(deps: AppDeps, user: User, access: PageAccess, input: AddendumInput) {
  const { db } = deps;
  const page = access.page;
  if (!access.canWrite) throw forbidden('You can read this page but not add to it');
  if (!page.locked) throw conflict('not_signed', 'This page is not signed; write on the page itself');
  await confirmSigner(deps, user, input, { action: 'addendum', notebookId: page.notebookId, pageId: page.id });
  const supervisor = input.supervisorId ? await chosenCountersigner(db, page.notebookId, user.id, input.supervisorId) : null;

  const addendum = await db.transaction(async (tx) => {
    // Row lock on the page: concurrent addenda get consecutive numbers and claim distinct files.
    await tx.execute(sql`select 1 from ${pages} where ${pages.id} = ${page.id} for update`);
    const existing = await tx.select({ number: addenda.number, attachmentIds: addenda.attachmentIds }).from(addenda).where(eq(addenda.pageId, page.id));
    const claimed = new Set(existing.flatMap((a) => a.attachmentIds));
    const laterFiles = await tx
      .select({ id: attachments.id })
      .from(attachments)
      .where(and(eq(attachments.pageId, page.id), eq(attachments.addendum, true)));
    const [created] = await tx
      .insert(addenda)
      .values({
        pageId: page.id,
        number: existing.reduce((max, a) => Math.max(max, a.number), 0) + 1,
        authorId: user.id,
        authorName: user.name,
        text: input.text,
        attachmentIds: laterFiles.map((f) => f.id).filter((id) => !claimed.has(id)),
        createdAt: now(),
      })
      .returning();
    const content = await addendumContent(tx, created);
    const signature = await insertSignature(tx, { pageId: page.id, addendumId: created.id, role: 'author', signer: user, meaningCode: input.meaning, content });
    const common = { actor: user, notebookId: page.notebookId, pageId: page.id };
    await appendInTransaction(tx, {
      ...common,
      type: 'addendum.signed',
      details: { ...signatureAuditDetails(signature), addendumNumber: created.number, attachmentIds: created.attachmentIds },
    });
    if (supervisor) {
      const [request] = await tx
        .insert(countersignRequests)
        .values({ pageId: page.id, addendumId: created.id, authorSignatureId: signature.id, supervisorId: supervisor.id, requestedAt: signature.signedAt })
        .returning();
      await appendInTransaction(tx, {
        ...common,
        type: 'countersign.requested',
        details: { requestId: request.id, addendumId: created.id, supervisorId: supervisor.id, supervisorName: supervisor.name },
      });
    }
    return created;
  });
  if (supervisor) await notifyCountersignRequested(deps, supervisor, user.name, await pageRef(db, page.id), addendum.number);
  return addendum;
}
