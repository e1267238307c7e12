import { count, eq } from 'drizzle-orm';
import { $createParagraphNode, $createTextNode, $getRoot } from 'lexical';
import { describe, expect, it } from 'vitest';
import { getCollabHub } from '../../server/collab';
import { collabUpdates, pageSnapshots } from '../../server/db/schema';
import { connectCollab, lexicalEditorOn, serverCaughtUp, type CollabClient } from '../support/collab';
import { countersignBody, newPage, signBody, signingFrame, writeOnPage } from '../support/signing';

const g = signingFrame();

async function storedUpdates(pageId: string): Promise<number> {
  const [row] = await g.server.deps.db.select({ n: count() }).from(collabUpdates).where(eq(collabUpdates.pageId, pageId));
  return Number(row.n);
}

function type(client: CollabClient, text: string) {
  lexicalEditorOn(client).update(() => $getRoot().append($createParagraphNode().append($createTextNode(text))), { discrete: true });
}

// 21 CFR 11.10(e) and 11.70: once signed, the record cannot change underneath its signature;
// the lock is enforced by the API and by the collaboration server, not only by the editor UI.
describe('a signed page is locked', () => {
  it('the API refuses changes to a signed page', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Locked against the API');
    await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
    const rename = await g.author.api.patch(`/api/pages/${pageId}`, { title: 'Changed after signing' });
    expect(rename.status).toBe(409);
    expect(rename.body.error.code).toBe('page_locked');
    expect((await g.author.api.get(`/api/pages/${pageId}`)).body.access.canEdit).toBe(false);
  });

  it('the websocket drops updates to a signed page, from a client connected before and one that joins after', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Locked against the websocket');
    await writeOnPage(g.server, g.author.api, pageId, ['Signed text.']);
    const before = await connectCollab(g.server.url, pageId, g.coEditor.api.sessionCookie);
    try {
      const signed = await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
      expect(signed.status).toBe(201);
      const updatesAtSigning = await storedUpdates(pageId);

      type(before, 'Sneaked in by a co-editor after signing.');
      await serverCaughtUp(before);
      const after = await connectCollab(g.server.url, pageId, g.author.api.sessionCookie);
      try {
        type(after, 'Sneaked in by the author after signing.');
        await serverCaughtUp(after);
      } finally {
        after.destroy();
      }

      expect(await storedUpdates(pageId)).toBe(updatesAtSigning);
      expect((await getCollabHub(g.server.deps).currentContent(pageId)).text).toBe('Signed text.');
      const verify = await g.author.api.get(`/api/pages/${pageId}/verify`);
      expect(verify.body.intact).toBe(true);
    } finally {
      before.destroy();
    }
  });

  it('takes a history snapshot at signing and at countersigning', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Snapshots at sign-off');
    await writeOnPage(g.server, g.author.api, pageId, ['Text at sign-off.']);
    await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
    await g.supervisor.api.post(`/api/pages/${pageId}/countersign`, countersignBody(g.supervisor.person));
    const reasons = await g.server.deps.db.select({ reason: pageSnapshots.reason }).from(pageSnapshots).where(eq(pageSnapshots.pageId, pageId));
    expect(reasons.map((r) => r.reason)).toEqual(expect.arrayContaining(['signed', 'countersigned']));
  });

  it('a returned page accepts edits again over the websocket', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Unlocked by a return');
    await writeOnPage(g.server, g.author.api, pageId, ['First version.']);
    await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
    await g.supervisor.api.post(`/api/pages/${pageId}/return`, { comment: 'Add the work-up.' });
    await writeOnPage(g.server, g.author.api, pageId, ['Work-up: washed with brine.']);
    expect((await getCollabHub(g.server.deps).currentContent(pageId)).text).toContain('Work-up: washed with brine.');
  });
});
