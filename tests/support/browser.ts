import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { DEMO_PASSWORD } from './api';
import { startServer, type TestServer } from './server';

/** Debian's headless Chromium; `npx playwright install` cannot work on these machines. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking'],
  });
}

/** Signs in through the real sign-in form and waits until the signed-in frame shows. */
export async function signIn(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  const form = page.getByRole('form', { name: 'Sign in' });
  await form.getByLabel('E-mail').fill(email);
  await form.getByLabel('Password').fill(password);
  await form.getByRole('button', { name: 'Sign in' }).click();
  await page.getByTestId('signed-in-name').waitFor();
}

/** Page `pageId` in a fresh, desktop-sized context where the demo person `email` is signed in, once its editor is live. */
export async function openEditorPage(browser: Browser, baseUrl: string, pageId: string, email: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1400, height: 1000 } });
  const page = await context.newPage();
  await signIn(page, baseUrl, email, DEMO_PASSWORD);
  await page.goto(`${baseUrl}/pages/${pageId}`);
  await page.locator('[data-testid="connection-state"][data-phase="live"]').waitFor({ timeout: 20_000 });
  return page;
}

/** Every context first (so their websockets close before the server does), then the browser. */
export async function closeBrowser(browser: Browser | undefined): Promise<void> {
  for (const context of browser?.contexts() ?? []) await context.close();
  await browser?.close();
}

export interface BrowserFrame {
  server: TestServer;
  browser: Browser;
  /** See openEditorPage. */
  openPage(pageId: string, email: string): Promise<Page>;
}

/** A server and a headless Chromium of this file's own, registered as the file's hooks. */
export function browserFrame(): BrowserFrame {
  const frame: BrowserFrame = {
    server: null as unknown as TestServer,
    browser: null as unknown as Browser,
    openPage: (pageId, email) => openEditorPage(frame.browser, frame.server.url, pageId, email),
  };
  beforeAll(async () => {
    frame.server = await startServer();
    frame.browser = await launchBrowser();
  });
  afterAll(async () => {
    await closeBrowser(frame.browser);
    await frame.server?.close();
  });
  return frame;
}
