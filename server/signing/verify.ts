import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import type { SignatureCheck, VerifyReport } from '../../shared/schemas/signing';
import { verifyChain } from '../audit/chain';
import type { Database } from '../db/client';
import { addenda, auditEvents, countersignRequests, signatures, type PageRow, type SignatureRow } from '../db/schema';
import { recordHash, sha256Hex, type RecordContent } from './canonical';
import { describeChanges } from './changes';
import { addendumContent, storedPageContent } from './content';
import { filesLeftOutByReturn } from './pageFiles';
import { signatureAuditDetails } from './workflow';

/** Author signatures whose countersign request was returned no longer cover the page. */
export async function withdrawnSignatureIds(db: Database, pageId: string): Promise<Set<string>> {
  const rows = await db
    .select({ id: countersignRequests.authorSignatureId })
    .from(countersignRequests)
    .where(and(eq(countersignRequests.pageId, pageId), eq(countersignRequests.state, 'returned'), sql`${countersignRequests.addendumId} is null`));
  return new Set(rows.map((r) => r.id));
}

/** The signature row must still say what the (append-only) audit trail recorded when it was made. */
function compareWithAudit(signature: SignatureRow, recorded: Record<string, unknown> | undefined): string[] {
  if (!recorded) return ['No audit event records this signature'];
  const stored = signatureAuditDetails(signature);
  return (Object.keys(stored) as (keyof typeof stored)[])
    .filter((field) => stored[field] !== recorded[field])
    .map((field) => `The signature's ${field} differs from the audit trail entry made when it was signed`);
}

function parseSigned(text: string): RecordContent | null {
  try {
    return JSON.parse(text) as RecordContent;
  } catch {
    return null;
  }
}

/**
 * Recomputes the hash of each signed record from the stored content and compares it with every
 * signature (21 CFR 11.70: signatures stay linked to their records and cannot be moved to other
 * content; 11.10(a): altered records must be discernible). Says what changed, not only that.
 */
export async function verifyPage(db: Database, page: PageRow): Promise<VerifyReport> {
  const rows = await db.select().from(signatures).where(eq(signatures.pageId, page.id)).orderBy(asc(signatures.signedAt));
  const withdrawn = await withdrawnSignatureIds(db, page.id);
  const addendumRows = await db.select().from(addenda).where(eq(addenda.pageId, page.id));
  const events = rows.length
    ? await db
        .select({ details: auditEvents.details })
        .from(auditEvents)
        .where(
          and(
            eq(auditEvents.pageId, page.id),
            inArray(
              sql`${auditEvents.details}->>'signatureId'`,
              rows.map((r) => r.id),
            ),
          ),
        )
    : [];
  const recorded = new Map(events.map((e) => [(e.details as { signatureId: string }).signatureId, e.details as Record<string, unknown>]));

  const pageNow = await storedPageContent(db, page);
  const leftOut = await filesLeftOutByReturn(db, page.id);
  const addendaNow = new Map<string, RecordContent>();
  for (const a of addendumRows) addendaNow.set(a.id, await addendumContent(db, a));

  const checks: SignatureCheck[] = rows.map((signature) => {
    const changes = compareWithAudit(signature, recorded.get(signature.id));
    if (sha256Hex(signature.signedContent) !== signature.contentHash) {
      changes.push('The stored copy of the signed content no longer matches the signature’s hash');
    }
    const isWithdrawn = withdrawn.has(signature.id);
    const current = signature.addendumId ? addendaNow.get(signature.addendumId) : pageNow;
    if (!isWithdrawn) {
      if (!current) changes.push('The signed addendum is missing');
      else if (recordHash(current).hash !== signature.contentHash) {
        const signed = parseSigned(signature.signedContent);
        const described = signed ? describeChanges(signed, current) : [];
        changes.push(...(described.length ? described : ['The content differs from what was signed']));
      }
      // 11.70: a page signature must cover all of the page; a file no signature covers is a gap in the record.
      if (!signature.addendumId) {
        for (const file of leftOut) changes.push(`File "${file.name}" was on the page before it was returned, but no signature covers it`);
      }
    }
    return {
      signatureId: signature.id,
      role: signature.role,
      addendumId: signature.addendumId,
      signerName: signature.signerName,
      signedAt: signature.signedAt.toISOString(),
      meaning: signature.meaning,
      withdrawn: isWithdrawn,
      intact: changes.length === 0,
      changes,
    };
  });
  const auditChain = await verifyChain(db);
  return {
    pageId: page.id,
    checkedAt: new Date().toISOString(),
    intact: checks.every((c) => c.intact) && auditChain.intact,
    currentHash: recordHash(pageNow).hash,
    signatures: checks,
    auditChain,
  };
}
