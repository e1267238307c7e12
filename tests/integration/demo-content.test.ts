import { and, count, eq } from 'drizzle-orm';
import { $getRoot } from 'lexical';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditEvents, collabUpdates, notebooks, pageContent, pages, signatures } from '../../server/db/schema';
import { seedDemo } from '../../server/seed/demo';
import { signedIn } from '../support/api';
import { connectCollab, lexicalEditorOn, waitFor } from '../support/collab';
import { startServer, type TestServer } from '../support/server';

// The demo scenario seeded by the global setup (server/seed/demo.ts): every demo page has a body
// written through the collaboration store, the signatures cover it, and seeding stays once-only.

let server: TestServer;

beforeAll(async () => {
  server = await startServer();
});
afterAll(() => server.close());

const demoPages = [
  { notebook: 'Fruity esters from short-chain acids', number: 1, structures: 3, product: '3-methylbutyl acetate' },
  { notebook: 'Fruity esters from short-chain acids', number: 2, structures: 4, product: 'Ethyl butanoate' },
  { notebook: 'Fruity esters from short-chain acids', number: 3, structures: 2, product: 'Recovery A' },
  { notebook: 'Solvent and reagent checks', number: 1, structures: 1, product: 'Water content 40 ppm' },
  { notebook: 'Solvent and reagent checks', number: 2, structures: 1, product: 'Reference spectrum recorded' },
];

async function pageRow(notebook: string, number: number) {
  const [row] = await server.deps.db
    .select({ page: pages, content: pageContent })
    .from(pages)
    .innerJoin(notebooks, eq(notebooks.id, pages.notebookId))
    .leftJoin(pageContent, eq(pageContent.pageId, pages.id))
    .where(and(eq(notebooks.title, notebook), eq(pages.number, number)));
  return row;
}

describe('demo page content', () => {
  it.each(demoPages)('$notebook page $number has aim, procedure, observations, result, structures and a reagent list with hazard notes marked as demo text', async (spec) => {
    const { content } = await pageRow(spec.notebook, spec.number);
    expect(content).not.toBeNull();
    for (const heading of ['Aim', 'Reagents', 'Procedure', 'Observations', 'Result']) expect(content!.text).toContain(`${heading}\n`);
    expect(content!.text).toContain(spec.product);
    expect(content!.structures).toHaveLength(spec.structures);
    expect(content!.text).toMatch(/\[reagents\]\n- .+hazard notes: .+\(illustrative demo note\)/);
    expect(JSON.stringify(content!.json)).toContain('"type":"reagents"');
  });

  it('opens in an editor from the page document exactly as projected, with the reagent rows', async () => {
    const { page, content } = await pageRow('Fruity esters from short-chain acids', 1);
    const viewer = await signedIn(server.url, 'viewer@saltmarsh.test');
    const client = await connectCollab(server.url, page.id, viewer.sessionCookie);
    try {
      const editor = lexicalEditorOn(client);
      await waitFor(() => editor.getEditorState().read(() => $getRoot().getTextContent()) === content!.text, 'the document in the editor');
      expect(content!.text).toContain('- 3-methylbutan-1-ol; SMILES CC(C)CCO; 8.82 g; 1.0 equiv; hazard notes: H226');
    } finally {
      client.destroy();
    }
  });

  it('is covered by the countersigned demo page signatures, which verify intact', async () => {
    const { page } = await pageRow('Fruity esters from short-chain acids', 1);
    const supervisor = await signedIn(server.url, 'supervisor@saltmarsh.test');
    const verify = await supervisor.get<{ intact: boolean }>(`/api/pages/${page.id}/verify`);
    expect(verify.status).toBe(200);
    expect(verify.body.intact).toBe(true);
    const signed = await server.deps.db.select().from(signatures).where(eq(signatures.pageId, page.id));
    expect(signed.map((s) => s.role).sort()).toEqual(['author', 'witness']);
    for (const signature of signed) {
      expect(signature.signedContent).toContain('[reagents]');
      expect(signature.signedContent).toContain('3-methylbutyl acetate');
    }
  });

  it('seeds only once: a second run adds no content, updates, signatures or audit events', async () => {
    const { page, content } = await pageRow('Fruity esters from short-chain acids', 1);
    const counts = async () => ({
      updates: (await server.deps.db.select({ n: count() }).from(collabUpdates).where(eq(collabUpdates.pageId, page.id)))[0].n,
      signatures: (await server.deps.db.select({ n: count() }).from(signatures).where(eq(signatures.pageId, page.id)))[0].n,
      events: (await server.deps.db.select({ n: count() }).from(auditEvents).where(eq(auditEvents.pageId, page.id)))[0].n,
    });
    const before = await counts();
    const again = await seedDemo(server.deps.db, server.deps.storage);
    expect(again.created).toBe(false);
    expect(await counts()).toEqual(before);
    expect((await pageRow('Fruity esters from short-chain acids', 1)).content!.text).toBe(content!.text);
  });
});
