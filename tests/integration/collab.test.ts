import { and, eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { getCollabHub } from '../../server/collab';
import { collabUpdates, pages, users } from '../../server/db/schema';
import { signedIn, type ApiClient } from '../support/api';
import { collabUrl, connectCollab, serverCaughtUp, upgradeStatus, waitFor, type CollabClient } from '../support/collab';
import { demoNotebookFrame } from '../support/collabFrame';
import { startServer, type TestServer } from '../support/server';

const frame = demoNotebookFrame(startServer);
const { newPage, join } = frame;
let server: TestServer;
let chemist: ApiClient;
let chemist2: ApiClient;
let viewer: ApiClient;

beforeAll(async () => {
  ({ server, chemist } = frame);
  // chemist@ owns the demo notebook, chemist2@ edits, viewer@ reads (see server/seed/demo.ts).
  chemist2 = await signedIn(server.url, 'chemist2@saltmarsh.test');
  viewer = await signedIn(server.url, 'viewer@saltmarsh.test');
});

async function userId(email: string): Promise<string> {
  const [row] = await server.deps.db.select({ id: users.id }).from(users).where(eq(users.email, email));
  return row.id;
}

describe('collaboration websocket: editing together', () => {
  it('two editors on one page converge', async () => {
    const pageId = await newPage('Converging edits');
    const a = await join(chemist, pageId);
    const b = await join(chemist2, pageId);
    a.root.insert(0, 'Esterify isoamyl alcohol. ');
    b.root.insert(0, 'Reflux 2 h. ');
    await waitFor(() => a.root.toString() === b.root.toString() && a.root.length > 30, 'both texts in both documents');
    expect(a.root.toString()).toContain('Esterify isoamyl alcohol.');
    expect(a.root.toString()).toContain('Reflux 2 h.');
  });

  it('a client joining later receives the full state', async () => {
    const pageId = await newPage('Late joiner');
    const a = await join(chemist, pageId);
    const b = await join(chemist2, pageId);
    a.root.insert(0, 'first line; ');
    await waitFor(() => b.root.toString() === 'first line; ', 'the first edit at b');
    b.root.insert(b.root.length, 'second line');
    await waitFor(() => a.root.toString() === 'first line; second line', 'the second edit at a');
    const c = await join(chemist, pageId);
    expect(c.root.toString()).toBe('first line; second line');
  });

  // 21 CFR 11.10(g): authority checks, so only authorised people can alter a record.
  it("drops a reader's updates: never relayed, never stored", async () => {
    const pageId = await newPage('Reader tries to type');
    const editor = await join(chemist, pageId);
    const reader = await join(viewer, pageId);
    editor.root.insert(0, 'written by the owner');
    await waitFor(() => reader.root.toString() === 'written by the owner', 'the owner’s text at the reader');

    reader.root.insert(0, 'READER WAS HERE ');
    await serverCaughtUp(reader);
    await getCollabHub(server.deps).currentContent(pageId); // every accepted update is stored by now
    editor.root.insert(editor.root.length, '.');
    await waitFor(() => reader.root.toString().endsWith('.'), 'a later edit at the reader');

    expect(editor.root.toString()).toBe('written by the owner.');
    const viewerId = await userId('viewer@saltmarsh.test');
    const stored = await server.deps.db
      .select({ id: collabUpdates.id })
      .from(collabUpdates)
      .where(and(eq(collabUpdates.pageId, pageId), eq(collabUpdates.userId, viewerId)));
    expect(stored).toEqual([]);
    const fresh = await join(chemist2, pageId);
    expect(fresh.root.toString()).toBe('written by the owner.');
  });

  it('a reader still shares presence (awareness)', async () => {
    const pageId = await newPage('Presence of a reader');
    const editor = await join(chemist, pageId);
    const reader = await join(viewer, pageId);
    reader.provider.awareness.setLocalStateField('user', { name: 'Viewer', color: '#336699' });
    await waitFor(
      () => [...editor.provider.awareness.getStates().values()].some((s) => s.user?.name === 'Viewer'),
      'the reader’s presence at the editor',
    );
  });

  // 21 CFR 11.10(e) and 11.70: a signed record does not change without trace (changes go to addenda).
  it('a locked page refuses updates from everyone and tells the clients', async () => {
    const pageId = await newPage('Locked for signing');
    const owner = await join(chemist, pageId);
    const other = await join(chemist2, pageId);
    owner.root.insert(0, 'final text');
    await waitFor(() => other.root.toString() === 'final text', 'the text before locking');

    await server.deps.db.update(pages).set({ locked: true }).where(eq(pages.id, pageId));
    await getCollabHub(server.deps).setPageLocked(pageId, true);
    const lockedSeen = (client: CollabClient) =>
      [...client.provider.awareness.getStates().values()].some((s) => s.page?.locked === true);
    await waitFor(() => lockedSeen(owner) && lockedSeen(other), 'the lock announced to both clients');

    owner.root.insert(0, 'late change by the owner ');
    other.root.insert(0, 'late change by an editor ');
    await serverCaughtUp(owner);
    await serverCaughtUp(other);
    const afterLock = await join(chemist, pageId);
    expect(afterLock.root.toString()).toBe('final text');
    expect(lockedSeen(afterLock)).toBe(true);
    afterLock.root.insert(0, 'joined after the lock ');
    await serverCaughtUp(afterLock);
    expect((await getCollabHub(server.deps).currentContent(pageId)).json).toBeTruthy();
    const fresh = await join(chemist2, pageId);
    expect(fresh.root.toString()).toBe('final text');

    // Returned to the author: accepted again.
    await server.deps.db.update(pages).set({ locked: false }).where(eq(pages.id, pageId));
    await getCollabHub(server.deps).setPageLocked(pageId, false);
    fresh.root.delete(0, fresh.root.length);
    fresh.root.insert(0, 'revised');
    await waitFor(() => afterLock.root.toString().includes('revised'), 'an edit after unlocking');
  });
});

// RFC 6455 §4.2.2: a server may refuse the opening handshake with an ordinary HTTP status; the
// statuses are RFC 9110's (401 no session, 403 refused, 404 hidden as elsewhere in the API).
// OWASP WebSocket Security Cheat Sheet: check the Origin header against cross-site WebSocket hijacking.
describe('collaboration websocket: refusals', () => {
  it('refuses an upgrade without a session (401)', async () => {
    const pageId = await newPage('No session');
    expect(await upgradeStatus(`${collabUrl(server.url)}/${pageId}`, {})).toBe(401);
    expect(await upgradeStatus(`${collabUrl(server.url)}/${pageId}`, { cookie: 'quillane_session=not-a-session' })).toBe(401);
  });

  it('refuses a signed-in person who is not a member (404), and unknown or malformed page ids', async () => {
    const own = await chemist2.post('/api/notebooks', { title: 'Private side project' });
    expect(own.status).toBe(201);
    const page = await chemist2.post(`/api/notebooks/${own.body.id}/pages`, { title: 'Not for others' });
    expect(page.status).toBe(201);
    const cookie = chemist.sessionCookie;
    expect(await upgradeStatus(`${collabUrl(server.url)}/${page.body.id}`, { cookie })).toBe(404);
    expect(await upgradeStatus(`${collabUrl(server.url)}/00000000-0000-4000-8000-000000000000`, { cookie })).toBe(404);
    expect(await upgradeStatus(`${collabUrl(server.url)}/not-a-page`, { cookie })).toBe(404);
    expect(await upgradeStatus(`${collabUrl(server.url)}/${page.body.id}`, { cookie: chemist2.sessionCookie })).toBe(101);
  });

  it('refuses an upgrade from another site even with a valid cookie (403)', async () => {
    const pageId = await newPage('Cross-site attempt');
    const headers = { cookie: chemist.sessionCookie, origin: 'https://elsewhere.example' };
    expect(await upgradeStatus(`${collabUrl(server.url)}/${pageId}`, headers)).toBe(403);
    expect(await upgradeStatus(`${collabUrl(server.url)}/${pageId}`, { ...headers, origin: server.url })).toBe(101);
  });

  it('closes a connection that sends a malformed update, storing nothing', async () => {
    const pageId = await newPage('Garbage in');
    const client = await join(chemist, pageId);
    const ws = client.provider.ws as unknown as import('ws').WebSocket;
    const closed = new Promise<number>((resolve) => ws.on('close', (code) => resolve(code)));
    client.provider.shouldConnect = false;
    ws.send(Uint8Array.of(0, 2, 5, 1, 2, 3, 4, 5));
    expect(await closed).toBe(4400);
    await getCollabHub(server.deps).currentContent(pageId);
    const stored = await server.deps.db.select({ userId: collabUpdates.userId }).from(collabUpdates).where(eq(collabUpdates.pageId, pageId));
    // Only the server's first paragraph, no update from a client.
    expect(stored).toEqual([{ userId: null }]);
  });
});

describe('collaboration persistence', () => {
  it('keeps the state across a server restart', async () => {
    const pageId = await newPage('Survives a restart');
    const first = await startServer();
    const cookie = (await signedIn(first.url, 'chemist@saltmarsh.test')).sessionCookie;
    const writer = await connectCollab(first.url, pageId, cookie);
    writer.root.insert(0, 'Yield 4.2 g (81 %).');
    const observer = await connectCollab(first.url, pageId, cookie);
    await waitFor(() => observer.root.toString() === 'Yield 4.2 g (81 %).', 'the edit relayed');
    writer.destroy();
    observer.destroy();
    await first.close();

    const second = await startServer();
    try {
      const reader = await connectCollab(second.url, pageId, cookie);
      expect(reader.root.toString()).toBe('Yield 4.2 g (81 %).');
      reader.destroy();
    } finally {
      await second.close();
    }
  });

  // RULES.md: nothing acknowledged is ever lost; storing before relaying is common practice, no source.
  it('stores each accepted update before relaying it', async () => {
    const pageId = await newPage('Stored before relayed');
    const writer = await join(chemist, pageId);
    const observer = await join(chemist2, pageId);
    writer.root.insert(0, 'x');
    await waitFor(() => observer.root.toString() === 'x', 'the relayed update');
    // The relay is the acknowledgement: by the time anyone sees the update, its row exists.
    const rows = await server.deps.db.select().from(collabUpdates).where(eq(collabUpdates.pageId, pageId)).orderBy(collabUpdates.id);
    const stored = new Y.Doc();
    for (const row of rows) Y.applyUpdate(stored, row.update);
    expect(stored.get('root', Y.XmlText).toString()).toBe('x');
    // The first row is the server's first paragraph (no author); every client update has one.
    expect(rows.map((r) => r.userId !== null)).toEqual([false, true]);
  });
});
