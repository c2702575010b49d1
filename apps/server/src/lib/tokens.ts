import { createHash, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';

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

/**
 * A short-lived, stateless grant: `<expiry>.<HMAC-SHA256 of subject and expiry>`. Any server
 * process with the same secret can check it, so no shared store is needed.
 */
export function grantToken(secret: string, subject: string, expiresAt: Date): string {
  const expiry = String(expiresAt.getTime());
  const mac = createHmac('sha256', secret).update(`${subject}.${expiry}`).digest('base64url');
  return `${expiry}.${mac}`;
}

export function grantValid(secret: string, subject: string, token: string, now: Date): boolean {
  const [expiry, mac] = token.split('.');
  if (!expiry || !mac || !/^\d+$/.test(expiry) || Number(expiry) <= now.getTime()) return false;
  return safeEqual(mac, createHmac('sha256', secret).update(`${subject}.${expiry}`).digest('base64url'));
}
