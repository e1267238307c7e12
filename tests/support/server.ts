import { createDeps } from '../../server/deps';
import type { AppDeps } from '../../server/context';
import { loadConfig } from '../../server/env';
import { createHttpServer } from '../../server/httpServer';
import { freePort } from '../../server/services/ports';

export interface TestServer {
  url: string;
  deps: AppDeps;
  close(): Promise<void>;
}

/**
 * The real app on loopback, wired to the suite's services (see global-setup.ts). It takes a free
 * port unless `overrides.PORT` names one (a restart on the same address, for reconnecting clients).
 */
export async function startServer(overrides: Record<string, string> = {}): Promise<TestServer> {
  const port = overrides.PORT ? Number(overrides.PORT) : await freePort();
  const config = loadConfig({ ...process.env, PORT: String(port), HOST: '127.0.0.1', ...overrides });
  const deps = await createDeps(config);
  const { server, close } = createHttpServer(deps);
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', resolve));
  return { url: `http://127.0.0.1:${port}`, deps, close };
}
