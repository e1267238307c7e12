import type http from 'node:http';
import type { Duplex } from 'node:stream';
import { WebSocketServer } from 'ws';
import type { AppDeps } from '../context';
import { HttpError } from '../http/errors';
import { CollabHub } from './hub';
import { authorizeUpgrade, collabPageId, refuseUpgrade } from './upgrade';
import { defaultTimings, type CollabTimings } from './timings';

export { CollabHub, type PageContent } from './hub';
export { CLOSE_ACCESS_REVOKED, CLOSE_SESSION_ENDED, type ServerAwarenessState } from './room';
export type { CollabTimings } from './timings';

/** Largest websocket message accepted: a page with many embedded molfiles stays well below. */
const MAX_MESSAGE_BYTES = 16 * 1024 * 1024;

/** One hub per set of dependencies (one per server process; one per test server). */
const hubs = new WeakMap<AppDeps, CollabHub>();

/**
 * The collaboration hub of these dependencies, for features that need it from a route (signing
 * locks pages, takes snapshots and reads content). Created on first use, shared with attachCollab.
 */
export function getCollabHub(deps: AppDeps, timings: Partial<CollabTimings> = {}): CollabHub {
  let hub = hubs.get(deps);
  if (!hub) {
    hub = new CollabHub(deps.db, { ...defaultTimings, ...timings });
    hubs.set(deps, hub);
  }
  return hub;
}

/**
 * Serves Yjs sync and awareness at `/collab/:pageId` on the app's HTTP server. Upgrades for other
 * paths are left to other listeners.
 */
export function attachCollab(
  server: http.Server,
  deps: AppDeps,
  timings: Partial<CollabTimings> = {},
): { close(): Promise<void>; hub: CollabHub } {
  const hub = getCollabHub(deps, timings);
  const wss = new WebSocketServer({ noServer: true, maxPayload: MAX_MESSAGE_BYTES });

  const onUpgrade = (req: http.IncomingMessage, socket: Duplex, head: Buffer) => {
    const pageId = collabPageId(req.url);
    if (pageId === null) return;
    socket.on('error', () => socket.destroy());
    void accept(req, socket, head, pageId);
  };

  async function accept(req: http.IncomingMessage, socket: Duplex, head: Buffer, pageId: string) {
    try {
      const epoch = hub.accessEpoch;
      const checkedAt = Date.now();
      const grant = await authorizeUpgrade(deps, req, pageId);
      const room = await hub.acquire(grant.pageId);
      try {
        // The database is the truth for the lock (signing sets pages.locked before telling us).
        if (grant.access.page.locked !== room.isLocked) await room.setLocked(grant.access.page.locked);
        if (socket.destroyed) return;
        await new Promise<void>((resolve) => {
          // A failed handshake never calls back; the socket closing ends the wait then.
          socket.once('close', () => resolve());
          wss.handleUpgrade(req, socket, head, (ws) => {
            const user = { id: grant.user.id, name: grant.user.name };
            const conn = room.join(ws, { user, sessionId: grant.sessionId, canWrite: grant.access.canWrite }, checkedAt);
            // Access changed while this upgrade was being decided: decide again.
            if (hub.accessEpoch !== epoch) void room.refreshAccess((c) => c === conn);
            resolve();
          });
        });
      } finally {
        room.release();
      }
    } catch (error) {
      if (error instanceof HttpError) return refuseUpgrade(socket, error);
      console.error('[collab] upgrade failed:', error);
      refuseUpgrade(socket, new HttpError(503, 'unavailable', 'The page could not be opened for editing; try again'));
    }
  }

  server.on('upgrade', onUpgrade);
  return {
    hub,
    async close() {
      server.off('upgrade', onUpgrade);
      for (const client of wss.clients) client.terminate();
      await hub.close();
      await new Promise<void>((resolve) => wss.close(() => resolve()));
    },
  };
}
