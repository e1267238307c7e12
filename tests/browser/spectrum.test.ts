import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { signedIn } from '../support/api';
import { launchBrowser, signIn } from '../support/browser';
import { newDemoNotebookPage } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';
import { storedAttachmentKeys, uploadFiles } from '../support/uploads';

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
  pageId = await newDemoNotebookPage(server.url, 'Browser spectrum upload');
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
    const readout = plot.locator('.u-legend .u-series').first().locator('.u-value');
    // The legend follows the cursor on a later animation frame, and the plot may still be settling
    // into its final place: each poll brings it on screen, measures it, moves the cursor, then reads.
    const xAt = (fraction: number) =>
      expect.poll(async () => {
        // Mouse coordinates are the viewport's: the plot must be on screen where it is measured.
        await over.scrollIntoViewIfNeeded();
        const box = (await over.boundingBox())!;
        await page.mouse.move(box.x + box.width * fraction, box.y + box.height / 2);
        return Number((await readout.textContent())?.replace(/[^0-9.-]/g, ''));
      });
    await xAt(0.05).toBeGreaterThan(1780);
    await xAt(0.95).toBeLessThan(1720);
    await over.scrollIntoViewIfNeeded();
    const box = (await over.boundingBox())!;

    // Drag to zoom, then back to the whole spectrum.
    const reset = plot.getByRole('button', { name: 'Whole spectrum' });
    expect(await reset.isDisabled()).toBe(true);
    await page.mouse.move(box.x + box.width * 0.3, box.y + box.height / 2);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.7, box.y + box.height / 2, { steps: 5 });
    await page.mouse.up();
    await expect.poll(() => reset.isDisabled()).toBe(false);
    // Zoomed into the middle: the left edge now reads well below the 1800 cm⁻¹ end.
    await (await xAt(0.05)).toBeLessThan(1780);
    await reset.click();
    await expect.poll(() => reset.isDisabled()).toBe(true);
    await context.close();
  });

  it('shows a progress bar per file and cancels one upload without keeping anything', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, server.url, 'chemist@saltmarsh.test', 'quillane-demo');
    await page.goto(`${server.url}/pages/${pageId}`);
    const keysBefore = await storedAttachmentKeys(server.deps);
    // Chromium's own network throttling slows the upload enough to watch it and cancel it.
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: 128 * 1024 });

    const panel = page.getByRole('region', { name: 'Attached files' });
    await panel.getByTestId('attachment-input').setInputFiles([{ name: 'slow raw data.bin', mimeType: 'application/octet-stream', buffer: Buffer.alloc(12 * 1024 * 1024, 7) }]);
    const bar = panel.getByRole('progressbar', { name: 'Uploading slow raw data.bin' });
    await expect.poll(async () => Number(await bar.getAttribute('aria-valuenow')), { timeout: 15_000 }).toBeGreaterThan(0);
    expect(Number(await bar.getAttribute('aria-valuenow'))).toBeLessThan(50);
    await panel.getByRole('button', { name: 'Cancel upload of slow raw data.bin' }).click();
    await bar.waitFor({ state: 'detached' });

    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });
    const chemist = await signedIn(server.url, 'chemist@saltmarsh.test');
    // The server notices the aborted request: no object stays in the bucket and no row is written.
    await expect.poll(async () => (await storedAttachmentKeys(server.deps)).length, { timeout: 10_000 }).toBe(keysBefore.length);
    const list = await chemist.get(`/api/pages/${pageId}/attachments`);
    expect(list.body.map((a: { displayName: string }) => a.displayName)).not.toContain('slow raw data.bin');
    await context.close();
  });

  it('accepts files dropped onto the panel', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, server.url, 'chemist@saltmarsh.test', 'quillane-demo');
    await page.goto(`${server.url}/pages/${pageId}`);
    const panel = page.getByRole('region', { name: 'Attached files' });
    await panel.getByRole('button', { name: 'Add files' }).waitFor();
    const dataTransfer = await page.evaluateHandle(() => {
      const transfer = new DataTransfer();
      transfer.items.add(new File(['Chemical shift (ppm),Intensity\n0.9,10\n1.5,4\n2.0,30\n4.1,20\n'], 'dropped proton.csv', { type: 'text/csv' }));
      return transfer;
    });
    await panel.dispatchEvent('dragover', { dataTransfer });
    await panel.dispatchEvent('drop', { dataTransfer });
    const item = panel.getByTestId('attachment-item').filter({ hasText: 'dropped proton.csv' });
    await item.getByTestId('spectrum-thumbnail').waitFor();
    await context.close();
  });
});

describe('a viewer in the browser', () => {
  it('sees the files and the plot but is offered no way to add or remove files', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, server.url, 'viewer@saltmarsh.test', 'quillane-demo');
    await page.goto(`${server.url}/pages/${pageId}`);
    const panel = page.getByRole('region', { name: 'Attached files' });
    const item = panel.getByTestId('attachment-item').filter({ hasText: 'ester band.jdx' });
    await item.getByRole('button', { name: 'Show plot' }).click();
    await item.getByTestId('spectrum-plot').locator('canvas').waitFor();
    expect(await panel.getByRole('button', { name: 'Add files' }).count()).toBe(0);
    expect(await panel.getByRole('button', { name: 'Remove' }).count()).toBe(0);
    await context.close();
  });
});

describe('upload limit in the browser', () => {
  it('tells the chemist plainly when a file is over the limit and keeps nothing', async () => {
    const small = await startServer({ UPLOAD_MAX_BYTES: String(1024 * 1024) });
    const context = await browser.newContext();
    try {
      const page = await context.newPage();
      await signIn(page, small.url, 'chemist@saltmarsh.test', 'quillane-demo');
      await page.goto(`${small.url}/pages/${pageId}`);
      const panel = page.getByRole('region', { name: 'Attached files' });
      await panel.getByTestId('attachment-input').setInputFiles([{ name: 'too big.bin', mimeType: 'application/octet-stream', buffer: Buffer.alloc(3 * 1024 * 1024, 1) }]);
      const failed = panel.getByRole('listitem').filter({ hasText: 'too big.bin' });
      await expect(failed.getByRole('alert').textContent()).resolves.toContain('Files larger than 1 MB cannot be uploaded');
      const chemist = await signedIn(small.url, 'chemist@saltmarsh.test');
      const list = await chemist.get(`/api/pages/${pageId}/attachments`);
      expect(list.body.map((a: { displayName: string }) => a.displayName)).not.toContain('too big.bin');
      await failed.getByRole('button', { name: 'Dismiss' }).click();
      await failed.waitFor({ state: 'detached' });
    } finally {
      await context.close();
      await small.close();
    }
  });
});

describe('a spectrum inside the page text', () => {
  it('shows a spectrum linked to a structure block side by side with that structure', async () => {
    const chemist = await signedIn(server.url, 'chemist@saltmarsh.test');
    const textPage = await newDemoNotebookPage(server.url, 'Spectrum beside its structure');
    const uploaded = await uploadFiles(chemist, textPage, [{ name: 'ester IR.jdx', content: Buffer.from(infraredFile()) }]);
    expect(uploaded.status).toBe(201);

    const context = await browser.newContext({ viewport: { width: 1280, height: 1000 } });
    const page = await context.newPage();
    await signIn(page, server.url, 'chemist@saltmarsh.test', 'quillane-demo');
    await page.goto(`${server.url}/pages/${textPage}`);
    await page.locator('[data-testid="connection-state"][data-phase="live"]').waitFor({ timeout: 20_000 });

    // The page editor's own menus: a structure from SMILES (isoamyl acetate), then the file, linked to it.
    const toolbar = page.getByRole('toolbar', { name: 'Formatting' });
    const blockMenu = toolbar.getByRole('button', { name: /Body text|heading|list|steps|Checklist|note/ });
    await blockMenu.click();
    await page.getByRole('menuitem', { name: /Structure from text or file/ }).click();
    const dialog = page.getByRole('dialog', { name: 'Add a structure' });
    await dialog.getByLabel('SMILES or molfile').fill('CC(C)CCOC(C)=O');
    await dialog.getByLabel(/Label/).fill('compound 3');
    await dialog.getByRole('button', { name: 'Add to page' }).click();
    await page.getByTestId('structure-block').first().waitFor({ timeout: 20_000 });

    await blockMenu.click();
    await page.getByRole('menuitem', { name: /Attached file/ }).click();
    const picker = page.getByRole('dialog', { name: 'Show an attached file in the text' });
    await picker.getByRole('combobox').selectOption({ label: 'compound 3' });
    await picker.getByRole('button', { name: /ester IR\.jdx/ }).click();

    const embed = page.getByTestId('attachment-embed');
    const structure = embed.getByTestId('linked-structure');
    const plot = embed.getByTestId('spectrum-plot');
    await plot.locator('canvas').waitFor({ timeout: 20_000 });
    await structure.locator('svg').waitFor({ timeout: 20_000 });
    await expect(structure.textContent()).resolves.toContain('Spectrum of compound 3');
    const structureBox = (await structure.boundingBox())!;
    const plotBox = (await plot.boundingBox())!;
    // Side by side: the structure to the left of the plot, on the same band of the page.
    expect(structureBox.x + structureBox.width).toBeLessThanOrEqual(plotBox.x);
    expect(structureBox.y).toBeLessThan(plotBox.y + plotBox.height);
    expect(plotBox.y).toBeLessThan(structureBox.y + structureBox.height);
    await page.screenshot({ path: '/tmp/spectrum-linked.png', fullPage: true });
    await context.close();
  });
});
