import { describe, expect, it } from 'vitest';
import { can } from '../people/roles';
import { incidentNoteInputSchema, incidentPhotoParamsSchema, incidentReportSchema, incidentReviewSchema } from './schemas';

const report = {
  occurredAt: '2026-11-20T15:45:00-06:00',
  location: 'Welding bay',
  kind: 'damage',
  description: 'The MIG welder’s ground clamp spring snapped.',
};

describe('incidentReportSchema', () => {
  it('reads multipart fields, leaving empty ones out', () => {
    expect(incidentReportSchema.parse({ ...report, areaId: '', machineId: '', firstAid: '  ' })).toEqual(report);
  });

  it('takes a time with an offset (RFC 3339 §5.6 date-time) and refuses one without', () => {
    expect(incidentReportSchema.safeParse({ ...report, occurredAt: '2026-11-20T21:45:00Z' }).success).toBe(true);
    expect(incidentReportSchema.safeParse({ ...report, occurredAt: '2026-11-20T15:45' }).success).toBe(false);
  });

  it('refuses a time more than ten minutes ahead', () => {
    const result = incidentReportSchema.safeParse({ ...report, occurredAt: new Date(Date.now() + 60 * 60 * 1000).toISOString() });
    expect(result.error?.issues.map((issue) => issue.message)).toEqual(['That time has not come yet.']);
  });

  it('needs an area or a place, and names the place field when both are missing', () => {
    const result = incidentReportSchema.safeParse({ ...report, location: '' });
    expect(result.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['location']);
    const withArea = incidentReportSchema.safeParse({ ...report, location: '', areaId: '0b6f4c1e-6f7a-4c57-9a35-6a3b1f0f2d11' });
    expect(withArea.success).toBe(true);
  });

  it('knows the three kinds only', () => {
    expect(incidentReportSchema.safeParse({ ...report, kind: 'fire' }).success).toBe(false);
    for (const kind of ['injury', 'near_miss', 'damage']) expect(incidentReportSchema.safeParse({ ...report, kind }).success).toBe(true);
  });
});

describe('the review', () => {
  it('moves a report between open, under review and closed only', () => {
    expect(incidentReviewSchema.safeParse({ status: 'under_review' }).success).toBe(true);
    expect(incidentReviewSchema.safeParse({ status: 'resolved' }).success).toBe(false);
  });

  it('needs words in a note', () => {
    expect(incidentNoteInputSchema.safeParse({ note: '   ' }).success).toBe(false);
    expect(incidentNoteInputSchema.parse({ note: ' Guard replaced. ' })).toEqual({ note: 'Guard replaced.' });
  });

  it('numbers photos 1 to 5', () => {
    const id = '0b6f4c1e-6f7a-4c57-9a35-6a3b1f0f2d11';
    expect(incidentPhotoParamsSchema.parse({ id, n: '5' })).toEqual({ id, n: 5 });
    expect(incidentPhotoParamsSchema.safeParse({ id, n: '0' }).success).toBe(false);
    expect(incidentPhotoParamsSchema.safeParse({ id, n: '6' }).success).toBe(false);
  });
});

describe('incident permissions', () => {
  it('lets everyone report and read their own, and only admins read all and review', () => {
    for (const role of ['member', 'instructor', 'admin'] as const) {
      expect(can(role, 'create:incident:own')).toBe(true);
      expect(can(role, 'read:incident:own')).toBe(true);
    }
    expect(can('member', 'read:incident:any')).toBe(false);
    expect(can('instructor', 'read:incident:any')).toBe(false);
    expect(can('instructor', 'review:incident:any')).toBe(false);
    expect(can('admin', 'read:incident:any')).toBe(true);
    expect(can('admin', 'review:incident:any')).toBe(true);
  });
});
