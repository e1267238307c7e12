import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { signedIn, type ApiClient } from '../support/api';
import { browserFrame } from '../support/browser';
import { getCollabHub } from '../../server/collab';

// Someone demoted to reader while they have the page open: the server stops taking their edits
// and says so in its awareness entry, and their editor turns read-only with a notice instead of
// letting them type into nothing. In real headless Chromium against the real server; build the
// client first (`npx vite build`). chemist@ owns a notebook of this test's own, chemist2@ edits in it.

const frame = browserFrame();
let owner: ApiClient;
let notebookId: string;
let pageId: string;
let editorId: string;

const pageText = (page: Page) => page.getByTestId('page-text');
const editable = (page: Page) => pageText(page).getAttribute('contenteditable');

async function typeAtEnd(page: Page, text: string) {
  await pageText(page).locator('p').last().click();
  await page.keyboard.press('End');
  await page.keyboard.type(text);
}

async function setRole(role: 'reader' | 'editor') {
  const response = await owner.put(`/api/notebooks/${notebookId}/members`, { userId: editorId, role });
  expect(response.status).toBe(200);
}

let ownerPage: Page;
let editorPage: Page;

beforeAll(async () => {
  const { server } = frame;
  owner = await signedIn(server.url, 'chemist@saltmarsh.test');
  const me2 = await (await signedIn(server.url, 'chemist2@saltmarsh.test')).get<{ id: string }>('/api/me');
  editorId = me2.body.id;
  const notebook = await owner.post<{ id: string }>('/api/notebooks', { title: `Role changes while editing ${Date.now()}` });
  expect(notebook.status).toBe(201);
  notebookId = notebook.body.id;
  await setRole('editor');
  const page = await owner.post<{ id: string }>(`/api/notebooks/${notebookId}/pages`, { title: 'Ethyl butanoate, second run' });
  expect(page.status).toBe(201);
  pageId = page.body.id;
  [ownerPage, editorPage] = await Promise.all([frame.openPage(pageId, 'chemist@saltmarsh.test'), frame.openPage(pageId, 'chemist2@saltmarsh.test')]);
});

describe('a demotion while the page is open', () => {
  it('turns the demoted person’s editor read-only with a notice; what they type goes nowhere', async () => {
    await expect(editable(editorPage)).resolves.toBe('true');
    await typeAtEnd(editorPage, 'Charged 10 mmol butanoic acid.');
    await expect.poll(() => pageText(ownerPage).textContent(), { timeout: 15_000 }).toContain('Charged 10 mmol butanoic acid.');

    await setRole('reader');
    await expect.poll(() => editable(editorPage), { timeout: 15_000 }).toBe('false');
    const notice = editorPage.getByTestId('demoted-notice');
    await notice.waitFor({ timeout: 15_000 });
    await expect(notice.textContent()).resolves.toContain('no longer edit');
    await expect(editorPage.getByTestId('read-only-note').textContent()).resolves.toBe('Read only');
    // The formatting toolbar goes with the right to edit.
    await expect(editorPage.getByRole('toolbar', { name: 'Formatting' }).count()).resolves.toBe(0);
    await editorPage.screenshot({ path: '/tmp/editor-demoted.png', fullPage: true });

    await typeAtEnd(editorPage, ' Typed after the demotion.');
    // The owner's next edit still reaches the reader, and nothing of the reader's reaches the owner.
    await typeAtEnd(ownerPage, ' Owner: heated to reflux.');
    await expect.poll(() => pageText(editorPage).textContent(), { timeout: 15_000 }).toContain('Owner: heated to reflux.');
    await expect(pageText(ownerPage).textContent()).resolves.not.toContain('Typed after the demotion.');
    await expect(pageText(editorPage).textContent()).resolves.not.toContain('Typed after the demotion.');
    const stored = await getCollabHub(frame.server.deps).currentContent(pageId);
    expect(stored.text).toContain('Owner: heated to reflux.');
    expect(stored.text).not.toContain('Typed after the demotion.');
  });

  it('gives editing back when promoted again, without a reload', async () => {
    await setRole('editor');
    await expect.poll(() => editable(editorPage), { timeout: 15_000 }).toBe('true');
    await expect(editorPage.getByTestId('demoted-notice').count()).resolves.toBe(0);
    await typeAtEnd(editorPage, ' Editor again: cooled to room temperature.');
    await expect.poll(() => pageText(ownerPage).textContent(), { timeout: 15_000 }).toContain('Editor again: cooled to room temperature.');
  });
});
