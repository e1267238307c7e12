import { CreateBucketCommand, HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import type { Config } from '../env';

export interface Storage {
  client: S3Client;
  bucket: string;
}

export function createStorage(config: Config): Storage {
  const client = new S3Client({
    endpoint: config.S3_ENDPOINT,
    region: config.S3_REGION,
    forcePathStyle: config.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: config.S3_ACCESS_KEY_ID, secretAccessKey: config.S3_SECRET_ACCESS_KEY },
  });
  return { client, bucket: config.S3_BUCKET };
}

/** The bucket is private and created at start when missing. */
export async function ensureBucket(storage: Storage): Promise<void> {
  try {
    await storage.client.send(new HeadBucketCommand({ Bucket: storage.bucket }));
  } catch {
    await storage.client.send(new CreateBucketCommand({ Bucket: storage.bucket }));
  }
}

export async function storageHealthy(storage: Storage): Promise<boolean> {
  try {
    await storage.client.send(new HeadBucketCommand({ Bucket: storage.bucket }));
    return true;
  } catch {
    return false;
  }
}
