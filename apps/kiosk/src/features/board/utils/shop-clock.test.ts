import { describe, expect, it } from 'vitest';
import { formatShopDate, formatShopTime } from './shop-clock';

describe('shop clock', () => {
  // IANA time zone database: America/Chicago is UTC−6 in winter and UTC−5 in daylight-saving time.
  it('shows the shop’s wall-clock time in winter and in summer', () => {
    expect(formatShopTime(new Date('2027-01-15T17:05:00Z'), 'America/Chicago')).toBe('11:05');
    expect(formatShopTime(new Date('2027-07-15T17:05:00Z'), 'America/Chicago')).toBe('12:05');
  });

  it('uses a 24-hour clock with two-digit hours', () => {
    expect(formatShopTime(new Date('2027-01-15T07:03:00Z'), 'UTC')).toBe('07:03');
    expect(formatShopTime(new Date('2027-01-15T21:45:00Z'), 'UTC')).toBe('21:45');
  });

  it('shows the shop’s date, which can differ from the date in UTC', () => {
    // 02:30 UTC on a Saturday is still Friday evening in the shop.
    expect(formatShopDate(new Date('2027-01-16T02:30:00Z'), 'America/Chicago')).toBe('Friday, January 15');
  });
});
