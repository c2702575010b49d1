import { describe, expect, it } from 'vitest';
import { dueBackLine, outLine, outToLine, overdueFor, whenWords } from './due-text';

const CHICAGO = 'America/Chicago';
const at = (iso: string) => new Date(iso);
// Saturday 7 March 2026, 10:00 in Chicago (CST, UTC−6): IANA tz database via Intl.
const now = at('2026-03-07T16:00:00Z');

describe('whenWords()', () => {
  it('names today, tomorrow and yesterday on the shop’s wall clock', () => {
    // 18:00 CST on 7 March is 00:00Z on 8 March: still today in Chicago, though tomorrow in UTC.
    expect(whenWords(at('2026-03-08T00:00:00Z'), now, CHICAGO)).toBe('today 18:00');
    // IANA tz database via Intl: daylight saving starts on 8 March 2026, so 10:00 CDT is 15:00Z.
    expect(whenWords(at('2026-03-08T15:00:00Z'), now, CHICAGO)).toBe('tomorrow 10:00');
    expect(whenWords(at('2026-03-07T00:00:00Z'), now, CHICAGO)).toBe('yesterday 18:00');
  });

  it('names the weekday within a week and the date beyond it', () => {
    // Tuesday 10 March 2026, 18:00 CDT (UTC−5) is 23:00Z.
    expect(whenWords(at('2026-03-10T23:00:00Z'), now, CHICAGO)).toBe('Tuesday 18:00');
    expect(whenWords(at('2026-03-14T23:00:00Z'), now, CHICAGO)).toBe('14 March 18:00');
  });
});

describe('due-time lines', () => {
  it('words a tool’s due time as "Due back Tuesday 18:00"', () => {
    expect(dueBackLine('2026-03-10T23:00:00Z', now, CHICAGO)).toBe('Due back Tuesday 18:00');
  });

  it('says how long a tool is overdue in minutes, hours, then days', () => {
    expect(overdueFor(at('2026-03-07T15:59:30Z'), now)).toBe('1 minute');
    expect(overdueFor(at('2026-03-07T15:15:00Z'), now)).toBe('45 minutes');
    expect(overdueFor(at('2026-03-07T13:00:00Z'), now)).toBe('3 hours');
    expect(overdueFor(at('2026-03-06T00:00:00Z'), now)).toBe('40 hours');
    expect(overdueFor(at('2026-03-04T16:00:00Z'), now)).toBe('3 days');
  });

  it('shows a tool not yet due by its due time, and an overdue one by how late it is', () => {
    expect(outLine('2026-03-08T00:00:00Z', now, CHICAGO)).toBe('Due back today 18:00');
    expect(outLine('2026-03-07T00:00:00Z', now, CHICAGO)).toBe('Overdue by 16 hours, was due yesterday 18:00');
  });

  it('says who has a tool and until when: the time alone for today', () => {
    expect(outToLine('Ines', '2026-03-08T00:00:00Z', now, CHICAGO)).toBe('Out to Ines until 18:00');
    expect(outToLine('Ines', '2026-03-10T23:00:00Z', now, CHICAGO)).toBe('Out to Ines until Tuesday 18:00');
    expect(outToLine('Ines', '2026-03-07T15:00:00Z', now, CHICAGO)).toBe('Out to Ines, overdue since today 09:00');
  });
});
