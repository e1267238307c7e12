import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import type { Browser, Page } from 'playwright-core';
import { closeBrowser, launchBrowser, openEditorPage } from '../support/browser';
import { newDemoNotebookPage } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';
import { freePort } from '../../server/services/ports';
import { pageContent } from '../../server/db/schema';

// Offline editing and the merge on reconnect (issue 5), in real headless Chromium against the
// real server. Playwright's offline mode does not close a websocket that is already open, so the
// server itself goes away instead: its close() drops every collaboration connection. A new server
// on the same port and the same database takes the clients back. Build the client first
// (`npx vite build`).

let port: number;
let server: TestServer | null = null;
let browser: Browser;
let pageId: string;

const serverUrl = () => `http://127.0.0.1:${port}`;
const pageText = (page: Page) => page.getByTestId('page-text');
const badge = (page: Page) => page.getByTestId('connection-state');

const openPage = (email: string) => openEditorPage(browser, serverUrl(), pageId, email);

/** A new paragraph after the page's last one, with the text typed into it. */
async function typeNewParagraph(page: Page, text: string) {
  await pageText(page).locator('p').last().click();
  await page.keyboard.press('End');
  await page.keyboard.press('Enter');
  await page.keyboard.type(text);
}

/** The page's paragraphs as the browser shows them (Lexical renders an empty one as <p><br></p>). */
const paragraphs = (page: Page) => pageText(page).locator('p').allTextContents();

async function storedText(): Promise<string | null> {
  const [row] = await server!.deps.db.select({ text: pageContent.text }).from(pageContent).where(eq(pageContent.pageId, pageId));
  return row?.text ?? null;
}

const before = 'Plan: esterify butanoic acid with ethanol.';
const fromFirst = 'Offline, chemist one: reflux started at 14:05.';
const fromSecond = 'Offline, chemist two: Dean-Stark trap fitted.';

beforeAll(async () => {
  port = await freePort();
  server = await startServer({ PORT: String(port) });
  browser = await launchBrowser();
  pageId = await newDemoNotebookPage(serverUrl(), `Reconnect ${Date.now()}`);
});

afterAll(async () => {
  await closeBrowser(browser);
  await server?.close();
});

describe('page editor, connection lost and back', () => {
  it('keeps both chemists writing while the server is away and merges both edits when it is back', async () => {
    // A shared line stored before the second editor opens, so both start from the same state.
    const first = await openPage('chemist@saltmarsh.test');
    await pageText(first).click();
    await first.keyboard.type(before);
    await expect.poll(storedText, { timeout: 15_000 }).toBe(before);
    const second = await openPage('chemist2@saltmarsh.test');
    await expect.poll(() => paragraphs(second), { timeout: 15_000 }).toEqual([before]);

    // The server goes away: both editors say so, and neither locks the page.
    await server!.close();
    server = null;
    for (const page of [first, second]) {
      await expect.poll(() => badge(page).getAttribute('data-phase'), { timeout: 15_000 }).toBe('reconnecting');
      await expect(pageText(page).getAttribute('contenteditable')).resolves.toBe('true');
    }

    await typeNewParagraph(first, fromFirst);
    await typeNewParagraph(second, fromSecond);
    for (const page of [first, second]) {
      await expect.poll(() => badge(page).getAttribute('data-phase'), { timeout: 5_000 }).toBe('offline-with-edits');
      await expect(badge(page).textContent()).resolves.toBe('Offline, edits kept here');
    }
    // Nothing can have crossed: each browser holds only its own offline line.
    expect(await pageText(first).textContent()).not.toContain(fromSecond);
    expect(await pageText(second).textContent()).not.toContain(fromFirst);
    await first.screenshot({ path: '/tmp/editor-reconnect-offline.png' });

    // The same address and database again: the clients find it by themselves (y-websocket backs off to 2.5 s at most).
    server = await startServer({ PORT: String(port) });
    for (const page of [first, second]) {
      await expect.poll(() => badge(page).getAttribute('data-phase'), { timeout: 20_000 }).toBe('live');
      await expect(badge(page).textContent()).resolves.toBe('Live');
    }
    for (const page of [first, second]) {
      await expect.poll(() => pageText(page).textContent(), { timeout: 15_000 }).toContain(fromFirst);
      await expect.poll(() => pageText(page).textContent(), { timeout: 15_000 }).toContain(fromSecond);
    }
    const merged = await paragraphs(first);
    expect(await paragraphs(second)).toEqual(merged);
    // Yjs orders concurrent inserts at one place by client id, so either line may come first; both follow the shared start.
    expect(merged[0]).toBe(before);
    expect([...merged.slice(1)].sort()).toEqual([fromFirst, fromSecond].sort());
    await first.screenshot({ path: '/tmp/editor-reconnect-merged.png' });

    // What the server stored is the merged page: its projection (written shortly after the last
    // change) lists the same paragraphs, and a browser that opens the page afresh shows them.
    await expect.poll(storedText, { timeout: 15_000 }).toBe(merged.join('\n\n'));
    const third = await openPage('supervisor@saltmarsh.test');
    await expect.poll(() => paragraphs(third), { timeout: 15_000 }).toEqual(merged);
  });
});
