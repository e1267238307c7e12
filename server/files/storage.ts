import { DeleteObjectCommand, GetObjectCommand } from '@aws-sdk/client-s3';
import type { Readable } from 'node:stream';
import type { Storage } from '../storage/s3';

/** Keys are ours: a fresh uuid per file, so no user-chosen name ever reaches the bucket. */
export function storageKeyFor(attachmentId: string): string {
  return `attachments/${attachmentId}`;
}

export async function openObject(storage: Storage, key: string): Promise<Readable> {
  const object = await storage.client.send(new GetObjectCommand({ Bucket: storage.bucket, Key: key }));
  return object.Body as Readable;
}

/** Best effort: a leftover object is unreachable without its row, and must not fail the request. */
export async function removeObject(storage: Storage, key: string): Promise<void> {
  try {
    await storage.client.send(new DeleteObjectCommand({ Bucket: storage.bucket, Key: key }));
  } catch (error) {
    console.warn(`[files] could not delete object ${key}:`, (error as Error).message);
  }
}
