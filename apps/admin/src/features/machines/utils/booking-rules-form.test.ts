import { DEFAULT_RESERVATION_RULES } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { bookingRulesResolver, hoursToMinutes, minutesToHours, toFormValues, toRulesBody } from './booking-rules-form';

describe('booking rules conversion', () => {
  it('shows the weekly quota in hours and reads it back in minutes (60 minutes to the hour, SI)', () => {
    expect(minutesToHours(360)).toBe('6');
    expect(minutesToHours(90)).toBe('1.5');
    expect(hoursToMinutes('2')).toBe(120);
    expect(hoursToMinutes('1.5')).toBe(90);
    // A decimal comma, as many locales write it (CLDR decimal symbols), reads the same.
    expect(hoursToMinutes('1,5')).toBe(90);
  });

  it('counts the quota to the nearest minute, so 20 minutes shown as 0.33 h comes back as 20 (common practice: the server keeps whole minutes)', () => {
    expect(minutesToHours(20)).toBe('0.33');
    expect(hoursToMinutes(minutesToHours(20))).toBe(20);
    expect(hoursToMinutes('')).toBeUndefined();
    expect(hoursToMinutes('two')).toBeUndefined();
  });

  it('builds the whole body of PUT /api/machines/:id/reservation-rules from the defaults (docs/api.md)', () => {
    expect(toRulesBody(toFormValues(DEFAULT_RESERVATION_RULES), true)).toEqual({ reservable: true, ...DEFAULT_RESERVATION_RULES });
  });

  it('judges with the core schema and puts quota errors on the hours field in hours (docs/api.md ranges: quota 0–10,080 minutes)', async () => {
    const resolve = bookingRulesResolver(() => true);
    const options = { fields: {}, shouldUseNativeValidation: false };
    const values = { ...toFormValues(DEFAULT_RESERVATION_RULES), weeklyQuotaHours: '169', bufferMinutes: '' };
    const result = await resolve(values, undefined, options);
    expect(result.errors.weeklyQuotaHours?.message).toBe('Give the weekly quota as a number of hours from 0 to 168, e.g. 1.5 for an hour and a half.');
    expect(result.errors.bufferMinutes?.message).toBe('Give the buffer after each reservation (minutes) as a whole number.');

    // 1,440 % 7 ≠ 0: the step must divide the day (docs/api.md).
    const offStep = await resolve({ ...toFormValues(DEFAULT_RESERVATION_RULES), slotMinutes: '7' }, undefined, options);
    expect(offStep.errors.slotMinutes?.message).toBe('The slot step must divide the day evenly (e.g. 10, 15, 20, 30 or 60 minutes).');

    const fine = await resolve({ ...toFormValues(DEFAULT_RESERVATION_RULES), weeklyQuotaHours: '168' }, undefined, options);
    expect(fine.values).toEqual({ reservable: true, ...DEFAULT_RESERVATION_RULES, weeklyQuotaMinutes: 10080 });
  });
});
