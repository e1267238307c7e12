import { and, eq } from 'drizzle-orm';
import type { User } from 'lucia';
import type { MembershipRole } from '../../shared/schemas/common';
import type { Database } from '../db/client';
import { memberships, notebooks, pages, type PageRow } from '../db/schema';
import { forbidden, notFound } from '../http/errors';

export interface NotebookAccess {
  notebookId: string;
  /** The caller's membership; admins without one act as owners. */
  membership: MembershipRole | null;
  effectiveRole: MembershipRole;
  /** May add pages and edit content: owner/editor, never an organisation viewer. */
  canWrite: boolean;
  /** May manage members: owner or admin. */
  canManage: boolean;
}

/**
 * Resolves what `user` may do in a notebook. Someone who is not a member gets 404 rather than
 * 403, so the existence of other groups' notebooks is not revealed.
 */
export async function notebookAccess(db: Database, user: User, notebookId: string): Promise<NotebookAccess> {
  const [row] = await db
    .select({ id: notebooks.id, membership: memberships.role })
    .from(notebooks)
    .leftJoin(memberships, and(eq(memberships.notebookId, notebooks.id), eq(memberships.userId, user.id)))
    .where(eq(notebooks.id, notebookId));
  if (!row) throw notFound('Notebook');
  const membership = row.membership ?? null;
  if (!membership && user.role !== 'admin') throw notFound('Notebook');
  const effectiveRole: MembershipRole = user.role === 'admin' ? 'owner' : (membership as MembershipRole);
  return {
    notebookId,
    membership,
    effectiveRole,
    canWrite: user.role !== 'viewer' && effectiveRole !== 'reader',
    canManage: user.role === 'admin' || membership === 'owner',
  };
}

export interface PageAccess extends NotebookAccess {
  page: PageRow;
  /** canWrite and the page is not locked by a signature. */
  canEdit: boolean;
}

export async function pageAccess(db: Database, user: User, pageId: string): Promise<PageAccess> {
  const [page] = await db.select().from(pages).where(eq(pages.id, pageId));
  if (!page) throw notFound('Page');
  const access = await notebookAccess(db, user, page.notebookId).catch(() => {
    throw notFound('Page');
  });
  return { ...access, page, canEdit: access.canWrite && !page.locked };
}

export function assertCanWrite(access: NotebookAccess): void {
  if (!access.canWrite) throw forbidden('You can read this notebook but not change it');
}

export function assertCanManage(access: NotebookAccess): void {
  if (!access.canManage) throw forbidden('Only the notebook owner or an admin can change its members');
}
