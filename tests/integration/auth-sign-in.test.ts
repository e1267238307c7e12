import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, DEMO_PASSWORD, signedIn } from '../support/api';
import { createPerson, signedInAs } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';

let server: TestServer;
beforeAll(async () => {
  server = await startServer();
});
afterAll(() => server.close());

// Status codes per RFC 9110 §15.5.2 (401 Unauthorized: no valid credentials or session) and
// §15.3.5 (204 No Content); the error codes are this app's contract (API.md).
describe('sign-in', () => {
  it('signs a demo account in and /api/me answers who it is', async () => {
    const client = new ApiClient(server.url);
    const response = await client.post('/api/auth/sign-in', { email: 'chemist@saltmarsh.test', password: DEMO_PASSWORD });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ email: 'chemist@saltmarsh.test', role: 'chemist', name: 'Imke Sallow' });
    expect(response.body).not.toHaveProperty('passwordHash');
    const me = await client.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body).toEqual(response.body);
  });

  it('treats the e-mail case-insensitively and ignores surrounding spaces', async () => {
    // E-mail domains are case-insensitive (RFC 5321 §2.4); treating the local part the same way is
    // common practice, no source.
    const client = new ApiClient(server.url);
    const response = await client.post('/api/auth/sign-in', { email: '  Supervisor@SALTMARSH.test ', password: DEMO_PASSWORD });
    expect(response.status).toBe(200);
    expect(response.body.email).toBe('supervisor@saltmarsh.test');
  });

  it('refuses a wrong password with 401 and no session', async () => {
    const client = new ApiClient(server.url);
    const response = await client.post('/api/auth/sign-in', { email: 'chemist2@saltmarsh.test', password: 'not-the-password' });
    expect(response.status).toBe(401);
    expect(response.body.error.code).toBe('invalid_credentials');
    expect(client.sessionCookie).toBe('');
    expect((await client.get('/api/me')).status).toBe(401);
  });

  it('gives an unknown account the same answer as a wrong password', async () => {
    // OWASP Authentication Cheat Sheet, "Authentication and Error Messages": a generic message that
    // does not say whether the account exists.
    const client = new ApiClient(server.url);
    const unknown = await client.post('/api/auth/sign-in', { email: 'nobody@saltmarsh.test', password: 'whatever-it-is' });
    const wrong = await client.post('/api/auth/sign-in', { email: 'viewer@saltmarsh.test', password: 'whatever-it-is' });
    expect(unknown.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
  });

  it('refuses an invited person who has not chosen a password yet', async () => {
    // An account without a password cannot be signed into with any password: common practice, no source.
    const person = await createPerson(server.deps, 'chemist', 'no-password');
    await server.deps.pool.query('update users set password_hash = null where id = $1', [person.id]);
    const response = await new ApiClient(server.url).post('/api/auth/sign-in', { email: person.email, password: person.password });
    expect(response.status).toBe(401);
  });

  it('answers /api/me without a session with 401 not_signed_in', async () => {
    const response = await new ApiClient(server.url).get('/api/me');
    expect(response.status).toBe(401);
    expect(response.body.error.code).toBe('not_signed_in');
  });

  it('ignores a made-up session cookie', async () => {
    // OWASP Session Management Cheat Sheet (strict session management): only session IDs the
    // server itself issued are accepted (written from memory).
    const response = await new ApiClient(server.url).request('GET', '/api/me', undefined, {
      headers: { cookie: 'quillane_session=abcdefghijklmnopqrstuvwxyz234567' },
    });
    expect(response.status).toBe(401);
  });
});

describe('sign-out', () => {
  it('ends the session on the server, not only in the browser', async () => {
    // OWASP Session Management Cheat Sheet, "Manual Session Expiration": the server must invalidate
    // the session on logout; clearing the cookie alone is not enough.
    const person = await createPerson(server.deps, 'chemist', 'sign-out');
    const client = await signedInAs(server.url, person);
    const stolenCookie = client.sessionCookie;
    expect(stolenCookie).toMatch(/^quillane_session=.+/);

    const response = await client.post('/api/auth/sign-out');
    expect(response.status).toBe(204);
    expect(client.sessionCookie).toBe('');
    expect((await client.get('/api/me')).status).toBe(401);

    const replay = await new ApiClient(server.url).request('GET', '/api/me', undefined, { headers: { cookie: stolenCookie } });
    expect(replay.status).toBe(401);
  });

  it('leaves the same person’s other sessions alone', async () => {
    // Signing out ends this session only (one browser, not every device): common practice, no source.
    const person = await createPerson(server.deps, 'chemist', 'two-browsers');
    const laptop = await signedInAs(server.url, person);
    const desktop = await signedInAs(server.url, person);
    expect((await laptop.post('/api/auth/sign-out')).status).toBe(204);
    expect((await desktop.get('/api/me')).status).toBe(200);
  });

  it('answers sign-out without a session with 401', async () => {
    const response = await new ApiClient(server.url).post('/api/auth/sign-out');
    expect(response.status).toBe(401);
    expect(response.body.error.code).toBe('not_signed_in');
  });

  it('lets a signed-out person sign in again', async () => {
    const client = await signedIn(server.url, 'chemist2@saltmarsh.test');
    await client.post('/api/auth/sign-out');
    expect((await client.post('/api/auth/sign-in', { email: 'chemist2@saltmarsh.test', password: DEMO_PASSWORD })).status).toBe(200);
    expect((await client.get('/api/me')).body.email).toBe('chemist2@saltmarsh.test');
  });
});
