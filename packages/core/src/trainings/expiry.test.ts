import { describe, expect, it } from 'vitest';
import { daysUntilExpiry, signOffExpiry, signOffState } from './expiry';

const iso = (date: Date | null) => date?.toISOString() ?? null;

describe('signOffExpiry()', () => {
  it('a 12-month sign-off given on 29 February is good through 28 February and lapses on 1 March', () => {
    // Gregorian calendar (ISO 8601): 2024 is a leap year, 2025 is not, so 2025 has no 29 February.
    // Clamping to the month's last day is common practice for "N months later" (date-fns addMonths).
    const expiry = signOffExpiry(new Date('2024-02-29T15:00:00Z'), 12, 'UTC');

    expect(iso(expiry)).toBe('2025-03-01T00:00:00.000Z');
  });

  it('a 48-month sign-off given on 29 February lands on the next 29 February', () => {
    // Gregorian calendar: 2028 is a leap year.
    expect(iso(signOffExpiry(new Date('2024-02-29T15:00:00Z'), 48, 'UTC'))).toBe('2028-03-01T00:00:00.000Z');
  });

  it('a 1-month sign-off given on 31 January is good through the last day of February', () => {
    // Gregorian calendar: February 2025 has 28 days, February 2024 has 29.
    expect(iso(signOffExpiry(new Date('2025-01-31T12:00:00Z'), 1, 'UTC'))).toBe('2025-03-01T00:00:00.000Z');
    expect(iso(signOffExpiry(new Date('2024-01-31T12:00:00Z'), 1, 'UTC'))).toBe('2024-03-01T00:00:00.000Z');
  });

  it('a sign-off given on 31 August for 1 month is good through 30 September', () => {
    // Gregorian calendar: September has 30 days.
    expect(iso(signOffExpiry(new Date('2025-08-31T12:00:00Z'), 1, 'UTC'))).toBe('2025-10-01T00:00:00.000Z');
  });

  it('counts from the shop’s calendar date, not the UTC date, for a sign-off given late in the evening', () => {
    // IANA time zone database: America/Chicago is UTC−6 in winter (CST), so 03:30 UTC on 1 March
    // is 21:30 on 28 February in the shop.
    const signedAt = new Date('2025-03-01T03:30:00Z');

    const inShop = signOffExpiry(signedAt, 12, 'America/Chicago');
    const inUtc = signOffExpiry(signedAt, 12, 'UTC');

    // Good through 28 February 2026 in Chicago; lapses at local midnight, 06:00 UTC.
    expect(iso(inShop)).toBe('2026-03-01T06:00:00.000Z');
    // The same instant read in UTC is 1 March, one day later.
    expect(iso(inUtc)).toBe('2026-03-02T00:00:00.000Z');
  });

  it('counts from the shop’s calendar date for a shop ahead of UTC, signed early in the morning', () => {
    // IANA time zone database: Pacific/Auckland is UTC+13 in January (NZDT), so 11:30 UTC on
    // 14 January is 00:30 on 15 January in the shop.
    const expiry = signOffExpiry(new Date('2025-01-14T11:30:00Z'), 12, 'Pacific/Auckland');

    // Good through 15 January 2026; local midnight of the 16th is 11:00 UTC on the 15th (NZDT).
    expect(iso(expiry)).toBe('2026-01-15T11:00:00.000Z');
  });

  it('lapses at local midnight after the spring daylight-saving change', () => {
    // US daylight saving time (Energy Policy Act of 2005, 15 U.S.C. §260a): it starts on the
    // second Sunday in March, 9 March 2025, so 16 March 2025 is CDT, UTC−5.
    const expiry = signOffExpiry(new Date('2025-01-15T18:00:00Z'), 2, 'America/Chicago');

    expect(iso(expiry)).toBe('2025-03-16T05:00:00.000Z');
  });

  it('lapses at local midnight after the autumn daylight-saving change', () => {
    // 15 U.S.C. §260a: daylight saving time ends on the first Sunday in November, 2 November
    // 2025, so a sign-off given in CDT (UTC−5) lapses at midnight CST (UTC−6).
    const expiry = signOffExpiry(new Date('2025-08-15T17:00:00Z'), 3, 'America/Chicago');

    expect(iso(expiry)).toBe('2025-11-16T06:00:00.000Z');
  });

  it('lapses at local midnight on the day daylight saving time starts in Europe', () => {
    // EU Directive 2000/84/EC: summer time starts on the last Sunday in March, 30 March 2025;
    // midnight on that day is still GMT in Europe/London.
    const expiry = signOffExpiry(new Date('2024-03-29T09:00:00Z'), 12, 'Europe/London');

    expect(iso(expiry)).toBe('2025-03-30T00:00:00.000Z');
  });

  it('never lapses when the training is valid for 0 months', () => {
    expect(signOffExpiry(new Date('2025-06-01T12:00:00Z'), 0, 'America/Chicago')).toBeNull();
  });
});

describe('signOffState()', () => {
  const now = new Date('2026-05-01T12:00:00Z');
  const day = 86_400_000;

  it('is valid with more than 30 days left and when it never lapses', () => {
    expect(signOffState({ expiresAt: new Date(now.getTime() + 31 * day), revokedAt: null }, now)).toBe('valid');
    expect(signOffState({ expiresAt: null, revokedAt: null }, now)).toBe('valid');
  });

  it('is expiring with 30 days or fewer left', () => {
    expect(signOffState({ expiresAt: new Date(now.getTime() + 30 * day), revokedAt: null }, now)).toBe('expiring');
    expect(signOffState({ expiresAt: new Date(now.getTime() + 1000), revokedAt: null }, now)).toBe('expiring');
  });

  it('is expired from the instant it lapses', () => {
    expect(signOffState({ expiresAt: now, revokedAt: null }, now)).toBe('expired');
  });

  it('is revoked, whatever its expiry, once revoked', () => {
    expect(signOffState({ expiresAt: null, revokedAt: new Date(now.getTime() - day) }, now)).toBe('revoked');
    expect(signOffState({ expiresAt: new Date(now.getTime() - day), revokedAt: new Date(now.getTime() - 2 * day) }, now)).toBe('revoked');
  });
});

describe('daysUntilExpiry()', () => {
  it('counts calendar days in the shop, not 24-hour spans', () => {
    // IANA: America/Chicago is UTC−6 in January. 05:00 UTC on the 11th is still 23:00 on 10 January
    // in the shop, two calendar days before the sign-off lapses at local midnight starting 12 January.
    expect(daysUntilExpiry(new Date('2026-01-12T06:00:00Z'), new Date('2026-01-11T05:00:00Z'), 'America/Chicago')).toBe(2);
    expect(daysUntilExpiry(new Date('2026-01-12T06:00:00Z'), new Date('2026-01-11T18:00:00Z'), 'America/Chicago')).toBe(1);
  });
});
