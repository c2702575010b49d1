import { describe, expect, it } from 'vitest';
import { grantToken, grantValid } from './tokens';

describe('grant tokens', () => {
  const secret = 'a-secret-that-is-long-enough-for-tests';
  const now = new Date('2026-12-01T12:00:00Z');
  const expires = new Date('2026-12-01T12:05:00Z');

  it('hold for their subject until they expire', () => {
    const token = grantToken(secret, 'photo.a', expires);
    expect(grantValid(secret, 'photo.a', token, now)).toBe(true);
    expect(grantValid(secret, 'photo.a', token, expires)).toBe(false);
  });

  it('do not hold for another subject, another secret or an edited expiry', () => {
    const token = grantToken(secret, 'photo.a', expires);
    expect(grantValid(secret, 'photo.b', token, now)).toBe(false);
    expect(grantValid(`${secret}!`, 'photo.a', token, now)).toBe(false);
    const [, mac] = token.split('.');
    expect(grantValid(secret, 'photo.a', `${expires.getTime() + 60_000}.${mac}`, now)).toBe(false);
    expect(grantValid(secret, 'photo.a', 'nonsense', now)).toBe(false);
  });
});
