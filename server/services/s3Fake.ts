import fs from 'node:fs';
// s3rver ships no type declarations.
// @ts-expect-error untyped module
import S3rver from 's3rver';

/** The local S3-compatible store; the app only ever talks to it through @aws-sdk/client-s3. */
export async function startS3Fake(options: { directory: string; port: number }) {
  fs.mkdirSync(options.directory, { recursive: true });
  const server = new S3rver({ port: options.port, address: '127.0.0.1', directory: options.directory, silent: true });
  await server.run();
  return {
    endpoint: `http://127.0.0.1:${options.port}`,
    stop: () => server.close() as Promise<void>,
  };
}
