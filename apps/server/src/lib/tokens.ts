import { createHash, randomBytes, timingSafeEqual } from 'node:crypto';

/** 256 bits from the CSPRNG (OWASP ASVS asks for at least 128), URL-safe. */
export function randomToken(): string {
  return randomBytes(32).toString('base64url');
}

/** Tokens sent by e-mail are stored only as their SHA-256, so a database leak reveals none. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export function safeEqual(a: string, b: string): boolean {
  const left = Buffer.from(a);
  const right = Buffer.from(b);
  return left.length === right.length && timingSafeEqual(left, right);
}
