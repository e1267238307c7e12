import { z } from 'zod';
import { idSchema } from './common';

/**
 * What a signature means (21 CFR 11.50(a)(3)): the signer picks one of these sentences, in our
 * own wording; the chosen sentence is stored with the signature and printed with it.
 */
export const signatureMeanings = {
  performed: { role: 'author', label: 'I performed and recorded this work' },
  directed: { role: 'author', label: 'I recorded this work, carried out under my direction' },
  witnessed: { role: 'witness', label: 'Witnessed and understood' },
  reviewed: { role: 'witness', label: 'Reviewed; the record agrees with the work I saw' },
} as const;

export type SignatureMeaningCode = keyof typeof signatureMeanings;
export type SignatureRole = 'author' | 'witness';
export const signatureRoles = ['author', 'witness'] as const;

const codes = Object.keys(signatureMeanings) as [SignatureMeaningCode, ...SignatureMeaningCode[]];

export function meaningsFor(role: SignatureRole): { code: SignatureMeaningCode; label: string }[] {
  return codes.filter((code) => signatureMeanings[code].role === role).map((code) => ({ code, label: signatureMeanings[code].label }));
}

/** Both components of the signature (21 CFR 11.200(a)(1)): identity (e-mail) and password. */
const reEnteredIdentity = {
  email: z.string().trim().toLowerCase().email({ message: 'must be your e-mail address' }),
  password: z.string().min(1, { message: 'is required' }).max(200),
};

const meaning = (role: SignatureRole) =>
  z.enum(codes, { message: 'must be one of the listed meanings' }).refine((code) => signatureMeanings[code].role === role, {
    message: `must be a meaning for ${role === 'author' ? 'an author' : 'a witness'}`,
  });

export const signPageSchema = z.object({
  ...reEnteredIdentity,
  meaning: meaning('author'),
  supervisorId: idSchema,
});

export const countersignSchema = z.object({
  ...reEnteredIdentity,
  meaning: meaning('witness'),
});

export const returnSchema = z.object({
  comment: z.string().trim().min(1, { message: 'is required: say what needs to change' }).max(4000),
});

export const addendumSchema = z.object({
  ...reEnteredIdentity,
  text: z.string().trim().min(1, { message: 'is required' }).max(20000),
  meaning: meaning('author'),
  supervisorId: idSchema.optional(),
});

export type SignPageInput = z.infer<typeof signPageSchema>;
export type CountersignInput = z.infer<typeof countersignSchema>;
export type ReturnInput = z.infer<typeof returnSchema>;
export type AddendumInput = z.infer<typeof addendumSchema>;

export interface SignatureView {
  id: string;
  role: SignatureRole;
  addendumId: string | null;
  signer: { id: string; name: string };
  /** UTC, ISO 8601; clients show it in the reader's time zone. */
  signedAt: string;
  meaning: string;
  contentHash: string;
  /** withdrawn: the page was returned after this signature, so it no longer covers the page. */
  withdrawn: boolean;
}

export interface CountersignRequestView {
  id: string;
  pageId: string;
  addendumId: string | null;
  supervisor: { id: string; name: string };
  requestedAt: string;
  state: 'waiting' | 'countersigned' | 'returned';
}

export interface ReturnView {
  id: string;
  addendumId: string | null;
  returnedBy: { id: string; name: string };
  comment: string;
  returnedAt: string;
}

export interface AddendumView {
  id: string;
  number: number;
  author: { id: string; name: string };
  text: string;
  createdAt: string;
}

export interface PageRecord {
  pageId: string;
  status: 'draft' | 'signed' | 'witnessed';
  locked: boolean;
  signatures: SignatureView[];
  requests: CountersignRequestView[];
  returns: ReturnView[];
  addenda: AddendumView[];
  /** What the caller may do now, decided on the server. */
  can: { sign: boolean; countersign: boolean; addAddendum: boolean };
}

export interface SignatureCheck {
  signatureId: string;
  role: SignatureRole;
  addendumId: string | null;
  signerName: string;
  signedAt: string;
  meaning: string;
  withdrawn: boolean;
  intact: boolean;
  /** Plain sentences saying what differs from what was signed; empty when intact. */
  changes: string[];
}

export interface VerifyReport {
  pageId: string;
  checkedAt: string;
  /** Every current signature matches the stored content, and the audit chain holds. */
  intact: boolean;
  currentHash: string;
  signatures: SignatureCheck[];
  auditChain: ChainCheck;
}

export interface ChainCheck {
  intact: boolean;
  checked: number;
  /** The first event whose stored hash or link does not match, if any. */
  firstBrokenEventId: number | null;
  problem: string | null;
}

export interface AuditEventView {
  id: number;
  occurredAt: string;
  type: string;
  actor: { id: string; name: string } | null;
  notebookId: string | null;
  pageId: string | null;
  details: Record<string, unknown>;
  hash: string;
  previousHash: string;
}

export interface AuditTrail {
  events: AuditEventView[];
  chain: ChainCheck;
}

export interface QueueItem {
  requestId: string;
  pageId: string;
  addendumId: string | null;
  addendumNumber: number | null;
  notebookId: string;
  notebookTitle: string;
  pageNumber: number;
  pageTitle: string;
  author: { id: string; name: string };
  requestedAt: string;
  waitingSeconds: number;
}

export interface Countersigner {
  id: string;
  name: string;
}

export interface PrintRecord {
  notebookTitle: string;
  pageNumber: number;
  pageTitle: string;
  author: string;
  status: 'draft' | 'signed' | 'witnessed';
  text: string;
  structures: { key: string; smiles: string }[];
  attachments: { name: string; sha256: string; size: number }[];
  addenda: AddendumView[];
  signatures: SignatureView[];
  verification: VerifyReport;
  printedAt: string;
}
