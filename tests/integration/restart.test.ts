import { describe, expect, it } from 'vitest';
import { ApiClient } from '../support/api';
import { createPerson, signedInAs } from '../support/fixtures';
import { startServer } from '../support/server';

// "Nothing acknowledged is ever lost" (RULES.md): everything the API answered with success is in
// PostgreSQL, so a new server process on the same database sees it all, sessions included.
describe('server restart', () => {
  it('keeps notebooks, pages, members and sessions across a restart', async () => {
    const first = await startServer();
    const owner = await createPerson(first.deps, 'chemist', 'restart-owner');
    const reader = await createPerson(first.deps, 'chemist', 'restart-reader');
    const api = await signedInAs(first.url, owner);
    const notebook = (await api.post('/api/notebooks', { title: 'Survives restarts', description: 'kept in PostgreSQL' })).body;
    const page = (await api.post(`/api/notebooks/${notebook.id}/pages`, { title: 'Before restart' })).body;
    expect((await api.patch(`/api/pages/${page.id}`, { title: 'Retitled before restart' })).status).toBe(200);
    expect((await api.put(`/api/notebooks/${notebook.id}/members`, { userId: reader.id, role: 'reader' })).status).toBe(200);
    const cookie = api.sessionCookie;
    await first.close(); // closes the HTTP server and the connection pool

    const second = await startServer();
    try {
      expect(second.url).not.toBe(first.url);
      const again = new ApiClient(second.url);
      const me = await again.request('GET', '/api/me', undefined, { headers: { cookie } });
      expect(me.status).toBe(200);
      expect(me.body.email).toBe(owner.email);

      const fresh = await signedInAs(second.url, owner);
      const shown = await fresh.get(`/api/notebooks/${notebook.id}`);
      expect(shown.body).toMatchObject({ title: 'Survives restarts', description: 'kept in PostgreSQL', pageCount: 1, myRole: 'owner' });
      expect((await fresh.get(`/api/pages/${page.id}`)).body).toMatchObject({ number: 1, title: 'Retitled before restart' });
      const members = (await fresh.get(`/api/notebooks/${notebook.id}/members`)).body as { userId: string; role: string }[];
      expect(members.find((m) => m.userId === reader.id)?.role).toBe('reader');
      // The page counter lives in the database too: numbering goes on, it does not restart at 1.
      expect((await fresh.post(`/api/notebooks/${notebook.id}/pages`, { title: 'After restart' })).body.number).toBe(2);
    } finally {
      await second.close();
    }
  });

  it('no longer answers on the closed server', async () => {
    const server = await startServer();
    await server.close();
    await expect(fetch(`${server.url}/api/health`)).rejects.toThrow();
  });
});
