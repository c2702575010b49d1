import { describe, expect, it } from 'vitest';
import { ownMigratedDatabase } from './test-database';

/*
 * training_teachers is kept by a trigger on sign_offs; whatever happens to the sign-offs, each row
 * must equal what sign_offs says: per training and signer, the latest signed_at. The expected
 * value is worked out here from sign_offs itself, not from the table under test.
 */
const own = ownMigratedDatabase('training_teachers');

let people = 0;
async function person(role: 'member' | 'instructor'): Promise<string> {
  people += 1;
  const [row] = await own.db('members')
    .insert({ email: `person${people}@teachers.example`, first_name: `Person${people}`, last_name: 'Test', role, password_hash: 'x' })
    .returning('id');
  return row.id as string;
}

async function training(name: string): Promise<string> {
  const [row] = await own.db('trainings').insert({ name, validity_months: 24 }).returning('id');
  return row.id as string;
}

async function signOff(memberId: string, trainingId: string, signedBy: string, signedAt: string): Promise<string> {
  const [row] = await own.db('sign_offs')
    .insert({ member_id: memberId, training_id: trainingId, level: 'independent', checklist: '[]', signed_by: signedBy, signed_at: signedAt })
    .returning('id');
  return row.id as string;
}

async function kept() {
  const rows = await own.db('training_teachers').select('training_id', 'member_id', 'last_signed_at').orderBy(['training_id', 'member_id']);
  return rows.map((r) => ({ training: r.training_id, teacher: r.member_id, latest: new Date(r.last_signed_at).toISOString() }));
}

async function fromSignOffs() {
  const rows = await own.db('sign_offs')
    .select('training_id', 'signed_by')
    .max('signed_at as latest')
    .groupBy('training_id', 'signed_by')
    .orderBy(['training_id', 'signed_by']);
  return rows.map((r) => ({ training: r.training_id, teacher: r.signed_by, latest: new Date(r.latest).toISOString() }));
}

describe('training_teachers', () => {
  it('follows sign-offs given, moved, re-dated and taken away', async () => {
    const [ines, oskar, member1, member2] = [await person('instructor'), await person('instructor'), await person('member'), await person('member')];
    const lathe = await training('Lathe basics');
    const mig = await training('MIG welding');

    await signOff(member1, lathe, ines, '2026-03-01T10:00:00Z');
    const later = await signOff(member2, lathe, ines, '2026-05-01T10:00:00Z');
    // An older sign-off entered afterwards does not move the latest time back.
    await signOff(member2, mig, ines, '2025-01-01T10:00:00Z');
    const oskars = await signOff(member1, mig, oskar, '2026-06-01T10:00:00Z');
    expect(await kept()).toEqual(await fromSignOffs());
    expect((await kept()).find((r) => r.training === lathe && r.teacher === ines)?.latest).toBe('2026-05-01T10:00:00.000Z');

    // The latest goes away: the pair falls back to the one before.
    await own.db('sign_offs').where({ id: later }).delete();
    expect((await kept()).find((r) => r.training === lathe && r.teacher === ines)?.latest).toBe('2026-03-01T10:00:00.000Z');

    // Moved to another signer: the old pair loses its only sign-off, the new one gains it.
    await own.db('sign_offs').where({ id: oskars }).update({ signed_by: ines });
    expect((await kept()).some((r) => r.teacher === oskar)).toBe(false);
    expect((await kept()).find((r) => r.training === mig && r.teacher === ines)?.latest).toBe('2026-06-01T10:00:00.000Z');

    // Re-dated earlier: the pair's latest is worked out again, not kept at the old maximum.
    await own.db('sign_offs').where({ id: oskars }).update({ signed_at: '2025-06-01T10:00:00Z' });
    expect((await kept()).find((r) => r.training === mig && r.teacher === ines)?.latest).toBe('2025-06-01T10:00:00.000Z');

    // Revoking a sign-off is not undoing the teaching: nothing changes.
    const before = await kept();
    await own.db('sign_offs').where({ member_id: member1, training_id: lathe }).update({ revoked_at: own.db.fn.now(), revoke_reason: 'Test', revoked_by: oskar });
    expect(await kept()).toEqual(before);

    expect(await kept()).toEqual(await fromSignOffs());
  });
});
