import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import type { PrintRecord, SignatureView } from '../../shared/schemas/signing';

const require = createRequire(import.meta.url);
const font = (file: string) => require.resolve(`@fontsource/${file}`);
const FONTS = {
  body: font('noto-sans/files/noto-sans-latin-400-normal.woff'),
  bold: font('noto-sans/files/noto-sans-latin-600-normal.woff'),
  mono: font('noto-sans-mono/files/noto-sans-mono-latin-400-normal.woff'),
};

const pad = (n: number) => String(n).padStart(3, '0');
/** Paper has no reader's time zone: print UTC and say so. */
const utc = (iso: string) => `${iso.slice(0, 10)} ${iso.slice(11, 19)} UTC`;

function signatureState(signature: SignatureView, record: PrintRecord): string {
  if (signature.withdrawn) return 'withdrawn (the page was returned after it)';
  const check = record.verification.signatures.find((c) => c.signatureId === signature.id);
  return check?.intact ? 'intact' : `CHANGED: ${check?.changes.join('; ') ?? 'not checked'}`;
}

/**
 * The printable record as PDF (21 CFR 11.10(b): accurate and complete copies in human-readable
 * form; 11.50(b): the signature manifestation, name, date and time and meaning, appears on every
 * human-readable form of the record).
 */
export function recordPdf(record: PrintRecord): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 56, info: { Title: `${record.notebookTitle}, page ${pad(record.pageNumber)}`, Creator: 'Quillane' } });
  doc.registerFont('body', FONTS.body);
  doc.registerFont('bold', FONTS.bold);
  doc.registerFont('mono', FONTS.mono);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const heading = (text: string) => doc.moveDown(0.8).font('bold').fontSize(12).text(text).moveDown(0.2).font('body').fontSize(10);
  const line = (label: string, value: string) => doc.font('bold').fontSize(10).text(`${label}: `, { continued: true }).font('body').text(value);

  doc.font('bold').fontSize(16).text(`${record.notebookTitle}`);
  doc.font('body').fontSize(13).text(`Page ${pad(record.pageNumber)}: ${record.pageTitle}`);
  doc.moveDown(0.4).fontSize(10);
  line('Author', record.author);
  line('Status', record.status);
  line('Printed', utc(record.printedAt));

  heading('Record check');
  doc.text(record.verification.intact ? 'Record intact: every signature matches the stored content and the audit trail holds.' : 'Record NOT intact; see the signatures below.');
  line('Content hash (SHA-256)', '');
  doc.font('mono').fontSize(8.5).text(record.verification.currentHash).font('body').fontSize(10);
  if (!record.verification.auditChain.intact) doc.text(`Audit trail: ${record.verification.auditChain.problem}`);

  heading('Page content');
  doc.text(record.text || '(no text)');
  if (record.structures.length) {
    heading('Structures');
    for (const s of record.structures) doc.text(`${s.key}: `, { continued: true }).font('mono').fontSize(9).text(s.smiles).font('body').fontSize(10);
  }
  if (record.attachments.length) {
    heading('Files');
    for (const f of record.attachments) {
      doc.text(`${f.name} (${f.size} bytes)`);
      doc.font('mono').fontSize(8).text(`SHA-256 ${f.sha256}`).font('body').fontSize(10);
    }
  }
  for (const a of record.addenda) {
    heading(`Addendum ${a.number}, ${utc(a.createdAt)}, by ${a.author.name}`);
    doc.text(a.text);
  }

  heading('Signatures');
  if (record.signatures.length === 0) doc.text('Not signed yet.');
  for (const s of record.signatures) {
    const addendum = record.addenda.find((a) => a.id === s.addendumId);
    doc.moveDown(0.3).font('bold').text(`${s.role === 'author' ? 'Signed' : 'Countersigned'}${addendum ? ` (addendum ${addendum.number})` : ''} by ${s.signer.name}`);
    doc.font('body');
    line('Date and time', utc(s.signedAt));
    line('Meaning', s.meaning);
    line('State', signatureState(s, record));
    doc.font('mono').fontSize(8).text(`SHA-256 ${s.contentHash}`).font('body').fontSize(10);
  }
  doc.end();
  return done;
}
