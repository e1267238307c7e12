import type { RecordAttachment, RecordContent, RecordStructure } from './canonical';

function lineCount(text: string): number {
  return text === '' ? 0 : text.split('\n').length;
}

function describeTextChange(signed: string, now: string): string {
  const before = signed.split('\n');
  const after = now.split('\n');
  let first = 0;
  while (first < before.length && first < after.length && before[first] === after[first]) first++;
  return `The text differs from what was signed from line ${first + 1} on (signed: ${lineCount(signed)} lines, now: ${lineCount(now)} lines)`;
}

function compareLists<T>(
  what: string,
  signed: T[],
  now: T[],
  key: (item: T) => string,
  label: (item: T) => string,
  same: (a: T, b: T) => boolean,
): string[] {
  const changes: string[] = [];
  const current = new Map(now.map((item) => [key(item), item]));
  const original = new Map(signed.map((item) => [key(item), item]));
  for (const [k, item] of original) {
    const later = current.get(k);
    if (!later) changes.push(`${what} ${label(item)} was signed but is gone`);
    else if (!same(item, later)) changes.push(`${what} ${label(item)} differs from what was signed`);
  }
  for (const [k, item] of current) if (!original.has(k)) changes.push(`${what} ${label(item)} was not part of what was signed`);
  return changes;
}

const structureLabel = (s: RecordStructure) => `"${s.key}"`;
const attachmentLabel = (a: RecordAttachment) => `"${a.name}"`;

/** Plain sentences saying how the content now differs from the content that was signed. */
export function describeChanges(signed: RecordContent, now: RecordContent): string[] {
  const changes: string[] = [];
  if (signed.kind === 'page' && now.kind === 'page') {
    if (signed.page.title !== now.page.title) changes.push(`The title was "${signed.page.title}" when signed and is now "${now.page.title}"`);
    if (signed.page.number !== now.page.number || signed.page.notebookId !== now.page.notebookId) {
      changes.push('The page was moved or renumbered after signing');
    }
    if (signed.text !== now.text) changes.push(describeTextChange(signed.text, now.text));
    changes.push(
      ...compareLists('Structure', signed.structures, now.structures, (s) => s.key, structureLabel, (a, b) => a.molfile === b.molfile && a.smiles === b.smiles),
    );
  }
  if (signed.kind === 'addendum' && now.kind === 'addendum') {
    const [a, b] = [signed.addendum, now.addendum];
    if (a.text !== b.text) changes.push(`The addendum text differs from what was signed`);
    if (a.authorName !== b.authorName || a.createdAt !== b.createdAt || a.number !== b.number) {
      changes.push('The addendum’s author, date or number differs from what was signed');
    }
  }
  changes.push(
    ...compareLists('File', signed.attachments, now.attachments, (f) => f.id, attachmentLabel, (a, b) => a.sha256 === b.sha256 && a.size === b.size && a.name === b.name),
  );
  return changes;
}
