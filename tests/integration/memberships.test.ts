import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiClient } from '../support/api';
import { createPerson, signedInAs, type TestPerson } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';
import { newPage } from '../support/signing';

// Role rules from DESIGN.md and API.md: an organisation viewer is read-only everywhere and can only
// be a notebook reader; a reader of any organisation role cannot write. Every refused write is
// checked against the database afterwards: nothing changed.
// Outside sources: 21 CFR 11.10(g) (authority checks decide who may alter a record); OWASP
// Authorization Cheat Sheet, "Enforce Least Privileges" and "Validate the Permissions on Every
// Request" (a demotion takes effect at once, on existing sessions too).
let server: TestServer;
let owner: TestPerson;
let ownerApi: ApiClient;
let notebookId: string;
let pageId: string;

beforeAll(async () => {
  server = await startServer();
  owner = await createPerson(server.deps, 'chemist', 'members-owner');
  ownerApi = await signedInAs(server.url, owner);
  notebookId = (await ownerApi.post('/api/notebooks', { title: 'Membership rules' })).body.id;
  pageId = await newPage(ownerApi, notebookId, 'Original title');
});
afterAll(() => server.close());

const membershipOf = async (userId: string) =>
  (await server.deps.pool.query('select role from memberships where notebook_id = $1 and user_id = $2', [notebookId, userId])).rows[0]?.role ?? null;
const pageTitle = async () => (await server.deps.pool.query('select title from pages where id = $1', [pageId])).rows[0].title;
const pageCount = async () => Number((await server.deps.pool.query('select count(*) from pages where notebook_id = $1', [notebookId])).rows[0].count);

async function expectWritesRefused(api: ApiClient) {
  const pagesBefore = await pageCount();
  const created = await api.post(`/api/notebooks/${notebookId}/pages`, { title: 'Should not exist' });
  expect(created.status).toBe(403);
  expect(created.body.error.code).toBe('forbidden');
  expect(await pageCount()).toBe(pagesBefore);

  const retitled = await api.patch(`/api/pages/${pageId}`, { title: 'Should not stick' });
  expect(retitled.status).toBe(403);
  expect(await pageTitle()).toBe('Original title');

  const bystander = await createPerson(server.deps, 'chemist', 'members-bystander');
  expect((await api.put(`/api/notebooks/${notebookId}/members`, { userId: bystander.id, role: 'editor' })).status).toBe(403);
  expect(await membershipOf(bystander.id)).toBeNull();
  expect((await api.delete(`/api/notebooks/${notebookId}/members/${owner.id}`)).status).toBe(403);
  expect(await membershipOf(owner.id)).toBe('owner');
}

describe('viewers can only be readers', () => {
  for (const role of ['editor', 'owner'] as const) {
    it(`refuses to make a viewer ${role === 'editor' ? 'an editor' : 'an owner'} (422) and leaves the membership as it was`, async () => {
      const viewer = await createPerson(server.deps, 'viewer', 'members-viewer');
      expect((await ownerApi.put(`/api/notebooks/${notebookId}/members`, { userId: viewer.id, role: 'reader' })).status).toBe(200);
      const response = await ownerApi.put(`/api/notebooks/${notebookId}/members`, { userId: viewer.id, role });
      expect(response.status).toBe(422);
      expect(response.body.error.code).toBe('viewer_read_only');
      expect(await membershipOf(viewer.id)).toBe('reader');
    });
  }

  it('refuses it to an admin too', async () => {
    const admin = await signedInAs(server.url, await createPerson(server.deps, 'admin', 'members-admin'));
    const viewer = await createPerson(server.deps, 'viewer', 'members-viewer');
    expect((await admin.put(`/api/notebooks/${notebookId}/members`, { userId: viewer.id, role: 'editor' })).status).toBe(422);
    expect(await membershipOf(viewer.id)).toBeNull();
  });

  it('keeps a viewer read-only even if the database says editor', async () => {
    // Defence in depth: the organisation role decides, whatever a membership row says.
    const viewer = await createPerson(server.deps, 'viewer', 'members-viewer');
    await server.deps.pool.query("insert into memberships (notebook_id, user_id, role) values ($1, $2, 'editor')", [notebookId, viewer.id]);
    const api = await signedInAs(server.url, viewer);
    expect((await api.get(`/api/pages/${pageId}`)).body.access.canEdit).toBe(false);
    await expectWritesRefused(api);
  });

  it('turns an editor demoted to viewer into a reader everywhere', async () => {
    const admin = await signedInAs(server.url, await createPerson(server.deps, 'admin', 'members-admin'));
    const editor = await createPerson(server.deps, 'chemist', 'members-demoted');
    expect((await ownerApi.put(`/api/notebooks/${notebookId}/members`, { userId: editor.id, role: 'editor' })).status).toBe(200);
    expect((await admin.patch(`/api/users/${editor.id}`, { role: 'viewer' })).status).toBe(200);

    expect(await membershipOf(editor.id)).toBe('reader');
    const members = (await ownerApi.get(`/api/notebooks/${notebookId}/members`)).body as { userId: string; role: string }[];
    expect(members.find((m) => m.userId === editor.id)?.role).toBe('reader');
    await expectWritesRefused(await signedInAs(server.url, editor));
  });

  it('cannot let a viewer create notebooks of their own', async () => {
    const viewer = await signedInAs(server.url, await createPerson(server.deps, 'viewer', 'members-viewer'));
    const response = await viewer.post('/api/notebooks', { title: 'A viewer notebook' });
    expect(response.status).toBe(403);
    const { rows } = await server.deps.pool.query("select 1 from notebooks where title = 'A viewer notebook'");
    expect(rows).toHaveLength(0);
  });
});

describe('readers cannot write', () => {
  it('refuses a chemist who is a reader of this notebook', async () => {
    const reader = await createPerson(server.deps, 'chemist', 'members-reader');
    expect((await ownerApi.put(`/api/notebooks/${notebookId}/members`, { userId: reader.id, role: 'reader' })).status).toBe(200);
    await expectWritesRefused(await signedInAs(server.url, reader));
  });

  it('refuses a supervisor who is a reader of this notebook', async () => {
    const reader = await createPerson(server.deps, 'supervisor', 'members-reader');
    expect((await ownerApi.put(`/api/notebooks/${notebookId}/members`, { userId: reader.id, role: 'reader' })).status).toBe(200);
    await expectWritesRefused(await signedInAs(server.url, reader));
  });

  it('lets the same person write once made an editor (the refusals above can fail)', async () => {
    const person = await createPerson(server.deps, 'chemist', 'members-promoted');
    expect((await ownerApi.put(`/api/notebooks/${notebookId}/members`, { userId: person.id, role: 'reader' })).status).toBe(200);
    expect((await ownerApi.put(`/api/notebooks/${notebookId}/members`, { userId: person.id, role: 'editor' })).status).toBe(200);
    const api = await signedInAs(server.url, person);
    expect((await api.post(`/api/notebooks/${notebookId}/pages`, { title: 'Written by a new editor' })).status).toBe(201);
  });

  it('takes effect at once when an editor is removed', async () => {
    const person = await createPerson(server.deps, 'chemist', 'members-removed');
    await ownerApi.put(`/api/notebooks/${notebookId}/members`, { userId: person.id, role: 'editor' });
    const api = await signedInAs(server.url, person);
    expect((await ownerApi.delete(`/api/notebooks/${notebookId}/members/${person.id}`)).status).toBe(204);
    expect((await api.get(`/api/pages/${pageId}`)).status).toBe(404);
    expect((await api.post(`/api/notebooks/${notebookId}/pages`, { title: 'Too late' })).status).toBe(404);
  });
});

describe('organisation roles', () => {
  it('does not let an admin take away their own admin role', async () => {
    const person = await createPerson(server.deps, 'admin', 'members-self');
    const api = await signedInAs(server.url, person);
    const response = await api.patch(`/api/users/${person.id}`, { role: 'chemist' });
    expect(response.status).toBe(409);
    expect((await server.deps.pool.query('select role from users where id = $1', [person.id])).rows[0].role).toBe('admin');
  });

  it('applies a role change to the person’s existing session', async () => {
    const admin = await signedInAs(server.url, await createPerson(server.deps, 'admin', 'members-admin'));
    const person = await createPerson(server.deps, 'chemist', 'members-promote');
    const api = await signedInAs(server.url, person);
    expect((await api.get('/api/users')).status).toBe(403);
    expect((await admin.patch(`/api/users/${person.id}`, { role: 'admin' })).body.role).toBe('admin');
    expect((await api.get('/api/me')).body.role).toBe('admin');
    expect((await api.get('/api/users')).status).toBe(200);
  });
});
