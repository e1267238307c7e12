import { spawn, spawnSync } from 'node:child_process';
import path from 'node:path';
import { buildClient } from './buildClient';

/**
 * `npm test`: type-checks everything, builds the client (the browser tests load it), then runs
 * the whole vitest suite. The suite's global setup starts its own throwaway PostgreSQL, S3 fake
 * and mail catcher.
 */
const root = path.resolve(import.meta.dirname, '..');
const bin = (name: string) => path.join(root, 'node_modules', '.bin', name);

console.log('[quillane] type-checking ...');
const typecheck = spawnSync(bin('tsc'), ['--noEmit', '-p', 'tsconfig.json'], { cwd: root, stdio: 'inherit' });
if (typecheck.status !== 0) {
  console.error('[quillane] the type check failed (see above)');
  process.exit(1);
}
console.log('[quillane] building the client ...');
buildClient(root);

const vitest = spawn(bin('vitest'), ['run', ...process.argv.slice(2)], { cwd: root, stdio: 'inherit' });
process.on('SIGINT', () => vitest.kill('SIGINT'));
process.on('SIGTERM', () => vitest.kill('SIGTERM'));
vitest.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
