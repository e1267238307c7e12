import { and, count, eq, sql } from 'drizzle-orm';
import { Router } from 'express';
import { membershipUpsertSchema, notebookCreateSchema } from '../../shared/schemas/notebooks';
import { recordAuditEvent } from '../audit/record';
import { assertCanManage, notebookAccess, type NotebookAccess } from '../auth/access';
import { currentUser, requireRole } from '../auth/middleware';
import { getCollabHub } from '../collab';
import type { AppDeps } from '../context';
import { memberships, notebooks, pages, users } from '../db/schema';
import { HttpError, notFound, parseInput } from '../http/errors';
import { idParam } from '../http/params';

export function notebookRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const router = Router();

  const withPageCount = { notebook: notebooks, pageCount: count(pages.id) };

  function toSummary(row: { notebook: typeof notebooks.$inferSelect; pageCount: number }, membership: NotebookAccess['membership']) {
    return {
      id: row.notebook.id,
      title: row.notebook.title,
      description: row.notebook.description,
      createdAt: row.notebook.createdAt.toISOString(),
      pageCount: Number(row.pageCount),
      myRole: membership,
    };
  }

  async function summary(notebookId: string, access: Pick<NotebookAccess, 'membership'>) {
    const [row] = await db
      .select(withPageCount)
      .from(notebooks)
      .leftJoin(pages, eq(pages.notebookId, notebooks.id))
      .where(eq(notebooks.id, notebookId))
      .groupBy(notebooks.id);
    return toSummary(row, access.membership);
  }

  router.get('/notebooks', async (_req, res) => {
    const user = currentUser(res);
    const rows = await db
      .select({ ...withPageCount, membership: memberships.role })
      .from(notebooks)
      .leftJoin(memberships, and(eq(memberships.notebookId, notebooks.id), eq(memberships.userId, user.id)))
      .leftJoin(pages, eq(pages.notebookId, notebooks.id))
      .where(user.role === 'admin' ? sql`true` : sql`${memberships.userId} is not null`)
      .groupBy(notebooks.id, memberships.role)
      .orderBy(notebooks.createdAt);
    res.json(rows.map((row) => toSummary(row, row.membership ?? null)));
  });

  router.post('/notebooks', requireRole('admin', 'supervisor', 'chemist'), async (req, res) => {
    const user = currentUser(res);
    const input = parseInput(notebookCreateSchema, req.body);
    const notebook = await db.transaction(async (tx) => {
      const [created] = await tx.insert(notebooks).values({ ...input, createdBy: user.id }).returning();
      await tx.insert(memberships).values({ notebookId: created.id, userId: user.id, role: 'owner' });
      return created;
    });
    await recordAuditEvent(db, { type: 'notebook.created', actor: user, notebookId: notebook.id, details: { title: notebook.title } });
    res.status(201).json(await summary(notebook.id, { membership: 'owner' }));
  });

  router.get('/notebooks/:id', async (req, res) => {
    const access = await notebookAccess(db, currentUser(res), idParam(req, 'id', 'Notebook'));
    res.json(await summary(access.notebookId, access));
  });

  router.get('/notebooks/:id/members', async (req, res) => {
    const access = await notebookAccess(db, currentUser(res), idParam(req, 'id', 'Notebook'));
    const rows = await db
      .select({ userId: users.id, name: users.name, email: users.email, role: memberships.role })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(eq(memberships.notebookId, access.notebookId))
      .orderBy(users.name);
    res.json(rows);
  });

  router.put('/notebooks/:id/members', async (req, res) => {
    const actor = currentUser(res);
    const access = await notebookAccess(db, actor, idParam(req, 'id', 'Notebook'));
    assertCanManage(access);
    const input = parseInput(membershipUpsertSchema, req.body);
    const [member] = await db.select().from(users).where(eq(users.id, input.userId));
    if (!member) throw notFound('Person');
    if (member.role === 'viewer' && input.role !== 'reader') {
      throw new HttpError(422, 'viewer_read_only', 'People with the viewer role can only be readers');
    }
    const [previous] = await db
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.notebookId, access.notebookId), eq(memberships.userId, member.id)));
    await db
      .insert(memberships)
      .values({ notebookId: access.notebookId, userId: member.id, role: input.role })
      .onConflictDoUpdate({ target: [memberships.notebookId, memberships.userId], set: { role: input.role } });
    await getCollabHub(deps).refreshAccess({ notebookId: access.notebookId, userId: member.id });
    await recordAuditEvent(db, {
      type: 'membership.changed',
      actor,
      notebookId: access.notebookId,
      details: { userId: member.id, email: member.email, from: previous?.role ?? null, to: input.role },
    });
    res.json({ userId: member.id, name: member.name, email: member.email, role: input.role });
  });

  router.delete('/notebooks/:id/members/:userId', async (req, res) => {
    const actor = currentUser(res);
    const access = await notebookAccess(db, actor, idParam(req, 'id', 'Notebook'));
    assertCanManage(access);
    const userId = idParam(req, 'userId', 'Member');
    const removed = await db
      .delete(memberships)
      .where(and(eq(memberships.notebookId, access.notebookId), eq(memberships.userId, userId)))
      .returning();
    if (removed.length === 0) throw notFound('Member');
    await getCollabHub(deps).refreshAccess({ notebookId: access.notebookId, userId });
    await recordAuditEvent(db, {
      type: 'membership.changed',
      actor,
      notebookId: access.notebookId,
      details: { userId, from: removed[0].role, to: null },
    });
    res.status(204).end();
  });

  return router;
}
