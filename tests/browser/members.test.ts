import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext } from 'playwright-core';
import { launchBrowser, signIn } from '../support/browser';
import { startServer, type TestServer } from '../support/server';

// Notebook members screen in real headless Chromium against the real server (built client from
// dist/client: run `npx vite build` first). Accounts are the seeded demo people.
const PASSWORD = 'quillane-demo';

let server: TestServer;
let browser: Browser;
const contexts: BrowserContext[] = [];

beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
});

afterAll(async () => {
  await Promise.all(contexts.map((context) => context.close()));
  await browser?.close();
  await server?.close();
});

async function signedInPage(email: string) {
  const context = await browser.newContext();
  contexts.push(context);
  const page = await context.newPage();
  await signIn(page, server.url, email, PASSWORD);
  return page;
}

describe('notebook members', () => {
  it('lets a chemist who owns a notebook add people from the group directory, who then see it', async () => {
    const owner = await signedInPage('chemist@saltmarsh.test');
    const title = `Ethyl hexanoate screen ${Date.now()}`;
    await owner.getByRole('button', { name: 'New notebook' }).click();
    const create = owner.getByRole('form', { name: 'New notebook' });
    await create.getByLabel('Title').fill(title);
    await create.getByRole('button', { name: 'Create notebook' }).click();
    await owner.waitForURL(/\/notebooks\/[0-9a-f-]{36}$/);
    await owner.getByRole('link', { name: 'Members' }).click();

    const add = owner.getByRole('form', { name: 'Add a member' });
    const person = add.getByLabel('Person');
    const part = add.getByLabel('Part in this notebook');
    // The directory lists the whole seeded group except the owner, who is already a member.
    await person.locator('option', { hasText: 'Rafe Mossgiel' }).waitFor({ state: 'attached' });
    const offered = await person.locator('option').allTextContents();
    expect(offered).toContain('Rafe Mossgiel (Bench chemist)');
    expect(offered).toContain('Perpetua Lisle (Viewer)');
    expect(offered.some((label) => label.startsWith('Imke Sallow'))).toBe(false);

    await person.selectOption({ label: 'Rafe Mossgiel (Bench chemist)' });
    await part.selectOption('editor');
    await add.getByRole('button', { name: 'Add to notebook' }).click();
    const table = owner.getByRole('table', { name: 'Notebook members' });
    await expect(table.getByLabel('Part of Rafe Mossgiel').inputValue()).resolves.toBe('editor');

    // Org viewers are read-only: the form offers only "Reader" for them...
    await person.selectOption({ label: 'Perpetua Lisle (Viewer)' });
    await expect(part.locator('option').allTextContents()).resolves.toEqual(['Reader']);
    await add.getByRole('button', { name: 'Add to notebook' }).click();
    await expect(table.getByLabel('Part of Perpetua Lisle').inputValue()).resolves.toBe('reader');

    // ...and when asked for more anyway, the server's 422 viewer_read_only is shown and nothing changes.
    await table.getByLabel('Part of Perpetua Lisle').selectOption('editor');
    await expect(owner.getByRole('alert').textContent()).resolves.toBe('People with the viewer role can only be readers');
    await owner.reload();
    await expect(owner.getByRole('table', { name: 'Notebook members' }).getByLabel('Part of Perpetua Lisle').inputValue()).resolves.toBe('reader');

    // The new member sees the notebook on their shelf and may write in it, but not manage members.
    const member = await signedInPage('chemist2@saltmarsh.test');
    await member.getByRole('link', { name: new RegExp(title) }).click();
    await member.getByRole('form', { name: 'New page' }).waitFor();
    await member.getByRole('link', { name: 'Members' }).click();
    await member.getByRole('table', { name: 'Notebook members' }).getByRole('cell', { name: 'Rafe Mossgiel' }).waitFor();
    expect(await member.getByRole('form', { name: 'Add a member' }).count()).toBe(0);
    expect(await member.getByLabel('Part of Imke Sallow').count()).toBe(0);
  });
});
