import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { connectDatabase } from '../../server/db/client';
import { collabDocuments, notebooks } from '../../server/db/schema';
import { freePort } from '../../server/services/ports';
import { signedIn } from '../support/api';
import { connectCollab, waitFor } from '../support/collab';

const root = path.resolve(import.meta.dirname, '../..');
const { db, pool } = connectDatabase(process.env.DATABASE_URL as string);
let port: number;
let child: ChildProcess | null = null;

/**
 * The real server process (server/index.ts) on the suite's services. Node runs it directly with
 * tsx as a loader: the tsx command would start it as a grandchild the SIGKILL would miss.
 */
async function startProcess(): Promise<ChildProcess> {
  const proc = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'server', 'index.ts')], {
    cwd: root,
    env: { ...process.env, PORT: String(port), HOST: '127.0.0.1', NODE_ENV: 'test' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start:\n${output}`)), 30_000);
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      if (output.includes('listening on')) {
        clearTimeout(timer);
        resolve();
      }
    };
    proc.stdout?.on('data', onData);
    proc.stderr?.on('data', onData);
    proc.on('exit', (code) => reject(new Error(`server exited (${code}):\n${output}`)));
  });
  return proc;
}

function killHard(proc: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    proc.once('exit', () => resolve());
    proc.kill('SIGKILL');
  });
}

beforeAll(async () => {
  port = await freePort();
});
afterAll(async () => {
  if (child && child.exitCode === null && child.signalCode === null) await killHard(child);
  await pool.end();
});

describe('collaboration after SIGKILL', () => {
  it('loses nothing that was acknowledged (relayed) before the process was killed', async () => {
    child = await startProcess();
    const url = `http://127.0.0.1:${port}`;
    const chemist = await signedIn(url, 'chemist@saltmarsh.test');
    const chemist2 = await signedIn(url, 'chemist2@saltmarsh.test');
    const [notebook] = await db.select().from(notebooks).where(eq(notebooks.title, 'Fruity esters from short-chain acids'));
    const page = await chemist.post(`/api/notebooks/${notebook.id}/pages`, { title: 'Killed mid-edit' });
    expect(page.status).toBe(201);
    const pageId: string = page.body.id;

    const writer = await connectCollab(url, pageId, chemist.sessionCookie);
    const observer = await connectCollab(url, pageId, chemist2.sessionCookie);
    const lines = Array.from({ length: 40 }, (_, i) => `step ${i + 1}; `);
    for (const line of lines) writer.root.insert(writer.root.length, line);
    // The server relays an update only after storing it, so the observer holding all of them is
    // the acknowledgement that every one is in the database.
    await waitFor(() => observer.root.toString() === lines.join(''), 'all edits at the observer');

    await killHard(child);
    writer.destroy();
    observer.destroy();
    // No graceful shutdown ran: nothing was compacted, the appended updates are all there is.
    expect(await db.select().from(collabDocuments).where(eq(collabDocuments.pageId, pageId))).toEqual([]);

    child = await startProcess();
    const reader = await connectCollab(url, pageId, (await signedIn(url, 'chemist2@saltmarsh.test')).sessionCookie);
    expect(reader.root.toString()).toBe(lines.join(''));
    reader.destroy();
    await killHard(child);
  });
});
