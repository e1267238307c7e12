import { beforeAll, describe, expect, it } from 'vitest';
import type { Locator, Page } from 'playwright-core';
import { getCollabHub } from '../../server/collab';
import { browserFrame } from '../support/browser';
import { newDemoNotebookPage } from '../support/fixtures';
import { reference } from '../unit/chem/support/rdkit';

// The reagent list in real Chromium against the real server: one chemist inserts it from the
// block menu and fills a row, a second chemist sees it live, the demo viewer reads it. Build the
// client first (`npx vite build`). The hazard note is invented test text, not hazard data.

const frame = browserFrame();
let pageId: string;
const openPage = (email: string) => frame.openPage(pageId, email);

/** A field of a reagent row by its exact label ("Reagent" is also part of "Remove this reagent"). */
const cell = (row: Locator, label: string) => row.getByLabel(label, { exact: true });

let first: Page;
let second: Page;

beforeAll(async () => {
  pageId = await newDemoNotebookPage(frame.server.url, `Reagents ${Date.now()}`);
  [first, second] = await Promise.all([openPage('chemist@saltmarsh.test'), openPage('chemist2@saltmarsh.test')]);
});

describe('reagent list', () => {
  it('is inserted from the block menu, filled in one browser and shown with the caution in the other', async () => {
    await first.getByTestId('page-text').click();
    await first.keyboard.type('Procedure:');
    await first.getByRole('toolbar', { name: 'Formatting' }).getByRole('button', { name: /Body text|heading|list|steps|Checklist|note/ }).click();
    await first.getByRole('menuitem', { name: /Reagent list/ }).click();

    const block = first.getByTestId('reagents-block');
    const row = block.getByTestId('reagent-row').first();
    await cell(row, 'Reagent').fill('ethanol');
    await cell(row, 'SMILES').fill('CCO');
    await cell(row, 'Amount').fill('12.0');
    await cell(row, 'Unit').fill('mL');
    await cell(row, 'Equiv.').fill('3.0');
    await cell(row, 'Hazard notes').fill('H225 test note entered by hand');
    await cell(row, 'Hazard notes').press('Enter');
    // Typing in the table stays in the table: nothing of it reached the page's own text.
    await expect(first.getByTestId('page-text').locator('p').first().textContent()).resolves.toBe('Procedure:');

    await block.getByRole('button', { name: 'Add a reagent' }).click();
    await expect.poll(() => block.getByTestId('reagent-row').count()).toBe(2);
    await block.getByRole('button', { name: 'Remove this reagent' }).click();
    await expect.poll(() => block.getByTestId('reagent-row').count()).toBe(1);

    const seen = second.getByTestId('reagents-block').getByTestId('reagent-row').first();
    await expect.poll(() => cell(seen, 'Hazard notes').inputValue().catch(() => ''), { timeout: 15_000 }).toBe('H225 test note entered by hand');
    await expect(cell(seen, 'Reagent').inputValue()).resolves.toBe('ethanol');
    await expect(cell(seen, 'Amount').inputValue()).resolves.toBe('12.0');
    await expect(second.getByTestId('reagents-caution').textContent()).resolves.toMatch(
      /Hazard notes are the chemist.s own entries.*safety data sheet.*does not replace a risk assessment, local safety rules or a licensed professional.s judgement/,
    );

    // Formula and molar mass of the SMILES against @rdkit/rdkit, an independent library.
    const rd = await reference('CCO');
    await seen.getByTestId('reagent-formula').waitFor({ timeout: 20_000 });
    await expect(seen.getByTestId('reagent-formula').textContent()).resolves.toBe(`C${rd.counts.get('C')}H${rd.counts.get('H')}O · ${rd.amw.toFixed(2)} g/mol`);
    // IUPAC 2013 P-63.1.2 (alcohols named with the suffix -ol): ethanol (written from memory).
    await expect(seen.getByTestId('reagent-engine-name').textContent()).resolves.toBe('ethanol');
    await second.screenshot({ path: '/tmp/editor-reagents.png', fullPage: true });

    // The server's projection (what signatures cover) lists the row with its hazard notes.
    const content = await getCollabHub(frame.server.deps).currentContent(pageId);
    expect(content.text).toContain('[reagents]\n- ethanol; SMILES CCO; 12.0 mL; 3.0 equiv; hazard notes: H225 test note entered by hand\n');
  });

  it('is read only for a reader, with the hazard codes set apart and the caution shown', async () => {
    const viewer = await openPage('viewer@saltmarsh.test');
    const block = viewer.getByTestId('reagents-block');
    await block.waitFor({ timeout: 15_000 });
    await expect(block.locator('input, textarea').count()).resolves.toBe(0);
    await expect(block.getByRole('button').count()).resolves.toBe(0);
    await expect(block.getByTestId('hazard-code').textContent()).resolves.toBe('H225');
    await expect(block.getByTestId('reagent-row').first().textContent()).resolves.toContain('ethanol');
    await expect(block.getByTestId('reagents-caution').isVisible()).resolves.toBe(true);
  });
});
