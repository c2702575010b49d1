import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from 'node:crypto';

/**
 * Authenticated encryption of short strings (badge codes kept for reprinting cards) with a key
 * that lives outside the database. AES-256-GCM (NIST SP 800-38D) with a random 96-bit IV per
 * message, the length SP 800-38D recommends; the key is derived from the configured secret with
 * HKDF-SHA-256 (RFC 5869), so one secret can serve several purposes without sharing a key.
 *
 * Output: `v1.<iv>.<tag>.<ciphertext>`, each part base64url. The version prefix is authenticated
 * too, so a later format can be told apart and an edited prefix fails to open.
 */
const VERSION = 'v1';
const IV_BYTES = 12;
const TAG_BYTES = 16;
const KEY_BYTES = 32;
const SALT = 'chuckkey secret-box';

export class SecretBoxError extends Error {
  constructor(message = 'the sealed value cannot be opened: it was altered or sealed with another key') {
    super(message);
    this.name = 'SecretBoxError';
  }
}

export interface SecretBox {
  seal(plain: string): string;
  /** Throws SecretBoxError when the value was altered, is malformed or was sealed with another key. */
  open(sealed: string): string;
}

/** Strict base64url: Node's decoder skips stray characters, so only a canonical part is accepted. */
function decode(part: string): Buffer {
  const bytes = Buffer.from(part, 'base64url');
  if (bytes.toString('base64url') !== part) throw new SecretBoxError();
  return bytes;
}

export function secretBox(secret: string, purpose: string): SecretBox {
  if (secret.length < 32) throw new Error('the secret for a secret box must be at least 32 characters');
  const key = Buffer.from(hkdfSync('sha256', secret, SALT, `${VERSION} ${purpose}`, KEY_BYTES));
  const aad = Buffer.from(VERSION);

  return {
    seal(plain) {
      const iv = randomBytes(IV_BYTES);
      const cipher = createCipheriv('aes-256-gcm', key, iv, { authTagLength: TAG_BYTES });
      cipher.setAAD(aad);
      const body = Buffer.concat([cipher.update(plain, 'utf8'), cipher.final()]);
      const tag = cipher.getAuthTag();
      return [VERSION, iv.toString('base64url'), tag.toString('base64url'), body.toString('base64url')].join('.');
    },

    open(sealed) {
      const parts = sealed.split('.');
      if (parts.length !== 4 || parts[0] !== VERSION) throw new SecretBoxError();
      const iv = decode(parts[1]!);
      const tag = decode(parts[2]!);
      const body = decode(parts[3]!);
      if (iv.length !== IV_BYTES || tag.length !== TAG_BYTES) throw new SecretBoxError();
      const decipher = createDecipheriv('aes-256-gcm', key, iv, { authTagLength: TAG_BYTES });
      decipher.setAAD(aad);
      decipher.setAuthTag(tag);
      try {
        return Buffer.concat([decipher.update(body), decipher.final()]).toString('utf8');
      } catch {
        throw new SecretBoxError();
      }
    },
  };
}
