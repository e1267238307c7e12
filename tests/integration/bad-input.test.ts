import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiClient, ApiResponse } from '../support/api';
import { createPerson, signedInAs, type TestPerson } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';
import { newPage } from '../support/signing';

// The contract (DESIGN.md, RULES.md): bad input gets `{ error: { code, message } }` with a fitting
// 4xx and changes nothing, never a 500. Status meanings per RFC 9110 §15.5 (400 Bad Request,
// 404 Not Found, 413 Content Too Large).
let server: TestServer;
let admin: TestPerson;
let api: ApiClient;
let notebookId: string;
let pageId: string;

beforeAll(async () => {
  server = await startServer();
  admin = await createPerson(server.deps, 'admin', 'input-admin');
  api = await signedInAs(server.url, admin);
  notebookId = (await api.post('/api/notebooks', { title: 'Bad input' })).body.id;
  pageId = await newPage(api, notebookId, 'Unchanged');
});
afterAll(() => server.close());

function expectError(response: ApiResponse, status: number, code?: string) {
  expect(response.status, JSON.stringify(response.body)).toBe(status);
  expect(response.body.error.message).toEqual(expect.any(String));
  if (code) expect(response.body.error.code).toBe(code);
}

const postRaw = (path: string, raw: string, contentType = 'application/json', method = 'POST') =>
  api.request(method, path, undefined, { raw, headers: { 'content-type': contentType } });

const writeRoutes = () => [
  ['POST', '/api/auth/sign-in'],
  ['POST', '/api/auth/accept-invitation'],
  ['POST', '/api/auth/password-reset'],
  ['POST', '/api/auth/password-reset/confirm'],
  ['PATCH', `/api/users/${admin.id}`],
  ['POST', '/api/invitations'],
  ['POST', '/api/notebooks'],
  ['PUT', `/api/notebooks/${notebookId}/members`],
  ['POST', `/api/notebooks/${notebookId}/pages`],
  ['PATCH', `/api/pages/${pageId}`],
];

describe('malformed JSON', () => {
  for (const raw of ['{"title": ', '{title: "x"}', "{'title': 'x'}", 'null', '"just a string"', '42']) {
    it(`answers ${JSON.stringify(raw)} with 400 on every route that takes a body`, async () => {
      for (const [method, path] of writeRoutes()) {
        const response = await postRaw(path, raw, 'application/json', method);
        expect(response.status, `${method} ${path}`).toBe(400);
        expect(response.body.error.code, `${method} ${path}`).toMatch(/^(malformed_json|invalid_input)$/);
      }
    });
  }

  it('treats a body that is not declared as JSON as missing, not as a crash', async () => {
    expectError(await postRaw('/api/notebooks', '{"title":"x"}', 'text/plain'), 400, 'invalid_input');
    expectError(await postRaw('/api/notebooks', '', 'application/json'), 400, 'invalid_input');
  });
});

describe('missing fields', () => {
  const cases: [string, string, () => string, Record<string, unknown>, string[]][] = [
    ['sign-in', 'POST', () => '/api/auth/sign-in', {}, ['email', 'password']],
    ['sign-in without password', 'POST', () => '/api/auth/sign-in', { email: 'someone@saltmarsh.test' }, ['password']],
    ['accept invitation', 'POST', () => '/api/auth/accept-invitation', {}, ['token', 'password']],
    ['password reset', 'POST', () => '/api/auth/password-reset', {}, ['email']],
    ['password reset confirm', 'POST', () => '/api/auth/password-reset/confirm', {}, ['token', 'password']],
    ['role change', 'PATCH', () => `/api/users/${admin.id}`, {}, ['role']],
    ['invitation', 'POST', () => '/api/invitations', { email: 'new@saltmarsh.test' }, ['name', 'role']],
    ['notebook', 'POST', () => '/api/notebooks', {}, ['title']],
    ['member', 'PUT', () => `/api/notebooks/${notebookId}/members`, {}, ['userId', 'role']],
    ['page', 'POST', () => `/api/notebooks/${notebookId}/pages`, {}, ['title']],
    ['page title', 'PATCH', () => `/api/pages/${pageId}`, {}, ['title']],
  ];
  for (const [name, method, path, body, fields] of cases) {
    it(`${name}: 400 naming ${fields.join(', ')}`, async () => {
      const response = await api.request(method, path(), body);
      expectError(response, 400, 'invalid_input');
      for (const field of fields) {
        expect(response.body.error.message).toContain(field);
        expect(response.body.error.fields).toHaveProperty(field);
      }
    });
  }
});

describe('wrong types and values', () => {
  const cases: [string, string, () => string, Record<string, unknown>, string][] = [
    ['numeric title', 'POST', () => '/api/notebooks', { title: 42 }, 'title'],
    ['blank title', 'POST', () => '/api/notebooks', { title: '   ' }, 'title'],
    ['array as title', 'PATCH', () => `/api/pages/${pageId}`, { title: ['a'] }, 'title'],
    ['object as title', 'POST', () => `/api/notebooks/${notebookId}/pages`, { title: { text: 'x' } }, 'title'],
    ['too long title', 'POST', () => '/api/notebooks', { title: 'x'.repeat(201) }, 'title'],
    ['unknown organisation role', 'PATCH', () => `/api/users/${admin.id}`, { role: 'superuser' }, 'role'],
    ['unknown membership role', 'PUT', () => `/api/notebooks/${notebookId}/members`, { userId: '7d3c1a2e-5b4f-4c6d-8e9f-0a1b2c3d4e5f', role: 'boss' }, 'role'],
    ['user id that is not an id', 'PUT', () => `/api/notebooks/${notebookId}/members`, { userId: 'abc', role: 'reader' }, 'userId'],
    ['e-mail that is not one', 'POST', () => '/api/invitations', { email: 'not-an-address', name: 'X', role: 'chemist' }, 'email'],
    ['numeric password', 'POST', () => '/api/auth/sign-in', { email: 'a@saltmarsh.test', password: 12345 }, 'password'],
    ['boolean e-mail', 'POST', () => '/api/auth/password-reset', { email: true }, 'email'],
  ];
  for (const [name, method, path, body, field] of cases) {
    it(`${name}: 400 naming ${field}`, async () => {
      const response = await api.request(method, path(), body);
      expectError(response, 400, 'invalid_input');
      expect(response.body.error.fields).toHaveProperty(field);
    });
  }

  it('leaves the page untouched after refused retitles', async () => {
    expect((await api.get(`/api/pages/${pageId}`)).body.title).toBe('Unchanged');
  });

  it('refuses an array where an object belongs', async () => {
    expectError(await api.request('POST', '/api/notebooks', [{ title: 'x' }]), 400, 'invalid_input');
  });
});

describe('oversize bodies', () => {
  it('answers a body over the configured limit (1 MB by default) with 413 and stores nothing', async () => {
    const title = `huge-${'x'.repeat(1024 * 1024)}`;
    const response = await api.post('/api/notebooks', { title });
    expectError(response, 413, 'too_large');
    const { rows } = await server.deps.pool.query("select 1 from notebooks where title like 'huge-%'");
    expect(rows).toHaveLength(0);
  });

  it('honours a smaller JSON_BODY_LIMIT', async () => {
    const small = await startServer({ JSON_BODY_LIMIT: '2kb' });
    try {
      const client = await signedInAs(small.url, admin);
      expectError(await client.post('/api/notebooks', { title: 'x'.repeat(3000) }), 413, 'too_large');
      // Just under the limit goes through to validation (the title is then too long: 400, not 413).
      expectError(await client.post('/api/notebooks', { title: 'x'.repeat(1500) }), 400, 'invalid_input');
    } finally {
      await small.close();
    }
  });
});

describe('unknown and malformed ids', () => {
  const unknown = '7d3c1a2e-5b4f-4c6d-8e9f-0a1b2c3d4e5f';
  const malformed = ['not-a-uuid', '123', "1' or '1'='1", '%00', 'x'.repeat(300), `${unknown}x`];

  const idRoutes: [string, (id: string) => [string, string, unknown?]][] = [
    ['GET /api/notebooks/:id', (id) => ['GET', `/api/notebooks/${id}`]],
    ['GET /api/notebooks/:id/members', (id) => ['GET', `/api/notebooks/${id}/members`]],
    ['PUT /api/notebooks/:id/members', (id) => ['PUT', `/api/notebooks/${id}/members`, { userId: admin.id, role: 'reader' }]],
    ['DELETE /api/notebooks/:id/members/:userId (notebook)', (id) => ['DELETE', `/api/notebooks/${id}/members/${admin.id}`]],
    ['DELETE /api/notebooks/:id/members/:userId (member)', (id) => ['DELETE', `/api/notebooks/${notebookId}/members/${id}`]],
    ['GET /api/notebooks/:id/pages', (id) => ['GET', `/api/notebooks/${id}/pages`]],
    ['POST /api/notebooks/:id/pages', (id) => ['POST', `/api/notebooks/${id}/pages`, { title: 'Lost page' }]],
    ['GET /api/pages/:id', (id) => ['GET', `/api/pages/${id}`]],
    ['PATCH /api/pages/:id', (id) => ['PATCH', `/api/pages/${id}`, { title: 'Lost title' }]],
    ['PATCH /api/users/:id', (id) => ['PATCH', `/api/users/${id}`, { role: 'chemist' }]],
    ['GET /api/auth/invitations/:token', (id) => ['GET', `/api/auth/invitations/${id}`]],
  ];

  for (const [name, make] of idRoutes) {
    it(`${name}: 404 for an unknown id and for malformed ones`, async () => {
      for (const id of [unknown, ...malformed]) {
        const [method, path, body] = make(encodeURIComponent(id));
        const response = await api.request(method, path, body);
        expect(response.status, `${method} ${path}`).toBe(404);
        expect(response.body.error.code).toBe('not_found');
      }
    });
  }

  it('answers a member id for someone who does not exist with 404', async () => {
    expectError(await api.put(`/api/notebooks/${notebookId}/members`, { userId: unknown, role: 'reader' }), 404, 'not_found');
  });

  it('answers unknown API paths and methods with 404 in the contract shape', async () => {
    expectError(await api.get('/api/notebook'), 404, 'not_found');
    expectError(await api.request('DELETE', `/api/pages/${pageId}`), 404, 'not_found');
    expectError(await api.request('PUT', '/api/notebooks'), 404, 'not_found');
  });
});
