import { afterEach, describe, expect, it } from 'vitest';
import { ApiClient } from '../support/api';
import { createPerson, uniqueEmail } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';

// OWASP Authentication Cheat Sheet, "Protect Against Automated Attacks" / "Login Throttling":
// limit failed attempts per account (password guessing) and per source address (spraying many
// accounts). 429 is RFC 6585 §4 "Too Many Requests". Each test starts its own server so the
// in-memory counters begin at zero; a small SIGN_IN_MAX_ATTEMPTS keeps the tests quick.
const MAX = 3;

let server: TestServer | undefined;
afterEach(async () => {
  await server?.close();
  server = undefined;
});

const signIn = (url: string, email: string, password: string) => new ApiClient(url).post('/api/auth/sign-in', { email, password });

describe('sign-in throttle per account', () => {
  it(`refuses the ${MAX + 1}th failure on one account with 429, even with the right password`, async () => {
    server = await startServer({ SIGN_IN_MAX_ATTEMPTS: String(MAX) });
    const target = await createPerson(server.deps, 'chemist', 'guessed');
    for (let i = 0; i < MAX; i++) {
      expect((await signIn(server.url, target.email, `guess-${i}`)).status).toBe(401);
    }
    const blocked = await signIn(server.url, target.email, 'guess-last');
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
    expect(blocked.body.error.message).toMatch(/try again/i);

    // While the account is blocked, even the right password does not get through to it.
    const right = await signIn(server.url, target.email, target.password);
    expect(right.status).toBe(429);
    expect(right.headers.get('set-cookie')).toBeNull();
  });

  it('counts the same account however its e-mail is capitalised', async () => {
    server = await startServer({ SIGN_IN_MAX_ATTEMPTS: String(MAX) });
    const target = await createPerson(server.deps, 'chemist', 'casing');
    const spellings = [target.email, target.email.toUpperCase(), ` ${target.email}`];
    for (const spelling of spellings) expect((await signIn(server.url, spelling, 'wrong-guess')).status).toBe(401);
    expect((await signIn(server.url, target.email.toUpperCase(), 'wrong-guess')).status).toBe(429);
  });

  it('does not block other accounts when one account is blocked', async () => {
    server = await startServer({ SIGN_IN_MAX_ATTEMPTS: String(MAX) });
    const target = await createPerson(server.deps, 'chemist', 'blocked');
    const bystander = await createPerson(server.deps, 'chemist', 'bystander');
    for (let i = 0; i <= MAX; i++) await signIn(server.url, target.email, `guess-${i}`);
    expect((await signIn(server.url, target.email, target.password)).status).toBe(429);
    expect((await signIn(server.url, bystander.email, bystander.password)).status).toBe(200);
  });

  it('does not count successful sign-ins', async () => {
    server = await startServer({ SIGN_IN_MAX_ATTEMPTS: String(MAX) });
    const person = await createPerson(server.deps, 'chemist', 'regular');
    for (let i = 0; i < MAX * 2; i++) expect((await signIn(server.url, person.email, person.password)).status).toBe(200);
    expect((await signIn(server.url, person.email, 'one-typo')).status).toBe(401);
  });
});

describe('sign-in throttle per address', () => {
  it('blocks an address that sprays failures across many accounts', async () => {
    server = await startServer({ SIGN_IN_MAX_ATTEMPTS: String(MAX) });
    const untouched = await createPerson(server.deps, 'chemist', 'untouched');
    // One failure per account never trips the per-account limit; only the address limit can stop this.
    let firstBlocked = -1;
    for (let i = 0; i < MAX * 10 && firstBlocked < 0; i++) {
      const response = await signIn(server.url, uniqueEmail('spray'), 'spray-password');
      if (response.status === 429) firstBlocked = i;
      else expect(response.status).toBe(401);
    }
    expect(firstBlocked).toBeGreaterThan(MAX);
    // The address is now blocked even for an account that never failed.
    const blocked = await signIn(server.url, untouched.email, untouched.password);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('too_many_attempts');
  });
});
