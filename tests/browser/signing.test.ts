import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, signIn } from '../support/browser';
import { startServer, type TestServer } from '../support/server';
import { newPage, signingGroup, writeOnPage, type Member, type SigningGroup } from '../support/signing';

// Sign → countersign by two people in two browser contexts, in real headless Chromium against the
// real server serving the built client from dist/client (run `npx vite build` first).
let server: TestServer;
let browser: Browser;
let g: SigningGroup;

beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
  g = await signingGroup(server);
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function as(member: Member): Promise<Page> {
  const context = await browser.newContext({ timezoneId: 'Europe/Berlin' });
  const page = await context.newPage();
  await signIn(page, server.url, member.person.email, member.person.password);
  return page;
}

describe('signing in the browser', () => {
  it('the author signs (after a wrong password), the supervisor countersigns from the queue', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Browser sign-off');
    await writeOnPage(server, g.author.api, pageId, ['Isoamyl acetate: 12.4 g, 81 % yield.']);

    const author = await as(g.author);
    await author.goto(`${server.url}/pages/${pageId}`);
    await author.getByRole('button', { name: 'Sign page' }).click();
    const signForm = author.getByRole('form', { name: 'Sign this page' });
    await signForm.getByLabel('Meaning of your signature').selectOption({ label: 'I performed and recorded this work' });
    await signForm.getByLabel('Your e-mail').fill(g.author.person.email);
    await signForm.getByLabel('Your password').fill('not-my-password');
    await signForm.getByLabel('Supervisor to countersign').selectOption({ label: 'Test supervisor' });
    await signForm.getByRole('button', { name: 'Sign and lock' }).click();
    // 21 CFR 11.200(a)(1): a wrong password is refused; the person stays signed in and can retry.
    await expect(signForm.getByRole('alert').textContent()).resolves.toContain('password is not right');
    await expect(author.getByTestId('signed-in-name').textContent()).resolves.toBe('Test author');

    await signForm.getByLabel('Your password').fill(g.author.person.password);
    await signForm.getByRole('button', { name: 'Sign and lock' }).click();
    await author.getByTestId('countersign-pending').waitFor();
    expect(await author.getByTestId('countersign-pending').textContent()).toContain('Test supervisor');
    // 21 CFR 11.50(a): printed name, date and time, meaning shown with the signature.
    const signature = author.getByTestId('signature').first();
    expect(await signature.textContent()).toContain('Signed by Test author');
    expect(await signature.textContent()).toContain('I performed and recorded this work');
    await expect(author.getByTestId('record-state').textContent()).resolves.toContain('Record intact');
    await expect(author.getByRole('button', { name: 'Sign page' }).count()).resolves.toBe(0);

    const supervisor = await as(g.supervisor);
    await supervisor.getByRole('link', { name: 'To countersign' }).click();
    await supervisor.getByRole('link', { name: /Browser sign-off/ }).click();
    await supervisor.getByRole('button', { name: 'Countersign or return' }).click();
    const csForm = supervisor.getByRole('form', { name: 'Countersign' });
    await csForm.getByLabel('Your e-mail').fill(g.supervisor.person.email);
    await csForm.getByLabel('Your password').fill(g.supervisor.person.password);
    await csForm.getByRole('button', { name: 'Countersign' }).click();
    await supervisor.getByText('Countersigned by Test supervisor').waitFor();
    expect(await supervisor.getByText('Witnessed and understood').count()).toBeGreaterThan(0);

    await author.reload();
    await author.getByText('Countersigned by Test supervisor').waitFor();
    await expect(author.getByTestId('record-state').textContent()).resolves.toContain('Record intact');

    await author.getByRole('button', { name: 'Show audit trail' }).click();
    await author.getByRole('table', { name: 'Audit trail of this page' }).waitFor();
    expect(await author.getByRole('cell', { name: 'Countersigned', exact: true }).count()).toBe(1);
    expect(await author.getByRole('cell', { name: 'Failed signature attempt' }).count()).toBe(1);
  });
});
