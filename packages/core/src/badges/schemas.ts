import { z } from 'zod';

/** 16 random bytes (128 bits, OWASP ASVS) in base64url: 22 characters, no padding. */
export const BADGE_CODE_BYTES = 16;
export const badgeCodeSchema = z
  .string({ error: 'Scan or type a badge code.' })
  .trim()
  .regex(/^[A-Za-z0-9_-]{22,64}$/, { error: 'That is not a badge code.' });

export const badgeSchema = z.object({
  id: z.uuid(),
  issuedAt: z.string(),
  /** The code the QR carries; only its holder and admins see it. */
  code: z.string(),
});
export type Badge = z.infer<typeof badgeSchema>;

export const pinSchema = z.object({
  pin: z.string({ error: 'Enter 4 to 6 digits.' }).regex(/^\d{4,6}$/, { error: 'Use 4 to 6 digits.' }),
});
export type PinInput = z.infer<typeof pinSchema>;

export const badgeSheetPapers = ['letter', 'a4'] as const;
export const badgeSheetQuerySchema = z.object({
  memberIds: z
    .union([z.string(), z.array(z.string())])
    .transform((v) => (Array.isArray(v) ? v : v.split(',')).map((s) => s.trim()).filter(Boolean))
    .pipe(z.array(z.uuid({ error: 'Not a valid member id.' })).min(1, { error: 'Choose at least one member.' }).max(200)),
  /** The sheet's paper: US Letter by default, or ISO 216 A4. */
  paper: z.enum(badgeSheetPapers).default('letter'),
});
export type BadgeSheetQuery = z.infer<typeof badgeSheetQuerySchema>;

/** ISO/IEC 7810 ID-1 card: 85.60 × 53.98 mm; corner radius 3.18 mm (ISO/IEC 7813). */
export const ID1_MM = { width: 85.6, height: 53.98, cornerRadius: 3.18 } as const;
export const POINTS_PER_MM = 72 / 25.4;

export const PHOTO_MAX_BYTES = 5 * 1024 * 1024;
export const WAIVER_SCAN_MAX_BYTES = 10 * 1024 * 1024;
