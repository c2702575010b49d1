import { stationTagOutReasons, tagOutCreateSchema } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { OTHER, reportReason } from './report-reason';

describe('the reason a station sends with a reported problem', () => {
  it('is the common reason alone when nothing more is said', () => {
    expect(reportReason('Coolant leak', '   ')).toBe('Coolant leak');
  });

  it('puts the member’s words after the common reason', () => {
    expect(reportReason('Strange noise', ' Knocking from the gearbox ')).toBe('Strange noise: Knocking from the gearbox');
  });

  it('is the member’s words alone for Other…, and nothing when they said nothing (the form then asks for words)', () => {
    expect(reportReason(OTHER, 'Table lock will not hold')).toBe('Table lock will not hold');
    expect(reportReason(OTHER, ' ')).toBe('');
    expect(tagOutCreateSchema.safeParse({ reason: reportReason(OTHER, ' ') }).success).toBe(false);
  });

  it('sends every common reason as a reason the server takes', () => {
    for (const reason of stationTagOutReasons) expect(tagOutCreateSchema.safeParse({ reason: reportReason(reason, '') }).success).toBe(true);
  });
});
