import { createHash, randomBytes } from 'node:crypto';
import { BADGE_CODE_BYTES } from '@chuckkey/core';
import { secretBox, type SecretBox } from './secret-box';

/**
 * A badge code is random bytes from the operating system's CSPRNG, never derived from the
 * member, so knowing a member tells nothing about their code (OWASP ASVS: at least 128 bits).
 */
export function generateBadgeCode(): string {
  return randomBytes(BADGE_CODE_BYTES).toString('base64url');
}

/**
 * What a scan is looked up by. A plain SHA-256 is enough: the code has 128 random bits, so
 * there is nothing to guess from the hash, and a lookup must be one indexed equality.
 */
export function badgeCodeHash(code: string): string {
  return createHash('sha256').update(code, 'utf8').digest('hex');
}

/** The box that keeps each code encrypted so its card can be printed again. */
export function badgeCodeBox(badgeSecret: string): SecretBox {
  return secretBox(badgeSecret, 'badge-code');
}
