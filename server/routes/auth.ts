import { and, eq, gt, isNull } from 'drizzle-orm';
import { Router } from 'express';
import { passwordResetRequestSchema, setPasswordSchema, signInSchema } from '../../shared/schemas/auth';
import { recordAuditEvent } from '../audit/record';
import { currentUser } from '../auth/middleware';
import { hashPassword, verifyPassword } from '../auth/passwords';
import { startSession, toMe } from '../auth/sessions';
import { signInThrottle } from '../auth/throttle';
import { hashToken, newToken } from '../auth/tokens';
import { getCollabHub } from '../collab';
import type { AppDeps } from '../context';
import { invitations, passwordResets, users } from '../db/schema';
import { conflict, HttpError, notFound, parseInput } from '../http/errors';

const RESET_LIFETIME_MS = 60 * 60 * 1000;

export function authRoutes(deps: AppDeps): Router {
  const { db } = deps;
  const router = Router();

  router.post('/auth/sign-in', ...signInThrottle(deps.config), async (req, res) => {
    const input = parseInput(signInSchema, req.body);
    const [user] = await db.select().from(users).where(eq(users.email, input.email));
    if (!(await verifyPassword(user?.passwordHash ?? null, input.password)) || !user) {
      throw new HttpError(401, 'invalid_credentials', 'E-mail or password is not right');
    }
    await startSession(deps, res, user.id);
    res.json(toMe(user));
  });

  router.post('/auth/sign-out', async (_req, res) => {
    const user = currentUser(res);
    const session = res.locals.session;
    if (session) await deps.auth.invalidateSession(session.id);
    await getCollabHub(deps).refreshAccess({ userId: user.id });
    res.append('Set-Cookie', deps.auth.createBlankSessionCookie().serialize());
    res.status(204).end();
  });

  router.get('/me', (_req, res) => {
    res.json(toMe(currentUser(res)));
  });

  async function liveInvitation(token: string) {
    const [invitation] = await db
      .select()
      .from(invitations)
      .where(and(eq(invitations.tokenHash, hashToken(token)), isNull(invitations.acceptedAt), gt(invitations.expiresAt, new Date())));
    if (!invitation) throw notFound('This invitation (it may have been used already or expired)');
    return invitation;
  }

  router.get('/auth/invitations/:token', async (req, res) => {
    const invitation = await liveInvitation(req.params.token);
    res.json({ email: invitation.email, name: invitation.name, role: invitation.role });
  });

  router.post('/auth/accept-invitation', async (req, res) => {
    const input = parseInput(setPasswordSchema, req.body);
    const invitation = await liveInvitation(input.token);
    const passwordHash = await hashPassword(input.password);
    const user = await db.transaction(async (tx) => {
      // Single use: only the request that flips accepted_at goes on.
      const claimed = await tx
        .update(invitations)
        .set({ acceptedAt: new Date() })
        .where(and(eq(invitations.id, invitation.id), isNull(invitations.acceptedAt)))
        .returning();
      if (claimed.length === 0) throw notFound('This invitation (it may have been used already or expired)');
      const [existing] = await tx.select().from(users).where(eq(users.email, invitation.email));
      if (existing) throw conflict('account_exists', 'An account with this e-mail already exists; use password reset instead');
      const [created] = await tx
        .insert(users)
        .values({ email: invitation.email, name: input.name ?? invitation.name, role: invitation.role, passwordHash })
        .returning();
      return created;
    });
    await recordAuditEvent(db, { type: 'invitation.accepted', actor: user, details: { email: user.email, role: user.role } });
    await startSession(deps, res, user.id);
    res.json(toMe(user));
  });

  router.post('/auth/password-reset', async (req, res) => {
    const { email } = parseInput(passwordResetRequestSchema, req.body);
    const [user] = await db.select().from(users).where(eq(users.email, email));
    if (user?.passwordHash) {
      const { token, tokenHash } = newToken();
      await db.insert(passwordResets).values({ userId: user.id, tokenHash, expiresAt: new Date(Date.now() + RESET_LIFETIME_MS) });
      const link = `${deps.config.publicUrl}/reset/${token}`;
      await deps.mailer.send({
        to: user.email,
        subject: 'Choose a new Quillane password',
        text: `Hello ${user.name},\n\nSomeone (hopefully you) asked to reset your Quillane password.\nOpen this link within one hour to choose a new one:\n\n${link}\n\nIf it was not you, ignore this message; your password stays as it is.\n`,
      });
    }
    // The same answer either way, so the form does not reveal who has an account.
    res.status(202).json({ status: 'sent_if_known' });
  });

  router.post('/auth/password-reset/confirm', async (req, res) => {
    const input = parseInput(setPasswordSchema.omit({ name: true }), req.body);
    const passwordHash = await hashPassword(input.password);
    const user = await db.transaction(async (tx) => {
      const [reset] = await tx
        .update(passwordResets)
        .set({ usedAt: new Date() })
        .where(and(eq(passwordResets.tokenHash, hashToken(input.token)), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, new Date())))
        .returning();
      if (!reset) throw notFound('This reset link (it may have been used already or expired)');
      const [updated] = await tx.update(users).set({ passwordHash }).where(eq(users.id, reset.userId)).returning();
      return updated;
    });
    await deps.auth.invalidateUserSessions(user.id);
    await getCollabHub(deps).refreshAccess({ userId: user.id });
    await recordAuditEvent(db, { type: 'password.reset', actor: user });
    await startSession(deps, res, user.id);
    res.json(toMe(user));
  });

  return router;
}
