import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { signedIn } from '../support/api';
import { launchBrowser, signIn } from '../support/browser';
import { startServer, type TestServer } from '../support/server';

// Uploads a spectrum through the page's file panel in real headless Chromium against the real
// server (built client from dist/client: run `npx vite build` first) and looks at the plot.

let server: TestServer;
let browser: Browser;
let pageId: string;

// An infrared file in AFFN X++(Y..Y) form (JCAMP-DX 4.24; McDonald & Wilks, Appl. Spectrosc. 42
// (1988) 151), written here: one strong band at 1740 cm⁻¹ between 1800 and 1700 cm⁻¹.
function infraredFile(): string {
  const y = Array.from({ length: 51 }, (_, i) => Math.round(9000 - 7000 / (1 + ((1800 - 2 * i - 1740) / 6) ** 2)));
  const lines = [];
  for (let i = 0; i < y.length; i += 10) lines.push(`${1800 - 2 * i} ${y.slice(i, i + 10).join(' ')}`);
  return [
    '##TITLE= Browser test ester band',
    '##JCAMP-DX= 4.24',
    '##DATA TYPE= INFRARED SPECTRUM',
    '##XUNITS= 1/CM',
    '##YUNITS= TRANSMITTANCE',
    '##XFACTOR= 1',
    '##YFACTOR= 0.0001',
    '##FIRSTX= 1800',
    '##LASTX= 1700',
    '##DELTAX= -2',
    '##NPOINTS= 51',
    '##XYDATA= (X++(Y..Y))',
    ...lines,
    '##END=',
    '',
  ].join('\n');
}

beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
  const chemist = await signedIn(server.url, 'chemist@saltmarsh.test');
  const notebooks = await chemist.get('/api/notebooks');
  const notebook = notebooks.body.find((n: { title: string }) => n.title === 'Fruity esters from short-chain acids');
  pageId = (await chemist.post(`/api/notebooks/${notebook.id}/pages`, { title: 'Browser spectrum upload' })).body.id;
});

afterAll(async () => {
  await browser?.close();
  await server?.close();
});

describe('spectrum upload in the browser', () => {
  it('uploads a JCAMP-DX file, lists it with a thumbnail and plots it with the file units, wavenumbers high to low', async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 1000 } });
    const page = await context.newPage();
    await signIn(page, server.url, 'chemist@saltmarsh.test', 'quillane-demo');
    await page.goto(`${server.url}/pages/${pageId}`);

    const panel = page.getByRole('region', { name: 'Attached files' });
    await panel.getByText('No files attached yet.').waitFor();
    await panel.getByTestId('attachment-input').setInputFiles([
      { name: 'ester band.jdx', mimeType: 'chemical/x-jcamp-dx', buffer: Buffer.from(infraredFile()) },
      { name: 'broken.jdx', mimeType: 'chemical/x-jcamp-dx', buffer: Buffer.from('##TITLE= broken\n##XYDATA= (X++(Y..Y))\n1 zz\n##END=\n') },
    ]);

    const item = panel.getByTestId('attachment-item').filter({ hasText: 'ester band.jdx' });
    await item.waitFor();
    await item.getByTestId('spectrum-thumbnail').waitFor();
    const broken = panel.getByTestId('attachment-item').filter({ hasText: 'broken.jdx' });
    await expect(broken.getByTestId('parse-error').textContent()).resolves.toContain('is not allowed in JCAMP-DX data');

    await item.getByRole('button', { name: 'Show plot' }).click();
    const plot = item.getByTestId('spectrum-plot');
    await plot.locator('canvas').waitFor();
    await expect(plot.textContent()).resolves.toContain('Browser test ester band');
    // Axis titles from ##XUNITS / ##YUNITS, written "quantity / unit".
    const labels = await plot.locator('.u-label').allTextContents();
    expect(labels).toEqual(expect.arrayContaining(['Wavenumber / cm⁻¹', 'Transmittance']));

    // Wavenumbers run high to low: the cursor near the left edge reads a larger x than near the right.
    const over = plot.locator('.u-over');
    const box = (await over.boundingBox())!;
    const readX = async (fraction: number) => {
      await page.mouse.move(box.x + box.width * fraction, box.y + box.height / 2);
      return Number((await plot.locator('.u-legend .u-series').first().locator('.u-value').textContent())?.replace(/[^0-9.-]/g, ''));
    };
    const left = await readX(0.05);
    const right = await readX(0.95);
    expect(left).toBeGreaterThan(1780);
    expect(right).toBeLessThan(1720);

    // Drag to zoom, then back to the whole spectrum.
    const reset = plot.getByRole('button', { name: 'Whole spectrum' });
    expect(await reset.isDisabled()).toBe(true);
    await page.mouse.move(box.x + box.width * 0.3, box.y + box.height / 2);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.7, box.y + box.height / 2, { steps: 5 });
    await page.mouse.up();
    await expect.poll(() => reset.isDisabled()).toBe(false);
    const zoomedLeft = await readX(0.05);
    expect(zoomedLeft).toBeLessThan(left);
    await reset.click();
    await expect.poll(() => reset.isDisabled()).toBe(true);
    await context.close();
  });
});
