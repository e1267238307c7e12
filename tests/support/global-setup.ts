import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { connectDatabase } from '../../server/db/client';
import { loadConfig } from '../../server/env';
import { seedDemo } from '../../server/seed/demo';
import { startLocalStack } from '../../server/services/stack';
import { createStorage, ensureBucket } from '../../server/storage/s3';

/**
 * Real services for the integration and browser tests, on throwaway data: a temporary PostgreSQL
 * cluster on a free port, a temporary S3 folder and a mail catcher. The demo scenario is seeded so
 * tests can sign in as the demo accounts. Connection details reach the test workers through env.
 */
export default async function setup() {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'quillane-test-'));
  const stack = await startLocalStack(dataDir);
  const teardown = async () => {
    await stack.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  };
  const { db, pool } = connectDatabase(stack.env.DATABASE_URL);
  try {
    const storage = createStorage(loadConfig({ ...process.env, ...stack.env }));
    await ensureBucket(storage);
    await seedDemo(db, storage);
  } catch (error) {
    // vitest runs no teardown when setup throws: stop PostgreSQL here or it outlives the run.
    await pool.end();
    await teardown();
    throw error;
  }
  await pool.end();
  Object.assign(process.env, stack.env, { NODE_ENV: 'test' });
  return teardown;
}
