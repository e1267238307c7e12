import { eq } from 'drizzle-orm';
import { afterAll, afterEach, beforeAll, expect } from 'vitest';
import { notebooks } from '../../server/db/schema';
import { signedIn, type ApiClient } from './api';
import { connectCollab, type CollabClient } from './collab';
import type { TestServer } from './server';

export interface DemoNotebookFrame {
  server: TestServer;
  /** The demo notebook "Fruity esters from short-chain acids" (see server/seed/demo.ts). */
  notebookId: string;
  /** chemist@, the notebook's owner, who makes the pages. */
  chemist: ApiClient;
  newPage(title: string): Promise<string>;
  /** A Yjs client of `api` on the page, destroyed after the test. */
  join(api: ApiClient, pageId: string): Promise<CollabClient>;
}

/**
 * The collaboration tests' common frame, registered as this file's hooks: a server from `start`,
 * the demo esters notebook (chemist@ owns it, chemist2@ and supervisor@ edit, viewer@ reads) with
 * pages of each test's own, and every client joined through `join` closed after each test.
 */
export function demoNotebookFrame(start: () => Promise<TestServer>): DemoNotebookFrame {
  const open: CollabClient[] = [];
  const frame: DemoNotebookFrame = {
    server: null as unknown as TestServer,
    notebookId: '',
    chemist: null as unknown as ApiClient,
    async newPage(title) {
      const response = await frame.chemist.post(`/api/notebooks/${frame.notebookId}/pages`, { title });
      expect(response.status).toBe(201);
      return response.body.id;
    },
    async join(api, pageId) {
      const client = await connectCollab(frame.server.url, pageId, api.sessionCookie);
      open.push(client);
      return client;
    },
  };
  beforeAll(async () => {
    frame.server = await start();
    frame.chemist = await signedIn(frame.server.url, 'chemist@saltmarsh.test');
    const [notebook] = await frame.server.deps.db.select().from(notebooks).where(eq(notebooks.title, 'Fruity esters from short-chain acids'));
    frame.notebookId = notebook.id;
  });
  afterEach(() => {
    for (const client of open.splice(0)) client.destroy();
  });
  afterAll(() => frame.server?.close());
  return frame;
}
