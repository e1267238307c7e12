import { z } from 'zod';
import type { MembershipRole } from './common';

export const pageStatuses = ['draft', 'signed', 'witnessed'] as const;
export type PageStatus = (typeof pageStatuses)[number];

export const pageCreateSchema = z.object({
  title: z.string().trim().min(1, { message: 'is required' }).max(300),
});
export const pageUpdateSchema = z.object({
  title: z.string().trim().min(1, { message: 'is required' }).max(300),
});
export type PageCreateInput = z.infer<typeof pageCreateSchema>;

export interface PageSummary {
  id: string;
  notebookId: string;
  number: number;
  title: string;
  author: { id: string; name: string };
  status: PageStatus;
  locked: boolean;
  createdAt: string;
  updatedAt: string;
}

export interface PageDetail extends PageSummary {
  notebookTitle: string;
  /** What the caller may do here, decided on the server. */
  access: { canEdit: boolean; role: MembershipRole };
}
