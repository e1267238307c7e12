import { describe, expect, it } from 'vitest';
import { ApiClient, signedIn } from '../support/api';
import { adminFrame, latestMailTo, sessionCookieOf, tokenFromLink, uniqueEmail } from '../support/fixtures';

// Invitations go through nodemailer to the suite's real mail catcher (smtp-server), which files
// them in caught_mail; the test reads them back through the admins' mail view.
// Single-use, expiring links: OWASP Forgot Password Cheat Sheet, "URL Tokens" (the same advice
// applies to any e-mailed link that lets someone set a password).
const frame = adminFrame();

async function invite(role: string, prefix = 'invitee') {
  const email = uniqueEmail(prefix);
  const response = await frame.admin.post('/api/invitations', { email, name: 'Wren Tolliver', role });
  expect(response.status).toBe(201);
  const mail = await latestMailTo(frame.admin, email);
  expect(mail).toBeDefined();
  return { email, invitation: response.body, mail: mail!, token: tokenFromLink(mail!.text, 'invite') };
}

describe('invitation end to end', () => {
  it('mails a link whose token shows the invitation; accepting sets the password and signs in', async () => {
    const { email, invitation, mail, token } = await invite('chemist');
    expect(invitation).toMatchObject({ email, name: 'Wren Tolliver', role: 'chemist', acceptedAt: null });
    expect(mail.subject).toMatch(/invited you/);
    expect(mail.text).toContain(`${frame.server.deps.config.publicUrl}/invite/${token}`);

    const visitor = new ApiClient(frame.server.url);
    const shown = await visitor.get(`/api/auth/invitations/${token}`);
    expect(shown.status).toBe(200);
    expect(shown.body).toEqual({ email, name: 'Wren Tolliver', role: 'chemist' });

    const accepted = await visitor.post('/api/auth/accept-invitation', { token, password: 'a-brand-new-password' });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ email, role: 'chemist', name: 'Wren Tolliver' });
    expect(sessionCookieOf(accepted.headers)?.attributes.has('httponly')).toBe(true);
    expect((await visitor.get('/api/me')).body.email).toBe(email);

    // The chosen password works for a normal sign-in too.
    expect((await signedIn(frame.server.url, email, 'a-brand-new-password')).sessionCookie).not.toBe('');

    const listed = (await frame.admin.get('/api/invitations')).body.find((i: { email: string }) => i.email === email);
    expect(listed.acceptedAt).not.toBeNull();
  });

  it('takes the name the invitee gives when accepting', async () => {
    const { token } = await invite('supervisor');
    const accepted = await new ApiClient(frame.server.url).post('/api/auth/accept-invitation', { token, password: 'another-long-password', name: 'Dr W. Tolliver' });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ name: 'Dr W. Tolliver', role: 'supervisor' });
  });

  it('works only once', async () => {
    const { token } = await invite('viewer');
    const first = await new ApiClient(frame.server.url).post('/api/auth/accept-invitation', { token, password: 'first-password-x' });
    expect(first.status).toBe(200);

    expect((await new ApiClient(frame.server.url).get(`/api/auth/invitations/${token}`)).status).toBe(404);
    const second = new ApiClient(frame.server.url);
    const again = await second.post('/api/auth/accept-invitation', { token, password: 'second-password-y' });
    expect(again.status).toBe(404);
    expect(again.body.error.code).toBe('not_found');
    expect(second.sessionCookie).toBe('');
    // The first password still stands.
    expect((await signedIn(frame.server.url, first.body.email, 'first-password-x')).sessionCookie).not.toBe('');
  });

  it('lets exactly one of two simultaneous acceptances through', async () => {
    const { token } = await invite('chemist', 'race');
    const answers = await Promise.all(
      ['race-password-one', 'race-password-two'].map((password) =>
        new ApiClient(frame.server.url).post('/api/auth/accept-invitation', { token, password }),
      ),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, 404]);
  });

  it('refuses an expired link', async () => {
    const { email, token } = await invite('chemist', 'late');
    await frame.server.deps.pool.query("update invitations set expires_at = now() - interval '1 minute' where email = $1", [email]);
    expect((await new ApiClient(frame.server.url).get(`/api/auth/invitations/${token}`)).status).toBe(404);
    const visitor = new ApiClient(frame.server.url);
    const accepted = await visitor.post('/api/auth/accept-invitation', { token, password: 'too-late-password' });
    expect(accepted.status).toBe(404);
    expect(visitor.sessionCookie).toBe('');
    const { rows } = await frame.server.deps.pool.query('select 1 from users where email = $1', [email]);
    expect(rows).toHaveLength(0);
  });

  it('refuses an unknown token', async () => {
    const madeUp = 'x'.repeat(43);
    expect((await new ApiClient(frame.server.url).get(`/api/auth/invitations/${madeUp}`)).status).toBe(404);
    expect((await new ApiClient(frame.server.url).post('/api/auth/accept-invitation', { token: madeUp, password: 'whatever-password' })).status).toBe(404);
  });

  it('refuses a too-short password and leaves the link usable', async () => {
    const { token } = await invite('chemist', 'short');
    const refused = await new ApiClient(frame.server.url).post('/api/auth/accept-invitation', { token, password: 'short' });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields).toHaveProperty('password');
    expect((await new ApiClient(frame.server.url).get(`/api/auth/invitations/${token}`)).status).toBe(200);
  });

  it('does not invite someone who already has an account', async () => {
    const response = await frame.admin.post('/api/invitations', { email: 'chemist@saltmarsh.test', name: 'Imke again', role: 'chemist' });
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('account_exists');
  });
});
