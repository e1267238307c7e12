import { and, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { auditEvents, notebooks, pages } from '../../server/db/schema';
import { signedIn } from '../support/api';
import { addendumBody, countersignBody, mailTo, newPage, signBody, signingFrame, writeOnPage } from '../support/signing';

const g = signingFrame();

const ISO_UTC = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/;

async function signedPage(title: string, text = ['Aim: isoamyl acetate by Fischer esterification.']) {
  const pageId = await newPage(g.author.api, g.notebookId, title);
  await writeOnPage(g.server, g.author.api, pageId, text);
  const signed = await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
  expect(signed.status).toBe(201);
  return pageId;
}

describe('sign → countersign, end to end through the API and the mail catcher', () => {
  it('records both signatures with name, UTC time, meaning and hash, locks the page and mails both people', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Isoamyl acetate, batch 2');
    await writeOnPage(g.server, g.author.api, pageId, ['Aim: isoamyl acetate.', 'Reflux 90 min with Dean–Stark trap.']);

    const signed = await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
    expect(signed.status).toBe(201);
    expect(signed.body.status).toBe('signed');
    expect(signed.body.locked).toBe(true);
    const [authorSignature] = signed.body.signatures;
    // 21 CFR 11.50(a): printed name of the signer, date and time of signing, meaning of the signature.
    expect(authorSignature.signer.name).toBe('Test author');
    expect(authorSignature.signedAt).toMatch(ISO_UTC);
    expect(authorSignature.meaning).toBe('I performed and recorded this work');
    // 21 CFR 11.70: the signature is linked to its record through the SHA-256 of the content.
    expect(authorSignature.contentHash).toMatch(/^[0-9a-f]{64}$/);

    // The supervisor is told by mail (through the real catcher) and sees the page in the queue.
    const request = await mailTo(g.admin, g.supervisor.person.email, 'Countersignature requested');
    expect(request.text).toContain(`/pages/${pageId}`);
    expect(request.text).toContain('Test author');
    const queue = await g.supervisor.api.get('/api/signing/queue');
    expect(queue.status).toBe(200);
    const item = queue.body.find((q: { pageId: string }) => q.pageId === pageId);
    expect(item).toMatchObject({ pageTitle: 'Isoamyl acetate, batch 2', author: { name: 'Test author' } });
    expect(item.waitingSeconds).toBeGreaterThanOrEqual(0);

    const witnessed = await g.supervisor.api.post(`/api/pages/${pageId}/countersign`, countersignBody(g.supervisor.person));
    expect(witnessed.status).toBe(201);
    expect(witnessed.body.status).toBe('witnessed');
    const witness = witnessed.body.signatures.find((s: { role: string }) => s.role === 'witness');
    expect(witness).toMatchObject({ signer: { name: 'Test supervisor' }, meaning: 'Witnessed and understood', contentHash: authorSignature.contentHash });
    expect((await mailTo(g.admin, g.author.person.email, 'Countersigned')).text).toContain('Test supervisor');
    expect((await g.supervisor.api.get('/api/signing/queue')).body.some((q: { pageId: string }) => q.pageId === pageId)).toBe(false);

    const verify = await g.reader.api.get(`/api/pages/${pageId}/verify`);
    expect(verify.status).toBe(200);
    expect(verify.body.intact).toBe(true);
    expect(verify.body.signatures.map((s: { intact: boolean }) => s.intact)).toEqual([true, true]);
    expect(verify.body.currentHash).toBe(authorSignature.contentHash);

    const trail = await g.reader.api.get(`/api/pages/${pageId}/audit`);
    expect(trail.body.events.map((e: { type: string }) => e.type)).toEqual(
      expect.arrayContaining(['page.created', 'page.signed', 'countersign.requested', 'page.countersigned']),
    );
    expect(trail.body.chain.intact).toBe(true);
  });

  it('lists the queue oldest first with how long each page has waited', async () => {
    const first = await signedPage('Queue order: first');
    const second = await signedPage('Queue order: second');
    const queue = (await g.supervisor.api.get('/api/signing/queue')).body as { pageId: string; requestedAt: string; waitingSeconds: number }[];
    const ids = queue.map((q) => q.pageId);
    expect(ids.indexOf(first)).toBeLessThan(ids.indexOf(second));
    const times = queue.map((q) => q.requestedAt);
    expect([...times].sort()).toEqual(times);
  });

  it('a return with a comment unlocks the page for its author, mails the comment, and the page can be signed anew', async () => {
    const pageId = await signedPage('To be returned');
    const returned = await g.supervisor.api.post(`/api/pages/${pageId}/return`, { comment: 'Please add the yield in grams.' });
    expect(returned.status).toBe(200);
    expect(returned.body).toMatchObject({ status: 'draft', locked: false });
    expect(returned.body.returns[0]).toMatchObject({ comment: 'Please add the yield in grams.', returnedBy: { name: 'Test supervisor' } });
    expect(returned.body.signatures[0].withdrawn).toBe(true);
    expect((await mailTo(g.admin, g.author.person.email, 'Returned with a comment')).text).toContain('Please add the yield in grams.');

    const renamed = await g.author.api.patch(`/api/pages/${pageId}`, { title: 'To be returned (yield added)' });
    expect(renamed.status).toBe(200);
    await writeOnPage(g.server, g.author.api, pageId, ['Yield 4.1 g.']);
    const again = await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor2.person.id));
    expect(again.status).toBe(201);
    const verify = await g.author.api.get(`/api/pages/${pageId}/verify`);
    expect(verify.body.intact).toBe(true);
    expect(verify.body.signatures.map((s: { withdrawn: boolean }) => s.withdrawn)).toEqual([true, false]);
  });

  it('after signing, changes are addenda: dated, signed the same way, optionally countersigned; the original stays intact', async () => {
    const pageId = await signedPage('Addenda page');
    const added = await g.coEditor.api.post(
      `/api/pages/${pageId}/addenda`,
      addendumBody(g.coEditor.person, 'The product was redistilled on the next day; bp 141 °C.', g.supervisor2.person.id),
    );
    expect(added.status).toBe(201);
    const addendum = added.body.addenda[0];
    expect(addendum).toMatchObject({ number: 1, author: { name: 'Test coeditor' } });
    expect(addendum.createdAt).toMatch(ISO_UTC);
    await mailTo(g.admin, g.supervisor2.person.email, 'addendum 1');

    const cs = await g.supervisor2.api.post(`/api/addenda/${addendum.id}/countersign`, countersignBody(g.supervisor2.person, 'reviewed'));
    expect(cs.status).toBe(201);
    const addendumSignatures = cs.body.signatures.filter((s: { addendumId: string | null }) => s.addendumId === addendum.id);
    expect(addendumSignatures.map((s: { role: string }) => s.role)).toEqual(['author', 'witness']);

    const verify = await g.author.api.get(`/api/pages/${pageId}/verify`);
    expect(verify.body.intact).toBe(true);
    expect(verify.body.signatures).toHaveLength(3);

    const unsignedPage = await newPage(g.author.api, g.notebookId, 'No addenda on drafts');
    const refused = await g.author.api.post(`/api/pages/${unsignedPage}/addenda`, addendumBody(g.author.person, 'x'));
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('not_signed');
  });
});

describe('password re-entry (21 CFR 11.200(a)(1)) and attempts recorded (11.300(d))', () => {
  it('a wrong password is refused with 401, signs nothing, and leaves a failed-attempt audit event', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Wrong password');
    const response = await g.author.api.post(`/api/pages/${pageId}/sign`, { ...signBody(g.author.person, g.supervisor.person.id), password: 'not-my-password' });
    expect(response.status).toBe(401);
    expect(response.body.error.code).toBe('signature_rejected');
    const record = await g.author.api.get(`/api/pages/${pageId}/record`);
    expect(record.body).toMatchObject({ status: 'draft', locked: false, signatures: [] });
    const events = await g.server.deps.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.pageId, pageId), eq(auditEvents.type, 'signature.failed')));
    expect(events).toHaveLength(1);
    expect(events[0].actorId).toBe(g.author.person.id);
    expect(events[0].details).toMatchObject({ action: 'sign', reason: 'wrong_password' });
  });

  it('nobody signs for someone else: another person’s identity is refused (11.100(a), 11.200(a)(2))', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Someone else’s identity');
    const response = await g.author.api.post(`/api/pages/${pageId}/sign`, {
      ...signBody(g.author.person, g.supervisor.person.id),
      email: g.coEditor.person.email,
      password: g.coEditor.person.password,
    });
    expect(response.status).toBe(403);
    expect(response.body.error.code).toBe('not_your_identity');
    const events = await g.server.deps.db.select().from(auditEvents).where(and(eq(auditEvents.pageId, pageId), eq(auditEvents.type, 'signature.failed')));
    expect(events[0].details).toMatchObject({ reason: 'identity_mismatch' });
  });

  it('a countersignature with a wrong password is refused with 401 too', async () => {
    const pageId = await signedPage('Wrong witness password');
    const response = await g.supervisor.api.post(`/api/pages/${pageId}/countersign`, { ...countersignBody(g.supervisor.person), password: 'wrong' });
    expect(response.status).toBe(401);
    expect((await g.supervisor.api.get(`/api/pages/${pageId}/record`)).body.status).toBe('signed');
  });
});

describe('role refusals', () => {
  it('a reader and a co-editor cannot sign the author’s page; nobody may sign without a session', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Only the author signs');
    const byReader = await g.reader.api.post(`/api/pages/${pageId}/sign`, signBody(g.reader.person, g.supervisor.person.id));
    expect(byReader.status).toBe(403);
    const byCoEditor = await g.coEditor.api.post(`/api/pages/${pageId}/sign`, signBody(g.coEditor.person, g.supervisor.person.id));
    expect(byCoEditor.status).toBe(403);
    const anonymous = await fetch(`${g.server.url}/api/pages/${pageId}/sign`, {
      method: 'POST',
      headers: { origin: g.server.url, 'content-type': 'application/json' },
      body: JSON.stringify(signBody(g.author.person, g.supervisor.person.id)),
    });
    expect(anonymous.status).toBe(401);
    const outsider = await g.outsider.api.get(`/api/pages/${pageId}/record`);
    expect(outsider.status).toBe(404);
  });

  it('the countersigner must be a supervisor of the notebook, not the signer; bad input is a 400', async () => {
    const pageId = await newPage(g.author.api, g.notebookId, 'Choosing a supervisor');
    const chemistAsSupervisor = await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.coEditor.person.id));
    expect(chemistAsSupervisor.status).toBe(422);
    const notAMember = await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.outsider.person.id));
    expect(notAMember.status).toBe(422);
    const witnessMeaning = await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id, 'witnessed'));
    expect(witnessMeaning.status).toBe(400);
    expect(witnessMeaning.body.error.fields.meaning).toBeTruthy();
    const noPassword = await g.author.api.post(`/api/pages/${pageId}/sign`, { email: g.author.person.email, meaning: 'performed', supervisorId: g.supervisor.person.id });
    expect(noPassword.status).toBe(400);
    expect((await g.author.api.get(`/api/pages/${pageId}/record`)).body.signatures).toEqual([]);
  });

  it('chemists and viewers cannot countersign; a supervisor only countersigns work addressed to them', async () => {
    const pageId = await signedPage('Who countersigns');
    const byChemist = await g.coEditor.api.post(`/api/pages/${pageId}/countersign`, countersignBody(g.coEditor.person));
    expect(byChemist.status).toBe(403);
    const byViewer = await g.reader.api.post(`/api/pages/${pageId}/countersign`, countersignBody(g.reader.person));
    expect(byViewer.status).toBe(403);
    const byOtherSupervisor = await g.supervisor2.api.post(`/api/pages/${pageId}/countersign`, countersignBody(g.supervisor2.person));
    expect(byOtherSupervisor.status).toBe(403);
    const returnByChemist = await g.coEditor.api.post(`/api/pages/${pageId}/return`, { comment: 'no' });
    expect(returnByChemist.status).toBe(403);
    const queueForChemist = await g.author.api.get('/api/signing/queue');
    expect(queueForChemist.status).toBe(403);
    expect((await g.author.api.get(`/api/pages/${pageId}/record`)).body.status).toBe('signed');
  });

  it('a supervisor cannot countersign their own page', async () => {
    const pageId = await newPage(g.supervisor.api, g.notebookId, 'The supervisor’s own page');
    await writeOnPage(g.server, g.supervisor.api, pageId, ['Reference sample prepared by the supervisor.']);
    const signed = await g.supervisor.api.post(`/api/pages/${pageId}/sign`, signBody(g.supervisor.person, g.supervisor.person.id));
    // Naming oneself as countersigner is refused outright.
    expect(signed.status).toBe(422);
    const properly = await g.supervisor.api.post(`/api/pages/${pageId}/sign`, signBody(g.supervisor.person, g.supervisor2.person.id));
    expect(properly.status).toBe(201);
    const own = await g.supervisor.api.post(`/api/pages/${pageId}/countersign`, countersignBody(g.supervisor.person));
    expect(own.status).toBe(403);
    expect(own.body.error.message).toMatch(/own/);
  });

  it('a second signature on a signed page is a conflict, and the returned comment is required', async () => {
    const pageId = await signedPage('Signed once');
    const twice = await g.author.api.post(`/api/pages/${pageId}/sign`, signBody(g.author.person, g.supervisor.person.id));
    expect(twice.status).toBe(409);
    const noComment = await g.supervisor.api.post(`/api/pages/${pageId}/return`, { comment: '  ' });
    expect(noComment.status).toBe(400);
  });
});

describe('printable record', () => {
  it('gives print data and a PDF with the page number, notebook, signatures and verification state', async () => {
    const pageId = await signedPage('Printable page', ['Aim: ethyl butanoate.']);
    const print = await g.reader.api.get(`/api/pages/${pageId}/print`);
    expect(print.status).toBe(200);
    expect(print.body).toMatchObject({ notebookTitle: 'Signing tests', pageTitle: 'Printable page', text: 'Aim: ethyl butanoate.' });
    expect(print.body.pageNumber).toBeGreaterThan(0);
    expect(print.body.signatures[0]).toMatchObject({ signer: { name: 'Test author' }, meaning: 'I performed and recorded this work' });
    expect(print.body.verification.intact).toBe(true);

    const pdf = await fetch(`${g.server.url}/api/pages/${pageId}/record.pdf`, { headers: { cookie: g.reader.api.sessionCookie } });
    expect(pdf.status).toBe(200);
    expect(pdf.headers.get('content-type')).toBe('application/pdf');
    expect(pdf.headers.get('content-disposition')).toMatch(/^attachment; filename="?notebook-page-\d{3}-record\.pdf"?$/);
    const bytes = Buffer.from(await pdf.arrayBuffer());
    expect(bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  });
});

describe('demo scenario', () => {
  it('has a countersigned page and a page waiting for the demo supervisor, both verifying intact', async () => {
    const supervisor = await signedIn(g.server.url, 'supervisor@saltmarsh.test');
    const demoPage = async (notebook: string) => {
      const [row] = await g.server.deps.db
        .select({ id: pages.id })
        .from(pages)
        .innerJoin(notebooks, eq(notebooks.id, pages.notebookId))
        .where(and(eq(notebooks.title, notebook), eq(pages.number, 1)));
      return row.id;
    };
    const witnessed = await demoPage('Fruity esters from short-chain acids');
    const waiting = await demoPage('Solvent and reagent checks');
    expect((await supervisor.get(`/api/pages/${witnessed}/record`)).body.status).toBe('witnessed');
    expect((await supervisor.get(`/api/pages/${waiting}/record`)).body.status).toBe('signed');
    expect((await supervisor.get(`/api/pages/${witnessed}/verify`)).body.intact).toBe(true);
    expect((await supervisor.get(`/api/pages/${waiting}/verify`)).body.intact).toBe(true);
    expect((await supervisor.get('/api/signing/queue')).body.some((q: { pageId: string }) => q.pageId === waiting)).toBe(true);
  });
});
