import { describe, expect, it } from 'vitest';
import { ApiClient } from '../support/api';
import { adminFrame, createPerson, latestMailTo, signedInAs, tokenFromLink, uniqueEmail, type TestPerson } from '../support/fixtures';

// Password reset through the real mail catcher. Expectations from the OWASP Forgot Password Cheat
// Sheet: the same answer whether or not the account exists ("Forgot Password Request"), tokens that
// are random, single-use and expire ("URL Tokens"); and from the OWASP Session Management Cheat
// Sheet: other sessions end when the password changes, so whoever knew the old one is shut out.
const frame = adminFrame();

async function requestReset(person: TestPerson) {
  const response = await new ApiClient(frame.server.url).post('/api/auth/password-reset', { email: person.email });
  expect(response.status).toBe(202);
  const mail = await latestMailTo(frame.admin, person.email);
  expect(mail).toBeDefined();
  return tokenFromLink(mail!.text, 'reset');
}

describe('password reset end to end', () => {
  it('mails a link; confirming sets the new password, signs in and ends every other session', async () => {
    const person = await createPerson(frame.server.deps, 'chemist', 'forgetful');
    const oldLaptop = await signedInAs(frame.server.url, person);
    const oldPhone = await signedInAs(frame.server.url, person);

    const token = await requestReset(person);
    const browser = new ApiClient(frame.server.url);
    const confirmed = await browser.post('/api/auth/password-reset/confirm', { token, password: 'a-fresh-password-1' });
    expect(confirmed.status).toBe(200);
    expect(confirmed.body).toMatchObject({ id: person.id, email: person.email });
    expect((await browser.get('/api/me')).status).toBe(200);

    expect((await oldLaptop.get('/api/me')).status).toBe(401);
    expect((await oldPhone.get('/api/me')).status).toBe(401);

    const withOld = await new ApiClient(frame.server.url).post('/api/auth/sign-in', { email: person.email, password: person.password });
    expect(withOld.status).toBe(401);
    const withNew = await new ApiClient(frame.server.url).post('/api/auth/sign-in', { email: person.email, password: 'a-fresh-password-1' });
    expect(withNew.status).toBe(200);
  });

  it('works only once', async () => {
    const person = await createPerson(frame.server.deps, 'chemist', 'once');
    const token = await requestReset(person);
    expect((await new ApiClient(frame.server.url).post('/api/auth/password-reset/confirm', { token, password: 'first-new-password' })).status).toBe(200);
    const again = await new ApiClient(frame.server.url).post('/api/auth/password-reset/confirm', { token, password: 'second-new-password' });
    expect(again.status).toBe(404);
    expect((await new ApiClient(frame.server.url).post('/api/auth/sign-in', { email: person.email, password: 'second-new-password' })).status).toBe(401);
  });

  it('refuses an expired link and keeps the old password', async () => {
    const person = await createPerson(frame.server.deps, 'chemist', 'slow');
    const token = await requestReset(person);
    await frame.server.deps.pool.query("update password_resets set expires_at = now() - interval '1 minute' where user_id = $1", [person.id]);
    const late = new ApiClient(frame.server.url);
    const response = await late.post('/api/auth/password-reset/confirm', { token, password: 'too-late-password' });
    expect(response.status).toBe(404);
    expect(late.sessionCookie).toBe('');
    expect((await signedInAs(frame.server.url, person)).sessionCookie).not.toBe('');
  });

  it('answers an unknown address exactly like a known one and sends no mail', async () => {
    const known = await createPerson(frame.server.deps, 'chemist', 'known');
    const unknownEmail = uniqueEmail('unknown');
    const forKnown = await new ApiClient(frame.server.url).post('/api/auth/password-reset', { email: known.email });
    const forUnknown = await new ApiClient(frame.server.url).post('/api/auth/password-reset', { email: unknownEmail });
    expect(forUnknown.status).toBe(forKnown.status);
    expect(forUnknown.body).toEqual(forKnown.body);
    expect(await latestMailTo(frame.admin, unknownEmail)).toBeUndefined();
  });

  it('refuses a made-up token and a too-short new password', async () => {
    const person = await createPerson(frame.server.deps, 'chemist', 'typo');
    const token = await requestReset(person);
    expect((await new ApiClient(frame.server.url).post('/api/auth/password-reset/confirm', { token: 'y'.repeat(43), password: 'long-enough-password' })).status).toBe(404);
    const short = await new ApiClient(frame.server.url).post('/api/auth/password-reset/confirm', { token, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields).toHaveProperty('password');
    // The refused attempt did not use the link up.
    expect((await new ApiClient(frame.server.url).post('/api/auth/password-reset/confirm', { token, password: 'long-enough-password' })).status).toBe(200);
  });
});
