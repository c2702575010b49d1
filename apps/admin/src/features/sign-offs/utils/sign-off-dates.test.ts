import { describe, expect, it } from 'vitest';
import { lastValidDay, localDate, previewValidUntil } from './sign-off-dates';

describe('the last day a sign-off counts', () => {
  it('is the day before the instant it lapses, in the shop’s calendar', () => {
    // Lapses at local midnight starting 1 March 2029 in Chicago (06:00 UTC, standard time).
    expect(localDate(lastValidDay('2029-03-01T06:00:00.000Z'), 'America/Chicago')).toBe('2029-02-28');
  });

  it('is counted in the shop’s time zone, not in UTC', () => {
    // 02:00 UTC on 15 June is still 14 June in Chicago.
    expect(localDate(new Date('2027-06-15T02:00:00.000Z'), 'America/Chicago')).toBe('2027-06-14');
    expect(localDate(new Date('2027-06-15T02:00:00.000Z'), 'UTC')).toBe('2027-06-15');
  });
});

describe('the validity shown before confirming a sign-off', () => {
  it('a 12-month sign-off given on 29 February counts through 28 February next year', () => {
    const preview = previewValidUntil(new Date('2028-02-29T18:00:00.000Z'), 12, 'America/Chicago');

    expect(preview.expiresAt).not.toBeNull();
    expect(localDate(lastValidDay(preview.expiresAt ?? ''), 'America/Chicago')).toBe('2029-02-28');
    expect(preview.text).toMatch(/^Valid until .+ \(12 months from today\)$/);
  });

  it('says when a training never lapses', () => {
    expect(previewValidUntil(new Date('2027-01-10T12:00:00.000Z'), 0, 'UTC')).toEqual({ expiresAt: null, text: 'Never lapses' });
  });

  it('speaks of one month in the singular', () => {
    expect(previewValidUntil(new Date('2027-01-10T12:00:00.000Z'), 1, 'UTC').text).toMatch(/\(1 month from today\)$/);
  });
});
