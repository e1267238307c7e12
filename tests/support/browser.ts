import { chromium, type Browser, type Page } from 'playwright-core';

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
