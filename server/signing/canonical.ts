import { createHash } from 'node:crypto';
import { canonicalJson } from '../audit/record';

export interface RecordStructure {
  key: string;
  molfile: string;
  smiles: string;
}

export interface RecordAttachment {
  id: string;
  name: string;
  sha256: string;
  size: number;
}

/** Everything a page signature covers: the page's identity, its text, structures and files. */
export interface PageRecordContent {
  kind: 'page';
  page: { id: string; notebookId: string; number: number; title: string };
  text: string;
  structures: RecordStructure[];
  attachments: RecordAttachment[];
}

/** Everything an addendum signature covers: the addendum as written and the files it carries. */
export interface AddendumRecordContent {
  kind: 'addendum';
  pageId: string;
  addendum: { id: string; number: number; authorName: string; createdAt: string; text: string };
  attachments: RecordAttachment[];
}

export type RecordContent = PageRecordContent | AddendumRecordContent;

const FORMAT = 'quillane-record/1';

/** Line endings and Unicode composition vary between browsers and systems without changing meaning. */
function normaliseText(text: string): string {
  return text.replace(/\r\n?/g, '\n').normalize('NFC');
}

const byKey = <T>(key: (item: T) => string) => (a: T, b: T) => (key(a) < key(b) ? -1 : key(a) > key(b) ? 1 : 0);

/**
 * The canonical serialisation a signature is computed over (21 CFR 11.70: the signature is linked
 * to exactly this record). Keys sorted, lists in a fixed order and text normalised, so the same
 * content always gives the same bytes, whoever computes it and whenever.
 */
export function serialiseRecord(content: RecordContent): string {
  const attachments = [...content.attachments]
    .sort(byKey((a) => a.id))
    .map(({ id, name, sha256, size }) => ({ id, name, sha256, size }));
  if (content.kind === 'addendum') {
    return canonicalJson({
      format: FORMAT,
      kind: 'addendum',
      pageId: content.pageId,
      addendum: { ...content.addendum, text: normaliseText(content.addendum.text) },
      attachments,
    });
  }
  return canonicalJson({
    format: FORMAT,
    kind: 'page',
    page: content.page,
    text: normaliseText(content.text),
    structures: [...content.structures]
      .sort(byKey((s) => s.key))
      .map(({ key, molfile, smiles }) => ({ key, molfile: normaliseText(molfile), smiles })),
    attachments,
  });
}

export function sha256Hex(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

export function recordHash(content: RecordContent): { serialised: string; hash: string } {
  const serialised = serialiseRecord(content);
  return { serialised, hash: sha256Hex(serialised) };
}
