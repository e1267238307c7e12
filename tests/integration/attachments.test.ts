import { and, eq } from 'drizzle-orm';
import { createHash } from 'node:crypto';
import http from 'node:http';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { attachments, auditEvents, pages } from '../../server/db/schema';
import { pageAttachmentChecksums } from '../../server/files/checksums';
import { ApiClient, signedIn } from '../support/api';
import { startServer, type TestServer } from '../support/server';
import { newPage } from '../support/signing';
import { generatedBytes, storedAttachmentKeys, uploadFiles } from '../support/uploads';

// Files go through the real app into the real s3rver fake and come back through the app.
// Accounts are the seeded demo people; every test works on a notebook or page of its own.

let server: TestServer;
let chemist: ApiClient;
let chemist2: ApiClient;
let viewer: ApiClient;
let pageId: string;
let notebookId: string;

const sha256 = (bytes: Buffer) => createHash('sha256').update(bytes).digest('hex');

async function download(client: ApiClient, id: string): Promise<{ status: number; bytes: Buffer; headers: Headers }> {
  const response = await fetch(`${client.baseUrl}/api/attachments/${id}/content`, { headers: { cookie: client.sessionCookie } });
  return { status: response.status, bytes: Buffer.from(await response.arrayBuffer()), headers: response.headers };
}

beforeAll(async () => {
  server = await startServer();
  chemist = await signedIn(server.url, 'chemist@saltmarsh.test');
  chemist2 = await signedIn(server.url, 'chemist2@saltmarsh.test');
  viewer = await signedIn(server.url, 'viewer@saltmarsh.test');
  const notebooks = await chemist.get('/api/notebooks');
  notebookId = notebooks.body.find((n: { title: string }) => n.title === 'Fruity esters from short-chain acids').id;
  pageId = await newPage(chemist, notebookId, 'Attachment round trip');
});

afterAll(async () => {
  await server?.close();
});

describe('upload and download', () => {
  it('stores several files from one request and returns exactly the same bytes with matching checksums', async () => {
    const notes = Buffer.from('Crude ester: 4.12 g, pale yellow oil.\n');
    const binary = Buffer.from(Array.from({ length: 5000 }, (_, i) => (i * 37) % 256));
    const response = await uploadFiles(chemist, pageId, [
      { name: 'crude notes.txt', content: notes, type: 'text/plain' },
      { name: 'raw.bin', content: binary },
    ]);
    expect(response.status).toBe(201);
    expect(response.body.map((a: { displayName: string }) => a.displayName)).toEqual(['crude notes.txt', 'raw.bin']);

    for (const [index, bytes] of [notes, binary].entries()) {
      const meta = response.body[index];
      expect(meta.size).toBe(bytes.length);
      expect(meta.sha256).toBe(sha256(bytes));
      const fetched = await download(chemist, meta.id);
      expect(fetched.status).toBe(200);
      expect(sha256(fetched.bytes)).toBe(sha256(bytes));
      expect(fetched.headers.get('content-disposition')).toContain(`filename="${meta.displayName}"`);
      // The checksum doubles as the validator (RFC 9110, 8.8.3 and 13.1.2): unchanged bytes are not sent again.
      const again = await fetch(`${chemist.baseUrl}/api/attachments/${meta.id}/content`, {
        headers: { cookie: chemist.sessionCookie, 'if-none-match': fetched.headers.get('etag')! },
      });
      expect(again.status).toBe(304);
    }

    const list = await chemist.get(`/api/pages/${pageId}/attachments`);
    expect(list.status).toBe(200);
    expect(list.body.map((a: { id: string }) => a.id)).toEqual(expect.arrayContaining(response.body.map((a: { id: string }) => a.id)));
    const meta = await chemist.get(`/api/attachments/${response.body[0].id}`);
    expect(meta.body).toMatchObject({ displayName: 'crude notes.txt', mediaType: 'text/plain', uploader: { name: expect.any(String) } });
  });

  it('keys objects by our own id, never by the file name, and sanitises the name for display', async () => {
    const hostile = '..\\..\\etc/pass\u202Egnp.exe ';
    const response = await uploadFiles(chemist, pageId, [{ name: hostile, content: Buffer.from('x') }]);
    expect(response.status).toBe(201);
    const [meta] = response.body;
    // A right-to-left override (U+202E) makes "gnp.exe" read as "exe.png"; it goes, as do the path parts.
    expect(meta.displayName).toBe('passgnp.exe');
    expect(meta.originalName).toContain('\u202E');
    const [row] = await server.deps.db.select().from(attachments).where(eq(attachments.id, meta.id));
    expect(row.storageKey).toBe(`attachments/${meta.id}`);
  });

  it('detects the media type from the content, not from the name or the browser', async () => {
    // PNG signature and an IHDR chunk header (ISO/IEC 15948, section 5.2 and 11.2.2).
    const png = Buffer.from('89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c489', 'hex');
    const response = await uploadFiles(chemist, pageId, [{ name: 'looks-like-text.txt', content: png, type: 'text/plain' }]);
    expect(response.status).toBe(201);
    expect(response.body[0].mediaType).toBe('image/png');
  });

  it('sends a large file up in parts and still returns identical bytes', async () => {
    const size = 30 * 1024 * 1024 + 12345;
    const parts: number[] = [];
    // Watches the commands the app itself sends to the S3 fake.
    server.deps.storage.client.middlewareStack.add(
      (next, context) => async (args) => {
        if (context.commandName === 'UploadPartCommand') parts.push((args.input as { PartNumber: number }).PartNumber);
        return next(args);
      },
      { step: 'initialize', name: 'countUploadParts' },
    );
    let expected = createHash('sha256');
    for await (const chunk of generatedBytes(size)()) expected = expected.update(chunk);
    const digest = expected.digest('hex');

    const response = await uploadFiles(chemist, pageId, [{ name: 'long-acquisition.fid', content: generatedBytes(size) }], { chunked: true });
    server.deps.storage.client.middlewareStack.remove('countUploadParts');
    expect(response.status).toBe(201);
    expect(response.body[0]).toMatchObject({ size, sha256: digest });
    // 5 MiB parts (the S3 minimum): 30 MiB + a little makes seven.
    expect(new Set(parts).size).toBe(7);

    const fetched = await download(chemist, response.body[0].id);
    expect(fetched.bytes.length).toBe(size);
    expect(sha256(fetched.bytes)).toBe(digest);
  });

  it('lists a page\'s checksums for signing in upload order (pageAttachmentChecksums)', async () => {
    const own = await newPage(chemist, notebookId, 'Checksums for signing');
    const first = Buffer.from('first file');
    const second = Buffer.from('second file');
    const a = await uploadFiles(chemist, own, [{ name: 'b-first.txt', content: first }, { name: 'a-second.txt', content: second }]);
    const b = await uploadFiles(chemist, own, [{ name: 'third.txt', content: Buffer.from('3') }]);
    const listed = await pageAttachmentChecksums(server.deps.db, own);
    expect(listed).toEqual([
      { id: a.body[0].id, name: 'b-first.txt', sha256: sha256(first), size: first.length },
      { id: a.body[1].id, name: 'a-second.txt', sha256: sha256(second), size: second.length },
      { id: b.body[0].id, name: 'third.txt', sha256: sha256(Buffer.from('3')), size: 1 },
    ]);
  });

  it('records attachment.added in the audit trail', async () => {
    const response = await uploadFiles(chemist, pageId, [{ name: 'audit-me.txt', content: Buffer.from('audit') }]);
    const events = await server.deps.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.pageId, pageId), eq(auditEvents.type, 'attachment.added')));
    const event = events.find((e) => (e.details as { attachmentId: string }).attachmentId === response.body[0].id);
    expect(event?.details).toMatchObject({ name: 'audit-me.txt', sha256: sha256(Buffer.from('audit')), size: 5, addendum: false });
  });
});

describe('size limit', () => {
  let small: TestServer;
  let client: ApiClient;
  const limit = 6 * 1024 * 1024;

  beforeAll(async () => {
    small = await startServer({ UPLOAD_MAX_BYTES: String(limit) });
    client = await signedIn(small.url, 'chemist@saltmarsh.test');
  });
  afterAll(async () => {
    await small?.close();
  });

  it('refuses with 413 from the declared length, before reading the body', async () => {
    const before = await storedAttachmentKeys(server.deps);
    const response = await uploadFiles(client, pageId, [{ name: 'too-big.bin', content: Buffer.alloc(limit + 100 * 1024) }]);
    expect(response.status).toBe(413);
    expect(response.body.error.code).toBe('too_large');
    expect(await storedAttachmentKeys(server.deps)).toEqual(before);
  });

  it('answers 413 without waiting for the body when the declared length is over', async () => {
    // Declares 500 MB but sends only a few bytes: an answer can only come before the body is read.
    const status = await new Promise<number>((resolve, reject) => {
      const request = http.request(`${small.url}/api/pages/${pageId}/attachments`, {
        method: 'POST',
        headers: {
          origin: small.url,
          cookie: client.sessionCookie,
          'content-type': 'multipart/form-data; boundary=x',
          'content-length': String(500 * 1024 * 1024),
        },
      });
      request.on('response', (response) => {
        resolve(response.statusCode ?? 0);
        request.destroy();
      });
      request.on('error', reject);
      request.write('--x\r\nContent-Disposition: form-data; name="files"; filename="huge.bin"\r\n\r\n');
    });
    expect(status).toBe(413);
  });

  it('aborts a streamed upload that goes over, deletes what was stored and keeps nothing', async () => {
    const before = await storedAttachmentKeys(server.deps);
    const rowsBefore = await server.deps.db.select({ id: attachments.id }).from(attachments).where(eq(attachments.pageId, pageId));
    // No Content-Length: only counting while streaming can notice. Over 5 MiB, so a part was sent already.
    const response = await uploadFiles(
      client,
      pageId,
      [
        { name: 'fine.txt', content: Buffer.from('kept only if the whole request succeeds') },
        { name: 'endless.bin', content: generatedBytes(limit + 2 * 1024 * 1024) },
      ],
      { chunked: true },
    );
    expect(response.status).toBe(413);
    expect(await storedAttachmentKeys(server.deps)).toEqual(before);
    const rowsAfter = await server.deps.db.select({ id: attachments.id }).from(attachments).where(eq(attachments.pageId, pageId));
    expect(rowsAfter).toHaveLength(rowsBefore.length);
    // The server is still fine afterwards.
    expect((await uploadFiles(client, pageId, [{ name: 'after.txt', content: Buffer.from('ok') }])).status).toBe(201);
  });
});

describe('who may do what', () => {
  it('answers 401 without a session', async () => {
    const anonymous = new ApiClient(server.url);
    expect((await uploadFiles(anonymous, pageId, [{ name: 'a.txt', content: Buffer.from('a') }])).status).toBe(401);
    expect((await anonymous.get(`/api/pages/${pageId}/attachments`)).status).toBe(401);
  });

  it('hides a page from a non-member: listing, metadata, download and spectrum are 404', async () => {
    // chemist2 owns a notebook of their own; chemist is not a member of it.
    const notebook = await chemist2.post('/api/notebooks', { title: 'Private reference spectra' });
    const privatePage = await newPage(chemist2, notebook.body.id, 'Only for chemist2');
    const uploaded = await uploadFiles(chemist2, privatePage, [{ name: 'secret.txt', content: Buffer.from('secret') }]);
    expect(uploaded.status).toBe(201);
    const id = uploaded.body[0].id;

    expect((await chemist.get(`/api/pages/${privatePage}/attachments`)).status).toBe(404);
    expect((await chemist.get(`/api/attachments/${id}`)).status).toBe(404);
    expect((await download(chemist, id)).status).toBe(404);
    expect((await chemist.get(`/api/attachments/${id}/spectrum`)).status).toBe(404);
    expect((await uploadFiles(chemist, privatePage, [{ name: 'x.txt', content: Buffer.from('x') }])).status).toBe(404);
    expect((await chemist.delete(`/api/attachments/${id}`)).status).toBe(404);
    expect((await download(chemist2, id)).status).toBe(200);
  });

  it('lets a viewer read and download but not upload or delete (403)', async () => {
    const uploaded = await uploadFiles(chemist, pageId, [{ name: 'for-viewer.txt', content: Buffer.from('read me') }]);
    const id = uploaded.body[0].id;
    expect((await viewer.get(`/api/pages/${pageId}/attachments`)).status).toBe(200);
    expect((await download(viewer, id)).bytes.toString()).toBe('read me');
    const refused = await uploadFiles(viewer, pageId, [{ name: 'v.txt', content: Buffer.from('v') }]);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('forbidden');
    expect((await viewer.delete(`/api/attachments/${id}`)).status).toBe(403);
  });

  it('lets only the uploader or the notebook owner delete; deletion is audited and removes the object', async () => {
    const uploaded = await uploadFiles(chemist2, pageId, [{ name: 'by-chemist2.txt', content: Buffer.from('c2') }]);
    const mine = await uploadFiles(chemist, pageId, [{ name: 'by-chemist.txt', content: Buffer.from('c1') }]);
    // chemist2 is an editor here, not the owner, and did not upload chemist's file.
    expect((await chemist2.delete(`/api/attachments/${mine.body[0].id}`)).status).toBe(403);
    // chemist owns the notebook and may remove anyone's file.
    const key = `attachments/${uploaded.body[0].id}`;
    expect(await storedAttachmentKeys(server.deps)).toContain(key);
    expect((await chemist.delete(`/api/attachments/${uploaded.body[0].id}`)).status).toBe(204);
    expect((await chemist.get(`/api/attachments/${uploaded.body[0].id}`)).status).toBe(404);
    expect(await storedAttachmentKeys(server.deps)).not.toContain(key);
    const [event] = await server.deps.db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.pageId, pageId), eq(auditEvents.type, 'attachment.removed')));
    expect(event.details).toMatchObject({ attachmentId: uploaded.body[0].id, name: 'by-chemist2.txt' });
  });

  it('refuses deletion on a signed (locked) page and marks later files as addenda', async () => {
    const signedPage = await newPage(chemist, notebookId, 'Signed with a spectrum');
    const before = await uploadFiles(chemist, signedPage, [{ name: 'signed-part.txt', content: Buffer.from('original') }]);
    expect(before.body[0].addendum).toBe(false);
    // Signing sets pages.locked (the signing feature's job); here the row is set directly.
    await server.deps.db.update(pages).set({ locked: true }).where(eq(pages.id, signedPage));

    const refused = await chemist.delete(`/api/attachments/${before.body[0].id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('page_locked');
    expect((await download(chemist, before.body[0].id)).bytes.toString()).toBe('original');

    const later = await uploadFiles(chemist, signedPage, [{ name: 'later.txt', content: Buffer.from('addendum') }]);
    expect(later.status).toBe(201);
    expect(later.body[0]).toMatchObject({ addendum: true, canDelete: false });
    expect((await chemist.delete(`/api/attachments/${later.body[0].id}`)).status).toBe(409);
  });
});

describe('bad input', () => {
  it('answers 400 for a request that is not multipart or holds no files, and 404 for unknown ids', async () => {
    const notMultipart = await chemist.post(`/api/pages/${pageId}/attachments`, { file: 'x' });
    expect(notMultipart.status).toBe(400);
    expect(notMultipart.body.error.code).toBe('not_multipart');
    expect((await uploadFiles(chemist, pageId, [])).status).toBe(400);
    expect((await chemist.get('/api/attachments/not-an-id')).status).toBe(404);
    expect((await chemist.get('/api/attachments/00000000-0000-4000-8000-000000000000/content')).status).toBe(404);
  });
});
