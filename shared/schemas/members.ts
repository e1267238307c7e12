import { z } from 'zod';
import { emailSchema } from './auth';
import { roleSchema } from './common';

export const invitationCreateSchema = z.object({
  email: emailSchema,
  name: z.string().trim().min(1, { message: 'is required' }).max(120),
  role: roleSchema,
});
export type InvitationCreateInput = z.infer<typeof invitationCreateSchema>;

export const userRoleUpdateSchema = z.object({ role: roleSchema });

export interface UserSummary {
  id: string;
  email: string;
  name: string;
  role: z.infer<typeof roleSchema>;
  createdAt: string;
}

/** One entry of the group directory (`GET /api/people`), from which notebook owners add members. */
export interface DirectoryPerson {
  id: string;
  name: string;
  email: string;
  role: z.infer<typeof roleSchema>;
}

export interface InvitationSummary {
  id: string;
  email: string;
  name: string;
  role: z.infer<typeof roleSchema>;
  expiresAt: string;
  acceptedAt: string | null;
  createdAt: string;
}

export interface CaughtMailSummary {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
}
