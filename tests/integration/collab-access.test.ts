import { and, eq, gt } from 'drizzle-orm';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { collabUpdates, sessions } from '../../server/db/schema';
import { ApiClient, signedIn } from '../support/api';
import { collabUrl, connectCollab, serverCaughtUp, startCollabServer, upgradeStatus, waitFor, type CollabClient } from '../support/collab';
import { insertPasswordReset, signedInAs } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';
import { member, newPage } from '../support/signing';

// Access is decided at the upgrade and then again whenever it may have changed: membership and
// role routes and sign-out ask the collaboration hub to re-check the people concerned, and every
// connection's session is re-read periodically, so expiry is caught too. Close codes: 4401 the
// session ended, 4403 no longer a member (server/collab/room.ts).
// Sources: 21 CFR 11.10(d) and (g) (access limited to authorised people, checked by authority
// checks); OWASP Session Management Cheat Sheet, session expiration and invalidation on logout
// and password change (written from memory). 4401/4403 are private-use codes (RFC 6455 §7.4.2).

let server: TestServer;
let admin: ApiClient;
const open: CollabClient[] = [];

beforeAll(async () => {
  server = await startServer();
  admin = await signedIn(server.url, 'admin@saltmarsh.test');
});
afterEach(() => {
  for (const client of open.splice(0)) client.destroy();
});
afterAll(() => server.close());

/** A notebook of one's own: an owner and an editor, and one page. */
async function editingPair(on: TestServer = server) {
  const owner = await member(on, 'chemist', 'owner');
  const editor = await member(on, 'chemist', 'editor');
  const notebook = await owner.api.post('/api/notebooks', { title: 'Access changes while editing' });
  expect(notebook.status).toBe(201);
  const notebookId: string = notebook.body.id;
  expect((await owner.api.put(`/api/notebooks/${notebookId}/members`, { userId: editor.person.id, role: 'editor' })).status).toBe(200);
  return { owner, editor, notebookId, pageId: await newPage(owner.api, notebookId, 'Shared page') };
}

async function join(on: TestServer, api: ApiClient, pageId: string, cookie = api.sessionCookie): Promise<CollabClient> {
  const client = await connectCollab(on.url, pageId, cookie);
  open.push(client);
  return client;
}

/** The close code of the client's current connection (y-websocket then tries to reconnect). */
function closeCode(client: CollabClient): Promise<number> {
  return new Promise((resolve) => {
    client.provider.once('connection-close', (event: CloseEvent | null) => resolve(event?.code ?? 0));
  });
}

async function updatesBy(on: TestServer, pageId: string, userId: string, since: Date): Promise<number> {
  const rows = await on.deps.db
    .select({ id: collabUpdates.id })
    .from(collabUpdates)
    .where(and(eq(collabUpdates.pageId, pageId), eq(collabUpdates.userId, userId), gt(collabUpdates.receivedAt, since)));
  return rows.length;
}

function edit(client: CollabClient, text: string): void {
  client.root.insert(client.root.length, text);
}

/** The read-only list in the server's own awareness entry (the one with `page`), as a client sees it. */
function readOnlyAt(client: CollabClient): string[] | undefined {
  for (const state of client.provider.awareness.getStates().values()) if (state.page) return state.readOnlyUsers as string[];
  return undefined;
}

const sameList = (client: CollabClient, expected: string[]) => () => JSON.stringify(readOnlyAt(client)) === JSON.stringify(expected);

describe('membership and role changes reach open connections', () => {
  it('closes the connection of an editor removed from the notebook (4403); their later edits are neither stored nor relayed', async () => {
    const { owner, editor, notebookId, pageId } = await editingPair();
    const ownerClient = await join(server, owner.api, pageId);
    const editorClient = await join(server, editor.api, pageId);
    edit(editorClient, 'before removal; ');
    await waitFor(() => ownerClient.root.toString() === 'before removal; ', 'the edit before removal at the owner');

    const closed = closeCode(editorClient);
    const removedAt = new Date();
    expect((await owner.api.delete(`/api/notebooks/${notebookId}/members/${editor.person.id}`)).status).toBe(204);
    edit(editorClient, 'after removal');
    expect(await closed).toBe(4403);
    // 4400–4499 tells y-websocket not to reconnect (the editor shows the connection as closed).
    expect(editorClient.provider.shouldConnect).toBe(false);

    edit(ownerClient, 'owner goes on');
    const fresh = await join(server, owner.api, pageId);
    await waitFor(() => fresh.root.toString().includes('owner goes on'), 'the owner’s later edit at a new client');
    expect(fresh.root.toString()).toBe('before removal; owner goes on');
    expect(ownerClient.root.toString()).toBe('before removal; owner goes on');
    expect(await updatesBy(server, pageId, editor.person.id, removedAt)).toBe(0);
    // Reconnecting is refused as for any non-member.
    expect(await upgradeStatus(`${collabUrl(server.url)}/${pageId}`, { cookie: editor.api.sessionCookie })).toBe(404);
  });

  it('makes an editor demoted to reader read-only without closing; promoted again, they reconnect and catch up (4205)', async () => {
    const { owner, editor, notebookId, pageId } = await editingPair();
    const ownerClient = await join(server, owner.api, pageId);
    const editorClient = await join(server, editor.api, pageId);
    const codes: number[] = [];
    editorClient.provider.on('connection-close', (event: CloseEvent | null) => codes.push(event?.code ?? 0));

    const demotedAt = new Date();
    expect((await owner.api.put(`/api/notebooks/${notebookId}/members`, { userId: editor.person.id, role: 'reader' })).status).toBe(200);
    edit(editorClient, 'typed as a reader; ');
    await serverCaughtUp(editorClient);
    edit(ownerClient, 'owner text; ');
    // Still connected and still receiving: read-only, not cut off.
    await waitFor(() => editorClient.root.toString().includes('owner text; '), 'the owner’s edit at the demoted editor');
    expect(ownerClient.root.toString()).toBe('owner text; ');
    expect(await updatesBy(server, pageId, editor.person.id, demotedAt)).toBe(0);
    expect(codes).toEqual([]);

    // Its dropped edit is missing on the server, so later ones could not be applied in place: the
    // connection is closed and the client's reconnect sends its whole state, as after offline work.
    expect((await owner.api.put(`/api/notebooks/${notebookId}/members`, { userId: editor.person.id, role: 'editor' })).status).toBe(200);
    edit(editorClient, 'editor again');
    await waitFor(() => ownerClient.root.toString().includes('editor again'), 'the promoted editor’s edit at the owner');
    expect(codes).toEqual([4205]);
    expect(ownerClient.root.toString()).toContain('typed as a reader; ');
  });

  it('makes a reader who never typed writable in place when promoted', async () => {
    const { owner, editor, notebookId, pageId } = await editingPair();
    expect((await owner.api.put(`/api/notebooks/${notebookId}/members`, { userId: editor.person.id, role: 'reader' })).status).toBe(200);
    const ownerClient = await join(server, owner.api, pageId);
    const readerClient = await join(server, editor.api, pageId);
    let closes = 0;
    readerClient.provider.on('connection-close', () => (closes += 1));
    expect((await owner.api.put(`/api/notebooks/${notebookId}/members`, { userId: editor.person.id, role: 'editor' })).status).toBe(200);
    edit(readerClient, 'now an editor');
    await waitFor(() => ownerClient.root.toString() === 'now an editor', 'the promoted reader’s edit at the owner');
    expect(closes).toBe(0);
  });

  it('makes someone whose organisation role becomes viewer read-only', async () => {
    const { owner, editor, pageId } = await editingPair();
    const ownerClient = await join(server, owner.api, pageId);
    const editorClient = await join(server, editor.api, pageId);
    const demotedAt = new Date();
    expect((await admin.patch(`/api/users/${editor.person.id}`, { role: 'viewer' })).status).toBe(200);
    edit(editorClient, 'typed as a viewer');
    await serverCaughtUp(editorClient);
    edit(ownerClient, 'owner text');
    await waitFor(() => editorClient.root.toString().includes('owner text'), 'the owner’s edit at the viewer');
    expect(ownerClient.root.toString()).toBe('owner text');
    expect(await updatesBy(server, pageId, editor.person.id, demotedAt)).toBe(0);
  });

  it('announces who is read-only in the server’s awareness entry, so an open editor learns of a demotion at once', async () => {
    const { owner, editor, notebookId, pageId } = await editingPair();
    const ownerClient = await join(server, owner.api, pageId);
    const editorClient = await join(server, editor.api, pageId);
    await waitFor(sameList(editorClient, []), 'an empty read-only list at the editor');

    expect((await owner.api.put(`/api/notebooks/${notebookId}/members`, { userId: editor.person.id, role: 'reader' })).status).toBe(200);
    // The route answers after the hub decided, so the announcement is on its way by now.
    await waitFor(sameList(editorClient, [editor.person.id]), 'the demoted editor listed at their own client');
    await waitFor(sameList(ownerClient, [editor.person.id]), 'the demoted editor listed at the owner');

    expect((await owner.api.put(`/api/notebooks/${notebookId}/members`, { userId: editor.person.id, role: 'editor' })).status).toBe(200);
    await waitFor(sameList(editorClient, []), 'the promoted editor no longer listed');

    expect((await admin.patch(`/api/users/${editor.person.id}`, { role: 'viewer' })).status).toBe(200);
    await waitFor(sameList(editorClient, [editor.person.id]), 'the organisation viewer listed');
    // Someone who leaves is no longer listed.
    open.splice(open.indexOf(editorClient), 1);
    editorClient.destroy();
    await waitFor(sameList(ownerClient, []), 'the viewer gone from the list after leaving');
  });

  it('lists a reader from the moment they join', async () => {
    const { owner, editor, notebookId, pageId } = await editingPair();
    expect((await owner.api.put(`/api/notebooks/${notebookId}/members`, { userId: editor.person.id, role: 'reader' })).status).toBe(200);
    const ownerClient = await join(server, owner.api, pageId);
    await join(server, editor.api, pageId);
    await waitFor(sameList(ownerClient, [editor.person.id]), 'the reader listed');
  });

  it('leaves other people’s connections alone', async () => {
    const { owner, editor, notebookId, pageId } = await editingPair();
    const ownerClient = await join(server, owner.api, pageId);
    const editorClient = await join(server, editor.api, pageId);
    expect((await owner.api.put(`/api/notebooks/${notebookId}/members`, { userId: editor.person.id, role: 'reader' })).status).toBe(200);
    edit(ownerClient, 'the owner still writes');
    await waitFor(() => editorClient.root.toString() === 'the owner still writes', 'the owner’s edit relayed');
  });
});

describe('ended sessions close their connections (4401)', () => {
  it('closes the signed-out session’s connection, not the same person’s other session', async () => {
    const { owner, editor, pageId } = await editingPair();
    const otherSession = await signedInAs(server.url, editor.person);
    const ownerClient = await join(server, owner.api, pageId);
    const signingOut = await join(server, editor.api, pageId);
    const staying = await join(server, otherSession, pageId);
    const closed = closeCode(signingOut);
    const cookie = editor.api.sessionCookie;

    expect((await editor.api.post('/api/auth/sign-out')).status).toBe(204);
    expect(await closed).toBe(4401);
    expect(await upgradeStatus(`${collabUrl(server.url)}/${pageId}`, { cookie })).toBe(401);
    edit(staying, 'from the other session');
    await waitFor(() => ownerClient.root.toString() === 'from the other session', 'the other session’s edit');
  });

  it('closes every connection of someone whose password was reset', async () => {
    const { editor, pageId } = await editingPair();
    const secondSession = await signedInAs(server.url, editor.person);
    const first = await join(server, editor.api, pageId);
    const second = await join(server, secondSession, pageId);
    const closed = [closeCode(first), closeCode(second)];
    const token = await insertPasswordReset(server.deps, editor.person.id);
    const reset = await new ApiClient(server.url).post('/api/auth/password-reset/confirm', { token, password: 'a new long passphrase 42' });
    expect(reset.status).toBe(200);
    expect(await Promise.all(closed)).toEqual([4401, 4401]);
  });
});

describe('session expiry', () => {
  async function expire(on: TestServer, cookie: string): Promise<void> {
    const sessionId = cookie.split('=')[1];
    await on.deps.db.update(sessions).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(sessions.id, sessionId));
  }

  it('is caught before the next update is accepted once the last check is older than the interval', async () => {
    // No housekeeping tick within the test: only an arriving update can trigger the check.
    const short = await startCollabServer({ accessCheckMs: 100, tickMs: 60_000 });
    try {
      const { owner, editor, pageId } = await editingPair(short);
      const ownerClient = await join(short, owner.api, pageId);
      const editorClient = await join(short, editor.api, pageId);
      await new Promise((resolve) => setTimeout(resolve, 150));
      await expire(short, editor.api.sessionCookie);
      const closed = closeCode(editorClient);
      const expiredAt = new Date();
      edit(editorClient, 'after expiry');
      expect(await closed).toBe(4401);
      edit(ownerClient, 'owner text');
      const fresh = await join(short, owner.api, pageId);
      await waitFor(() => fresh.root.toString().includes('owner text'), 'the owner’s edit at a new client');
      expect(fresh.root.toString()).toBe('owner text');
      expect(await updatesBy(short, pageId, editor.person.id, expiredAt)).toBe(0);
    } finally {
      for (const client of open.splice(0)) client.destroy();
      await short.close();
    }
  });

  it('is caught by the periodic check on a connection that sends nothing', async () => {
    const short = await startCollabServer({ accessCheckMs: 100, tickMs: 100 });
    try {
      const { editor, pageId } = await editingPair(short);
      const idle = await join(short, editor.api, pageId);
      const closed = closeCode(idle);
      await expire(short, editor.api.sessionCookie);
      expect(await closed).toBe(4401);
    } finally {
      for (const client of open.splice(0)) client.destroy();
      await short.close();
    }
  });
});
