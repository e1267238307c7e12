import { and, desc, eq } from 'drizzle-orm';
import { beforeAll, describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { getCollabHub } from '../../server/collab';
import { auditEvents, collabDocuments, collabUpdates, pageContent, pages, users } from '../../server/db/schema';
import { StructureNode } from '../../shared/editor';
import { ApiClient, signedIn } from '../support/api';
import { eventually, lexicalEditorOn, startCollabServer, waitFor, writeBlocks, type CollabClient } from '../support/collab';
import { demoNotebookFrame } from '../support/collabFrame';
import type { TestServer } from '../support/server';

// Short timings so the background work (projection, compaction, idle snapshots, unloading) happens
// within a test; the production defaults are in server/collab/timings.ts.
const frame = demoNotebookFrame(() =>
  startCollabServer({ projectionDelayMs: 50, projectionMaxDelayMs: 200, compactAfterUpdates: 5, unloadAfterMs: 100, tickMs: 100 }),
);
const { newPage, join } = frame;
let server: TestServer;
let chemist: ApiClient;
let chemist2: ApiClient;
let notebookId: string;

beforeAll(async () => {
  ({ server, chemist, notebookId } = frame);
  chemist2 = await signedIn(server.url, 'chemist2@saltmarsh.test');
});

function writeParagraph(client: CollabClient, text: string, structure?: { key: string; smiles: string; molfile: string }) {
  writeBlocks(lexicalEditorOn(client), [text], () =>
    structure ? [new StructureNode({ structureKey: structure.key, molfile: structure.molfile, smiles: structure.smiles, label: 'compound 1' })] : [],
  );
}

// Isoamyl acetate (3-methylbutyl acetate), written from memory as SMILES; the molfile text is only
// carried, never parsed, by the collaboration server.
const ISOAMYL_ACETATE = { key: 's-1', smiles: 'CC(C)CCOC(C)=O', molfile: '\n  Quillane\n\n  0  0  0  0  0  0            999 V2000\nM  END\n' };

describe('page projection (page_content)', () => {
  it('keeps text, Lexical JSON and structures current, and moves the page updatedAt', async () => {
    const pageId = await newPage('Projection');
    const [before] = await server.deps.db.select({ updatedAt: pages.updatedAt }).from(pages).where(eq(pages.id, pageId));
    const client = await join(chemist, pageId);
    writeParagraph(client, 'Isoamyl alcohol (10 mL) and acetic acid were refluxed.', ISOAMYL_ACETATE);

    const row = await eventually(
      async () => (await server.deps.db.select().from(pageContent).where(eq(pageContent.pageId, pageId)))[0],
      (found) => found !== undefined,
      'the projection row',
    );
    expect(row.text).toContain('Isoamyl alcohol (10 mL) and acetic acid were refluxed.');
    expect(row.text).toContain('[structure compound 1: CC(C)CCOC(C)=O]');
    expect(row.structures).toEqual([{ key: 's-1', smiles: ISOAMYL_ACETATE.smiles, molfile: ISOAMYL_ACETATE.molfile }]);
    const json = row.json as { root: { children: { type: string }[] } };
    expect(json.root.children.map((c) => c.type)).toEqual(['paragraph', 'structure']);
    const [after] = await server.deps.db.select({ updatedAt: pages.updatedAt }).from(pages).where(eq(pages.id, pageId));
    expect(after.updatedAt.getTime()).toBeGreaterThan(before.updatedAt.getTime());
  });

  it('currentContent includes an edit made just before the call', async () => {
    const pageId = await newPage('Content for signing');
    const writer = await join(chemist, pageId);
    const observer = await join(chemist2, pageId);
    writeParagraph(writer, 'Final yield 6.1 g.');
    await waitFor(() => observer.root.toJSON().includes('Final yield'), 'the edit relayed');
    const content = await getCollabHub(server.deps).currentContent(pageId);
    expect(content.text).toBe('Final yield 6.1 g.');
    expect(content.structures).toEqual([]);
  });
});

describe('compaction and unloading', () => {
  it('folds appended updates into one state row without losing anything', async () => {
    const pageId = await newPage('Compaction');
    const writer = await join(chemist, pageId);
    const observer = await join(chemist2, pageId);
    for (let i = 0; i < 12; i += 1) {
      writer.root.insert(writer.root.length, `${i};`);
      await waitFor(() => observer.root.toString().endsWith(`${i};`), `edit ${i}`);
    }
    await getCollabHub(server.deps).currentContent(pageId);
    const [compacted] = await server.deps.db.select().from(collabDocuments).where(eq(collabDocuments.pageId, pageId));
    expect(compacted).toBeDefined();
    const left = await server.deps.db.select().from(collabUpdates).where(eq(collabUpdates.pageId, pageId));
    expect(left.length).toBeLessThan(5);
    const rebuilt = new Y.Doc();
    Y.applyUpdate(rebuilt, compacted.state);
    for (const row of left) Y.applyUpdate(rebuilt, row.update);
    expect(rebuilt.get('root', Y.XmlText).toString()).toBe(writer.root.toString());
  });

  it('unloads a page nobody has open and reloads it intact', async () => {
    const pageId = await newPage('Unload and reload');
    const writer = await join(chemist, pageId);
    writer.root.insert(0, 'kept after unloading');
    const observer = await join(chemist2, pageId);
    await waitFor(() => observer.root.toString() === 'kept after unloading', 'the edit relayed');
    writer.destroy();
    observer.destroy();
    // Unloading ends with a history snapshot of the session ('idle') and a compaction.
    const history = await eventually(() => chemist.get(`/api/pages/${pageId}/history`), (r) => r.body.length > 0, 'the idle snapshot');
    expect(history.body.map((s: { reason: string }) => s.reason)).toEqual(['idle']);
    await eventually(
      () => server.deps.db.select().from(collabUpdates).where(eq(collabUpdates.pageId, pageId)),
      (rows) => rows.length === 0,
      'the compaction at unloading',
    );
    const later = await join(chemist2, pageId);
    expect(later.root.toString()).toBe('kept after unloading');
  });
});

describe('history snapshots and the history API', () => {
  it('lists snapshots with their authors and serves each as a Yjs state', async () => {
    const pageId = await newPage('History');
    const a = await join(chemist, pageId);
    const b = await join(chemist2, pageId);
    a.root.insert(0, 'version one');
    await waitFor(() => b.root.toString() === 'version one', 'first version relayed');
    const hub = getCollabHub(server.deps);
    const first = await hub.takeSnapshot(pageId, 'signed');
    b.root.insert(b.root.length, ', amended');
    await waitFor(() => a.root.toString() === 'version one, amended', 'second version relayed');
    const second = await hub.takeSnapshot(pageId, 'manual');

    const list = await chemist.get(`/api/pages/${pageId}/history`);
    expect(list.status).toBe(200);
    expect(list.body.map((s: { id: string }) => s.id)).toEqual([second, first]);
    const names = async (email: string) =>
      (await server.deps.db.select({ id: users.id, name: users.name }).from(users).where(eq(users.email, email)))[0];
    expect(list.body[1]).toMatchObject({ reason: 'signed', authors: [await names('chemist@saltmarsh.test')] });
    expect(list.body[0]).toMatchObject({ reason: 'manual', authors: [await names('chemist2@saltmarsh.test')] });

    const old = await chemist2.get(`/api/pages/${pageId}/history/${first}`);
    expect(old.status).toBe(200);
    const doc = new Y.Doc();
    Y.applyUpdate(doc, Buffer.from(old.body.update, 'base64'));
    expect(doc.get('root', Y.XmlText).toString()).toBe('version one');
  });

  it('refuses strangers, signed-out callers and snapshots of other pages', async () => {
    const pageId = await newPage('History refusals');
    const otherPage = await newPage('Another page');
    const snapshot = await getCollabHub(server.deps).takeSnapshot(otherPage, 'manual');
    expect((await new ApiClient(server.url).get(`/api/pages/${pageId}/history`)).status).toBe(401);
    const admin = await signedIn(server.url, 'admin@saltmarsh.test');
    const own = await chemist2.post('/api/notebooks', { title: 'Kept apart' });
    const privatePage = await chemist2.post(`/api/notebooks/${own.body.id}/pages`, { title: 'Private' });
    expect((await chemist.get(`/api/pages/${privatePage.body.id}/history`)).status).toBe(404);
    expect((await admin.get(`/api/pages/${privatePage.body.id}/history`)).status).toBe(200);
    const crossed = await chemist.get(`/api/pages/${pageId}/history/${snapshot}`);
    expect(crossed.status).toBe(404);
    expect(crossed.body.error.code).toBe('not_found');
    expect((await chemist.get(`/api/pages/${pageId}/history/not-an-id`)).status).toBe(404);
  });
});

describe('editing sessions in the audit trail', () => {
  it('records who edited and the first and last update time when the page is locked', async () => {
    const pageId = await newPage('Editing session');
    const writer = await join(chemist2, pageId);
    const observer = await join(chemist, pageId);
    const started = Date.now();
    writer.root.insert(0, 'first');
    await waitFor(() => observer.root.toString() === 'first', 'first edit');
    writer.root.insert(5, ' and last');
    await waitFor(() => observer.root.toString() === 'first and last', 'last edit');
    await server.deps.db.update(pages).set({ locked: true }).where(eq(pages.id, pageId));
    await getCollabHub(server.deps).setPageLocked(pageId, true);

    const events = await server.deps.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.pageId, pageId), eq(auditEvents.type, 'page.editing_session')))
      .orderBy(desc(auditEvents.id));
    const [editor] = await server.deps.db.select().from(users).where(eq(users.email, 'chemist2@saltmarsh.test'));
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({ actorId: editor.id, actorName: editor.name, notebookId });
    const details = events[0].details as { userId: string; firstUpdateAt: string; lastUpdateAt: string };
    expect(details.userId).toBe(editor.id);
    const first = Date.parse(details.firstUpdateAt);
    const last = Date.parse(details.lastUpdateAt);
    expect(first).toBeGreaterThanOrEqual(started - 1000);
    expect(last).toBeGreaterThan(first);
    expect(last).toBeLessThanOrEqual(Date.now());
  });
});
