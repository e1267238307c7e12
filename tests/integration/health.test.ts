import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient } from '../support/api';
import { startServer, type TestServer } from '../support/server';

let server: TestServer;
beforeAll(async () => {
  server = await startServer();
});
afterAll(() => server.close());

describe('GET /api/health', () => {
  it('reports every service reachable', async () => {
    const response = await new ApiClient(server.url).get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ status: 'ok', database: 'ok', storage: 'ok', mail: 'ok' });
  });

  it('answers unknown API routes with the error contract, not the client shell', async () => {
    const response = await new ApiClient(server.url).get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.body.error.code).toBe('not_found');
  });
});
