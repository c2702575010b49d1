import { randomUUID } from 'node:crypto';
import type { APIRequestContext, Page } from '@playwright/test';
import { stationWithCodeSchema, type StationWithCode } from '@chuckkey/core';
import { createBadge, createWaiverVersion, recordWaiver, type CreatedMember } from '@chuckkey/db/factories';
import type { Knex } from 'knex';
import { expect } from './fixtures';

export function badgeSecret(): string {
  const secret = process.env.BADGE_SECRET;
  if (!secret) throw new Error('BADGE_SECRET is not set: the browser tests issue badges the way the server does.');
  return secret;
}

/**
 * An admin creates a station for the machine (or a wall board, or the crib station) through the
 * API, signed in the way the web app signs in (CSRF token first), and signs out again: the
 * admin's session is no part of the station.
 */
export async function createStationAsAdmin(
  request: APIRequestContext,
  admin: CreatedMember,
  target: string | { kind: 'board' | 'crib'; name?: string },
): Promise<StationWithCode> {
  const { token } = (await (await request.get('/api/auth/csrf')).json()) as { token: string };
  const headers = { 'x-csrf-token': token };
  expect((await request.post('/api/auth/login', { headers, data: { email: admin.email, password: admin.password } })).status()).toBe(200);
  const created = await request.post('/api/stations', { headers, data: typeof target === 'string' ? { machineId: target } : target });
  expect(created.status()).toBe(201);
  const station = stationWithCodeSchema.parse(await created.json());
  expect((await request.post('/api/auth/logout', { headers })).status()).toBe(204);
  return station;
}

/** Opens the station screen and types the pairing code; the idle screen follows. */
export async function pairScreen(page: Page, pairingCode: string): Promise<void> {
  await page.goto('/kiosk/station');
  await page.getByLabel('Pairing code').fill(pairingCode);
  await expect(page.getByText('Hold your badge to the camera or scan it')).toBeVisible();
}

/** What the station tests leave behind that refers to their people, machine and station. */
export async function removeStationRows(db: Knex, rows: { people: string[]; stationId?: string | undefined; machine: { id: string; area_id: string } }) {
  await db('sign_offs').whereIn('member_id', rows.people).delete();
  await db('audit_log').whereIn('actor_id', rows.people).orWhereIn('member_id', rows.people).orWhere({ entity_id: rows.stationId ?? '' }).delete();
  if (rows.stationId) await db('stations').where({ id: rows.stationId }).delete();
  await db('machines').where({ id: rows.machine.id }).delete();
  await db('areas').where({ id: rows.machine.area_id }).delete();
}

/**
 * A hand scanner is a keyboard that types the code (a badge's or a tool's tag) and Enter a few
 * milliseconds apart, with no field focused. The keys are sent from inside the page, all in one
 * go: keys sent one by one from the test runner can arrive further apart than any scanner's on a
 * busy machine.
 */
export async function scanWithHandScanner(page: Page, code: string): Promise<void> {
  await page.evaluate((keys) => {
    for (const key of keys) document.body.dispatchEvent(new KeyboardEvent('keydown', { key, bubbles: true }));
  }, [...code, 'Enter']);
}

/** Uses the station's on-screen fallback: types the badge code as a member would. */
export async function typeBadge(page: Page, code: string): Promise<void> {
  await page.getByRole('button', { name: 'Type badge code' }).click();
  await page.getByLabel('Badge code').fill(code);
  await page.getByRole('button', { name: 'Use this code' }).click();
}

/**
 * The member accepts the waiver in force; one is published only if the shop has none yet.
 * Returns the version published here (to delete afterwards), or null.
 */
export async function withCurrentWaiver(db: Knex, member: CreatedMember): Promise<number | null> {
  const newest = await db('waiver_versions').max<{ max: number | null }>({ max: 'version' }).first();
  const created = newest?.max ? null : await createWaiverVersion(db);
  const version = newest?.max ?? created?.version ?? 1;
  await recordWaiver(db, { memberId: member.id, version, typedName: `${member.first_name} ${member.last_name}` });
  return created ? created.version : null;
}

/**
 * The crib station of the browser tests: a crib station paired on the page, a member with a
 * badge, and a bore gauge in the crib under its own asset tag (due back after its loan period).
 * `cleanUp` removes the checkouts, audit entries, the tool and the station made for the test.
 */
export async function cribStationWithBoreGauge(page: Page, db: Knex, people: { admin: CreatedMember; member: CreatedMember }) {
  const badge = await createBadge(db, { memberId: people.member.id, badgeSecret: badgeSecret() });
  const assetTag = `BG-${randomUUID().slice(0, 6).toUpperCase()}`;
  const [tool] = await db('crib_items')
    .insert({ kind: 'tool', name: 'Telescoping bore gauge', asset_tag: assetTag, bin_location: 'Drawer 3', condition: 'good', loan_period_hours: 48 })
    .returning<{ id: string; name: string }[]>(['id', 'name']);
  if (!tool) throw new Error('the bore gauge was not stored');
  const station = await createStationAsAdmin(page.request, people.admin, { kind: 'crib' });
  await pairScreen(page, station.pairingCode);
  return {
    badge,
    tool: { ...tool, assetTag },
    station,
    async cleanUp() {
      await db('crib_checkouts').where({ item_id: tool.id }).delete();
      const everyone = [people.admin.id, people.member.id];
      await db('audit_log').where({ entity_id: tool.id }).orWhereIn('actor_id', everyone).orWhereIn('member_id', everyone).orWhere({ entity_id: station.id }).delete();
      await db('crib_items').where({ id: tool.id }).delete();
      await db('stations').where({ id: station.id }).delete();
    },
  };
}
