import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { launchBrowser, signIn } from '../support/browser';
import { startServer, type TestServer } from '../support/server';

// The client shell in real headless Chromium against the real server, which serves the built
// client from dist/client (run `npx vite build` first). Accounts are the seeded demo people.
const PASSWORD = 'quillane-demo';

let server: TestServer;
let browser: Browser;
let context: BrowserContext;
let page: Page;

beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function freshPage(): Promise<Page> {
  await context?.close();
  context = await browser.newContext();
  page = await context.newPage();
  return page;
}

describe('client shell', () => {
  it('sends a visitor without a session to sign-in and back to where they were going', async () => {
    const page = await freshPage();
    await page.goto(`${server.url}/notebooks`);
    await page.getByRole('form', { name: 'Sign in' }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    expect(new URL(page.url()).searchParams.get('next')).toBe('/notebooks');

    const form = page.getByRole('form', { name: 'Sign in' });
    await form.getByLabel('E-mail').fill('chemist@saltmarsh.test');
    await form.getByLabel('Password').fill('not-the-password');
    await form.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert').first().textContent()).resolves.toContain('do not match');

    await form.getByLabel('Password').fill(PASSWORD);
    await form.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Notebooks', level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/notebooks');
  });

  it('lets a chemist open a notebook, read its pages table and start a page', async () => {
    const page = await freshPage();
    await signIn(page, server.url, 'chemist@saltmarsh.test', PASSWORD);
    await page.getByRole('link', { name: /Fruity esters from short-chain acids/ }).click();

    const table = page.getByRole('table', { name: 'Pages of this notebook' });
    await table.getByRole('link', { name: 'Isoamyl acetate, first batch' }).waitFor();
    const numbersBefore = (await table.locator('tbody tr td:first-child').allTextContents()).map(Number);
    expect(numbersBefore.length).toBeGreaterThanOrEqual(3);
    const headers = await table.locator('thead th').allTextContents();
    expect(headers).toEqual(['No.', 'Title', 'Author', 'Status', 'Last change']);

    // The shared zod schema refuses an empty title before anything is sent.
    const newPage = page.getByRole('form', { name: 'New page' });
    await newPage.getByRole('button', { name: 'Start page' }).click();
    await expect(newPage.getByRole('alert').textContent()).resolves.toBe('Title of the new page is required');

    const title = `Methyl salicylate trial ${Date.now()}`;
    await newPage.getByLabel('Title of the new page').fill(title);
    await newPage.getByRole('button', { name: 'Start page' }).click();

    await page.waitForURL(/\/pages\/[0-9a-f-]{36}$/);
    await expect(page.getByLabel('Title', { exact: true }).inputValue()).resolves.toBe(title);
    expect(await page.locator('[data-slot="page-body"]').count()).toBe(1);
    await expect(page.getByTestId('safety-note').textContent()).resolves.toContain('does not replace a risk assessment');

    await page.getByRole('navigation', { name: 'Where you are' }).getByRole('link', { name: 'Fruity esters from short-chain acids' }).click();
    const row = table.locator('tbody tr', { hasText: title });
    await row.waitFor();
    const number = Number(await row.locator('td').first().textContent());
    expect(number).toBe(Math.max(...numbersBefore) + 1);
  });

  it('lets an admin invite someone, read the invitation in the mail room, and the invitee join through its link', async () => {
    const page = await freshPage();
    await signIn(page, server.url, 'admin@saltmarsh.test', PASSWORD);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'People and roles' }).click();

    const email = `newcomer-${Date.now()}@saltmarsh.test`;
    const invite = page.getByRole('form', { name: 'Invite someone' });
    await invite.getByLabel('Name').fill('Rowan Newcomer');
    await invite.getByLabel('E-mail').fill(email);
    await invite.getByLabel('Role').selectOption('chemist');
    await invite.getByRole('button', { name: 'Send invitation' }).click();
    await invite.getByText(`Invitation sent to ${email}.`).waitFor();

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Mail room' }).click();
    await page.getByRole('list', { name: 'Caught mail' }).getByRole('link', { name: new RegExp(email) }).click();
    const message = page.getByRole('article', { name: 'Message' });
    await expect(message.textContent()).resolves.toContain(email);
    const link = await message.getByTestId('mail-body').getByRole('link').first().getAttribute('href');
    expect(link).toMatch(/\/invite\/[^/]+$/);

    // The link from the mail opens the invitation for that very address.
    const invitee = await browser.newContext();
    const inviteePage = await invitee.newPage();
    await inviteePage.goto(link!.replace(/^https?:\/\/[^/]+/, server.url));
    await expect(inviteePage.getByText(`You were invited as ${email}`).textContent()).resolves.toContain('Bench chemist');
    await inviteePage.getByLabel('New password').fill('reed-and-tide-2026');
    await inviteePage.getByLabel('Repeat the password').fill('reed-and-tide-2026');
    await inviteePage.getByRole('button', { name: 'Set password and sign in' }).click();
    await expect(inviteePage.getByTestId('signed-in-name').textContent()).resolves.toBe('Rowan Newcomer');
    expect(new URL(inviteePage.url()).pathname).toBe('/notebooks');
    await invitee.close();
  });

  it('shows a non-admin the refusal on admin screens and a not-found state for unknown pages', async () => {
    const page = await freshPage();
    await signIn(page, server.url, 'chemist@saltmarsh.test', PASSWORD);
    expect(await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Mail room' }).count()).toBe(0);

    await page.goto(`${server.url}/mail`);
    await expect(page.getByRole('alert').textContent()).resolves.toContain('Not open to you');

    await page.goto(`${server.url}/pages/00000000-0000-4000-8000-000000000000`);
    await expect(page.getByRole('alert').textContent()).resolves.toContain('Nothing here');
  });
});
