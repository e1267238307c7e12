import { eq } from 'drizzle-orm';
import type { PrintRecord } from '../../shared/schemas/signing';
import type { PageAccess } from '../auth/access';
import type { Database } from '../db/client';
import { notebooks, users } from '../db/schema';
import type { User } from 'lucia';
import { storedPageContent } from './content';
import { verifyPage } from './verify';
import { pageRecord } from './views';

/** The printable record of a page: content, addenda, signatures and the result of verification. */
export async function printRecord(db: Database, user: User, access: PageAccess): Promise<PrintRecord> {
  const page = access.page;
  const [[notebook], [author], content, record, verification] = await Promise.all([
    db.select({ title: notebooks.title }).from(notebooks).where(eq(notebooks.id, page.notebookId)),
    db.select({ name: users.name }).from(users).where(eq(users.id, page.authorId)),
    storedPageContent(db, page),
    pageRecord(db, user, access),
    verifyPage(db, page),
  ]);
  return {
    notebookTitle: notebook.title,
    pageNumber: page.number,
    pageTitle: page.title,
    author: author.name,
    status: page.status,
    text: content.text,
    structures: content.structures.map(({ key, smiles }) => ({ key, smiles })),
    attachments: content.attachments.map(({ name, sha256, size }) => ({ name, sha256, size })),
    addenda: record.addenda,
    signatures: record.signatures,
    verification,
    printedAt: new Date().toISOString(),
  };
}
