import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { browserFrame } from '../support/browser';
import { newDemoNotebookPage } from '../support/fixtures';

// Block-level editing in real Chromium against the real server: a dropped .mol file, the
// drawing pad, the block menu and our keyboard map. Build the client first (`npx vite build`).

// 2-methylbutane as a V2000 molfile written by hand (CTfile format: counts line, atom block,
// bond block); atoms 1–4 form the chain, atom 5 is the methyl on atom 2.
const methylbutaneMolfile = [
  '',
  '  hand-written',
  '',
  '  5  4  0  0  0  0  0  0  0  0999 V2000',
  '    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
  '    0.8660    0.5000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
  '    1.7321    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
  '    2.5981    0.5000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
  '    0.8660    1.5000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
  '  1  2  1  0  0  0  0',
  '  2  3  1  0  0  0  0',
  '  3  4  1  0  0  0  0',
  '  2  5  1  0  0  0  0',
  'M  END',
  '',
].join('\n');

const frame = browserFrame();
let page: Page;

beforeAll(async () => {
  const pageId = await newDemoNotebookPage(frame.server.url, `Blocks ${Date.now()}`);
  page = await frame.openPage(pageId, 'chemist@saltmarsh.test');
});

describe('page editor blocks', () => {
  it('turns a dropped .mol file into a named structure block', async () => {
    await page.getByTestId('page-text').click();
    await page.keyboard.type('Reference hydrocarbon:');
    await page.getByTestId('page-text').evaluate((element, molfile) => {
      const transfer = new DataTransfer();
      transfer.items.add(new File([molfile], 'isopentane.mol', { type: 'chemical/x-mdl-molfile' }));
      element.dispatchEvent(new DragEvent('drop', { dataTransfer: transfer, bubbles: true, cancelable: true, clientX: 400, clientY: 300 }));
    }, methylbutaneMolfile);
    const block = page.getByTestId('structure-block');
    await block.getByTestId('structure-formula').waitFor({ timeout: 20_000 });
    // IUPAC 2013 P-31.1.4 (lowest locants): 2-methylbutane, C5H12 (written from memory).
    await expect(block.getByTestId('structure-name').textContent()).resolves.toBe('2-methylbutane');
    await expect(block.getByTestId('structure-formula').textContent()).resolves.toBe('C5H12');
    await expect(block.getByTestId('structure-label').textContent()).resolves.toBe('isopentane');
  });

  it('refuses a dropped .mol file that holds no structure, saying why', async () => {
    await page.getByTestId('page-text').evaluate((element) => {
      const transfer = new DataTransfer();
      transfer.items.add(new File(['not a molfile'], 'broken.mol'));
      element.dispatchEvent(new DragEvent('drop', { dataTransfer: transfer, bubbles: true, cancelable: true }));
    });
    await expect(page.getByRole('alert').filter({ hasText: 'broken.mol' }).textContent()).resolves.toMatch(/does not hold a molfile/);
    expect(await page.getByTestId('structure-block').count()).toBe(1);
  });

  it('reopens the structure in the drawing pad and switches the name style', async () => {
    // The style switch asks the engine again; the block shows its answer for that style.
    await page.getByRole('button', { name: 'Traditional' }).click();
    await expect(page.getByRole('button', { name: 'Traditional' }).getAttribute('aria-pressed')).resolves.toBe('true');
    await expect.poll(() => page.getByTestId('structure-name').textContent()).toMatch(/methylbutane|isopentane/);
    await page.getByRole('button', { name: 'Redraw' }).click();
    const dialog = page.getByRole('dialog', { name: 'Redraw the structure' });
    await dialog.getByTestId('drawing-pad').locator('canvas').first().waitFor({ timeout: 20_000 });
    await page.screenshot({ path: '/tmp/editor-drawing-pad.png' });
    await dialog.getByRole('button', { name: 'Cancel' }).click();
  });

  it('switches blocks from the block menu and formats with our keys', async () => {
    await page.getByTestId('page-text').locator('p').last().click();
    await page.keyboard.press('End');
    await page.keyboard.press('Enter');
    await page.keyboard.type('Dry the flask');
    await page.getByRole('toolbar', { name: 'Formatting' }).getByRole('button', { name: 'Body text' }).click();
    await page.getByRole('menuitem', { name: /Checklist/ }).click();
    await page.getByTestId('page-text').locator('li.qn-check', { hasText: 'Dry the flask' }).waitFor();

    await page.keyboard.press('Enter');
    await page.keyboard.press('Enter');
    await page.keyboard.press('Control+Alt+2');
    await page.keyboard.type('Observations');
    await page.getByTestId('page-text').locator('h2', { hasText: 'Observations' }).waitFor();

    await page.keyboard.press('Enter');
    await page.keyboard.type('H');
    await page.keyboard.press('Control+Comma');
    await page.keyboard.type('2');
    await page.keyboard.press('Control+Comma');
    await page.keyboard.type('O condensed');
    await expect(page.getByTestId('page-text').locator('.qn-sub').textContent()).resolves.toBe('2');
    await page.screenshot({ path: '/tmp/editor-blocks.png', fullPage: true });
  });
});
