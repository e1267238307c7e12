import { eq } from 'drizzle-orm';
import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { User } from 'lucia';
import { recordAuditEvent } from '../audit/record';
import { verifyPassword } from '../auth/passwords';
import type { AppDeps } from '../context';
import { users } from '../db/schema';
import { HttpError } from '../http/errors';

interface SigningContext {
  action: 'sign' | 'countersign' | 'addendum';
  notebookId: string;
  pageId: string;
}

/**
 * Re-entry of both signature components at each signing (21 CFR 11.200(a)(1): identification
 * code and password; we ask for both every time, also within one session, which is stricter than
 * 11.200(a)(1)(i) requires). The identity must be the signed-in person's own (11.100(a): a
 * signature belongs to one individual; 11.200(a)(2): used only by its owner), so nobody can
 * sign for someone else. Each refusal is written to the audit trail (11.300(d): attempts at
 * unauthorised use are recorded and can be reported).
 */
export async function confirmSigner(
  deps: AppDeps,
  user: User,
  typed: { email: string; password: string },
  context: SigningContext,
): Promise<void> {
  const fail = async (reason: string) =>
    recordAuditEvent(deps.db, {
      type: 'signature.failed',
      actor: user,
      notebookId: context.notebookId,
      pageId: context.pageId,
      details: { action: context.action, reason },
    });
  if (typed.email !== user.email.toLowerCase()) {
    await fail('identity_mismatch');
    throw new HttpError(403, 'not_your_identity', 'You can only sign as yourself: enter the e-mail address you are signed in with');
  }
  const [row] = await deps.db.select({ passwordHash: users.passwordHash }).from(users).where(eq(users.id, user.id));
  if (!(await verifyPassword(row?.passwordHash ?? null, typed.password))) {
    await fail('wrong_password');
    throw new HttpError(401, 'signature_rejected', 'The password is not right; nothing was signed');
  }
}

/**
 * Limits failed signature attempts per person (21 CFR 11.300(d)); only wrong passwords count,
 * so role refusals and successful signings do not use up the allowance.
 */
export function signingThrottle(deps: AppDeps): RequestHandler {
  const { SIGN_IN_MAX_ATTEMPTS: limit, SIGN_IN_WINDOW_SECONDS: windowSeconds } = deps.config;
  return rateLimit({
    windowMs: windowSeconds * 1000,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (_req, res) => `signer:${res.locals.user?.id ?? 'anonymous'}`,
    requestWasSuccessful: (_req, res) => res.statusCode !== 401,
    skipSuccessfulRequests: true,
    handler: (_req, _res, next) =>
      next(new HttpError(429, 'too_many_attempts', `Too many wrong signature passwords. Try again in about ${Math.ceil(windowSeconds / 60)} minutes.`)),
  });
}
