import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { attachments, pageContent, signatures } from '../../server/db/schema';
import { countersignBody, newPage, signBody, signingFrame, verifyReport, writeOnPage } from '../support/signing';

const g = signingFrame();

async function witnessedPage(title: string): Promise<string> {
  const pageId = await newPage(g.author.api, g.notebookId, title);
  await writeOnPage(g.server, g.author.api, pageId, ['Charge 10.0 g isoamyl alcohol.', 'Add 1.2 equivalents acetic acid.']);
  expect((await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id))).status).toBe(201);
  expect((await g.supervisor.api.post(`/api/pages/${pageId}/countersign`, countersignBody(g.supervisor.person))).status).toBe(201);
  return pageId;
}

const verify = (pageId: string) => verifyReport(g.reader.api, pageId);

// 21 CFR 11.10(a): the system must be able to discern invalid or altered records; 11.70: a
// signature stays linked to its record so it cannot be carried over to changed content. Each test
// changes a stored row with SQL, as someone with database access might, and asks for verification.
describe('tamper detection', () => {
  it('a changed page text (page_content row) is reported with where it changed', async () => {
    const pageId = await witnessedPage('Tampered text');
    expect((await verify(pageId)).intact).toBe(true);
    await g.server.deps.db
      .update(pageContent)
      .set({ text: 'Charge 10.0 g isoamyl alcohol.\n\nAdd 2.0 equivalents acetic acid.' })
      .where(eq(pageContent.pageId, pageId));
    const report = await verify(pageId);
    expect(report.intact).toBe(false);
    for (const s of report.signatures) {
      expect(s.intact).toBe(false);
      expect(s.changes.join(' ')).toMatch(/text differs from what was signed/);
    }
  });

  it('a structure slipped into the stored content is named', async () => {
    const pageId = await witnessedPage('Tampered structures');
    await g.server.deps.db
      .update(pageContent)
      .set({ structures: [{ key: 'compound 9', molfile: '', smiles: 'CC(=O)OCCC(C)C' }] })
      .where(eq(pageContent.pageId, pageId));
    const report = await verify(pageId);
    expect(report.intact).toBe(false);
    expect(report.signatures[0].changes).toContain('Structure "compound 9" was not part of what was signed');
  });

  it('a file row added to the signed page is reported', async () => {
    const pageId = await witnessedPage('Tampered files');
    await g.server.deps.db.insert(attachments).values({
      id: randomUUID(),
      pageId,
      uploaderId: g.author.person.id,
      originalName: 'late.jdx',
      displayName: 'late.jdx',
      size: 10,
      mediaType: 'text/plain',
      sha256: 'a'.repeat(64),
      storageKey: `tamper-test/${randomUUID()}`,
      addendum: false,
    });
    const report = await verify(pageId);
    expect(report.intact).toBe(false);
    expect(report.signatures[0].changes).toContain('File "late.jdx" was not part of what was signed');
  });

  it('an edited signature row (name or hash) no longer agrees with the audit trail', async () => {
    const pageId = await witnessedPage('Tampered signature');
    const [witness] = await g.server.deps.db.select().from(signatures).where(eq(signatures.pageId, pageId)).orderBy(signatures.signedAt).offset(1);
    await g.server.deps.db.update(signatures).set({ signerName: 'Someone Else' }).where(eq(signatures.id, witness.id));
    const [author] = await g.server.deps.db.select().from(signatures).where(eq(signatures.pageId, pageId)).orderBy(signatures.signedAt).limit(1);
    await g.server.deps.db.update(signatures).set({ contentHash: 'b'.repeat(64) }).where(eq(signatures.id, author.id));
    const report = await verify(pageId);
    expect(report.intact).toBe(false);
    const [a, w] = report.signatures;
    expect(a.changes).toContain("The signature's contentHash differs from the audit trail entry made when it was signed");
    expect(a.changes).toContain('The stored copy of the signed content no longer matches the signature’s hash');
    expect(w.changes).toContain("The signature's signerName differs from the audit trail entry made when it was signed");
  });

  it('a countersignature is refused when the content no longer matches what the author signed', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Changed before countersigning');
    await writeOnPage(g.server, g.author.api, pageId, ['Original line.']);
    await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
    await g.server.deps.db.update(pageContent).set({ text: 'Rewritten line.' }).where(eq(pageContent.pageId, pageId));
    const response = await g.supervisor.api.post(`/api/pages/${pageId}/countersign`, countersignBody(g.supervisor.person));
    expect(response.status).toBe(409);
    expect(response.body.error.code).toBe('record_changed');
  });
});
