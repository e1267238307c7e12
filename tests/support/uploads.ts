import { ListObjectsV2Command } from '@aws-sdk/client-s3';
import { randomUUID } from 'node:crypto';
import type { AppDeps } from '../../server/context';
import type { ApiClient } from './api';

export interface UploadPart {
  name: string;
  /** The bytes, or a generator of chunks for files too large to hold at once. */
  content: Buffer | (() => AsyncIterable<Buffer>);
  type?: string;
}

export interface UploadResult {
  status: number;
  body: any;
}

function partHeader(boundary: string, part: UploadPart): Buffer {
  const quoted = part.name.replace(/"/g, '%22').replace(/\r|\n/g, ' ');
  return Buffer.from(
    `--${boundary}\r\nContent-Disposition: form-data; name="files"; filename="${quoted}"\r\n` +
      `Content-Type: ${part.type ?? 'application/octet-stream'}\r\n\r\n`,
  );
}

async function* multipartChunks(boundary: string, parts: UploadPart[]): AsyncIterable<Buffer> {
  for (const part of parts) {
    yield partHeader(boundary, part);
    if (Buffer.isBuffer(part.content)) yield part.content;
    else for await (const chunk of part.content()) yield chunk;
    yield Buffer.from('\r\n');
  }
  yield Buffer.from(`--${boundary}--\r\n`);
}

/**
 * Sends files as multipart/form-data the way a browser form does. Small bodies go with a
 * Content-Length; `chunked` streams the body without one, so only the server's own counting
 * can notice a file that is too large.
 */
export async function uploadFiles(client: ApiClient, pageId: string, parts: UploadPart[], options: { chunked?: boolean } = {}): Promise<UploadResult> {
  const boundary = `----quillane-test-${randomUUID()}`;
  const headers: Record<string, string> = {
    origin: client.baseUrl,
    'content-type': `multipart/form-data; boundary=${boundary}`,
  };
  if (client.sessionCookie) headers.cookie = client.sessionCookie;
  let body: BodyInit;
  if (options.chunked) {
    const iterator = multipartChunks(boundary, parts)[Symbol.asyncIterator]();
    body = new ReadableStream<Uint8Array>({
      async pull(controller) {
        const next = await iterator.next();
        if (next.done) controller.close();
        else controller.enqueue(new Uint8Array(next.value));
      },
    });
  } else {
    const chunks: Buffer[] = [];
    for await (const chunk of multipartChunks(boundary, parts)) chunks.push(chunk);
    body = Buffer.concat(chunks);
  }
  const response = await fetch(`${client.baseUrl}/api/pages/${pageId}/attachments`, {
    method: 'POST',
    headers,
    body,
    ...(options.chunked ? { duplex: 'half' } : {}),
  } as RequestInit);
  const text = await response.text();
  let parsed: unknown = text;
  try {
    parsed = JSON.parse(text);
  } catch {
    // Not JSON; the raw text is the body.
  }
  return { status: response.status, body: parsed };
}

/** Deterministic pseudo-random bytes (xorshift32), produced in chunks so large files never sit in memory. */
export function generatedBytes(total: number, seed = 0x9e3779b9, chunkSize = 1 << 20): () => AsyncIterable<Buffer> {
  return async function* () {
    let state = seed >>> 0 || 1;
    for (let offset = 0; offset < total; offset += chunkSize) {
      const chunk = Buffer.allocUnsafe(Math.min(chunkSize, total - offset));
      for (let i = 0; i < chunk.length; i++) {
        state ^= state << 13;
        state >>>= 0;
        state ^= state >>> 17;
        state ^= state << 5;
        state >>>= 0;
        chunk[i] = state & 0xff;
      }
      yield chunk;
    }
  };
}

/** Every attachment object in the bucket, sorted; follows continuation tokens past one listing page. */
export async function storedAttachmentKeys(deps: AppDeps): Promise<string[]> {
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page = await deps.storage.client.send(new ListObjectsV2Command({ Bucket: deps.storage.bucket, Prefix: 'attachments/', ContinuationToken: token }));
    keys.push(...(page.Contents ?? []).map((o) => o.Key!));
    token = page.NextContinuationToken;
  } while (token);
  return keys.sort();
}
