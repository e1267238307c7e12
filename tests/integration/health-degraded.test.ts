import { describe, expect, it } from 'vitest';
import { freePort } from '../../server/services/ports';
import { ApiClient } from '../support/api';
import { startServer } from '../support/server';

// The health endpoint must tell the truth when a service is gone, so a supervisor process or load
// balancer stops sending traffic: 503 Service Unavailable (RFC 9110 §15.6.4) naming what is down.
// A port nothing listens on stands in for a service that is down.
describe('GET /api/health with services missing', () => {
  it('reports an unreachable mail relay with 503 and mail: unavailable', async () => {
    const server = await startServer({ SMTP_PORT: String(await freePort()) });
    try {
      const response = await new ApiClient(server.url).get('/api/health');
      expect(response.status).toBe(503);
      expect(response.body).toEqual({ status: 'degraded', database: 'ok', storage: 'ok', mail: 'unavailable' });
    } finally {
      await server.close();
    }
  });

  it('reports an unreachable database with 503 and database: unavailable', async () => {
    const url = new URL(process.env.DATABASE_URL!);
    url.port = String(await freePort());
    const server = await startServer({ DATABASE_URL: url.toString() });
    try {
      const response = await new ApiClient(server.url).get('/api/health');
      expect(response.status).toBe(503);
      expect(response.body).toMatchObject({ status: 'degraded', database: 'unavailable', mail: 'ok' });
      // Without a database nobody can sign in; the failure is ours (5xx), in the contract's shape.
      const signIn = await new ApiClient(server.url).post('/api/auth/sign-in', { email: 'chemist@saltmarsh.test', password: 'quillane-demo' });
      expect(signIn.status).toBeGreaterThanOrEqual(500);
      expect(signIn.body.error).toEqual(expect.objectContaining({ code: expect.any(String), message: expect.any(String) }));
    } finally {
      await server.close();
    }
  });
});
