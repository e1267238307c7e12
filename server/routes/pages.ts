import { and, desc, eq, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { Router } from 'express';
import { pageCreateSchema, pageUpdateSchema } from '../../shared/schemas/pages';
import { appendInTransaction, recordAuditEvent } from '../audit/record';
import { assertCanWrite, notebookAccess, pageAccess, type PageAccess } from '../auth/access';
import { currentUser } from '../auth/middleware';
import type { AppDeps } from '../context';
import { notebooks, pages, users, type PageRow } from '../db/schema';
import { conflict, forbidden, parseInput } from '../http/errors';
import { idParam } from '../http/params';

const authors = alias(users, 'authors');

function pageSummary(page: PageRow, author: { id: string; name: string }) {
  return {
    id: page.id,
    notebookId: page.notebookId,
    number: page.number,
    title: page.title,
    author,
    status: page.status,
    locked: page.locked,
    createdAt: page.createdAt.toISOString(),
    updatedAt: page.updatedAt.toISOString(),
  };
}

export function pageRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const router = Router();

  async function pageDetail(access: PageAccess) {
    const [row] = await db
      .select({ author: { id: authors.id, name: authors.name }, notebookTitle: notebooks.title })
      .from(pages)
      .innerJoin(authors, eq(authors.id, pages.authorId))
      .innerJoin(notebooks, eq(notebooks.id, pages.notebookId))
      .where(eq(pages.id, access.page.id));
    return {
      ...pageSummary(access.page, row.author),
      notebookTitle: row.notebookTitle,
      access: { canEdit: access.canEdit, role: access.effectiveRole },
    };
  }

  router.get('/notebooks/:id/pages', async (req, res) => {
    const access = await notebookAccess(db, currentUser(res), idParam(req, 'id', 'Notebook'));
    const rows = await db
      .select({ page: pages, author: { id: authors.id, name: authors.name } })
      .from(pages)
      .innerJoin(authors, eq(authors.id, pages.authorId))
      .where(eq(pages.notebookId, access.notebookId))
      .orderBy(desc(pages.number));
    res.json(rows.map((r) => pageSummary(r.page, r.author)));
  });

  router.post('/notebooks/:id/pages', async (req, res) => {
    const user = currentUser(res);
    const access = await notebookAccess(db, user, idParam(req, 'id', 'Notebook'));
    assertCanWrite(access);
    const input = parseInput(pageCreateSchema, req.body);
    const page = await db.transaction(async (tx) => {
      // Taking the number and bumping the counter in one statement keeps numbers gap-free and unique.
      const [{ number }] = await tx
        .update(notebooks)
        .set({ nextPageNumber: sql`${notebooks.nextPageNumber} + 1` })
        .where(eq(notebooks.id, access.notebookId))
        .returning({ number: sql<number>`${notebooks.nextPageNumber} - 1` });
      const [created] = await tx
        .insert(pages)
        .values({ notebookId: access.notebookId, number, title: input.title, authorId: user.id })
        .returning();
      await appendInTransaction(tx, {
        type: 'page.created',
        actor: user,
        notebookId: access.notebookId,
        pageId: created.id,
        details: { number, title: input.title },
      });
      return created;
    });
    res.status(201).json(await pageDetail({ ...access, page, canEdit: true }));
  });

  router.get('/pages/:id', async (req, res) => {
    const access = await pageAccess(db, currentUser(res), idParam(req, 'id', 'Page'));
    res.json(await pageDetail(access));
  });

  router.patch('/pages/:id', async (req, res) => {
    const user = currentUser(res);
    const access = await pageAccess(db, user, idParam(req, 'id', 'Page'));
    if (!access.canWrite) throw forbidden('You can read this page but not change it');
    if (access.page.locked) throw conflict('page_locked', 'This page is signed and locked; add an addendum instead');
    const input = parseInput(pageUpdateSchema, req.body);
    const [page] = await db
      .update(pages)
      .set({ title: input.title, updatedAt: new Date() })
      .where(and(eq(pages.id, access.page.id), eq(pages.locked, false)))
      .returning();
    if (!page) throw conflict('page_locked', 'This page was signed and locked meanwhile; nothing was changed');
    if (page.title !== access.page.title) {
      await recordAuditEvent(db, {
        type: 'page.retitled',
        actor: user,
        notebookId: page.notebookId,
        pageId: page.id,
        details: { from: access.page.title, to: page.title },
      });
    }
    res.json(await pageDetail({ ...access, page }));
  });

  return router;
}
