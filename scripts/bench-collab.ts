import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { parseArgs } from 'node:util';
import { asc, eq, gt, and, sql } from 'drizzle-orm';
import { $createParagraphNode, $createTextNode, $getRoot } from 'lexical';
import { WebSocket } from 'ws';
import { WebsocketProvider } from 'y-websocket';
import * as Y from 'yjs';
import { writeThroughEditor } from '../server/collab/editorWrite';
import { connectDatabase } from '../server/db/client';
import { collabDocuments, collabUpdates, notebooks, pageContent } from '../server/db/schema';
import { seedDemo } from '../server/seed/demo';
import { DEMO_PASSWORD } from '../server/seed/demoPeople';
import { freePort } from '../server/services/ports';
import { startLocalStack } from '../server/services/stack';
import { createStorage, ensureBucket } from '../server/storage/s3';
import { loadConfig } from '../server/env';

/**
 * `npm run bench:collab`: N simulated editors on one page over loopback, each appending a token
 * to its own paragraph every interval. Prints the median and 99th percentile time from an edit to
 * its arrival at every other client, updates stored per second, the server's memory, and checks
 * that every edit reached every client and the database. The server runs as its own process on a
 * throwaway stack, as in production.
 */
const { values: args } = parseArgs({
  options: {
    editors: { type: 'string', default: '20' },
    seconds: { type: 'string', default: '30' },
    interval: { type: 'string', default: '100' },
  },
});
const EDITORS = Number(args.editors);
const SECONDS = Number(args.seconds);
const INTERVAL_MS = Number(args.interval);
const EDITOR_ACCOUNTS = ['chemist@saltmarsh.test', 'chemist2@saltmarsh.test', 'supervisor@saltmarsh.test'];
const root = path.resolve(import.meta.dirname, '..');
const TOKEN = /#e(\d+)n(\d+);/g;

async function signIn(url: string, email: string): Promise<string> {
  const response = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: url },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (response.status !== 200) throw new Error(`sign-in as ${email}: ${response.status}`);
  return response.headers.getSetCookie()[0].split(';')[0];
}

function startServer(env: Record<string, string>): Promise<ChildProcess> {
  // Node with tsx as a loader, so the measured pid is the server itself.
  const proc = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'server', 'index.ts')], {
    cwd: root,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  return new Promise((resolve, reject) => {
    proc.stdout?.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('listening on')) resolve(proc);
    });
    proc.on('exit', (code) => reject(new Error(`server exited (${code})`)));
  });
}

function residentMegabytes(pid: number): number {
  const status = fs.readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0);
  return kb / 1024;
}

function cookieSocket(cookie: string) {
  return class extends WebSocket {
    constructor(url: string | URL, protocols?: string | string[]) {
      super(url, protocols, { headers: { cookie } });
    }
  } as unknown as typeof globalThis.WebSocket;
}

async function connect(url: string, pageId: string, cookie: string): Promise<{ doc: Y.Doc; provider: WebsocketProvider }> {
  const doc = new Y.Doc();
  const provider = new WebsocketProvider(`${url.replace('http', 'ws')}/collab`, pageId, doc, { WebSocketPolyfill: cookieSocket(cookie), disableBc: true });
  await new Promise<void>((resolve) => provider.once('sync', () => resolve()));
  return { doc, provider };
}

/** One paragraph per editor, written by a real Lexical binding so the page is what browsers write. */
function seedParagraphs(doc: Y.Doc): void {
  writeThroughEditor(doc, () => {
    for (let i = 0; i < EDITORS; i += 1) $getRoot().append($createParagraphNode().append($createTextNode(`Editor ${i}: `)));
  });
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

async function main() {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'quillane-bench-collab-'));
  const stack = await startLocalStack(dataDir);
  const { db, pool } = connectDatabase(stack.env.DATABASE_URL);
  let server: ChildProcess | null = null;
  try {
    const storage = createStorage(loadConfig({ ...process.env, ...stack.env }));
    await ensureBucket(storage);
    await seedDemo(db, storage);
    const port = await freePort();
    const url = `http://127.0.0.1:${port}`;
    server = await startServer({ ...stack.env, PORT: String(port), HOST: '127.0.0.1', NODE_ENV: 'production', PUBLIC_URL: url });
    const pid = server.pid as number;

    const owner = await signIn(url, EDITOR_ACCOUNTS[0]);
    const [notebook] = await db.select().from(notebooks).where(eq(notebooks.title, 'Fruity esters from short-chain acids'));
    const created = await fetch(`${url}/api/notebooks/${notebook.id}/pages`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: url, cookie: owner },
      body: JSON.stringify({ title: 'Benchmark: many hands' }),
    });
    const pageId: string = ((await created.json()) as { id: string }).id;

    const setup = await connect(url, pageId, owner);
    seedParagraphs(setup.doc);
    // One session per account (the sign-in throttle counts attempts), shared by several editors.
    const sessions = [owner, ...(await Promise.all(EDITOR_ACCOUNTS.slice(1).map((email) => signIn(url, email))))];
    const clients = await Promise.all(Array.from({ length: EDITORS }, (_, i) => connect(url, pageId, sessions[i % sessions.length])));
    for (const client of clients) {
      while ((client.doc.get('root', Y.XmlText).toDelta() as unknown[]).length < EDITORS) await new Promise((r) => setTimeout(r, 20));
    }
    setup.provider.destroy();

    const sentAt = new Map<string, number>();
    const latencies: number[] = [];
    const received = clients.map(() => new Set<string>());
    clients.forEach((client, index) => {
      client.doc.get('root', Y.XmlText).observeDeep((events, transaction) => {
        if (transaction.local) return;
        const now = performance.now();
        for (const event of events) {
          for (const op of event.delta) {
            if (typeof op.insert !== 'string') continue;
            for (const [token] of op.insert.matchAll(TOKEN)) {
              const sent = sentAt.get(token);
              if (sent === undefined || received[index].has(token)) continue;
              received[index].add(token);
              latencies.push(now - sent);
            }
          }
        }
      });
    });

    const idBefore = await db.execute(sql`select coalesce(max(id), 0) as id from collab_updates`);
    const firstId = Number((idBefore.rows[0] as { id: string }).id);
    const memory: number[] = [];
    const sampler = setInterval(() => memory.push(residentMegabytes(pid)), 1000);
    // The 20 clients share this process: its own event-loop delay is part of every measured time.
    const clientLoop = monitorEventLoopDelay({ resolution: 10 });
    clientLoop.enable();
    const editsPerEditor = Math.floor((SECONDS * 1000) / INTERVAL_MS);
    const started = performance.now();
    console.log(`[bench:collab] ${EDITORS} editors, an edit each every ${INTERVAL_MS} ms for ${SECONDS} s ...`);
    await Promise.all(
      clients.map(
        (client, i) =>
          new Promise<void>((resolve) => {
            const paragraph = (client.doc.get('root', Y.XmlText).toDelta() as { insert: Y.XmlText }[])[i].insert;
            let seq = 0;
            setTimeout(() => {
              const timer = setInterval(() => {
                const token = `#e${i}n${seq};`;
                sentAt.set(token, performance.now());
                paragraph.insert(paragraph.length, token);
                seq += 1;
                if (seq >= editsPerEditor) {
                  clearInterval(timer);
                  resolve();
                }
              }, INTERVAL_MS);
            }, (i * INTERVAL_MS) / EDITORS);
          }),
      ),
    );
    const expected = EDITORS * editsPerEditor;
    const deadline = Date.now() + 30_000;
    while (received.some((set) => set.size < expected - editsPerEditor) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    const elapsed = (performance.now() - started) / 1000;
    clearInterval(sampler);
    clientLoop.disable();
    memory.push(residentMegabytes(pid));

    const stored = await db
      .select({ id: collabUpdates.id })
      .from(collabUpdates)
      .where(and(eq(collabUpdates.pageId, pageId), gt(collabUpdates.id, firstId)));
    const lastRow = await db.execute(sql`select last_value from collab_updates_id_seq`);
    const persisted = Number((lastRow.rows[0] as { last_value: string }).last_value) - firstId;

    // Every edit at every other client, and in the database (compacted state + appended rows).
    const missingAtClients = received.reduce((sum, set) => sum + (expected - editsPerEditor - set.size), 0);
    server.kill('SIGKILL');
    await new Promise((r) => server?.once('exit', r));
    server = null;
    const rebuilt = new Y.Doc();
    const [compacted] = await db.select().from(collabDocuments).where(eq(collabDocuments.pageId, pageId));
    if (compacted) Y.applyUpdate(rebuilt, compacted.state);
    const rows = await db
      .select({ update: collabUpdates.update })
      .from(collabUpdates)
      .where(and(eq(collabUpdates.pageId, pageId), gt(collabUpdates.id, compacted?.throughUpdateId ?? 0)))
      .orderBy(asc(collabUpdates.id));
    for (const row of rows) Y.applyUpdate(rebuilt, row.update);
    const storedText = (rebuilt.get('root', Y.XmlText).toDelta() as { insert: Y.XmlText }[]).map((d) => d.insert.toString()).join('\n');
    const storedTokens = new Set([...storedText.matchAll(TOKEN)].map((m) => m[0]));
    const [projection] = await db.select({ text: pageContent.text }).from(pageContent).where(eq(pageContent.pageId, pageId));
    const projectedTokens = new Set([...(projection?.text ?? '').matchAll(TOKEN)].map((m) => m[0]));

    latencies.sort((a, b) => a - b);
    const median = percentile(latencies, 50);
    const p99 = percentile(latencies, 99);
    console.log(`edits sent                      ${expected}`);
    console.log(`arrivals measured               ${latencies.length} (expected ${expected * (EDITORS - 1)})`);
    console.log(`edit → other client, median     ${median.toFixed(1)} ms  (aim < 30 ms: ${(median / 30).toFixed(2)} of the budget)`);
    console.log(`edit → other client, p99        ${p99.toFixed(1)} ms  (aim < 150 ms: ${(p99 / 150).toFixed(2)} of the budget)`);
    console.log(`edit → other client, max        ${latencies.at(-1)?.toFixed(1)} ms`);
    console.log(`updates stored                  ${persisted} in ${elapsed.toFixed(1)} s = ${(persisted / elapsed).toFixed(0)}/s (rows left uncompacted: ${stored.length})`);
    console.log(`server memory (RSS)             peak ${Math.max(...memory).toFixed(0)} MB, end ${memory.at(-1)?.toFixed(0)} MB`);
    console.log(`client process loop delay       p99 ${(clientLoop.percentile(99) / 1e6).toFixed(1)} ms, max ${(clientLoop.max / 1e6).toFixed(1)} ms (load average ${os.loadavg()[0].toFixed(1)} on ${os.cpus().length} cores)`);
    console.log(`missing at clients              ${missingAtClients}`);
    console.log(`edits in the database           ${storedTokens.size} of ${expected} (after SIGKILL, rebuilt from the tables)`);
    console.log(`edits in the projection         ${projectedTokens.size} of ${expected} (page_content, debounced)`);
    const lost = missingAtClients > 0 || storedTokens.size !== expected;
    console.log(lost ? 'RESULT: updates were lost' : 'RESULT: no update lost');
    for (const client of clients) client.provider.destroy();
    process.exitCode = lost ? 1 : 0;
  } finally {
    if (server) server.kill('SIGKILL');
    await pool.end();
    await stack.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
