import { readFile } from 'node:fs/promises';
import { createArea, createMachine, createSignOff, createTraining } from '@chuckkey/db/factories';
import { expectNoWcagViolations } from './axe';
import { expect, signIn, test } from './fixtures';

const HOUR_MS = 3_600_000;
const DAY_MS = 24 * HOUR_MS;

test.describe('the usage review', () => {
  // A sign-in, two report requests, a download and an accessibility scan.
  test.setTimeout(90_000);

  test('an admin opens Usage and sees the charts and the figures of a short history, and exports a table as CSV', async ({ page, db, shop, createUser }) => {
    const suffix = Date.now() % 100_000;
    const admin = await createUser({ role: 'admin', first_name: 'Marit', last_name: `Oyelaran${suffix}` });
    const member = await createUser({ role: 'member', first_name: 'Cosmo', last_name: `Haldane${suffix}` });
    const area = await createArea(db, { name: `Usage bay ${suffix}` });
    const lathe = await createMachine(db, { name: `Usage lathe ${suffix}`, area_id: area.id });
    const mill = await createMachine(db, { name: `Usage mill ${suffix}`, area_id: area.id });
    const training = await createTraining(db, { name: `Usage lathe course ${suffix}`, machine_ids: [lathe.id] });

    // Three days back lies inside the default range (the last 30 days) at any hour in any zone.
    const start = new Date(Date.now() - 3 * DAY_MS);
    const at = (hours: number) => new Date(start.getTime() + hours * HOUR_MS);
    await db('machine_sessions').insert([
      { machine_id: lathe.id, member_id: member.id, started_at: at(0), ended_at: at(1.5), ended_by: 'member', hours: 1.5 },
      { machine_id: lathe.id, member_id: member.id, started_at: at(24), ended_at: at(26), ended_by: 'member', hours: 2 },
      { machine_id: mill.id, member_id: admin.id, started_at: at(2), ended_at: at(2.5), ended_by: 'member', hours: 0.5 },
    ]);
    await db('station_denials').insert([
      { at: at(3), machine_id: lathe.id, member_id: member.id, code: 'sign_off_missing', rule: 2, training_id: training.id },
      { at: at(4), machine_id: lathe.id, member_id: member.id, code: 'sign_off_missing', rule: 2, training_id: training.id },
    ]);
    await createSignOff(db, { member_id: member.id, training_id: training.id, signed_by: admin.id });

    try {
      await signIn(page, admin.email, admin.password);
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Usage' }).click();
      await expect(page.getByRole('heading', { name: 'Usage', level: 1 })).toBeVisible();
      await expect(page.getByRole('button', { name: 'Last 30 days' })).toHaveAttribute('aria-pressed', 'true');

      // The lathe's two sessions, 1.5 h and 2 h, make 3.5 h; the mill's one 0.5 h.
      const machines = page.getByRole('table', { name: 'Hours per machine' });
      const latheRow = machines.getByRole('row').filter({ hasText: lathe.name });
      await expect(latheRow.getByRole('cell').nth(1)).toHaveText('2');
      await expect(latheRow.getByRole('cell').nth(2)).toHaveText('3.5 h');
      await expect(machines.getByRole('row').filter({ hasText: mill.name }).getByRole('cell').nth(2)).toHaveText('0.5 h');

      // The charts are recharts' SVG drawings, each with its main figure in words below.
      await expect(page.locator('svg.recharts-surface').first()).toBeVisible();
      await expect(page.getByRole('table', { name: `Hours of use by weekday and hour, ${shop.timeZone} time` })).toBeVisible();

      const members = page.getByRole('table', { name: 'Busiest members' });
      const memberRow = members.getByRole('row').filter({ hasText: `Cosmo Haldane${suffix}` });
      await expect(memberRow.getByRole('cell').nth(2)).toHaveText('3.5 h');

      const trainings = page.getByRole('table', { name: 'Trainings in demand' });
      await expect(trainings.getByRole('row').filter({ hasText: training.name }).getByRole('cell').nth(1)).toHaveText('2');
      const signOffs = page.getByRole('table', { name: 'Sign-offs per instructor' });
      await expect(signOffs.getByRole('row').filter({ hasText: `Marit Oyelaran${suffix}` }).getByRole('cell').nth(1)).toHaveText('1');

      // Sorting on a heading turns the table round and says so to screen readers.
      await machines.getByRole('button', { name: 'Machine' }).click();
      await expect(machines.getByRole('columnheader', { name: 'Machine' })).toHaveAttribute('aria-sort', 'ascending');

      const exportLink = page.getByRole('link', { name: 'Export CSV of hours per machine' });
      const [download] = await Promise.all([page.waitForEvent('download'), exportLink.click()]);
      const csv = await readFile(await download.path(), 'utf8');
      expect(csv).toContain(lathe.name);
      // The same link answered as text/csv (RFC 4180 section 3 registers the media type).
      const href = await exportLink.getAttribute('href');
      if (!href) throw new Error('the export link has no address');
      const answer = await page.request.get(href);
      expect(answer.status()).toBe(200);
      expect(answer.headers()['content-type']).toMatch(/^text\/csv/);

      await expectNoWcagViolations(page);
    } finally {
      await db('machine_sessions').whereIn('machine_id', [lathe.id, mill.id]).delete();
      await db('station_denials').whereIn('machine_id', [lathe.id, mill.id]).delete();
      await db('machines').whereIn('id', [lathe.id, mill.id]).delete();
      await db('areas').where({ id: area.id }).delete();
      await db('sign_offs').where({ training_id: training.id }).delete();
      await db('trainings').where({ id: training.id }).delete();
    }
  });
});
