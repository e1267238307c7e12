import { createHash } from 'node:crypto';
import { and, desc, eq, isNull } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { attachments, auditEvents, signatures } from '../../server/db/schema';
import { addendumBody, newPage, signBody, signingFrame, verifyReport, writeOnPage } from '../support/signing';
import { uploadFiles } from '../support/uploads';

const g = signingFrame();

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

const verify = (pageId: string) => verifyReport(g.reader.api, pageId);

async function sign(pageId: string) {
  const signed = await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
  expect(signed.status).toBe(201);
}

async function returnPage(pageId: string) {
  const returned = await g.supervisor.api.post(`/api/pages/${pageId}/return`, { comment: 'Please record the boiling point.' });
  expect(returned.status).toBe(200);
}

async function upload(pageId: string, name: string, content: Buffer): Promise<{ id: string; addendum: boolean }> {
  const uploaded = await uploadFiles(g.author.api, pageId, [{ name, content }]);
  expect(uploaded.status).toBe(201);
  return uploaded.body[0];
}

/** What the newest author signature of the page itself hashed. */
async function latestPageSignature(pageId: string) {
  const [row] = await g.server.deps.db
    .select()
    .from(signatures)
    .where(and(eq(signatures.pageId, pageId), isNull(signatures.addendumId), eq(signatures.role, 'author')))
    .orderBy(desc(signatures.signedAt))
    .limit(1);
  return JSON.parse(row.signedContent) as { attachments: { id: string; sha256: string }[] };
}

// 21 CFR 11.70: a signature is linked to its record so it cannot be carried over to other content;
// that only protects the record if the signature covers all of the page. Files uploaded while the
// page was signed must therefore be covered by the next page signature after a return, unless a
// signed addendum already claims them.
describe('files uploaded while a page was signed, after the page is returned', () => {
  it('belong to the page again and the next signature covers them; a changed checksum is then reported', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Returned with a late spectrum');
    await writeOnPage(g.server, g.author.api, pageId, ['Isoamyl acetate, crude, 6.2 g.']);
    await sign(pageId);
    const bytes = Buffer.from('##TITLE=isoamyl acetate IR (late)\n##END=\n');
    const late = await upload(pageId, 'late-ir.jdx', bytes);
    expect(late.addendum).toBe(true);

    await returnPage(pageId);
    const listed = await g.author.api.get(`/api/pages/${pageId}/attachments`);
    expect(listed.body.find((a: { id: string }) => a.id === late.id)).toMatchObject({ addendum: false });
    const [returned] = await g.server.deps.db
      .select({ details: auditEvents.details })
      .from(auditEvents)
      .where(and(eq(auditEvents.pageId, pageId), eq(auditEvents.type, 'page.returned')));
    expect(returned.details).toMatchObject({ filesBackOnPage: [late.id] });

    await sign(pageId);
    expect((await latestPageSignature(pageId)).attachments).toEqual([expect.objectContaining({ id: late.id, sha256: sha256(bytes) })]);
    const intact = await verify(pageId);
    expect(intact.intact).toBe(true);
    expect(intact.signatures.map((s) => s.withdrawn)).toEqual([true, false]);

    await g.server.deps.db.update(attachments).set({ sha256: 'c'.repeat(64) }).where(eq(attachments.id, late.id));
    const tampered = await verify(pageId);
    expect(tampered.intact).toBe(false);
    expect(tampered.signatures[1].changes).toContain('File "late-ir.jdx" differs from what was signed');
    // The withdrawn signature no longer speaks for the page, so it is not what reports the change.
    expect(tampered.signatures[0].changes).toEqual([]);
  });

  it('a file a signed addendum claims stays with that addendum; only the unclaimed one comes back to the page', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Returned after an addendum');
    await writeOnPage(g.server, g.author.api, pageId, ['Distillation, fraction 2.']);
    await sign(pageId);
    const claimed = await upload(pageId, 'gc-trace.csv', Buffer.from('time (min),signal\n1,2\n2,3\n'));
    const addendum = await g.author.api.post(`/api/pages/${pageId}/addenda`, addendumBody(g.author.person, 'GC trace of fraction 2 added.'));
    expect(addendum.status).toBe(201);
    const unclaimed = await upload(pageId, 'bp-note.txt', Buffer.from('bp 141 C at 760 mmHg'));

    await returnPage(pageId);
    await sign(pageId);
    expect((await latestPageSignature(pageId)).attachments.map((a) => a.id)).toEqual([unclaimed.id]);
    const report = await verify(pageId);
    expect(report.intact).toBe(true);
    const addendumCheck = report.signatures.find((s) => s.addendumId);
    expect(addendumCheck).toMatchObject({ withdrawn: false, intact: true });
    const rows = await g.server.deps.db.select({ id: attachments.id, addendum: attachments.addendum }).from(attachments).where(eq(attachments.pageId, pageId));
    expect(Object.fromEntries(rows.map((r) => [r.id, r.addendum]))).toEqual({ [claimed.id]: true, [unclaimed.id]: false });
  });

  it('a file put back among the waiting addenda with SQL is reported as signed-but-gone and as covered by no signature', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Flag flipped after re-signing');
    await writeOnPage(g.server, g.author.api, pageId, ['Ester wash with NaHCO3.']);
    await sign(pageId);
    const late = await upload(pageId, 'wash-ph.txt', Buffer.from('pH 8 after wash'));
    await returnPage(pageId);
    await sign(pageId);
    expect((await verify(pageId)).intact).toBe(true);

    // What a return made before files were handed back left behind: the file waits for an addendum.
    await g.server.deps.db.update(attachments).set({ addendum: true }).where(eq(attachments.id, late.id));
    const report = await verify(pageId);
    expect(report.intact).toBe(false);
    expect(report.signatures[1].changes).toEqual([
      'File "wash-ph.txt" was signed but is gone',
      'File "wash-ph.txt" was on the page before it was returned, but no signature covers it',
    ]);
  });

  it('a draft that still has files waiting for an addendum (a return made before this rule) signs them with the page', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Returned before files came back');
    await writeOnPage(g.server, g.author.api, pageId, ['Dry over MgSO4.']);
    await sign(pageId);
    const late = await upload(pageId, 'kf-water.txt', Buffer.from('water 0.04 %'));
    await returnPage(pageId);
    await g.server.deps.db.update(attachments).set({ addendum: true }).where(eq(attachments.id, late.id));

    await sign(pageId);
    expect((await latestPageSignature(pageId)).attachments.map((a) => a.id)).toEqual([late.id]);
    expect((await verify(pageId)).intact).toBe(true);
  });
});
