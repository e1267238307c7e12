import { PutObjectCommand } from '@aws-sdk/client-s3';
import { and, eq } from 'drizzle-orm';
import { createHash, randomUUID } from 'node:crypto';
import { appendInTransaction } from '../audit/record';
import type { Database } from '../db/client';
import { attachments, notebooks, pages } from '../db/schema';
import { attachmentAddedDetails } from '../files/addedEvent';
import { displayNameFor } from '../files/displayName';
import { SNIFF_BYTES } from '../files/mediaType';
import { describeReceived } from '../files/receiveUpload';
import { storageKeyFor } from '../files/storage';
import type { Storage } from '../storage/s3';
import type { DemoUsers } from './demo';
import { esterInfraredJcamp } from './esterInfrared';

const TARGET = { notebook: 'Fruity esters from short-chain acids', number: 1, uploader: 'chemist@saltmarsh.test' };

/**
 * Attaches the generated ester IR spectrum to the first isoamyl acetate page, the way an upload
 * would store it (object under our own key, checksum, parsed spectrum, audit event). Runs inside
 * seedDemo's once-only marker and before the demo signatures, so the signed record covers it.
 */
export async function seedDemoAttachments(db: Database, storage: Storage, people: DemoUsers): Promise<void> {
  const [page] = await db
    .select({ id: pages.id, notebookId: pages.notebookId })
    .from(pages)
    .innerJoin(notebooks, eq(notebooks.id, pages.notebookId))
    .where(and(eq(notebooks.title, TARGET.notebook), eq(pages.number, TARGET.number)));
  const uploader = people[TARGET.uploader];
  const bytes = Buffer.from(esterInfraredJcamp());
  const id = randomUUID();
  const originalName = 'isoamyl-acetate-crude-IR.jdx';
  const file = await describeReceived(
    {
      id,
      storageKey: storageKeyFor(id),
      originalName,
      displayName: displayNameFor(originalName),
      size: bytes.length,
      sha256: createHash('sha256').update(bytes).digest('hex'),
    },
    bytes.subarray(0, SNIFF_BYTES),
    bytes,
  );
  await storage.client.send(new PutObjectCommand({ Bucket: storage.bucket, Key: file.storageKey, Body: bytes, ContentType: 'application/octet-stream' }));
  await db.transaction(async (tx) => {
    await tx.insert(attachments).values({ ...file, pageId: page.id, uploaderId: uploader.id });
    await appendInTransaction(tx, {
      type: 'attachment.added',
      actor: uploader,
      notebookId: page.notebookId,
      pageId: page.id,
      details: attachmentAddedDetails(file, false),
    });
  });
}
