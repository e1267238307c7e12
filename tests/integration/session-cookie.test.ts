import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, DEMO_PASSWORD, signedIn } from '../support/api';
import { sessionCookieOf } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';

// Session cookie attributes, per the OWASP Session Management Cheat Sheet ("Cookies": Secure,
// HttpOnly, SameSite) and RFC 6265bis (draft-ietf-httpbis-rfc6265bis) §4.1.2.5 Secure,
// §4.1.2.6 HttpOnly, §4.1.2.7 SameSite ("Lax" keeps the cookie off cross-site subrequests and
// cross-site POSTs while top-level links into the app still carry it).
async function signInCookie(server: TestServer) {
  const response = await new ApiClient(server.url).post('/api/auth/sign-in', { email: 'chemist@saltmarsh.test', password: DEMO_PASSWORD });
  expect(response.status).toBe(200);
  const cookie = sessionCookieOf(response.headers);
  expect(cookie).toBeDefined();
  return cookie!;
}

describe('session cookie over plain http', () => {
  let server: TestServer;
  beforeAll(async () => {
    server = await startServer();
  });
  afterAll(() => server.close());

  it('is HttpOnly, SameSite=Lax, for the whole site, and not Secure', async () => {
    const cookie = await signInCookie(server);
    expect(cookie.value.length).toBeGreaterThanOrEqual(20);
    expect(cookie.attributes.has('httponly')).toBe(true);
    expect(cookie.attributes.get('samesite')?.toLowerCase()).toBe('lax');
    expect(cookie.attributes.get('path')).toBe('/');
    // A Secure cookie would never come back over http (RFC 6265bis §4.1.2.5), so sign-in would break.
    expect(cookie.attributes.has('secure')).toBe(false);
  });

  it('is a new random value for every sign-in', async () => {
    // OWASP Session Management Cheat Sheet, "Renew the Session ID After Any Privilege Level Change".
    const first = await signInCookie(server);
    const second = await signInCookie(server);
    expect(first.value).not.toBe(second.value);
  });

  it('is cleared by sign-out with an already expired cookie of the same name and path', async () => {
    const client = await signedIn(server.url, 'chemist@saltmarsh.test');
    const response = await client.post('/api/auth/sign-out');
    const cleared = sessionCookieOf(response.headers);
    expect(cleared?.value).toBe('');
    expect(cleared?.attributes.get('max-age')).toBe('0');
    expect(cleared?.attributes.get('path')).toBe('/');
  });
});

describe('session cookie when the public URL is https', () => {
  let server: TestServer;
  beforeAll(async () => {
    // Behind a TLS-terminating proxy the app itself still listens on plain http.
    server = await startServer({ PUBLIC_URL: 'https://notebook.saltmarsh.test' });
  });
  afterAll(() => server.close());

  it('is Secure as well as HttpOnly and SameSite=Lax', async () => {
    const cookie = await signInCookie(server);
    expect(cookie.attributes.has('secure')).toBe(true);
    expect(cookie.attributes.has('httponly')).toBe(true);
    expect(cookie.attributes.get('samesite')?.toLowerCase()).toBe('lax');
  });

  it('tells browsers to stay on https (HSTS)', async () => {
    // OWASP HTTP Strict Transport Security Cheat Sheet; RFC 6797 §6.1.
    const response = await new ApiClient(server.url).get('/api/health');
    expect(response.headers.get('strict-transport-security')).toMatch(/max-age=\d+/);
  });
});
