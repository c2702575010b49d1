import type { Knex } from 'knex';

const DAY = 86_400_000;
const HOUR = 3_600_000;

interface DemoIncident {
  machine: string;
  reporterEmail: string;
  kind: 'near_miss' | 'damage';
  daysAgo: number;
  description: string;
  firstAid: string | null;
  status: 'open' | 'closed';
  notes: { daysAgo: number; note: string }[];
}

/** Two invented reports for the demo shop: one still open, one reviewed and closed with notes. */
export const demoIncidents: DemoIncident[] = [
  {
    machine: 'Lathe 2 · 12×36',
    reporterEmail: 'member@example.org',
    kind: 'near_miss',
    daysAgo: 3,
    description:
      'Found the chuck key left in the chuck when I walked up to the lathe. The previous user had switched off at the panel but not taken the key out. Nobody started the spindle; I removed the key and put it on the holder.',
    firstAid: null,
    status: 'open',
    notes: [],
  },
  {
    machine: 'Horizontal band saw',
    reporterEmail: 'instructor@example.org',
    kind: 'damage',
    daysAgo: 12,
    description:
      'The blade guard on the horizontal band saw was bent when a length of round bar rolled off the stand during a cut. The blade stopped on its own; the guard rubs the blade on the downstroke.',
    firstAid: null,
    status: 'closed',
    notes: [
      { daysAgo: 11, note: 'Saw tagged out. Guard straightened and the blade checked for tooth damage; none found.' },
      { daysAgo: 9, note: 'Added a second V-block stand for long stock. Guard runs clear of the blade; closed.' },
    ],
  },
];

export async function seed(knex: Knex): Promise<void> {
  // Seeding again leaves existing reports as they are: they are the shop's record now.
  if (await knex('incidents').first('id')) return;

  const admin = await knex('members').first('id').where({ email: 'admin@example.org' });
  const now = Date.now();
  for (const incident of demoIncidents) {
    const [machine, reporter] = await Promise.all([
      knex('machines').first('id', 'area_id').where({ name: incident.machine }),
      knex('members').first('id').where({ email: incident.reporterEmail }),
    ]);
    if (!machine || !reporter) continue;
    const occurredAt = new Date(now - incident.daysAgo * DAY);
    const [row] = await knex('incidents')
      .insert({
        occurred_at: occurredAt,
        area_id: machine.area_id,
        machine_id: machine.id,
        kind: incident.kind,
        description: incident.description,
        first_aid: incident.firstAid,
        reported_by: reporter.id,
        reported_at: new Date(occurredAt.getTime() + HOUR),
        status: incident.status,
      })
      .returning<{ id: string }[]>('id');
    if (!row) continue;
    for (const note of incident.notes) {
      await knex('incident_notes').insert({ incident_id: row.id, author_id: admin?.id ?? null, at: new Date(now - note.daysAgo * DAY), note: note.note });
    }
  }
}
