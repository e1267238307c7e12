import { and, eq } from 'drizzle-orm';
import type { Database } from '../db/client';
import { attachments, notebooks, pages } from '../db/schema';
import { projectPage } from '../collab/projection';
import { appendUpdates, closeEditingSessions, saveProjection } from '../collab/store';
import type { DemoUsers } from './demo';
import { demoBodies } from './demoPageBodies';
import { pageDocumentUpdate } from './pageDocument';

/**
 * Writes the demo pages' bodies as their authors would have typed them: each body becomes one
 * Yjs update stored through the collaboration server's own persistence (update row, editing
 * session closed into the audit trail) with its projection (text, JSON, structures). Runs inside
 * seedDemo's once-only marker, after the demo files and before the demo signatures, so the
 * signatures cover this content.
 */
export async function seedDemoContent(db: Database, people: DemoUsers): Promise<void> {
  for (const body of demoBodies) {
    const [page] = await db
      .select({ id: pages.id, notebookId: pages.notebookId, authorId: pages.authorId })
      .from(pages)
      .innerJoin(notebooks, eq(notebooks.id, pages.notebookId))
      .where(and(eq(notebooks.title, body.notebook), eq(pages.number, body.number)));
    const files = await db.select({ id: attachments.id, name: attachments.displayName }).from(attachments).where(eq(attachments.pageId, page.id));
    const update = await pageDocumentUpdate(body.blocks(new Map(files.map((f) => [f.name, f.id]))));
    const author = Object.values(people).find((p) => p.id === page.authorId)!;
    await appendUpdates(db, page.id, [{ update, userId: author.id }], new Date());
    await closeEditingSessions(db, page.id, page.notebookId, [author.id]);
    await saveProjection(db, page.id, projectPage(update), { touchPage: true });
  }
}
