import type pg from 'pg';
import type { Auth } from './auth/lucia';
import type { Database } from './db/client';
import type { Config } from './env';
import type { Mailer } from './mail/mailer';
import type { Storage } from './storage/s3';

/** Everything a route or the collaboration server needs, built once by the process (or a test). */
export interface AppDeps {
  config: Config;
  db: Database;
  pool: pg.Pool;
  auth: Auth;
  storage: Storage;
  mailer: Mailer;
}
