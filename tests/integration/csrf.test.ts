import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient } from '../support/api';
import { createPerson, insertInvitation, insertPasswordReset, signedInAs, type TestPerson } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';
import { newPage } from '../support/signing';

// CSRF defence by origin: OWASP Cross-Site Request Forgery Prevention Cheat Sheet, "Verifying
// Origin With Standard Headers" — a state-changing request whose Origin is missing or is not the
// app's own is refused. Sign-in is covered too (login CSRF, same cheat sheet, "Login CSRF").
// Each refusal must change nothing: every case reads the affected row before and after.

let server: TestServer;
let admin: TestPerson;
let client: ApiClient;
let notebookId: string;
let pageId: string;
let member: TestPerson;
let invitationToken: string;
let resetToken: string;

beforeAll(async () => {
  server = await startServer();
  admin = await createPerson(server.deps, 'admin', 'csrf-admin');
  member = await createPerson(server.deps, 'chemist', 'csrf-member');
  client = await signedInAs(server.url, admin);
  notebookId = (await client.post('/api/notebooks', { title: 'Origin checks' })).body.id;
  pageId = await newPage(client, notebookId, 'Untouched title');
  await client.put(`/api/notebooks/${notebookId}/members`, { userId: member.id, role: 'reader' });

  invitationToken = await insertInvitation(server.deps, 'Csrf Invitee');
  resetToken = await insertPasswordReset(server.deps, member.id);
});
afterAll(() => server.close());

/** A request as a script on another site could make it: the victim's cookie, but any Origin. */
async function forged(method: string, path: string, body: unknown, origin: string | undefined) {
  const headers: Record<string, string> = { cookie: client.sessionCookie, 'content-type': 'application/json' };
  if (origin !== undefined) headers.origin = origin;
  const response = await fetch(server.url + path, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
  return { status: response.status, body: (await response.json()) as { error: { code: string } }, setCookie: response.headers.getSetCookie() };
}

const sql = async (text: string, params: unknown[]) => (await server.deps.pool.query(text, params)).rows;

interface Case {
  name: string;
  method: string;
  path: () => string;
  body?: () => unknown;
  /** The state the request would change; must read the same after a refusal. */
  state: () => Promise<unknown>;
}

const marker = `forged-${Date.now()}`;
const cases: Case[] = [
  {
    name: 'sign-in',
    method: 'POST',
    path: () => '/api/auth/sign-in',
    body: () => ({ email: admin.email, password: admin.password }),
    state: () => sql('select count(*) from sessions where user_id = $1', [admin.id]),
  },
  { name: 'sign-out', method: 'POST', path: () => '/api/auth/sign-out', body: () => ({}), state: () => sql('select id from sessions where user_id = $1 order by id', [admin.id]) },
  {
    name: 'accept invitation',
    method: 'POST',
    path: () => '/api/auth/accept-invitation',
    body: () => ({ token: invitationToken, password: 'forged-password-1' }),
    state: () => sql("select accepted_at from invitations where name = 'Csrf Invitee'", []),
  },
  {
    name: 'request password reset',
    method: 'POST',
    path: () => '/api/auth/password-reset',
    body: () => ({ email: member.email }),
    state: () => sql('select count(*) from password_resets where user_id = $1', [member.id]),
  },
  {
    name: 'confirm password reset',
    method: 'POST',
    path: () => '/api/auth/password-reset/confirm',
    body: () => ({ token: resetToken, password: 'forged-password-2' }),
    state: () => sql('select password_hash from users where id = $1', [member.id]),
  },
  { name: 'change a role', method: 'PATCH', path: () => `/api/users/${member.id}`, body: () => ({ role: 'admin' }), state: () => sql('select role from users where id = $1', [member.id]) },
  {
    name: 'invite',
    method: 'POST',
    path: () => '/api/invitations',
    body: () => ({ email: `${marker}@saltmarsh.test`, name: 'Forged', role: 'admin' }),
    state: () => sql('select count(*) from invitations where email = $1', [`${marker}@saltmarsh.test`]),
  },
  { name: 'create a notebook', method: 'POST', path: () => '/api/notebooks', body: () => ({ title: marker }), state: () => sql('select count(*) from notebooks where title = $1', [marker]) },
  {
    name: 'set a member',
    method: 'PUT',
    path: () => `/api/notebooks/${notebookId}/members`,
    body: () => ({ userId: member.id, role: 'owner' }),
    state: () => sql('select role from memberships where notebook_id = $1 and user_id = $2', [notebookId, member.id]),
  },
  {
    name: 'remove a member',
    method: 'DELETE',
    path: () => `/api/notebooks/${notebookId}/members/${member.id}`,
    state: () => sql('select role from memberships where notebook_id = $1 and user_id = $2', [notebookId, member.id]),
  },
  { name: 'add a page', method: 'POST', path: () => `/api/notebooks/${notebookId}/pages`, body: () => ({ title: marker }), state: () => sql('select count(*) from pages where title = $1', [marker]) },
  { name: 'retitle a page', method: 'PATCH', path: () => `/api/pages/${pageId}`, body: () => ({ title: marker }), state: () => sql('select title, updated_at from pages where id = $1', [pageId]) },
];

const badOrigins: [string, () => string | undefined][] = [
  ['no Origin', () => undefined],
  ['a foreign Origin', () => 'https://evil.example'],
  ['the opaque Origin "null"', () => 'null'],
  ['the right host on another port', () => 'http://127.0.0.1:1'],
  ['the right host and port over https', () => server.url.replace('http:', 'https:')],
];

describe('state-changing requests from elsewhere', () => {
  for (const [originName, originOf] of badOrigins) {
    describe(`with ${originName}`, () => {
      for (const c of cases) {
        it(`refuses ${c.name} with 403 bad_origin and changes nothing`, async () => {
          const before = await c.state();
          const response = await forged(c.method, c.path(), c.body?.(), originOf());
          expect(response.status).toBe(403);
          expect(response.body.error.code).toBe('bad_origin');
          expect(response.setCookie).toEqual([]);
          expect(await c.state()).toEqual(before);
        });
      }
    });
  }

  it('still lets the same requests through from the app’s own origin (the checks above can fail)', async () => {
    const before = await cases.find((c) => c.name === 'retitle a page')!.state();
    const response = await forged('PATCH', `/api/pages/${pageId}`, { title: 'Own origin title' }, server.url);
    expect(response.status).toBe(200);
    expect(await cases.find((c) => c.name === 'retitle a page')!.state()).not.toEqual(before);
  });

  it('does not ask for an Origin on reads', async () => {
    const response = await forged('GET', '/api/me', undefined, undefined);
    expect(response.status).toBe(200);
  });
});

describe('behind a proxy with a configured public URL', () => {
  let proxied: TestServer;
  beforeAll(async () => {
    proxied = await startServer({ PUBLIC_URL: 'https://notebook.saltmarsh.test' });
  });
  afterAll(() => proxied.close());

  it('accepts the public origin and refuses a look-alike', async () => {
    const sign = (origin: string) =>
      new ApiClient(proxied.url).request('POST', '/api/auth/sign-in', { email: admin.email, password: admin.password }, { headers: { origin } });
    expect((await sign('https://notebook.saltmarsh.test')).status).toBe(200);
    expect((await sign('https://notebook.saltmarsh.test.evil.example')).status).toBe(403);
    expect((await sign('http://notebook.saltmarsh.test')).status).toBe(403);
  });
});
