import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiClient } from '../support/api';
import { createPerson, signedInAs } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';
import { newPage } from '../support/signing';

// A signed page is locked: no edits at all, only addenda (21 CFR 11.10(e) and 11.70 — a signed
// record must not change without trace). The lock is set here with SQL, as the signing flow does.
let server: TestServer;
let owner: ApiClient;
let pageId: string;

beforeAll(async () => {
  server = await startServer();
  owner = await signedInAs(server.url, await createPerson(server.deps, 'chemist', 'lock-owner'));
  const notebookId = (await owner.post('/api/notebooks', { title: 'Locks' })).body.id;
  pageId = await newPage(owner, notebookId, 'Signed record');
  await server.deps.pool.query('update pages set locked = true where id = $1', [pageId]);
});
afterAll(() => server.close());

describe('locked pages', () => {
  it('refuses a retitle with 409 page_locked and keeps the title and timestamp', async () => {
    const before = (await server.deps.pool.query('select title, updated_at from pages where id = $1', [pageId])).rows[0];
    const response = await owner.patch(`/api/pages/${pageId}`, { title: 'Changed after signing' });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('page_locked');
    expect((await server.deps.pool.query('select title, updated_at from pages where id = $1', [pageId])).rows[0]).toEqual(before);
  });

  it('tells the author they cannot edit it', async () => {
    const detail = (await owner.get(`/api/pages/${pageId}`)).body;
    expect(detail).toMatchObject({ locked: true, access: { canEdit: false, role: 'owner' } });
  });

  it('refuses an admin too', async () => {
    const admin = await signedInAs(server.url, await createPerson(server.deps, 'admin', 'lock-admin'));
    expect((await admin.patch(`/api/pages/${pageId}`, { title: 'Admin override' })).status).toBe(409);
  });
});
