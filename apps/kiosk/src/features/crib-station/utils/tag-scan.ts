import type { ScanShape } from '@/lib/keystroke-burst';

/**
 * An asset tag as a hand scanner types it: short (the demo's are like "CK-0001") and made of
 * letters, digits and the separators labels use. Three characters at least, so that a person's
 * quick "ok" and Enter is not taken for a tag.
 */
export const tagScan: ScanShape = { minLength: 3, character: /^[A-Za-z0-9._/-]$/ };
