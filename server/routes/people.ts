import { and, desc, eq, ne } from 'drizzle-orm';
import { Router } from 'express';
import { invitationCreateSchema, userRoleUpdateSchema } from '../../shared/schemas/members';
import { recordAuditEvent } from '../audit/record';
import { currentUser, requireRole } from '../auth/middleware';
import { newToken } from '../auth/tokens';
import { getCollabHub } from '../collab';
import type { AppDeps } from '../context';
import { caughtMail, invitations, memberships, users } from '../db/schema';
import { conflict, notFound, parseInput } from '../http/errors';
import { idParam } from '../http/params';

const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

const userSummary = (u: typeof users.$inferSelect) => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  createdAt: u.createdAt.toISOString(),
});

const invitationSummary = (i: typeof invitations.$inferSelect) => ({
  id: i.id,
  email: i.email,
  name: i.name,
  role: i.role,
  expiresAt: i.expiresAt.toISOString(),
  acceptedAt: i.acceptedAt?.toISOString() ?? null,
  createdAt: i.createdAt.toISOString(),
});

/** Organisation administration: people, roles, invitations and the caught mail. Admins only. */
export function peopleRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const router = Router();
  router.use(['/users', '/invitations', '/mail'], requireRole('admin'));

  // The group directory (names and roles, no admin data) lets notebook owners add members.
  router.get('/people', requireRole('admin', 'supervisor', 'chemist'), async (_req, res) => {
    const rows = await db.select({ id: users.id, name: users.name, email: users.email, role: users.role }).from(users).orderBy(users.name);
    res.json(rows);
  });

  router.get('/users', async (_req, res) => {
    const rows = await db.select().from(users).orderBy(users.name);
    res.json(rows.map(userSummary));
  });

  router.patch('/users/:id', async (req, res) => {
    const id = idParam(req, 'id', 'Person');
    const { role } = parseInput(userRoleUpdateSchema, req.body);
    const admin = currentUser(res);
    if (id === admin.id && role !== 'admin') {
      throw conflict('last_admin_guard', 'You cannot remove your own admin role; ask another admin');
    }
    const [before] = await db.select().from(users).where(eq(users.id, id));
    if (!before) throw notFound('Person');
    const { after, readerIn } = await db.transaction(async (tx) => {
      const [updated] = await tx.update(users).set({ role }).where(eq(users.id, id)).returning();
      // Viewers can only be readers, so a demotion to viewer takes every membership down with it.
      const downgraded =
        role === 'viewer'
          ? await tx
              .update(memberships)
              .set({ role: 'reader' })
              .where(and(eq(memberships.userId, id), ne(memberships.role, 'reader')))
              .returning({ notebookId: memberships.notebookId })
          : [];
      return { after: updated, readerIn: downgraded.map((m) => m.notebookId) };
    });
    await getCollabHub(deps).refreshAccess({ userId: id });
    await recordAuditEvent(db, {
      type: 'user.role_changed',
      actor: admin,
      details: { userId: id, email: after.email, from: before.role, to: role, ...(readerIn.length ? { readerIn } : {}) },
    });
    res.json(userSummary(after));
  });

  router.get('/invitations', async (_req, res) => {
    const rows = await db.select().from(invitations).orderBy(desc(invitations.createdAt));
    res.json(rows.map(invitationSummary));
  });

  router.post('/invitations', async (req, res) => {
    const input = parseInput(invitationCreateSchema, req.body);
    const admin = currentUser(res);
    const [existing] = await db.select({ id: users.id }).from(users).where(eq(users.email, input.email));
    if (existing) throw conflict('account_exists', 'This person already has an account');
    const { token, tokenHash } = newToken();
    const [invitation] = await db
      .insert(invitations)
      .values({ ...input, tokenHash, invitedBy: admin.id, expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS) })
      .returning();
    const link = `${deps.config.publicUrl}/invite/${token}`;
    await deps.mailer.send({
      to: input.email,
      subject: `${admin.name} invited you to Quillane`,
      text: `Hello ${input.name},\n\n${admin.name} invited you to the group's Quillane notebooks as ${input.role}.\nOpen this link within 7 days to choose your password (it works once):\n\n${link}\n`,
    });
    await recordAuditEvent(db, { type: 'invitation.sent', actor: admin, details: { email: input.email, role: input.role } });
    res.status(201).json(invitationSummary(invitation));
  });

  router.get('/mail', async (_req, res) => {
    const rows = await db.select().from(caughtMail).orderBy(desc(caughtMail.receivedAt)).limit(200);
    res.json(rows.map((m) => ({ ...m, receivedAt: m.receivedAt.toISOString() })));
  });

  return router;
}
