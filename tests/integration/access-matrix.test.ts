import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, type ApiResponse } from '../support/api';
import { createPerson, insertInvitation, insertPasswordReset, signedInAs, uniqueEmail, type TestPerson } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';
import { newPage } from '../support/signing';

// Every route of /work/notes/API.md tried by every kind of caller. The expected statuses are the
// table in API.md and the role meanings in DESIGN.md; "non-members get 404, not 403" hides which
// notebooks exist (OWASP Authorization Cheat Sheet, "Deny by Default" and enumeration advice).
// The callers: an organisation admin with no membership, a supervisor who edits the notebook, the
// chemist who owns it, a viewer who reads it, a chemist who is not a member, and no session.

const actors = ['admin', 'supervisor', 'chemist', 'viewer', 'outsider', 'anonymous'] as const;
type Actor = (typeof actors)[number];

let server: TestServer;
const people = {} as Record<Exclude<Actor, 'anonymous'>, TestPerson>;
const clients = {} as Record<Actor, ApiClient>;
let notebookId: string;
let pageId: string;
let liveInvitationToken: string;

beforeAll(async () => {
  server = await startServer();
  people.admin = await createPerson(server.deps, 'admin', 'matrix-admin');
  people.supervisor = await createPerson(server.deps, 'supervisor', 'matrix-supervisor');
  people.chemist = await createPerson(server.deps, 'chemist', 'matrix-owner');
  people.viewer = await createPerson(server.deps, 'viewer', 'matrix-viewer');
  people.outsider = await createPerson(server.deps, 'chemist', 'matrix-outsider');
  for (const actor of actors) clients[actor] = actor === 'anonymous' ? new ApiClient(server.url) : await signedInAs(server.url, people[actor]);

  const owner = clients.chemist;
  notebookId = (await owner.post('/api/notebooks', { title: 'Matrix notebook' })).body.id;
  expect((await owner.put(`/api/notebooks/${notebookId}/members`, { userId: people.supervisor.id, role: 'editor' })).status).toBe(200);
  expect((await owner.put(`/api/notebooks/${notebookId}/members`, { userId: people.viewer.id, role: 'reader' })).status).toBe(200);
  pageId = await newPage(owner, notebookId, 'Matrix page');
  liveInvitationToken = await insertInvitation(server.deps);
});
afterAll(() => server.close());

/** Someone to change, add or remove, so that one cell's success does not affect the next. */
const bystander = () => createPerson(server.deps, 'chemist', 'matrix-bystander');

interface RouteCase {
  route: string;
  call(api: ApiClient): Promise<ApiResponse>;
  expected: Record<Actor, number>;
  /** The call ends or replaces the caller's session, so it runs on a session of its own. */
  ownSession?: true;
}

const everyone = (status: number): Record<Actor, number> => ({ admin: status, supervisor: status, chemist: status, viewer: status, outsider: status, anonymous: status });
const signedInOnly = (status: number): Record<Actor, number> => ({ ...everyone(status), anonymous: 401 });
const adminOnly = (status: number): Record<Actor, number> => ({ ...everyone(403), admin: status, anonymous: 401 });
/** Members (and admins) read; a non-member is told the notebook does not exist. */
const membersRead: Record<Actor, number> = { ...signedInOnly(200), outsider: 404 };
/** Owner/editor (and admins) write; the reader, an organisation viewer, is refused. */
const editorsWrite = (status: number): Record<Actor, number> => ({ ...membersRead, admin: status, supervisor: status, chemist: status, viewer: 403 });
/** Only the owner and admins manage members. */
const managersOnly = (status: number): Record<Actor, number> => ({ ...membersRead, admin: status, chemist: status, supervisor: 403, viewer: 403 });

const routes: RouteCase[] = [
  { route: 'GET /api/health', call: (api) => api.get('/api/health'), expected: everyone(200) },
  {
    route: 'POST /api/auth/sign-in',
    ownSession: true,
    call: async (api) => {
      const person = await bystander();
      return api.post('/api/auth/sign-in', { email: person.email, password: person.password });
    },
    expected: everyone(200),
  },
  { route: 'POST /api/auth/sign-out', ownSession: true, call: (api) => api.post('/api/auth/sign-out'), expected: signedInOnly(204) },
  { route: 'GET /api/me', call: (api) => api.get('/api/me'), expected: signedInOnly(200) },
  { route: 'GET /api/auth/invitations/:token', call: (api) => api.get(`/api/auth/invitations/${liveInvitationToken}`), expected: everyone(200) },
  {
    route: 'POST /api/auth/accept-invitation',
    ownSession: true,
    call: async (api) => api.post('/api/auth/accept-invitation', { token: await insertInvitation(server.deps), password: 'matrix-password-1' }),
    expected: everyone(200),
  },
  { route: 'POST /api/auth/password-reset', call: (api) => api.post('/api/auth/password-reset', { email: uniqueEmail('matrix-nobody') }), expected: everyone(202) },
  {
    route: 'POST /api/auth/password-reset/confirm',
    ownSession: true,
    call: async (api) => api.post('/api/auth/password-reset/confirm', { token: await insertPasswordReset(server.deps, (await bystander()).id), password: 'matrix-password-2' }),
    expected: everyone(200),
  },
  { route: 'GET /api/people', call: (api) => api.get('/api/people'), expected: { ...signedInOnly(200), viewer: 403 } },
  { route: 'POST /api/chem/describe', call: (api) => api.post('/api/chem/describe', { smiles: 'CCC' }), expected: signedInOnly(200) },
  { route: 'GET /api/users', call: (api) => api.get('/api/users'), expected: adminOnly(200) },
  { route: 'PATCH /api/users/:id', call: async (api) => api.patch(`/api/users/${(await bystander()).id}`, { role: 'supervisor' }), expected: adminOnly(200) },
  { route: 'GET /api/invitations', call: (api) => api.get('/api/invitations'), expected: adminOnly(200) },
  {
    route: 'POST /api/invitations',
    call: (api) => api.post('/api/invitations', { email: uniqueEmail('matrix-invited'), name: 'Matrix Invited', role: 'chemist' }),
    expected: adminOnly(201),
  },
  { route: 'GET /api/mail', call: (api) => api.get('/api/mail'), expected: adminOnly(200) },
  { route: 'GET /api/notebooks', call: (api) => api.get('/api/notebooks'), expected: signedInOnly(200) },
  { route: 'POST /api/notebooks', call: (api) => api.post('/api/notebooks', { title: 'Matrix extra notebook' }), expected: { ...signedInOnly(201), viewer: 403 } },
  { route: 'GET /api/notebooks/:id', call: (api) => api.get(`/api/notebooks/${notebookId}`), expected: membersRead },
  { route: 'GET /api/notebooks/:id/members', call: (api) => api.get(`/api/notebooks/${notebookId}/members`), expected: membersRead },
  {
    route: 'PUT /api/notebooks/:id/members',
    call: async (api) => api.put(`/api/notebooks/${notebookId}/members`, { userId: (await bystander()).id, role: 'editor' }),
    expected: managersOnly(200),
  },
  {
    route: 'DELETE /api/notebooks/:id/members/:userId',
    call: async (api) => {
      const member = await bystander();
      await server.deps.pool.query("insert into memberships (notebook_id, user_id, role) values ($1, $2, 'reader')", [notebookId, member.id]);
      return api.delete(`/api/notebooks/${notebookId}/members/${member.id}`);
    },
    expected: managersOnly(204),
  },
  { route: 'GET /api/notebooks/:id/pages', call: (api) => api.get(`/api/notebooks/${notebookId}/pages`), expected: membersRead },
  { route: 'POST /api/notebooks/:id/pages', call: (api) => api.post(`/api/notebooks/${notebookId}/pages`, { title: 'Matrix extra page' }), expected: editorsWrite(201) },
  { route: 'GET /api/pages/:id', call: (api) => api.get(`/api/pages/${pageId}`), expected: membersRead },
  { route: 'PATCH /api/pages/:id', call: (api) => api.patch(`/api/pages/${pageId}`, { title: 'Matrix page, retitled' }), expected: editorsWrite(200) },
];

async function clientFor(actor: Actor, ownSession: boolean): Promise<ApiClient> {
  if (!ownSession) return clients[actor];
  return actor === 'anonymous' ? new ApiClient(server.url) : signedInAs(server.url, people[actor]);
}

describe('role × route matrix', () => {
  for (const route of routes) {
    describe(route.route, () => {
      for (const actor of actors) {
        const status = route.expected[actor];
        it(`${actor} → ${status}`, async () => {
          const response = await route.call(await clientFor(actor, route.ownSession ?? false));
          expect(response.status, JSON.stringify(response.body)).toBe(status);
          if (status >= 400) {
            expect(response.body.error).toEqual(expect.objectContaining({ code: expect.any(String), message: expect.any(String) }));
          }
        });
      }
    });
  }
});

describe('what each caller sees in the lists', () => {
  it('lists the notebook to its members and admins but not to a non-member', async () => {
    const seen = async (actor: Actor) => ((await clients[actor].get('/api/notebooks')).body as { id: string }[]).some((n) => n.id === notebookId);
    expect(await seen('admin')).toBe(true);
    expect(await seen('chemist')).toBe(true);
    expect(await seen('supervisor')).toBe(true);
    expect(await seen('viewer')).toBe(true);
    expect(await seen('outsider')).toBe(false);
  });

  it('tells each member what they may do on the page', async () => {
    const access = async (actor: Actor) => (await clients[actor].get(`/api/pages/${pageId}`)).body.access;
    expect(await access('chemist')).toEqual({ canEdit: true, role: 'owner' });
    expect(await access('supervisor')).toEqual({ canEdit: true, role: 'editor' });
    expect(await access('viewer')).toEqual({ canEdit: false, role: 'reader' });
    expect(await access('admin')).toEqual({ canEdit: true, role: 'owner' });
  });

  it('gives a non-member the same 404 for an existing page as for a page that never existed', async () => {
    const existing = await clients.outsider.get(`/api/pages/${pageId}`);
    const missing = await clients.outsider.get('/api/pages/00000000-0000-4000-8000-000000000000');
    expect(existing.status).toBe(404);
    expect(existing.body).toEqual(missing.body);
  });
});
