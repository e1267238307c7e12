import { z } from 'zod';
import { roleSchema } from './common';

export const emailSchema = z.string().trim().toLowerCase().email({ message: 'must be an e-mail address' }).max(254);
export const newPasswordSchema = z
  .string()
  .min(10, { message: 'must be at least 10 characters' })
  .max(200, { message: 'must be at most 200 characters' });

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, { message: 'is required' }).max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const meSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
});
export type Me = z.infer<typeof meSchema>;

/** Accepting an invitation or finishing a password reset: the token from the e-mailed link. */
export const setPasswordSchema = z.object({
  token: z.string().min(20).max(200),
  password: newPasswordSchema,
  name: z.string().trim().min(1).max(120).optional(),
});
export type SetPasswordInput = z.infer<typeof setPasswordSchema>;

export const passwordResetRequestSchema = z.object({ email: emailSchema });
