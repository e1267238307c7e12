import { beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { signedIn } from '../support/api';
import { browserFrame } from '../support/browser';
import { newDemoNotebookPage } from '../support/fixtures';
import { getCollabHub } from '../../server/collab';
import { reference } from '../unit/chem/support/rdkit';

// The page editor in real headless Chromium against the real server (API + /collab websocket),
// which serves the built client from dist/client: run `npx vite build` first. Two demo chemists
// share one fresh page; the demo viewer reads it.

const frame = browserFrame();
let pageId: string;
const openPage = (email: string) => frame.openPage(pageId, email);

const pageText = (page: Page) => page.getByTestId('page-text');

/** Puts the caret at the end of the page's last paragraph (not on a structure block) and types. */
async function typeAtEnd(page: Page, text: string) {
  await pageText(page).locator('p').last().click();
  await page.keyboard.press('End');
  await page.keyboard.type(text);
}

async function structureFacts(page: Page, index: number) {
  const block = page.getByTestId('structure-block').nth(index);
  await block.getByTestId('structure-formula').waitFor({ timeout: 20_000 });
  return {
    label: await block.getByTestId('structure-label').textContent(),
    name: await block.getByTestId('structure-name').textContent(),
    formula: await block.getByTestId('structure-formula').textContent(),
    averageMass: await block.getByTestId('structure-average-mass').textContent(),
    monoisotopicMass: await block.getByTestId('structure-monoisotopic-mass').textContent(),
  };
}

async function openAddStructure(page: Page) {
  await page.getByRole('toolbar', { name: 'Formatting' }).getByRole('button', { name: /Body text|heading|list|steps|Checklist|note/ }).click();
  await page.getByRole('menuitem', { name: /Structure from text or file/ }).click();
  return page.getByRole('dialog', { name: 'Add a structure' });
}

let first: Page;
let second: Page;

beforeAll(async () => {
  pageId = await newDemoNotebookPage(frame.server.url, `Shared editing ${Date.now()}`);
  [first, second] = await Promise.all([openPage('chemist@saltmarsh.test'), openPage('chemist2@saltmarsh.test')]);
});

describe('page editor, two chemists on one page', () => {
  it('shows what one types to the other, both ways, and who is on the page', async () => {
    await pageText(first).click();
    await first.keyboard.type('Aim: methylation trial on pentane skeletons.');
    await expect.poll(() => pageText(second).textContent(), { timeout: 15_000 }).toContain('Aim: methylation trial on pentane skeletons.');

    await typeAtEnd(second, '');
    await second.keyboard.press('Enter');
    await second.keyboard.type('Observed: clear, colourless liquid.');
    await expect.poll(() => pageText(first).textContent(), { timeout: 15_000 }).toContain('Observed: clear, colourless liquid.');

    const people = first.getByRole('list', { name: 'On this page now' });
    await expect.poll(() => people.getByRole('listitem').count(), { timeout: 15_000 }).toBe(2);
    const me2 = await (await signedIn(frame.server.url, 'chemist2@saltmarsh.test')).get<{ name: string }>('/api/me');
    await expect(people.textContent()).resolves.toContain(me2.body.name);

    await first.screenshot({ path: '/tmp/editor-two-people.png', fullPage: true });
  });

  it('adds a structure from SMILES in one browser and shows the same name, formula and masses in both', async () => {
    const dialog = await openAddStructure(first);
    await dialog.getByLabel('SMILES or molfile').fill('CCC(C)CC');
    await dialog.getByLabel(/Label/).fill('compound 1');
    await dialog.getByRole('button', { name: 'Add to page' }).click();
    await dialog.waitFor({ state: 'detached' });

    const inFirst = await structureFacts(first, 0);
    await second.getByTestId('structure-block').first().waitFor({ timeout: 15_000 });
    const inSecond = await structureFacts(second, 0);
    expect(inSecond).toEqual(inFirst);

    // IUPAC 2013 P-44.3 (longest chain) and P-31.1.4 (lowest locants): 3-methylpentane.
    expect(inFirst.name).toBe('3-methylpentane');
    expect(inFirst.label).toBe('compound 1');
    // Formula and masses against @rdkit/rdkit, an independent library.
    const rd = await reference('CCC(C)CC');
    expect(inFirst.formula).toBe(`C${rd.counts.get('C')}H${rd.counts.get('H')}`);
    expect(inFirst.averageMass).toBe(`${rd.amw.toFixed(2)} g/mol`);
    expect(inFirst.monoisotopicMass).toBe(`${rd.exactmw.toFixed(4)} Da`);

    // The side panel lists it and "why this name" marks the five-carbon parent on the drawing.
    await expect(second.getByTestId('structure-entry').first().textContent()).resolves.toContain('3-methylpentane');
    await second.getByRole('button', { name: 'Why this name?' }).click();
    await expect(second.getByTestId('name-explanation').textContent()).resolves.toMatch(/pentane.*3-methyl/s);
    await expect(second.getByTestId('name-highlight').locator('text').count()).resolves.toBe(5);

    await second.screenshot({ path: '/tmp/editor-structure.png', fullPage: true });
  });

  it('refuses a malformed SMILES in the dialog with a clear message and inserts nothing', async () => {
    const before = await first.getByTestId('structure-block').count();
    const dialog = await openAddStructure(first);
    await dialog.getByLabel('SMILES or molfile').fill('CC(C');
    await dialog.getByRole('button', { name: 'Add to page' }).click();
    const alert = dialog.getByRole('alert');
    await alert.waitFor();
    // The naming engine's own message says what is wrong and where.
    await expect(alert.textContent()).resolves.toMatch(/never closed/);
    await first.screenshot({ path: '/tmp/editor-bad-smiles.png' });
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await dialog.waitFor({ state: 'detached' });

    expect(await first.getByTestId('structure-block').count()).toBe(before);
    // The other browser does not receive anything either (give a relayed change time to arrive).
    await typeAtEnd(first, ' Marker after refusal.');
    await expect.poll(() => pageText(second).textContent(), { timeout: 15_000 }).toContain('Marker after refusal.');
    expect(await second.getByTestId('structure-block').count()).toBe(before);
  });
});

describe('page history', () => {
  it('lists saved versions and opens one read only with the text of that moment', async () => {
    await getCollabHub(frame.server.deps).takeSnapshot(pageId, 'activity');
    await typeAtEnd(first, ' Written after the snapshot.');
    await expect.poll(() => pageText(second).textContent(), { timeout: 15_000 }).toContain('Written after the snapshot.');

    await second.getByRole('region', { name: 'Earlier versions' }).getByRole('button', { name: 'Show' }).click();
    await second.getByTestId('history-entry').first().click();
    const viewer = second.getByRole('dialog', { name: /Earlier version/ });
    const oldText = viewer.getByTestId('snapshot-text');
    await expect.poll(() => oldText.textContent(), { timeout: 15_000 }).toContain('Observed: clear, colourless liquid.');
    expect(await oldText.textContent()).not.toContain('Written after the snapshot.');
    await expect(oldText.getAttribute('contenteditable')).resolves.toBe('false');
    await viewer.getByTestId('structure-name').waitFor();
    await second.screenshot({ path: '/tmp/editor-history.png' });
    await viewer.getByRole('button', { name: 'Close' }).click();
  });
});

describe('page editor, a viewer', () => {
  it('sees the page live but cannot type into it', async () => {
    const viewer = await openPage('viewer@saltmarsh.test');
    await expect.poll(() => pageText(viewer).textContent(), { timeout: 15_000 }).toContain('Aim: methylation trial');
    await expect(pageText(viewer).getAttribute('contenteditable')).resolves.toBe('false');
    await viewer.getByTestId('read-only-note').waitFor();
    expect(await viewer.getByRole('toolbar', { name: 'Formatting' }).count()).toBe(0);
    expect(await viewer.getByRole('button', { name: 'Redraw' }).count()).toBe(0);

    // Wait until every structure block has finished naming, so the text can only change by typing.
    await expect.poll(() => viewer.getByText('Naming…').count(), { timeout: 15_000 }).toBe(0);
    const before = await pageText(viewer).textContent();
    await pageText(viewer).click();
    await viewer.keyboard.type('viewer was here');
    await viewer.waitForTimeout(500);
    expect(await pageText(viewer).textContent()).toBe(before);
    expect(await pageText(first).textContent()).not.toContain('viewer was here');

    // Still live: a chemist's change reaches the viewer.
    await typeAtEnd(first, ' Seen by the reader.');
    await expect.poll(() => pageText(viewer).textContent(), { timeout: 15_000 }).toContain('Seen by the reader.');
    await viewer.screenshot({ path: '/tmp/editor-viewer.png', fullPage: true });
  });
});
