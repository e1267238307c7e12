import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiClient } from '../support/api';
import { createPerson, signedInAs } from '../support/fixtures';
import { startServer, type TestServer } from '../support/server';

// Pages are numbered 1, 2, 3 ... within their notebook, the way bound paper notebooks are (common
// practice, no source). Numbers are never reused or skipped, also when people add pages at once.
let server: TestServer;
let api: ApiClient;
let other: ApiClient;

beforeAll(async () => {
  server = await startServer();
  api = await signedInAs(server.url, await createPerson(server.deps, 'chemist', 'numbers-owner'));
  other = await signedInAs(server.url, await createPerson(server.deps, 'chemist', 'numbers-editor'));
});
afterAll(() => server.close());

async function newNotebook(title: string, editor?: ApiClient): Promise<string> {
  const id = (await api.post('/api/notebooks', { title })).body.id as string;
  if (editor) {
    const me = (await editor.get('/api/me')).body;
    expect((await api.put(`/api/notebooks/${id}/members`, { userId: me.id, role: 'editor' })).status).toBe(200);
  }
  return id;
}

describe('page numbers', () => {
  it('counts 1, 2, 3 in each notebook separately', async () => {
    const first = await newNotebook('Numbering A');
    const second = await newNotebook('Numbering B');
    const numbers: number[] = [];
    for (const [notebook, title] of [
      [first, 'A one'],
      [first, 'A two'],
      [second, 'B one'],
      [first, 'A three'],
    ]) {
      const response = await api.post(`/api/notebooks/${notebook}/pages`, { title });
      expect(response.status).toBe(201);
      numbers.push(response.body.number);
    }
    expect(numbers).toEqual([1, 2, 1, 3]);
  });

  it('gives 10 simultaneous new pages the numbers 1..10, each once', async () => {
    const notebook = await newNotebook('Numbering under load', other);
    const responses = await Promise.all(
      Array.from({ length: 10 }, (_, i) => (i % 2 ? other : api).post(`/api/notebooks/${notebook}/pages`, { title: `Parallel ${i}` })),
    );
    expect(responses.map((r) => r.status)).toEqual(Array(10).fill(201));
    const numbers = responses.map((r) => r.body.number as number).sort((a, b) => a - b);
    expect(numbers).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);

    const listed = (await api.get(`/api/notebooks/${notebook}/pages`)).body as { number: number; title: string }[];
    expect(listed.map((p) => p.number)).toEqual([10, 9, 8, 7, 6, 5, 4, 3, 2, 1]);
    expect((await api.get(`/api/notebooks/${notebook}`)).body.pageCount).toBe(10);
    // The next page continues the sequence.
    expect((await api.post(`/api/notebooks/${notebook}/pages`, { title: 'After the rush' })).body.number).toBe(11);
  });

  it('does not use up a number on a refused page', async () => {
    const notebook = await newNotebook('Numbering with refusals');
    expect((await api.post(`/api/notebooks/${notebook}/pages`, { title: 'One' })).body.number).toBe(1);
    expect((await api.post(`/api/notebooks/${notebook}/pages`, { title: '' })).status).toBe(400);
    expect((await api.post(`/api/notebooks/${notebook}/pages`, { title: 'Two' })).body.number).toBe(2);
  });

  it('keeps the numbers when a page is retitled', async () => {
    const notebook = await newNotebook('Numbering and titles');
    const page = (await api.post(`/api/notebooks/${notebook}/pages`, { title: 'Draft title' })).body;
    const retitled = await api.patch(`/api/pages/${page.id}`, { title: 'Final title' });
    expect(retitled.body).toMatchObject({ number: 1, title: 'Final title' });
  });
});
