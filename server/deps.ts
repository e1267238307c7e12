import { createLucia } from './auth/lucia';
import type { AppDeps } from './context';
import { connectDatabase } from './db/client';
import type { Config } from './env';
import { createMailer } from './mail/mailer';
import { createStorage, ensureBucket } from './storage/s3';

/** Connects to the configured services; shared by the process entry and the tests. */
export async function createDeps(config: Config): Promise<AppDeps> {
  const { db, pool } = connectDatabase(config.DATABASE_URL);
  const storage = createStorage(config);
  await ensureBucket(storage);
  return {
    config,
    db,
    pool,
    auth: createLucia(db, { secureCookies: config.publicUrl.startsWith('https:') }),
    storage,
    mailer: createMailer(config),
  };
}
