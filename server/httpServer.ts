import http from 'node:http';
import { createApp } from './app';
import { attachCollab } from './collab';
import type { AppDeps } from './context';

/**
 * One HTTP server carries the client, the API and the collaboration websocket. Features that need
 * the raw server (websocket upgrades) register here.
 */
export function createHttpServer(deps: AppDeps): { server: http.Server; close(): Promise<void> } {
  const server = http.createServer(createApp(deps));
  const closers: (() => Promise<void>)[] = [];
  closers.push(attachCollab(server, deps).close);
  return {
    server,
    async close() {
      for (const close of closers) await close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await deps.pool.end();
    },
  };
}
