import type { SignOff } from '@chuckkey/core';
import { describe, expect, it } from 'vitest';
import { sortSignOffs } from './sign-off-sort';

let next = 0;
function signOff(memberName: string, trainingName: string, expiresAt: string | null): SignOff {
  next += 1;
  const id = `00000000-0000-4000-8000-${String(next).padStart(12, '0')}`;
  return {
    id,
    memberId: id,
    memberName,
    trainingId: id,
    trainingName,
    level: 'independent',
    checklist: [],
    note: '',
    signedBy: { id, name: 'Instructor' },
    signedVia: 'web',
    signedAt: '2026-01-01T12:00:00.000Z',
    expiresAt,
    revokedAt: null,
    revokeReason: null,
    state: 'expiring',
    machines: [],
  };
}

const list = [
  signOff('Wren Alder', 'MIG welding', '2027-03-10T06:00:00.000Z'),
  signOff('ada Quill', 'Metal lathe fundamentals', null),
  signOff('Bo Fenwick', 'Band saw', '2027-02-01T06:00:00.000Z'),
];

describe('sorting the sign-off report', () => {
  it('puts the soonest expiry first, and never-lapsing ones last', () => {
    expect(sortSignOffs(list, { field: 'expires', order: 'asc' }).map((s) => s.memberName)).toEqual(['Bo Fenwick', 'Wren Alder', 'ada Quill']);
  });

  it('sorts names A to Z without regard to capitals', () => {
    expect(sortSignOffs(list, { field: 'member', order: 'asc' }).map((s) => s.memberName)).toEqual(['ada Quill', 'Bo Fenwick', 'Wren Alder']);
    expect(sortSignOffs(list, { field: 'training', order: 'desc' }).map((s) => s.trainingName)).toEqual([
      'MIG welding',
      'Metal lathe fundamentals',
      'Band saw',
    ]);
  });

  it('leaves the list it was given as it was', () => {
    const before = list.map((s) => s.id);
    sortSignOffs(list, { field: 'member', order: 'desc' });
    expect(list.map((s) => s.id)).toEqual(before);
  });
});
