import { z } from 'zod';
import { roleSchema } from '../people/roles';

export const emailSchema = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter an e-mail address like name@example.org.' }).max(254));

/**
 * NIST SP 800-63B: length is what makes a password strong; no composition rules.
 * 12 characters minimum, 128 maximum (argon2 takes any length; the cap stops abuse).
 */
export const PASSWORD_MIN = 12;
export const PASSWORD_MAX = 128;
export const newPasswordSchema = z
  .string({ error: 'Enter a password.' })
  .min(PASSWORD_MIN, { error: `Use at least ${PASSWORD_MIN} characters.` })
  .max(PASSWORD_MAX, { error: `Use at most ${PASSWORD_MAX} characters.` });

export const loginSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'Enter your password.' }).min(1, { error: 'Enter your password.' }).max(PASSWORD_MAX),
});
export type LoginInput = z.infer<typeof loginSchema>;

export const userSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
});
export type User = z.infer<typeof userSchema>;

export const csrfResponseSchema = z.object({ token: z.string() });

export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;

export const tokenSchema = z
  .string({ error: 'The link is missing its code.' })
  .regex(/^[A-Za-z0-9_-]{20,100}$/, { error: 'The link is not valid.' });

export const passwordResetConfirmSchema = z.object({
  token: tokenSchema,
  password: newPasswordSchema,
});
export type PasswordResetConfirm = z.infer<typeof passwordResetConfirmSchema>;

export const passwordChangeSchema = z.object({
  currentPassword: z.string({ error: 'Enter your current password.' }).min(1, { error: 'Enter your current password.' }).max(PASSWORD_MAX),
  newPassword: newPasswordSchema,
});
export type PasswordChange = z.infer<typeof passwordChangeSchema>;
