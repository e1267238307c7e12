import { eq } from 'drizzle-orm';
import { recordAuditEvent } from '../audit/record';
import { hashPassword } from '../auth/passwords';
import type { Database } from '../db/client';
import type { Storage } from '../storage/s3';
import { memberships, notebooks, pages, users } from '../db/schema';
import { DEMO_PASSWORD, demoPeople } from './demoPeople';
import { seedDemoAttachments } from './demoAttachments';
import { seedDemoContent } from './demoContent';
import { seedDemoSigning } from './demoSigning';

export type DemoUsers = Record<string, { id: string; name: string }>;

const demoNotebooks = [
  {
    title: 'Fruity esters from short-chain acids',
    description: 'Fischer esterifications towards pear- and banana-like notes for the spring range.',
    pages: ['Isoamyl acetate, first batch', 'Ethyl butanoate by azeotropic drying', 'Work-up comparison: brine vs. bicarbonate'],
  },
  {
    title: 'Solvent and reagent checks',
    description: 'Purity checks of incoming solvents and reference spectra for the group.',
    pages: ['Toluene lot 24-117 water content', 'Reference IR of hexane'],
  },
];

/**
 * Seeds the demo scenario once: the marker is the demo admin account. Later capabilities (page
 * content, signatures, spectra) add their parts through their own seed steps.
 */
export async function seedDemo(db: Database, storage: Storage): Promise<{ created: boolean; users: DemoUsers }> {
  const [marker] = await db.select().from(users).where(eq(users.email, demoPeople[0].email));
  if (marker) {
    const rows = await db.select().from(users);
    return { created: false, users: Object.fromEntries(rows.map((u) => [u.email, { id: u.id, name: u.name }])) };
  }
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const created = await db
    .insert(users)
    .values(demoPeople.map((p) => ({ ...p, passwordHash })))
    .returning();
  const byEmail: DemoUsers = Object.fromEntries(created.map((u) => [u.email, { id: u.id, name: u.name }]));
  const chemist = byEmail['chemist@saltmarsh.test'];

  for (const [n, spec] of demoNotebooks.entries()) {
    const [notebook] = await db
      .insert(notebooks)
      .values({ title: spec.title, description: spec.description, createdBy: chemist.id, nextPageNumber: spec.pages.length + 1 })
      .returning();
    await db.insert(memberships).values([
      { notebookId: notebook.id, userId: chemist.id, role: 'owner' },
      { notebookId: notebook.id, userId: byEmail['chemist2@saltmarsh.test'].id, role: 'editor' },
      { notebookId: notebook.id, userId: byEmail['supervisor@saltmarsh.test'].id, role: 'editor' },
      { notebookId: notebook.id, userId: byEmail['viewer@saltmarsh.test'].id, role: 'reader' },
    ]);
    await recordAuditEvent(db, { type: 'notebook.created', actor: chemist, notebookId: notebook.id, details: { title: spec.title } });
    for (const [i, title] of spec.pages.entries()) {
      const author = n === 0 && i === 1 ? byEmail['chemist2@saltmarsh.test'] : chemist;
      const [page] = await db.insert(pages).values({ notebookId: notebook.id, number: i + 1, title, authorId: author.id }).returning();
      await recordAuditEvent(db, { type: 'page.created', actor: author, notebookId: notebook.id, pageId: page.id, details: { number: i + 1, title } });
    }
  }
  await seedDemoAttachments(db, storage, byEmail);
  await seedDemoContent(db, byEmail);
  await seedDemoSigning(db, byEmail);
  return { created: true, users: byEmail };
}
