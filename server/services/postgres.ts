import { execFileSync, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';

/** A local PostgreSQL cluster on loopback for `npm start` and `npm test`; a deployment uses a managed one. */
export interface LocalPostgres {
  url: string;
  stop(): void;
}

export function findPostgresBin(): string | null {
  const root = '/usr/lib/postgresql';
  if (!fs.existsSync(root)) return null;
  const versions = fs
    .readdirSync(root)
    .filter((v) => fs.existsSync(path.join(root, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? path.join(root, versions[0], 'bin') : null;
}

const isRoot = process.getuid?.() === 0;

/** initdb refuses to run as root, so as root everything runs as Debian's `postgres` user. */
function run(bin: string, tool: string, args: string[], options: { allowFailure?: boolean } = {}) {
  const command = isRoot ? 'runuser' : path.join(bin, tool);
  const fullArgs = isRoot ? ['-u', 'postgres', '--', path.join(bin, tool), ...args] : args;
  const result = spawnSync(command, fullArgs, { encoding: 'utf8' });
  if (result.status !== 0 && !options.allowFailure) {
    throw new Error(`${tool} failed (${result.status}): ${result.stderr || result.stdout}`);
  }
  return result;
}

function handOverToPostgresUser(dir: string) {
  if (!isRoot) return;
  execFileSync('chown', ['-R', 'postgres:postgres', dir]);
}

/** Every folder above the data folder must be enterable by the postgres user. */
function makeTraversable(dir: string) {
  if (!isRoot) return;
  let current = path.dirname(dir);
  while (current !== path.dirname(current)) {
    const mode = fs.statSync(current).mode;
    if ((mode & 0o001) === 0) fs.chmodSync(current, mode | 0o011);
    current = path.dirname(current);
  }
}

export async function startPostgres(options: { dataDir: string; port: number; database: string }): Promise<LocalPostgres> {
  const bin = findPostgresBin();
  if (!bin) throw new Error('PostgreSQL server binaries not found under /usr/lib/postgresql/*/bin');
  const { dataDir, port, database } = options;
  const clusterDir = path.join(dataDir, 'cluster');
  const socketDir = fs.mkdtempSync(path.join(os.tmpdir(), 'quillane-pgsock-'));
  fs.mkdirSync(dataDir, { recursive: true });
  makeTraversable(clusterDir);
  handOverToPostgresUser(socketDir);

  if (!fs.existsSync(path.join(clusterDir, 'PG_VERSION'))) {
    fs.mkdirSync(clusterDir, { recursive: true });
    handOverToPostgresUser(clusterDir);
    run(bin, 'initdb', ['-D', clusterDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8']);
  }

  // A crash can leave a server running (pg_ctl daemonises it) or a stale pid file behind.
  const status = run(bin, 'pg_ctl', ['-D', clusterDir, 'status'], { allowFailure: true });
  if (status.status === 0) run(bin, 'pg_ctl', ['-D', clusterDir, '-m', 'fast', '-w', 'stop'], { allowFailure: true });
  fs.rmSync(path.join(clusterDir, 'postmaster.pid'), { force: true });

  const logFile = path.join(dataDir, 'postgres.log');
  if (isRoot && !fs.existsSync(logFile)) {
    fs.writeFileSync(logFile, '');
    handOverToPostgresUser(logFile);
  }
  run(bin, 'pg_ctl', [
    '-D', clusterDir, '-l', logFile, '-w', '-t', '60',
    '-o', `-h 127.0.0.1 -p ${port} -k ${socketDir} -c listen_addresses=127.0.0.1`,
    'start',
  ]);

  let stopped = false;
  const stop = () => {
    if (stopped) return;
    stopped = true;
    run(bin, 'pg_ctl', ['-D', clusterDir, '-m', 'fast', '-w', 'stop'], { allowFailure: true });
    fs.rmSync(socketDir, { recursive: true, force: true });
  };

  const admin = new pg.Client({ host: '127.0.0.1', port, user: 'postgres', database: 'postgres' });
  try {
    await admin.connect();
    const exists = await admin.query('select 1 from pg_database where datname = $1', [database]);
    if (exists.rowCount === 0) await admin.query(`create database "${database}"`);
  } catch (error) {
    stop();
    throw error;
  } finally {
    await admin.end().catch(() => undefined);
  }
  return { url: `postgres://postgres@127.0.0.1:${port}/${database}`, stop };
}
