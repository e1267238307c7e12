import { and, desc, eq, inArray } from 'drizzle-orm';
import { Router } from 'express';
import { pageAccess } from '../auth/access';
import { currentUser } from '../auth/middleware';
import type { AppDeps } from '../context';
import { pageSnapshots, users } from '../db/schema';
import { notFound } from '../http/errors';
import { idParam } from '../http/params';

/**
 * Page history: the snapshots the collaboration server took (every few minutes of editing, at
 * sign-off, when everyone left), listed with their authors; one of them as a Yjs state that the
 * editor opens read-only. Any member who may read the page may read its history.
 */
export function historyRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const router = Router();

  router.get('/pages/:id/history', async (req, res) => {
    const access = await pageAccess(db, currentUser(res), idParam(req, 'id', 'Page'));
    const snapshots = await db
      .select({ id: pageSnapshots.id, takenAt: pageSnapshots.takenAt, reason: pageSnapshots.reason, authorIds: pageSnapshots.authorIds })
      .from(pageSnapshots)
      .where(eq(pageSnapshots.pageId, access.page.id))
      .orderBy(desc(pageSnapshots.takenAt));
    const authorIds = [...new Set(snapshots.flatMap((s) => s.authorIds))];
    const names = authorIds.length
      ? await db.select({ id: users.id, name: users.name }).from(users).where(inArray(users.id, authorIds))
      : [];
    const byId = new Map(names.map((n) => [n.id, n]));
    res.json(
      snapshots.map((s) => ({
        id: s.id,
        takenAt: s.takenAt.toISOString(),
        reason: s.reason,
        authors: s.authorIds.flatMap((id) => byId.get(id) ?? []),
      })),
    );
  });

  router.get('/pages/:id/history/:snapshotId', async (req, res) => {
    const access = await pageAccess(db, currentUser(res), idParam(req, 'id', 'Page'));
    const [snapshot] = await db
      .select()
      .from(pageSnapshots)
      .where(and(eq(pageSnapshots.id, idParam(req, 'snapshotId', 'Snapshot')), eq(pageSnapshots.pageId, access.page.id)));
    if (!snapshot) throw notFound('Snapshot');
    res.json({
      id: snapshot.id,
      takenAt: snapshot.takenAt.toISOString(),
      reason: snapshot.reason,
      update: Buffer.from(snapshot.state).toString('base64'),
    });
  });

  return router;
}
