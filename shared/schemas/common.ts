import { z } from 'zod';

export const roles = ['admin', 'supervisor', 'chemist', 'viewer'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

export const membershipRoles = ['owner', 'editor', 'reader'] as const;
export const membershipRoleSchema = z.enum(membershipRoles);
export type MembershipRole = z.infer<typeof membershipRoleSchema>;

export const idSchema = z.string().uuid({ message: 'must be a valid id' });

/** The error body every failing API call returns. */
export interface ApiErrorBody {
  error: { code: string; message: string; fields?: Record<string, string>; details?: unknown };
}
