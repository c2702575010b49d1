import { describe, expect, it } from 'vitest';
import { describeElapsed, formatElapsed } from './elapsed';

const SECOND = 1000;
const MINUTE = 60 * SECOND;
const HOUR = 60 * MINUTE;

describe('formatElapsed', () => {
  it('shows minutes and seconds, both two digits, in the first hour', () => {
    expect(formatElapsed(0)).toBe('00:00');
    expect(formatElapsed(7 * SECOND)).toBe('00:07');
    expect(formatElapsed(5 * MINUTE + 3 * SECOND)).toBe('05:03');
    expect(formatElapsed(HOUR - SECOND)).toBe('59:59');
  });

  it('adds the hours from the first full hour on, without a leading zero', () => {
    expect(formatElapsed(HOUR)).toBe('1:00:00');
    expect(formatElapsed(2 * HOUR + 4 * MINUTE + 9 * SECOND)).toBe('2:04:09');
    expect(formatElapsed(25 * HOUR)).toBe('25:00:00');
  });

  it('counts whole seconds only', () => {
    expect(formatElapsed(59_999)).toBe('00:59');
  });

  it('reads a start ahead of the station clock as no time at all', () => {
    expect(formatElapsed(-4 * SECOND)).toBe('00:00');
  });
});

describe('describeElapsed', () => {
  it('says the time in words', () => {
    expect(describeElapsed(61 * SECOND)).toBe('1 minute 1 second');
    expect(describeElapsed(HOUR + 2 * MINUTE)).toBe('1 hour 2 minutes 0 seconds');
  });
});
