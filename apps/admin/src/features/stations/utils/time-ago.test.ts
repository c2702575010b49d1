import { describe, expect, it } from 'vitest';
import { timeAgo } from './time-ago';

const now = new Date('2027-03-10T15:00:00.000Z');

describe('how long ago a station was last heard from', () => {
  it('says now for the same instant and counts seconds within the first minute', () => {
    expect(timeAgo('2027-03-10T15:00:00.000Z', now, 'en-US')).toBe('now');
    expect(timeAgo('2027-03-10T14:59:35.000Z', now, 'en-US')).toBe('25 seconds ago');
  });

  it('speaks in the largest whole unit, rounding down', () => {
    expect(timeAgo('2027-03-10T14:57:59.000Z', now, 'en-US')).toBe('2 minutes ago');
    expect(timeAgo('2027-03-10T11:50:00.000Z', now, 'en-US')).toBe('3 hours ago');
    expect(timeAgo('2027-03-06T15:00:00.000Z', now, 'en-US')).toBe('4 days ago');
    expect(timeAgo('2027-02-17T15:00:00.000Z', now, 'en-US')).toBe('3 weeks ago');
    expect(timeAgo('2025-12-01T15:00:00.000Z', now, 'en-US')).toBe('last year');
  });

  it('says yesterday for one day ago', () => {
    expect(timeAgo('2027-03-09T14:00:00.000Z', now, 'en-US')).toBe('yesterday');
  });

  it('reads a time a little ahead of the browser clock as now', () => {
    expect(timeAgo('2027-03-10T15:00:04.000Z', now, 'en-US')).toBe('now');
  });

  it('gives back what it cannot read', () => {
    expect(timeAgo('not a time', now, 'en-US')).toBe('not a time');
  });
});
