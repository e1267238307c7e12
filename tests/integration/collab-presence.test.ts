import { eq } from 'drizzle-orm';
import * as encoding from 'lib0/encoding';
import { beforeAll, describe, expect, it } from 'vitest';
import { WebSocket } from 'ws';
import { getCollabHub } from '../../server/collab';
import { pages } from '../../server/db/schema';
import { signedIn, type ApiClient } from '../support/api';
import { collabUrl, eventually, serverCaughtUp, waitFor, type CollabClient } from '../support/collab';
import { demoNotebookFrame } from '../support/collabFrame';
import { startServer } from '../support/server';

// Presence (Yjs awareness) is relayed by the server, but each connection may only set the entry it
// introduced itself with: not another person's, and never the server's own (the page lock).

const frame = demoNotebookFrame(startServer);
const { newPage, join } = frame;
let chemist2: ApiClient;
let supervisor: ApiClient;

beforeAll(async () => {
  chemist2 = await signedIn(frame.server.url, 'chemist2@saltmarsh.test');
  supervisor = await signedIn(frame.server.url, 'supervisor@saltmarsh.test');
});

/**
 * A raw awareness message as y-protocols lays it out (message type 1, then the update: count, and
 * per entry client id, clock and the state as JSON), written by hand so it can claim any id.
 */
function awarenessMessage(clientId: number, clock: number, state: unknown): Uint8Array {
  const update = encoding.createEncoder();
  encoding.writeVarUint(update, 1);
  encoding.writeVarUint(update, clientId);
  encoding.writeVarUint(update, clock);
  encoding.writeVarString(update, JSON.stringify(state));
  const message = encoding.createEncoder();
  encoding.writeVarUint(message, 1);
  encoding.writeVarUint8Array(message, encoding.toUint8Array(update));
  return encoding.toUint8Array(message);
}

/** A bare websocket on a page, for messages a y-websocket provider would not send. */
async function rawConnection(api: ApiClient, pageId: string) {
  const ws = new WebSocket(`${collabUrl(frame.server.url)}/${pageId}`, { headers: { cookie: api.sessionCookie } });
  await new Promise((resolve, reject) => {
    ws.once('open', resolve);
    ws.once('error', reject);
  });
  return {
    send: (message: Uint8Array) => ws.send(message),
    /** Asks for everyone's presence; the answer comes after everything sent before it is handled. */
    caughtUp: () =>
      new Promise<void>((resolve) => {
        const onMessage = (data: Buffer) => {
          if (data[0] !== 1) return;
          ws.off('message', onMessage);
          resolve();
        };
        ws.on('message', onMessage);
        ws.send(Uint8Array.of(3));
      }),
    close: () => ws.close(),
  };
}

function sendRaw(client: CollabClient, message: Uint8Array): void {
  (client.provider.ws as unknown as WebSocket).send(message);
}

function stateAt(observer: CollabClient, clientId: number): Record<string, any> | undefined {
  return observer.provider.awareness.getStates().get(clientId);
}

function clockAt(observer: CollabClient, clientId: number): number {
  return observer.provider.awareness.meta.get(clientId)?.clock ?? 0;
}

/** The server has handled what `sender` sent, and `observer` has received what that caused. */
async function settled(sender: CollabClient, observer: CollabClient): Promise<void> {
  await serverCaughtUp(sender);
  await serverCaughtUp(observer);
}

/** Three people on one page, each announcing their name, all seen by the observer. */
async function threeOnAPage(title: string) {
  const pageId = await newPage(title);
  const victim = await join(frame.chemist, pageId);
  const intruder = await join(chemist2, pageId);
  const observer = await join(supervisor, pageId);
  victim.provider.awareness.setLocalStateField('user', { name: 'Chemist', color: '#2a7f62' });
  intruder.provider.awareness.setLocalStateField('user', { name: 'Chemist Two', color: '#8a4fbf' });
  await waitFor(
    () => stateAt(observer, victim.doc.clientID)?.user?.name === 'Chemist' && stateAt(observer, intruder.doc.clientID)?.user?.name === 'Chemist Two',
    'both names at the observer',
  );
  return { pageId, victim, intruder, observer };
}

describe('presence cannot be spoofed', () => {
  it('drops an update to another connection’s entry, and its removal', async () => {
    const { victim, intruder, observer } = await threeOnAPage('Presence overwrite');
    const id = victim.doc.clientID;
    sendRaw(intruder, awarenessMessage(id, clockAt(observer, id) + 10, { user: { name: 'Chemist', color: '#000000' }, focusing: true, anchorPos: null }));
    sendRaw(intruder, awarenessMessage(id, clockAt(observer, id) + 20, null));
    await settled(intruder, observer);
    expect(stateAt(observer, id)?.user).toEqual({ name: 'Chemist', color: '#2a7f62' });

    // The intruder's own presence still flows, and so does the victim's next change.
    intruder.provider.awareness.setLocalStateField('user', { name: 'Chemist Two', color: '#123456' });
    victim.provider.awareness.setLocalStateField('user', { name: 'Chemist', color: '#654321' });
    await waitFor(
      () => stateAt(observer, intruder.doc.clientID)?.user?.color === '#123456' && stateAt(observer, id)?.user?.color === '#654321',
      'both genuine changes at the observer',
    );
  });

  it('shows the signed-in name beside a cursor, whatever name the client claims', async () => {
    const { victim, intruder, observer } = await threeOnAPage('Presence impersonation');
    // The editor's cursor label is the top-level `name` field of its presence state.
    intruder.provider.awareness.setLocalStateField('name', 'Imke Sallow');
    victim.provider.awareness.setLocalStateField('name', 'Imke Sallow');
    await waitFor(
      () => stateAt(observer, intruder.doc.clientID)?.name !== undefined && stateAt(observer, victim.doc.clientID)?.name !== undefined,
      'both cursor names at the observer',
    );
    // chemist2@ is Rafe Mossgiel and chemist@ is Imke Sallow in the demo group (server/seed/demoPeople.ts).
    expect(stateAt(observer, intruder.doc.clientID)?.name).toBe('Rafe Mossgiel');
    expect(stateAt(observer, victim.doc.clientID)?.name).toBe('Imke Sallow');
  });

  it('drops entries a connection invents beyond the one it introduced itself with', async () => {
    const { intruder, observer } = await threeOnAPage('Presence invented');
    const invented = 424242;
    sendRaw(intruder, awarenessMessage(invented, 1, { user: { name: 'Guest reviewer', color: '#ff0000' } }));
    await settled(intruder, observer);
    expect(stateAt(observer, invented)).toBeUndefined();
  });

  it('never lets a client overwrite the server’s entry (the page lock)', async () => {
    const { pageId, intruder, observer } = await threeOnAPage('Presence lock');
    await frame.server.deps.db.update(pages).set({ locked: true }).where(eq(pages.id, pageId));
    await getCollabHub(frame.server.deps).setPageLocked(pageId, true);
    const serverId = [...observer.provider.awareness.getStates()].find(([, state]) => state.page)?.[0];
    expect(serverId).toBeDefined();
    await waitFor(() => stateAt(observer, serverId!)?.page?.locked === true, 'the lock at the observer');

    sendRaw(intruder, awarenessMessage(serverId!, clockAt(observer, serverId!) + 10, { page: { locked: false } }));
    sendRaw(intruder, awarenessMessage(serverId!, clockAt(observer, serverId!) + 20, null));
    await settled(intruder, observer);
    // Everyone on the page writes (chemist@, chemist2@, supervisor@), so nobody is listed read-only.
    expect(stateAt(observer, serverId!)).toEqual({ page: { locked: true }, readOnlyUsers: [] });
    const later = await join(frame.chemist, pageId);
    expect(stateAt(later, serverId!)).toEqual({ page: { locked: true }, readOnlyUsers: [] });
  });

  it('lets the same person’s new connection take over their entry (a reconnect the old socket has not noticed)', async () => {
    const { pageId, victim, observer } = await threeOnAPage('Presence reconnect');
    const id = victim.doc.clientID;
    // The same browser document on a new socket introduces itself with the same client id.
    const reconnected = await rawConnection(frame.chemist, pageId);
    reconnected.send(awarenessMessage(id, clockAt(observer, id) + 1, { user: { name: 'Chemist', color: '#0000aa' } }));
    await reconnected.caughtUp();
    await serverCaughtUp(observer);
    expect(stateAt(observer, id)?.user?.color).toBe('#0000aa');

    // The old connection ending does not take the entry with it; it belongs to the new one now.
    victim.provider.disconnect();
    const hub = getCollabHub(frame.server.deps);
    await eventually(() => hub.withRoom(pageId, async (room) => room.connectionCount), (n) => n === 3, 'the old connection gone at the server');
    await serverCaughtUp(observer);
    expect(stateAt(observer, id)?.user?.color).toBe('#0000aa');
    reconnected.close();
  });

  it('does not let another person take over an entry that way', async () => {
    const { pageId, victim, observer } = await threeOnAPage('Presence taken over');
    const id = victim.doc.clientID;
    const other = await rawConnection(chemist2, pageId);
    other.send(awarenessMessage(id, clockAt(observer, id) + 1, { user: { name: 'Chemist', color: '#0000aa' } }));
    await other.caughtUp();
    await serverCaughtUp(observer);
    expect(stateAt(observer, id)?.user?.color).toBe('#2a7f62');
    other.close();
  });
});
