import path from 'node:path';
import { applyMigrations, connectDatabase } from '../db/client';
import { startMailCatcher } from './mailCatcher';
import { freePort } from './ports';
import { startPostgres } from './postgres';
import { startS3Fake } from './s3Fake';

export interface LocalStack {
  /** Environment for the server process: where to find each service. */
  env: Record<string, string>;
  stop(): Promise<void>;
}

/**
 * Starts PostgreSQL, the S3 fake and the mail catcher on 127.0.0.1 with data under `dataDir`
 * and applies the migrations. Stops whatever did start if a later piece fails.
 */
export async function startLocalStack(dataDir: string, ports: { postgres?: number } = {}): Promise<LocalStack> {
  const stops: (() => Promise<void> | void)[] = [];
  const stop = async () => {
    for (const s of stops.reverse()) await Promise.resolve(s()).catch(() => undefined);
  };
  try {
    const postgres = await startPostgres({
      dataDir: path.join(dataDir, 'postgres'),
      port: ports.postgres ?? (await freePort()),
      database: 'quillane',
    });
    stops.push(postgres.stop);

    const { db, pool } = connectDatabase(postgres.url);
    await applyMigrations(db);
    await pool.end();

    const s3 = await startS3Fake({ directory: path.join(dataDir, 's3'), port: await freePort() });
    stops.push(s3.stop);
    const mail = await startMailCatcher({ port: await freePort(), databaseUrl: postgres.url });
    stops.push(mail.stop);

    return {
      env: { DATABASE_URL: postgres.url, S3_ENDPOINT: s3.endpoint, SMTP_HOST: '127.0.0.1', SMTP_PORT: String(mail.port) },
      stop,
    };
  } catch (error) {
    await stop();
    throw error;
  }
}
