import { loadConfig } from './env';
import { createDeps } from './deps';
import { createHttpServer } from './httpServer';

/** The server process: configuration from the environment, then listen until told to stop. */
async function main() {
  const config = loadConfig();
  const deps = await createDeps(config);
  const { server, close } = createHttpServer(deps);
  await new Promise<void>((resolve) => server.listen(config.PORT, config.HOST, resolve));
  console.log(`Quillane server listening on http://${config.HOST}:${config.PORT}`);
  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`Quillane server stopping (${signal})`);
    await close();
    process.exit(0);
  };
  process.on('SIGINT', () => void stop('SIGINT'));
  process.on('SIGTERM', () => void stop('SIGTERM'));
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
