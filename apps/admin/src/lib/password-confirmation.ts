import { z } from 'zod';

/**
 * The second copy of a new password exists only in the browser, to catch typing slips before
 * the server sees anything; the server's own password rules come from @chuckkey/core.
 */
export const confirmPasswordSchema = z
  .string({ error: 'Type the new password again.' })
  .min(1, { error: 'Type the new password again.' });

export const passwordsDifferMessage = 'The two passwords are not the same. Type them again.';

/**
 * The form of someone setting a password: the password as the endpoint's own schema checks it,
 * and the second copy, which has to match it.
 */
export function passwordPairSchema(password: z.ZodType<string, string>) {
  return z
    .object({ password, confirmPassword: confirmPasswordSchema })
    .refine((values) => values.password === values.confirmPassword, {
      path: ['confirmPassword'],
      error: passwordsDifferMessage,
    });
}
