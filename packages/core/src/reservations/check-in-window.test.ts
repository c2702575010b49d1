import { describe, expect, it } from 'vitest';
import { checkInOpen } from './check-in-window';

const START = new Date('2026-12-05T09:00:00Z');
const RULES = { checkInMinutes: 10, noShowGraceMinutes: 15 };
const at = (minutes: number) => new Date(START.getTime() + minutes * 60_000);

// Reference: product.md (check-in opens 10 min before the start; release after the start plus a 15 min grace).
describe('checkInOpen', () => {
  it('opens the check-in window minutes before the start, not earlier', () => {
    expect(checkInOpen(START, at(-11), RULES)).toBe(false);
    expect(checkInOpen(START, at(-10), RULES)).toBe(true);
    expect(checkInOpen(START, at(-5), RULES)).toBe(true);
  });

  it('keeps it open through the grace after the start, then closes it', () => {
    expect(checkInOpen(START, at(0), RULES)).toBe(true);
    expect(checkInOpen(START, at(15), RULES)).toBe(true);
    expect(checkInOpen(START, at(15.01), RULES)).toBe(false);
  });

  it('follows each machine’s own window and grace', () => {
    expect(checkInOpen(START, at(-20), { checkInMinutes: 30, noShowGraceMinutes: 0 })).toBe(true);
    expect(checkInOpen(START, at(1), { checkInMinutes: 30, noShowGraceMinutes: 0 })).toBe(false);
  });
});
