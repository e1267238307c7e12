import type http from 'node:http';
import type { Duplex } from 'node:stream';
import type { User } from 'lucia';
import { pageAccess, type PageAccess } from '../auth/access';
import type { AppDeps } from '../context';
import { errorBody, HttpError, notSignedIn } from '../http/errors';
import { idFrom } from '../http/params';

const COLLAB_PATH = /^\/collab\/([^/?#]+)\/?(?:[?#].*)?$/;

export interface UpgradeGrant {
  pageId: string;
  sessionId: string;
  user: User;
  access: PageAccess;
}

/** The page id of a collaboration URL, or null when the upgrade is meant for someone else. */
export function collabPageId(url: string | undefined): string | null {
  const match = COLLAB_PATH.exec(url ?? '');
  return match ? decodeURIComponent(match[1]) : null;
}

/**
 * Decides an upgrade before the websocket handshake: our own origin (a browser on another site
 * must not ride the cookie), a valid session (else 401) and membership of the page's notebook
 * (else 404, as the API does). Throws HttpError for the refusal to send.
 */
export async function authorizeUpgrade(deps: AppDeps, req: http.IncomingMessage, pageId: string): Promise<UpgradeGrant> {
  const id = idFrom(pageId, 'Page');
  const origin = req.headers.origin;
  if (origin && !allowedOrigin(deps, req, origin)) {
    throw new HttpError(403, 'bad_origin', 'This connection did not come from the Quillane app (Origin check failed)');
  }
  const sessionId = deps.auth.readSessionCookie(req.headers.cookie ?? '');
  const { user, session } = sessionId ? await deps.auth.validateSession(sessionId) : { user: null, session: null };
  if (!user || !session) throw notSignedIn();
  const access = await pageAccess(deps.db, user, id);
  return { pageId: access.page.id, sessionId: session.id, user, access };
}

function allowedOrigin(deps: AppDeps, req: http.IncomingMessage, origin: string): boolean {
  if (origin === new URL(deps.config.publicUrl).origin) return true;
  return Boolean(req.headers.host) && (origin === `http://${req.headers.host}` || origin === `https://${req.headers.host}`);
}

/** Answers a refused upgrade with a plain HTTP response in the API's error shape, then hangs up. */
export function refuseUpgrade(socket: Duplex, error: HttpError): void {
  const body = JSON.stringify(errorBody(error));
  const reason = { 401: 'Unauthorized', 403: 'Forbidden', 404: 'Not Found', 503: 'Service Unavailable' }[error.status] ?? 'Error';
  socket.end(
    `HTTP/1.1 ${error.status} ${reason}\r\n` +
      'Connection: close\r\n' +
      'Content-Type: application/json; charset=utf-8\r\n' +
      `Content-Length: ${Buffer.byteLength(body)}\r\n\r\n` +
      body,
  );
}
