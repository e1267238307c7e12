import { spawn } from 'node:child_process';
import path from 'node:path';
import { buildClient } from './buildClient';

/**
 * `npm test`: builds the client (the browser tests load it), then runs the whole vitest suite.
 * The suite's global setup starts its own throwaway PostgreSQL, S3 fake and mail catcher.
 */
const root = path.resolve(import.meta.dirname, '..');
buildClient(root);
const vitest = spawn(path.join(root, 'node_modules', '.bin', 'vitest'), ['run', ...process.argv.slice(2)], {
  cwd: root,
  stdio: 'inherit',
});
process.on('SIGINT', () => vitest.kill('SIGINT'));
process.on('SIGTERM', () => vitest.kill('SIGTERM'));
vitest.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
