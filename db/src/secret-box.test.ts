import { describe, expect, it } from 'vitest';
import { badgeCodeBox, badgeCodeHash, generateBadgeCode } from './badge-codes';
import { secretBox, SecretBoxError } from './secret-box';

const SECRET = 'a-badge-secret-for-the-secret-box-tests';
const OTHER_SECRET = 'another-badge-secret-for-the-same-tests';

/** Flips one bit of one base64url part, keeping it valid base64url of the same length. */
function flipBit(sealed: string, partIndex: number): string {
  const parts = sealed.split('.');
  const bytes = Buffer.from(parts[partIndex]!, 'base64url');
  bytes[0] = bytes[0]! ^ 0x01;
  parts[partIndex] = bytes.toString('base64url');
  return parts.join('.');
}

describe('secretBox', () => {
  it('opens what it sealed, also for text beyond ASCII', () => {
    const box = secretBox(SECRET, 'test');
    for (const plain of ['', 'Zx9_-abcDEF0123456789a', 'Ølfríður Þórsdóttir ✓']) {
      expect(box.open(box.seal(plain))).toBe(plain);
    }
  });

  it('writes v1.<iv>.<tag>.<ciphertext> in base64url with a 12-byte IV and a 16-byte tag', () => {
    const sealed = secretBox(SECRET, 'test').seal('hello');

    const [version, iv, tag, body, ...rest] = sealed.split('.');

    expect(version).toBe('v1');
    expect(rest).toEqual([]);
    for (const part of [iv, tag, body]) expect(part).toMatch(/^[A-Za-z0-9_-]+$/);
    // NIST SP 800-38D: a 96-bit IV is the recommended length for GCM; the full 128-bit tag.
    expect(Buffer.from(iv!, 'base64url')).toHaveLength(12);
    expect(Buffer.from(tag!, 'base64url')).toHaveLength(16);
    // GCM is a stream mode: the ciphertext is as long as the text.
    expect(Buffer.from(body!, 'base64url')).toHaveLength(5);
  });

  it('uses a fresh IV each time, so the same text seals differently', () => {
    const box = secretBox(SECRET, 'test');
    const seals = new Set(Array.from({ length: 50 }, () => box.seal('same text')));
    expect(seals.size).toBe(50);
    const ivs = new Set([...seals].map((s) => s.split('.')[1]));
    expect(ivs.size).toBe(50);
  });

  it('refuses a value whose IV, tag or ciphertext was altered', () => {
    const box = secretBox(SECRET, 'test');
    const sealed = box.seal('Zx9_-abcDEF0123456789a');

    for (const part of [1, 2, 3]) {
      expect(() => box.open(flipBit(sealed, part))).toThrow(SecretBoxError);
    }
  });

  it('refuses a value sealed with another secret, or for another purpose', () => {
    const sealed = secretBox(SECRET, 'test').seal('Zx9_-abcDEF0123456789a');

    expect(() => secretBox(OTHER_SECRET, 'test').open(sealed)).toThrow(SecretBoxError);
    expect(() => secretBox(SECRET, 'another purpose').open(sealed)).toThrow(SecretBoxError);
  });

  it('refuses malformed values and unknown versions', () => {
    const box = secretBox(SECRET, 'test');
    const sealed = box.seal('text');
    const [, iv, tag, body] = sealed.split('.');

    for (const bad of ['', 'v1', 'v1.a.b', `v2.${iv}.${tag}.${body}`, `${sealed}.extra`, `v1.${iv}.${tag}.${body}!`, `v1.${iv}x.${tag}.${body}`]) {
      expect(() => box.open(bad), bad).toThrow(SecretBoxError);
    }
  });

  it('will not run with a short secret', () => {
    expect(() => secretBox('too short', 'test')).toThrow(/at least 32/);
  });
});

describe('badge codes', () => {
  it('are 16 random bytes as 22 base64url characters, all different', () => {
    const codes = Array.from({ length: 200 }, generateBadgeCode);

    // OWASP ASVS: tokens of at least 128 bits from a CSPRNG; base64url (RFC 4648 §5) without padding.
    for (const code of codes) {
      expect(code).toMatch(/^[A-Za-z0-9_-]{22}$/);
      expect(Buffer.from(code, 'base64url')).toHaveLength(16);
    }
    expect(new Set(codes).size).toBe(codes.length);
  });

  it('hash to the SHA-256 hex digest, which does not contain the code', () => {
    // FIPS 180-4 test vector: SHA-256("abc").
    expect(badgeCodeHash('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    const code = generateBadgeCode();
    expect(badgeCodeHash(code)).toMatch(/^[0-9a-f]{64}$/);
    expect(badgeCodeHash(code)).not.toContain(code);
  });

  it('are kept in a box of their own: the sealed value does not contain the code', () => {
    const code = generateBadgeCode();
    const sealed = badgeCodeBox(SECRET).seal(code);

    expect(sealed).not.toContain(code);
    expect(badgeCodeBox(SECRET).open(sealed)).toBe(code);
    expect(() => secretBox(SECRET, 'test').open(sealed)).toThrow(SecretBoxError);
  });
});
