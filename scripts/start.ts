import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { connectDatabase } from '../server/db/client';
import { loadConfig } from '../server/env';
import { seedDemo } from '../server/seed/demo';
import { DEMO_PASSWORD, demoPeople } from '../server/seed/demoPeople';
import { startLocalStack } from '../server/services/stack';
import { createStorage, ensureBucket } from '../server/storage/s3';
import { buildClient } from './buildClient';

/**
 * `npm start`: local services on loopback with data under .data/, the demo scenario seeded once,
 * the client built, and the server process running until Ctrl-C or SIGTERM.
 */
const root = path.resolve(import.meta.dirname, '..');
const port = process.env.PORT ?? '3000';

async function main() {
  console.log('[quillane] starting PostgreSQL, the S3 fake and the mail catcher ...');
  const stack = await startLocalStack(path.join(root, '.data'));
  // For development: lets a second server (e.g. `tsx watch`) reach the same services.
  fs.writeFileSync(path.join(root, '.data', 'services.env'), Object.entries(stack.env).map(([k, v]) => `${k}=${v}`).join('\n') + '\n');
  let stopping = false;
  const stopAll = async (code: number) => {
    if (stopping) return;
    stopping = true;
    console.log('[quillane] stopping services ...');
    await stack.stop();
    process.exit(code);
  };
  process.on('SIGINT', () => void stopAll(0));
  process.on('SIGTERM', () => void stopAll(0));

  try {
    const { db, pool } = connectDatabase(stack.env.DATABASE_URL);
    const storage = createStorage(loadConfig({ ...process.env, ...stack.env }));
    await ensureBucket(storage);
    const seeded = await seedDemo(db, storage);
    await pool.end();
    console.log(seeded.created ? '[quillane] demo data seeded' : '[quillane] demo data found from an earlier start');
    console.log('[quillane] building the client ...');
    buildClient(root);
  } catch (error) {
    console.error(error);
    await stopAll(1);
    return;
  }

  const publicUrl = `http://127.0.0.1:${port}`;
  const server = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'server', 'index.ts')], {
    cwd: root,
    stdio: ['ignore', 'inherit', 'inherit'],
    env: { ...process.env, ...stack.env, PORT: port, HOST: '127.0.0.1', PUBLIC_URL: process.env.PUBLIC_URL ?? publicUrl, NODE_ENV: 'production' },
  });
  server.on('exit', (code) => void stopAll(code ?? 0));
  process.removeAllListeners('SIGINT');
  process.removeAllListeners('SIGTERM');
  const forward = (signal: NodeJS.Signals) => {
    if (!server.killed) server.kill(signal);
  };
  process.on('SIGINT', () => forward('SIGTERM'));
  process.on('SIGTERM', () => forward('SIGTERM'));

  console.log(`
  Quillane is running at ${publicUrl}
  Demo accounts (password "${DEMO_PASSWORD}"):
${demoPeople.map((p) => `    ${p.email.padEnd(28)} ${p.role}`).join('\n')}
  Caught e-mail (invitations, resets) is readable by the admin under "Mail".
  Press Ctrl-C to stop; all services stop with it.
`);
}

void main().catch(async (error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
