import type { Knex } from 'knex';
import type { ChecklistItem, SignOffLevel } from '@chuckkey/core';
import { signOffExpiry } from '@chuckkey/core';
import { createSignOff } from '../factories';
import { GENERAL_SAFETY } from './04_trainings';

const DAY = 86_400_000;

interface Person {
  id: string;
  email: string;
  role: string;
}

interface Training {
  id: string;
  name: string;
  validity_months: number;
  checklist: ChecklistItem[];
}

interface Given {
  training: string;
  /** How long ago it was signed; a fraction of a day puts it at a different hour. */
  daysAgo: number;
  level?: SignOffLevel;
  by?: string;
  note?: string;
  revoked?: { daysAfter: number; by: string; reason: string };
  /** Whether the reminder mails due by now went out (the demo member's are left for the job). */
  reminded?: boolean;
}

const notes: Record<string, string[]> = {
  [GENERAL_SAFETY]: ['', 'Walked the shop with the evening group.', 'Knew the extinguisher types already.'],
  'Metal lathe fundamentals': ['Good chuck-key habit. Practise parting off under supervision.', 'Faced and turned a shoulder to size on the first try.', ''],
  'Milling fundamentals': ['Trammed the head with help; squared a block to size.', ''],
  'Drill press': [''],
  'MIG welding': ['Clean fillets on 3 mm plate; watch the stick-out.', 'Needs more practice out of position.', ''],
  'TIG welding': ['Steady bead on steel; aluminium next time.', ''],
  'Band saw': [''],
  'Surface grinder': ['Ring-tested and mounted a wheel; dressed it cleanly.', ''],
};

/**
 * A shop a few years old: most members hold general shop safety, fewer hold the lathe or a
 * welder, some sign-offs lapsed or lapse soon, some are supervised only, and one was revoked.
 * Dates count back from today so the states stay true whenever the demo is loaded.
 */
function plan(j: number): Given[] {
  const given: Given[] = [];
  if (j % 13 !== 12) {
    if (j % 9 === 4) given.push({ training: GENERAL_SAFETY, daysAgo: 365 - (5 + (j % 20)) });
    else if (j % 10 === 7) given.push({ training: GENERAL_SAFETY, daysAgo: 380 + j * 3 });
    else {
      const daysAgo = 15 + ((j * 29) % 320);
      given.push({ training: GENERAL_SAFETY, daysAgo });
      // Renewed a few days before the last one lapsed.
      if (j % 6 === 0) given.push({ training: GENERAL_SAFETY, daysAgo: daysAgo + 360.2 });
    }
  }
  if (j % 3 === 0) {
    const level: SignOffLevel = j % 2 === 0 ? 'independent' : 'supervised';
    const daysAgo = j % 12 === 3 ? 730 - (3 + (j % 25)) : j % 12 === 9 ? 760 + j * 4 : 30 + ((j * 41) % 600);
    given.push({ training: 'Metal lathe fundamentals', daysAgo, level });
  }
  if (j % 5 === 2) given.push({ training: 'Milling fundamentals', daysAgo: 40 + ((j * 53) % 650), level: j % 10 === 2 ? 'independent' : 'supervised' });
  if (j % 3 === 1 || j % 5 === 2) given.push({ training: 'Drill press', daysAgo: 20 + ((j * 17) % 500) });
  if (j % 4 === 1) {
    const daysAgo = j % 12 === 5 ? 365 - (8 + (j % 15)) : j % 12 === 9 ? 400 + j : 10 + ((j * 31) % 330);
    given.push({
      training: 'MIG welding',
      daysAgo,
      level: j % 8 === 1 ? 'supervised' : 'independent',
      ...(j === 13
        ? {
            revoked: {
              daysAfter: 40,
              by: 'bettina',
              reason: 'Welded twice with the fume extraction off after being reminded. Retrain with an instructor before welding again.',
            },
          }
        : {}),
    });
  }
  if (j % 7 === 3) given.push({ training: 'TIG welding', daysAgo: 60 + ((j * 13) % 280), level: j === 10 ? 'supervised' : 'independent' });
  if (j % 2 === 0) given.push({ training: 'Band saw', daysAgo: 30 + ((j * 23) % 700) });
  if (j % 8 === 5) given.push({ training: 'Surface grinder', daysAgo: j === 21 ? 730 - 20 : 100 + ((j * 19) % 600), level: j % 16 === 5 ? 'supervised' : 'independent' });
  return given;
}

/** Who teaches what in the demo shop; admins sign off general shop safety too. */
const teacherFor: Record<string, string[]> = {
  [GENERAL_SAFETY]: ['tobias', 'marguerite', 'ansel', 'bettina', 'corwin'],
  'Metal lathe fundamentals': ['tobias', 'ansel'],
  'Milling fundamentals': ['tobias'],
  'Drill press': ['tobias', 'ansel'],
  'MIG welding': ['bettina', 'corwin'],
  'TIG welding': ['bettina'],
  'Band saw': ['ansel', 'tobias'],
  'Surface grinder': ['ansel'],
};

export async function seed(knex: Knex): Promise<void> {
  const shop = await knex('shop').first('time_zone').where({ id: 1 });
  const timeZone: string = shop.time_zone;
  const people: (Person & { first_name: string })[] = await knex('members').select('id', 'email', 'role', 'first_name').orderBy('email');
  const trainings: Training[] = await knex('trainings').select('id', 'name', 'validity_months', 'checklist');
  const byName = new Map(trainings.map((t) => [t.name, t]));

  const teachers = new Map<string, Person>();
  for (const person of people) {
    if (person.role === 'member') continue;
    teachers.set(person.first_name.toLowerCase(), person);
  }
  const teacher = (key: string) => {
    const found = teachers.get(key);
    if (!found) throw new Error(`demo teacher "${key}" is missing`);
    return found;
  };

  const now = Date.now();
  let counter = 0;

  async function give(member: Person, g: Given): Promise<void> {
    const training = byName.get(g.training);
    if (!training) throw new Error(`demo training "${g.training}" is missing`);
    counter++;
    const candidates = (g.by ? [g.by] : teacherFor[g.training]!).map(teacher).filter((t) => t.id !== member.id);
    const signer = candidates[counter % candidates.length]!;
    // Sign-offs happen in the afternoon or evening, a few hours before now on their day.
    const signedAt = new Date(now - g.daysAgo * DAY - (2 + (counter % 5)) * 3_600_000);
    const expiresAt = signOffExpiry(signedAt, training.validity_months, timeZone);
    const sent = (daysBefore: number) => {
      if (!expiresAt || g.reminded === false) return null;
      const due = expiresAt.getTime() - daysBefore * DAY;
      return due <= now ? new Date(Math.max(due, signedAt.getTime())) : null;
    };
    const revokedAt = g.revoked ? new Date(signedAt.getTime() + g.revoked.daysAfter * DAY) : null;
    const note = g.note ?? notes[g.training]![counter % notes[g.training]!.length]!;
    const row = await createSignOff(knex, {
      member_id: member.id,
      training_id: training.id,
      level: g.level ?? 'independent',
      note,
      signed_by: signer.id,
      signed_via: counter % 4 === 0 ? 'station' : 'web',
      signed_at: signedAt,
      expires_at: expiresAt,
      revoked_at: revokedAt,
      revoked_by: g.revoked ? teacher(g.revoked.by).id : null,
      revoke_reason: g.revoked?.reason ?? null,
      reminded_30_at: sent(30),
      reminded_7_at: sent(7),
    });
    await knex('audit_log').insert({
      actor_id: signer.id,
      action: 'sign_off.created',
      entity: 'sign_off',
      entity_id: row.id,
      member_id: member.id,
      details: JSON.stringify({ trainingId: training.id, trainingName: training.name, level: row.level, via: row.signed_via, expiresAt: expiresAt?.toISOString() ?? null }),
      at: signedAt,
    });
    if (g.revoked && revokedAt) {
      await knex('audit_log').insert({
        actor_id: teacher(g.revoked.by).id,
        action: 'sign_off.revoked',
        entity: 'sign_off',
        entity_id: row.id,
        member_id: member.id,
        details: JSON.stringify({ trainingId: training.id, trainingName: training.name, reason: g.revoked.reason }),
        at: revokedAt,
      });
    }
  }

  // The staff hold what they teach, signed off by one another.
  const staff: [string, Given[]][] = [
    ['tobias', [GENERAL_SAFETY, 'Metal lathe fundamentals', 'Milling fundamentals', 'Drill press', 'Band saw'].map((training, i) => ({ training, daysAgo: 90 + i * 30, by: 'marguerite' }))],
    ['ansel', [GENERAL_SAFETY, 'Metal lathe fundamentals', 'Drill press', 'Band saw', 'Surface grinder'].map((training, i) => ({ training, daysAgo: 120 + i * 25, by: 'tobias' }))],
    ['bettina', [GENERAL_SAFETY, 'MIG welding', 'TIG welding'].map((training, i) => ({ training, daysAgo: 60 + i * 40, by: 'corwin' }))],
    ['marguerite', [{ training: GENERAL_SAFETY, daysAgo: 150, by: 'tobias' }]],
    ['corwin', [GENERAL_SAFETY, 'MIG welding'].map((training, i) => ({ training, daysAgo: 200 + i * 20, by: 'bettina' }))],
  ];
  for (const [key, list] of staff) for (const g of list) await give(teacher(key), g);

  // The demo member's page has something to say: valid sign-offs, one lapsing in 12 days whose
  // reminder the job has yet to send, a supervised one and one that never lapses.
  const demoMember = people.find((p) => p.email === 'member@example.org');
  if (!demoMember) throw new Error('the demo member is missing');
  const demoPlan: Given[] = [
    { training: GENERAL_SAFETY, daysAgo: 200, by: 'tobias', note: 'Walked the shop with the Tuesday group.' },
    { training: 'Metal lathe fundamentals', daysAgo: 730 - 12, by: 'tobias', reminded: false, note: 'Turned a stepped pin to drawing; good chuck-key habit.' },
    { training: 'MIG welding', daysAgo: 45, level: 'supervised', by: 'bettina', note: 'Solid fillets flat; weld with a supervisor until out-of-position work is steadier.' },
    { training: 'Band saw', daysAgo: 300, by: 'ansel' },
  ];
  for (const g of demoPlan) await give(demoMember, g);

  const members = people.filter((p) => p.role === 'member' && p.id !== demoMember.id);
  for (const [j, member] of members.entries()) {
    for (const g of plan(j)) await give(member, g);
  }
}
