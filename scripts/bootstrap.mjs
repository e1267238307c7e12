#!/usr/bin/env node
// Entry for `npm start` and `npm test`: installs whatever is missing (npm packages, Debian's
// PostgreSQL server, Chromium for the browser tests), then hands over to the TypeScript runner.
// Plain JavaScript on purpose: it must run before any dependency is installed.
import { execFileSync, spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const root = path.resolve(import.meta.dirname, '..');
const mode = process.argv[2];
const passThrough = process.argv.slice(3);
if (mode !== 'start' && mode !== 'test') {
  console.error('usage: node scripts/bootstrap.mjs start|test [args]');
  process.exit(2);
}

function say(message) {
  console.log(`[quillane] ${message}`);
}

function npmPackagesCurrent() {
  const installed = path.join(root, 'node_modules', '.package-lock.json');
  if (!fs.existsSync(installed)) return false;
  return fs.statSync(installed).mtimeMs >= fs.statSync(path.join(root, 'package-lock.json')).mtimeMs;
}

function hasPostgresServer() {
  const base = '/usr/lib/postgresql';
  return fs.existsSync(base) && fs.readdirSync(base).some((v) => fs.existsSync(path.join(base, v, 'bin', 'initdb')));
}

let aptUpdated = false;
function aptInstall(pkg, why) {
  const isRoot = process.getuid?.() === 0;
  const prefix = isRoot ? [] : ['sudo', '-n'];
  say(`installing Debian's ${pkg} (${why}) with apt-get ...`);
  try {
    const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
    if (!aptUpdated) {
      execFileSync(prefix[0] ?? 'apt-get', [...prefix.slice(1), ...(isRoot ? [] : ['apt-get']), 'update'], { stdio: 'inherit', env });
      aptUpdated = true;
    }
    execFileSync(prefix[0] ?? 'apt-get', [...prefix.slice(1), ...(isRoot ? [] : ['apt-get']), 'install', '-y', '--no-install-recommends', pkg], {
      stdio: 'inherit',
      env,
    });
  } catch {
    console.error(
      `[quillane] Could not install Debian's ${pkg}. Install it yourself (as root: apt-get install -y ${pkg}) and run this again.`,
    );
    process.exit(1);
  }
}

if (!npmPackagesCurrent()) {
  say('installing npm packages (npm ci) ...');
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) process.exit(result.status ?? 1);
}
if (!hasPostgresServer()) aptInstall('postgresql', 'the database server');
if (mode === 'test' && !fs.existsSync('/usr/bin/chromium')) aptInstall('chromium', 'for the browser tests');

// The locked AWS SDK supports this Node.js; its notice about future releases is noise at every start.
const env = { AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true', ...process.env };
// `node --import tsx` rather than the tsx command: no wrapper process in between, so signals reach
// the script itself and its clean-up (stopping PostgreSQL) always runs.
const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, 'scripts', `${mode}.ts`), ...passThrough], {
  cwd: root,
  stdio: 'inherit',
  env,
});
// Ctrl-C in a terminal reaches the child directly too; passing signals on covers a lone `kill`.
// The child's shutdown is idempotent, so receiving one twice is harmless.
process.on('SIGINT', () => child.kill('SIGINT'));
process.on('SIGTERM', () => child.kill('SIGTERM'));
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
