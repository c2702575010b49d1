import { describe, expect, it } from 'vitest';
import { byUrgency, dueSortKey, everyWords, nextDueWords } from './maintenance-words';

const machine = { id: '6f1d0c9e-3b8a-4f3e-9a51-2d7c1e0b4a77', name: 'Lathe 1', meterHours: 1843.5 };

describe('maintenance words', () => {
  it('say how often by hours, by days, or both', () => {
    expect(everyWords({ everyHours: 8, everyDays: null })).toBe('Every 8 meter hours');
    expect(everyWords({ everyHours: null, everyDays: 1 })).toBe('Every day');
    expect(everyWords({ everyHours: 500, everyDays: 180 })).toBe('Every 500 meter hours or 180 days');
  });

  it('say when next due, with the meter beside the due reading', () => {
    expect(nextDueWords({ nextDueHours: 1851.5, nextDueDate: null, machine })).toBe('At 1,851.5 h (meter 1,843.5 h)');
    // A bare calendar date, formatted in UTC so it cannot shift a day.
    expect(nextDueWords({ nextDueHours: null, nextDueDate: '2026-12-31', machine })).toBe('On 31 Dec');
  });

  it('order overdue before due soon before OK, and dated tasks by date before those kept by hours', () => {
    const statuses = (['ok', 'overdue', 'due'] as const).map((status) => ({ status }));
    expect([...statuses].sort(byUrgency).map((t) => t.status)).toEqual(['overdue', 'due', 'ok']);
    const dated = dueSortKey({ nextDueHours: null, nextDueDate: '2026-12-31', machine });
    const byHours = dueSortKey({ nextDueHours: 1850, nextDueDate: null, machine });
    expect(dated[0]).toBeLessThan(byHours[0]);
    expect(byHours[1]).toBeCloseTo(6.5);
  });
});
