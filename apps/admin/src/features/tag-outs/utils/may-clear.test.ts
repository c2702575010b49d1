import { describe, expect, it } from 'vitest';
import { mayClear } from './may-clear';

const instructorId = '6b1f3c2e-0a4d-4c5e-9f7a-1d2e3f4a5b6c';
const otherId = '0c9d8e7f-6a5b-4c3d-8e1f-2a3b4c5d6e7f';
const taggedBy = (id: string | null) => ({ reportedBy: id ? { id, firstName: 'Greta', lastName: 'Pfeiffer' } : null });

describe('who is offered Clear on a tag-out', () => {
  it('offers it to an admin for any tag-out, also one whose reporter is gone', () => {
    expect(mayClear({ id: otherId, role: 'admin' }, taggedBy(instructorId))).toBe(true);
    expect(mayClear({ id: otherId, role: 'admin' }, taggedBy(null))).toBe(true);
  });

  it('offers it to the instructor who tagged the machine out, not to another instructor', () => {
    expect(mayClear({ id: instructorId, role: 'instructor' }, taggedBy(instructorId))).toBe(true);
    expect(mayClear({ id: otherId, role: 'instructor' }, taggedBy(instructorId))).toBe(false);
  });

  it('never offers it to a member, even for their own report', () => {
    expect(mayClear({ id: otherId, role: 'member' }, taggedBy(otherId))).toBe(false);
  });
});
