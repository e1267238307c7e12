import { z } from 'zod';
import { idSchema, membershipRoleSchema, type MembershipRole } from './common';

export const notebookCreateSchema = z.object({
  title: z.string().trim().min(1, { message: 'is required' }).max(200),
  description: z.string().trim().max(2000).default(''),
});
export type NotebookCreateInput = z.input<typeof notebookCreateSchema>;

export const membershipUpsertSchema = z.object({
  userId: idSchema,
  role: membershipRoleSchema,
});

export interface NotebookSummary {
  id: string;
  title: string;
  description: string;
  createdAt: string;
  pageCount: number;
  /** The caller's membership; admins without a membership see 'owner' rights and `null` here. */
  myRole: MembershipRole | null;
}

export interface NotebookMember {
  userId: string;
  name: string;
  email: string;
  role: MembershipRole;
}
