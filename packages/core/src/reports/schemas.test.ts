import { describe, expect, it } from 'vitest';
import { daysInRange, USAGE_REPORT_MAX_DAYS, usageReportQuerySchema } from './schemas';

describe('the usage report’s range', () => {
  it('counts both days, across a leap day (ISO 8601 calendar dates)', () => {
    expect(daysInRange('2026-03-02', '2026-03-02')).toBe(1);
    expect(daysInRange('2028-02-28', '2028-03-01')).toBe(3);
    expect(daysInRange('2026-01-01', '2026-12-31')).toBe(365);
  });

  it(`takes up to ${USAGE_REPORT_MAX_DAYS} days and defaults to machines as JSON`, () => {
    expect(usageReportQuerySchema.parse({ from: '2025-01-01', to: '2026-02-04' })).toEqual({
      from: '2025-01-01',
      to: '2026-02-04',
      groupBy: 'machine',
      format: 'json',
      table: 'rows',
    });
    const over = usageReportQuerySchema.safeParse({ from: '2025-01-01', to: '2026-02-05' });
    expect(over.success).toBe(false);
    expect(over.error?.issues.map((i) => i.path.join('.'))).toEqual(['to']);
  });

  it('refuses an end before the start, a date that does not exist, and unknown groupings', () => {
    expect(usageReportQuerySchema.safeParse({ from: '2026-03-03', to: '2026-03-02' }).success).toBe(false);
    expect(usageReportQuerySchema.safeParse({ from: '2026-02-30', to: '2026-03-02' }).success).toBe(false);
    expect(usageReportQuerySchema.safeParse({ from: '2026-03-02', to: '2026-03-03', groupBy: 'week' }).success).toBe(false);
  });
});
