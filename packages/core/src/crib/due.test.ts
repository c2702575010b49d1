import { describe, expect, it } from 'vitest';
import type { WeeklyHours } from '../shop/hours';
import { cribDueAt, FALLBACK_LOAN_HOURS } from './due';

const CHICAGO = 'America/Chicago';
const at = (iso: string) => new Date(iso);
// ISO 8601 weekdays: Monday 1 … Sunday 7.
const week: WeeklyHours[] = [
  { weekday: 6, opensAt: '09:00', closesAt: '18:00' },
  { weekday: 7, opensAt: '12:00', closesAt: '18:00' },
];
const hours = { weekly: week, closures: [], timeZone: CHICAGO };

describe('cribDueAt()', () => {
  it('counts a tool’s own loan period in elapsed hours from now', () => {
    expect(cribDueAt(48, hours, at('2026-03-07T16:00:00Z'))).toEqual(at('2026-03-09T16:00:00Z'));
  });

  it('keeps a loan period in elapsed hours across the start of daylight saving time', () => {
    // IANA tz database via Intl: Chicago moves from CST (UTC−6) to CDT (UTC−5) at 02:00 on 8 March 2026,
    // so 24 elapsed hours from 10:00 CST on Saturday end at 11:00 CDT on Sunday.
    const due = cribDueAt(24, hours, at('2026-03-07T16:00:00Z'));
    expect(due).toEqual(at('2026-03-08T16:00:00Z'));
    expect(new Intl.DateTimeFormat('en-US', { timeZone: CHICAGO, hour: 'numeric', hour12: false }).format(due)).toBe('11');
  });

  it('without a loan period, is due at the shop’s closing time today', () => {
    // IANA tz database via Intl: 18:00 CST on Saturday 7 March 2026 is 00:00Z on Sunday.
    expect(cribDueAt(null, hours, at('2026-03-07T16:00:00Z'))).toEqual(at('2026-03-08T00:00:00Z'));
  });

  it('on the day daylight saving time starts, the closing time is read on the new offset', () => {
    // IANA tz database via Intl: on Sunday 8 March 2026 Chicago keeps CDT (UTC−5), so 18:00 local is 23:00Z.
    expect(cribDueAt(null, hours, at('2026-03-08T18:00:00Z'))).toEqual(at('2026-03-08T23:00:00Z'));
  });

  it('when the shop is closed, falls back to a day from now', () => {
    // Monday 9 March 2026 has no opening.
    const now = at('2026-03-09T15:00:00Z');
    expect(cribDueAt(null, hours, now)).toEqual(new Date(now.getTime() + FALLBACK_LOAN_HOURS * 3_600_000));
  });

  it('when the shop keeps no hours at all, falls back to a day from now', () => {
    const now = at('2026-03-09T15:00:00Z');
    expect(cribDueAt(null, { weekly: [], closures: [], timeZone: CHICAGO }, now)).toEqual(new Date(now.getTime() + 24 * 3_600_000));
  });
});
