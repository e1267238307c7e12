import { and, eq, isNull } from 'drizzle-orm';
import { $createParagraphNode, $createTextNode, $getRoot, $isParagraphNode, type LexicalEditor } from 'lexical';
import { beforeAll, describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { getCollabHub } from '../../server/collab';
import { collabUpdates, pages } from '../../server/db/schema';
import { signedIn, type ApiClient } from '../support/api';
import { lexicalEditorOn, waitFor } from '../support/collab';
import { demoNotebookFrame } from '../support/collabFrame';
import { startServer } from '../support/server';

// A new page's document is created by the server with its first, empty paragraph (written by a
// headless editor through the same binding as the browser), so editors opening the page at the
// same moment no longer each add one.

const frame = demoNotebookFrame(startServer);
const { newPage, join } = frame;
let chemist2: ApiClient;

beforeAll(async () => {
  chemist2 = await signedIn(frame.server.url, 'chemist2@saltmarsh.test');
});

/** What the collaboration plugin's bootstrap does: a first paragraph, only if the synced page is empty. */
function bootstrapIfEmpty(editor: LexicalEditor): void {
  editor.update(
    () => {
      if ($getRoot().isEmpty()) $getRoot().append($createParagraphNode());
    },
    { discrete: true },
  );
}

function blockTypes(editor: LexicalEditor): string[] {
  return editor.getEditorState().read(() => $getRoot().getChildren().map((node) => node.getType()));
}

async function serverRows(pageId: string) {
  return frame.server.deps.db.select({ userId: collabUpdates.userId }).from(collabUpdates).where(eq(collabUpdates.pageId, pageId));
}

describe('the first paragraph of a new page', () => {
  it('two editors joining a new page at once end with exactly one paragraph', async () => {
    const pageId = await newPage('Opened by two at once');
    const [a, b] = await Promise.all([join(frame.chemist, pageId), join(chemist2, pageId)]);
    const editorA = lexicalEditorOn(a);
    const editorB = lexicalEditorOn(b);
    // Even editors that would still bootstrap find the page's paragraph already there.
    bootstrapIfEmpty(editorA);
    bootstrapIfEmpty(editorB);
    await waitFor(() => Y.encodeStateVector(a.doc).toString() === Y.encodeStateVector(b.doc).toString(), 'both documents in step');
    expect(blockTypes(editorA)).toEqual(['paragraph']);
    expect(blockTypes(editorB)).toEqual(['paragraph']);

    const content = await getCollabHub(frame.server.deps).currentContent(pageId);
    const json = content.json as { root: { children: { type: string; children: unknown[] }[] } };
    expect(json.root.children).toHaveLength(1);
    expect(json.root.children[0]).toMatchObject({ type: 'paragraph', children: [] });
    expect(content.text).toBe('');
    // Written once, by the server (no author), before either client had the document.
    expect(await serverRows(pageId)).toEqual([{ userId: null }]);
  });

  it('is where the first words go, and is not written again when the page is opened later', async () => {
    const pageId = await newPage('Typed into the first paragraph');
    const writer = await join(frame.chemist, pageId);
    const editor = lexicalEditorOn(writer);
    editor.update(
      () => {
        const first = $getRoot().getFirstChild();
        if ($isParagraphNode(first)) first.append($createTextNode('Isoamyl alcohol, 10.0 mL.'));
      },
      { discrete: true },
    );
    const reader = await join(chemist2, pageId);
    await waitFor(() => reader.root.toJSON().includes('Isoamyl alcohol'), 'the first words at the second client');
    expect(blockTypes(lexicalEditorOn(reader))).toEqual(['paragraph']);
    expect((await getCollabHub(frame.server.deps).currentContent(pageId)).text).toBe('Isoamyl alcohol, 10.0 mL.');
    expect((await serverRows(pageId)).filter((r) => r.userId === null)).toHaveLength(1);
  });

  it('leaves a page with stored state as it is', async () => {
    const pageId = await newPage('Stored before');
    // A document stored earlier (as before this change, the client bootstrapped it): one paragraph of text.
    const earlier = new Y.Doc();
    const earlierEditor = lexicalEditorOn({ doc: earlier });
    earlierEditor.update(() => $getRoot().append($createParagraphNode().append($createTextNode('Written last week.'))), { discrete: true });
    const [author] = await frame.server.deps.db.select({ id: pages.authorId }).from(pages).where(eq(pages.id, pageId));
    await frame.server.deps.db.insert(collabUpdates).values({ pageId, update: Y.encodeStateAsUpdate(earlier), userId: author.id });

    const client = await join(frame.chemist, pageId);
    expect(blockTypes(lexicalEditorOn(client))).toEqual(['paragraph']);
    expect((await getCollabHub(frame.server.deps).currentContent(pageId)).text).toBe('Written last week.');
    expect(await frame.server.deps.db.select().from(collabUpdates).where(and(eq(collabUpdates.pageId, pageId), isNull(collabUpdates.userId)))).toEqual([]);
  });

  it('writes nothing into a locked page without content; it gets its paragraph once it can be edited again', async () => {
    const pageId = await newPage('Locked while empty');
    await frame.server.deps.db.update(pages).set({ locked: true }).where(eq(pages.id, pageId));
    const client = await join(frame.chemist, pageId);
    expect(client.root.length).toBe(0);
    expect(await serverRows(pageId)).toEqual([]);

    // Returned to the author (signing unlocks through the hub).
    await frame.server.deps.db.update(pages).set({ locked: false }).where(eq(pages.id, pageId));
    await getCollabHub(frame.server.deps).setPageLocked(pageId, false);
    const editor = lexicalEditorOn(client);
    await waitFor(() => client.root.length > 0, 'the first paragraph at the client');
    expect(blockTypes(lexicalEditorOn(client))).toEqual(['paragraph']);
    expect(blockTypes(editor)).toEqual(['paragraph']);
    expect(await serverRows(pageId)).toEqual([{ userId: null }]);
  });

  it('leaves the signed demo pages as they were signed', async () => {
    // The witnessed demo page (server/seed/demoSigning.ts).
    const [demo] = await frame.server.deps.db.select().from(pages).where(and(eq(pages.notebookId, frame.notebookId), eq(pages.number, 1)));
    expect(demo.locked).toBe(true);
    const before = await serverRows(demo.id);
    await join(frame.chemist, demo.id);
    await getCollabHub(frame.server.deps).currentContent(demo.id);
    expect(await serverRows(demo.id)).toEqual(before);
    const verify = await frame.chemist.get(`/api/pages/${demo.id}/verify`);
    expect(verify.status).toBe(200);
    expect(verify.body.intact).toBe(true);
  });

  it('does not count as an edit: the page is not marked as changed', async () => {
    const pageId = await newPage('Only opened');
    const [before] = await frame.server.deps.db.select({ updatedAt: pages.updatedAt }).from(pages).where(eq(pages.id, pageId));
    await join(frame.chemist, pageId);
    await getCollabHub(frame.server.deps).currentContent(pageId);
    const [after] = await frame.server.deps.db.select({ updatedAt: pages.updatedAt }).from(pages).where(eq(pages.id, pageId));
    expect(after.updatedAt).toEqual(before.updatedAt);
  });
});
