import { spawnSync } from 'node:child_process';
import path from 'node:path';

/** Builds the React client into dist/client with Vite. */
export function buildClient(root: string): void {
  const vite = path.join(root, 'node_modules', '.bin', 'vite');
  const result = spawnSync(vite, ['build', '--logLevel', 'warn'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) throw new Error('The client build failed (see above)');
}
