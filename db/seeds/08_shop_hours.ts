import type { Knex } from 'knex';

/**
 * The demo collective opens on weekday evenings after work and during the day at weekends, and
 * rests on Mondays. Wall-clock times in the shop's time zone; ISO weekdays, Monday 1.
 */
export const demoWeeklyHours = [
  { weekday: 2, opensAt: '16:00', closesAt: '22:00' },
  { weekday: 3, opensAt: '16:00', closesAt: '22:00' },
  { weekday: 4, opensAt: '16:00', closesAt: '22:00' },
  { weekday: 5, opensAt: '16:00', closesAt: '22:00' },
  { weekday: 6, opensAt: '09:00', closesAt: '18:00' },
  { weekday: 7, opensAt: '12:00', closesAt: '18:00' },
] as const;

export const demoClosures = [{ startsOn: '2026-12-24', endsOn: '2026-12-26', reason: 'Winter deep clean' }] as const;

export async function seed(knex: Knex): Promise<void> {
  await knex('shop_hours').insert(demoWeeklyHours.map((row) => ({ weekday: row.weekday, opens_at: row.opensAt, closes_at: row.closesAt })));
  const admin = await knex('members').first('id').where({ email: 'admin@example.org' });
  await knex('shop_closures').insert(
    demoClosures.map((closure) => ({
      starts_on: closure.startsOn,
      ends_on: closure.endsOn,
      reason: closure.reason,
      created_by: admin?.id ?? null,
    })),
  );
}
