import { describe, expect, it } from 'vitest';
import { demoIncidents } from '../seeds/13_incidents';
import { ownDatabase } from './test-database';

const own = ownDatabase('incidents_seed', { seed: true });

const reports = () =>
  own
    .db('incidents as i')
    .join('machines as m', 'm.id', 'i.machine_id')
    .join('members as r', 'r.id', 'i.reported_by')
    .select('i.id', 'i.kind', 'i.status', 'i.description', 'i.occurred_at', 'i.reported_at', 'i.area_id', 'm.area_id as machine_area', 'm.name as machine', 'r.email')
    .orderBy('i.occurred_at', 'desc');

describe('the demo shop’s incident reports', () => {
  it('holds an open near miss with a chuck key left in, and closed damage to a band saw blade guard', async () => {
    const rows = await reports();
    expect(rows.map(({ kind, status, machine, email }) => ({ kind, status, machine, email }))).toEqual([
      { kind: 'near_miss', status: 'open', machine: 'Lathe 2 · 12×36', email: 'member@example.org' },
      { kind: 'damage', status: 'closed', machine: 'Horizontal band saw', email: 'instructor@example.org' },
    ]);
    expect(rows[0].description).toMatch(/chuck key/i);
    expect(rows[1].description).toMatch(/blade guard/i);
    for (const row of rows) {
      // Placed in the machine's own area, reported after it happened and not in the future.
      expect(row.area_id).toBe(row.machine_area);
      expect(row.reported_at.getTime()).toBeGreaterThan(row.occurred_at.getTime());
      expect(row.occurred_at.getTime()).toBeLessThan(Date.now());
    }
  });

  it('gives the closed report the admin’s follow-up notes in order, and the open one none', async () => {
    const [open, closed] = await reports();
    const notes = (id: string) =>
      own.db('incident_notes as n').join('members as a', 'a.id', 'n.author_id').where('n.incident_id', id).orderBy('n.at').select('n.note', 'n.at', 'a.email');
    expect(await notes(open.id)).toEqual([]);
    const closedNotes = await notes(closed.id);
    expect(closedNotes.map((row) => row.note)).toEqual(demoIncidents[1]!.notes.map((note) => note.note));
    expect(closedNotes.every((row) => row.email === 'admin@example.org' && row.at.getTime() > closed.occurred_at.getTime())).toBe(true);
  });

});
