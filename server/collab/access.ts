import { and, eq, gt } from 'drizzle-orm';
import { pageAccess } from '../auth/access';
import type { Database } from '../db/client';
import { sessions, users } from '../db/schema';
import { HttpError } from '../http/errors';

/** What an open connection may do now: keep editing or reading, or be closed and why. */
export type AccessVerdict = { kind: 'open'; canWrite: boolean } | { kind: 'session-ended' } | { kind: 'revoked' };

/**
 * Decides again, from the database as it is now, what the holder of `sessionId` may do on a page:
 * the session must still exist and be unexpired, and its user (with their current organisation
 * role) must still be a member. The session is only read, never extended: an open editor alone
 * does not keep someone signed in.
 */
export async function checkConnectionAccess(db: Database, sessionId: string, pageId: string): Promise<AccessVerdict> {
  const [user] = await db
    .select({ id: users.id, email: users.email, name: users.name, role: users.role })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(and(eq(sessions.id, sessionId), gt(sessions.expiresAt, new Date())));
  if (!user) return { kind: 'session-ended' };
  try {
    const access = await pageAccess(db, user, pageId);
    return { kind: 'open', canWrite: access.canWrite };
  } catch (error) {
    if (error instanceof HttpError && error.status === 404) return { kind: 'revoked' };
    throw error;
  }
}
