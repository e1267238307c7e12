import { and, asc, desc, eq, gt, inArray, lte, sql } from 'drizzle-orm';
import { appendInTransaction } from '../audit/record';
import type { Database } from '../db/client';
import { collabDocuments, collabEditingSessions, collabUpdates, pageContent, pages, pageSnapshots, users } from '../db/schema';
import type { PageProjection } from './projection';

/** What the database holds for a page: the compacted state and the updates appended since. */
export interface StoredPage {
  notebookId: string;
  locked: boolean;
  compacted: Uint8Array | null;
  throughUpdateId: number;
  updates: { id: number; update: Uint8Array }[];
  /** Users whose updates arrived after the latest history snapshot (survives a crash). */
  authorsSinceSnapshot: string[];
}

export async function loadPage(db: Database, pageId: string): Promise<StoredPage | null> {
  const [page] = await db.select({ notebookId: pages.notebookId, locked: pages.locked }).from(pages).where(eq(pages.id, pageId));
  if (!page) return null;
  const [compacted] = await db.select().from(collabDocuments).where(eq(collabDocuments.pageId, pageId));
  const throughUpdateId = compacted?.throughUpdateId ?? 0;
  const updates = await db
    .select({ id: collabUpdates.id, update: collabUpdates.update })
    .from(collabUpdates)
    .where(and(eq(collabUpdates.pageId, pageId), gt(collabUpdates.id, throughUpdateId)))
    .orderBy(asc(collabUpdates.id));
  const [latest] = await db
    .select({ takenAt: pageSnapshots.takenAt })
    .from(pageSnapshots)
    .where(eq(pageSnapshots.pageId, pageId))
    .orderBy(desc(pageSnapshots.takenAt))
    .limit(1);
  const authors = await db
    .selectDistinct({ userId: collabUpdates.userId })
    .from(collabUpdates)
    .where(
      and(
        eq(collabUpdates.pageId, pageId),
        latest ? gt(collabUpdates.receivedAt, latest.takenAt) : undefined,
        sql`${collabUpdates.userId} is not null`,
      ),
    );
  return {
    ...page,
    compacted: compacted?.state ?? null,
    throughUpdateId,
    updates,
    authorsSinceSnapshot: authors.map((a) => a.userId as string),
  };
}

export interface AcceptedUpdate {
  update: Uint8Array;
  userId: string;
}

/**
 * Appends a batch of accepted updates in one transaction (one commit, so one WAL flush for the
 * whole batch) and keeps each author's open editing session current. Returns the last row id.
 */
export async function appendUpdates(db: Database, pageId: string, batch: AcceptedUpdate[], at: Date): Promise<number> {
  return db.transaction(async (tx) => {
    const rows = await tx
      .insert(collabUpdates)
      .values(batch.map((b) => ({ pageId, update: b.update, userId: b.userId, receivedAt: at })))
      .returning({ id: collabUpdates.id });
    const authors = [...new Set(batch.map((b) => b.userId))];
    await tx
      .insert(collabEditingSessions)
      .values(authors.map((userId) => ({ pageId, userId, firstUpdateAt: at, lastUpdateAt: at })))
      .onConflictDoUpdate({
        target: [collabEditingSessions.pageId, collabEditingSessions.userId],
        set: { lastUpdateAt: sql`excluded.last_update_at` },
      });
    return Math.max(...rows.map((r) => r.id));
  });
}

/** Stores the update that creates a page's document; it has no author (the server writes it). */
export async function appendFirstUpdate(db: Database, pageId: string, update: Uint8Array): Promise<number> {
  const [row] = await db.insert(collabUpdates).values({ pageId, update, userId: null, receivedAt: new Date() }).returning({ id: collabUpdates.id });
  return row.id;
}

/** Folds everything up to `throughUpdateId` into one state row and drops the folded updates. */
export async function compactPage(db: Database, pageId: string, state: Uint8Array, throughUpdateId: number): Promise<void> {
  await db.transaction(async (tx) => {
    await tx
      .insert(collabDocuments)
      .values({ pageId, state, throughUpdateId, compactedAt: new Date() })
      .onConflictDoUpdate({ target: collabDocuments.pageId, set: { state, throughUpdateId, compactedAt: new Date() } });
    await tx.delete(collabUpdates).where(and(eq(collabUpdates.pageId, pageId), lte(collabUpdates.id, throughUpdateId)));
  });
}

export async function saveSnapshot(db: Database, pageId: string, reason: string, state: Uint8Array, authorIds: string[]): Promise<string> {
  const [row] = await db.insert(pageSnapshots).values({ pageId, reason, state, authorIds, takenAt: new Date() }).returning({ id: pageSnapshots.id });
  return row.id;
}

/** Stores the projection; with `touchPage` the page also counts as changed now. */
export async function saveProjection(db: Database, pageId: string, projection: PageProjection, options: { touchPage: boolean }): Promise<void> {
  const now = new Date();
  const values = { text: projection.text, json: projection.json, structures: projection.structures, updatedAt: now };
  await db.transaction(async (tx) => {
    await tx.insert(pageContent).values({ pageId, ...values }).onConflictDoUpdate({ target: pageContent.pageId, set: values });
    if (options.touchPage) await tx.update(pages).set({ updatedAt: now }).where(eq(pages.id, pageId));
  });
}

/**
 * Ends editing sessions (all of the page's, or only those of `userIds`) and writes each into the
 * audit trail as `page.editing_session` with who edited and the first and last update times.
 */
export async function closeEditingSessions(db: Database, pageId: string, notebookId: string, userIds?: string[]): Promise<void> {
  if (userIds && userIds.length === 0) return;
  await db.transaction(async (tx) => {
    const closed = await tx
      .delete(collabEditingSessions)
      .where(and(eq(collabEditingSessions.pageId, pageId), userIds ? inArray(collabEditingSessions.userId, userIds) : undefined))
      .returning();
    if (closed.length === 0) return;
    const names = await tx
      .select({ id: users.id, name: users.name })
      .from(users)
      .where(inArray(users.id, closed.map((c) => c.userId)));
    for (const session of closed.sort((a, b) => a.firstUpdateAt.getTime() - b.firstUpdateAt.getTime())) {
      const actor = names.find((n) => n.id === session.userId) ?? null;
      await appendInTransaction(tx, {
        type: 'page.editing_session',
        actor,
        notebookId,
        pageId,
        details: {
          userId: session.userId,
          firstUpdateAt: session.firstUpdateAt.toISOString(),
          lastUpdateAt: session.lastUpdateAt.toISOString(),
        },
      });
    }
  });
}
