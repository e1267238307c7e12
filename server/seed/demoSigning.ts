import { and, eq } from 'drizzle-orm';
import type { Database } from '../db/client';
import { countersignRequests, notebooks, pages } from '../db/schema';
import { storedPageContent } from '../signing/content';
import { writeCountersignature, writePageSignature } from '../signing/workflow';
import type { DemoUsers } from './demo';

/** Demo pages that show the sign-off workflow: one waiting for its countersignature, one witnessed. */
const SIGNED_ONLY = { notebook: 'Solvent and reagent checks', number: 1 };
const COUNTERSIGNED = { notebook: 'Fruity esters from short-chain acids', number: 1 };

async function demoPage(db: Database, spec: { notebook: string; number: number }) {
  const [row] = await db
    .select({ page: pages })
    .from(pages)
    .innerJoin(notebooks, eq(notebooks.id, pages.notebookId))
    .where(and(eq(notebooks.title, spec.notebook), eq(pages.number, spec.number)));
  return row.page;
}

/**
 * Signs two demo pages as their authors would, straight through the database (no one is editing
 * at seed time, so the stored content is the live content). Runs inside seedDemo's once-only
 * marker, after the content seeds, so the signatures cover the demo content.
 */
export async function seedDemoSigning(db: Database, people: DemoUsers): Promise<void> {
  const supervisor = people['supervisor@saltmarsh.test'];
  for (const spec of [SIGNED_ONLY, COUNTERSIGNED]) {
    const page = await demoPage(db, spec);
    const author = Object.values(people).find((p) => p.id === page.authorId)!;
    const content = await storedPageContent(db, page);
    await db.transaction((tx) => writePageSignature(tx, { page, signer: author, meaning: 'performed', content, supervisor }));
    if (spec !== COUNTERSIGNED) continue;
    const [request] = await db.select().from(countersignRequests).where(eq(countersignRequests.pageId, page.id));
    await db.transaction((tx) =>
      writeCountersignature(tx, { page, addendum: null, request, signer: supervisor, meaning: 'witnessed', content }),
    );
  }
}
