import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import type { APIRequestContext, Browser, Page } from '@playwright/test';
import type { MachineCategory } from '@chuckkey/core';
import {
  createArea,
  createBadge,
  createMachine,
  createSignOff,
  createTraining,
  type CreatedMember,
  type MachineRow,
} from '@chuckkey/db/factories';
import type { Knex } from 'knex';
import { expectNoWcagViolations } from './axe';
import { expect, test } from './fixtures';
import { openShopForEachTest } from './shop-hours';
import { badgeSecret, createStationAsAdmin, pairScreen, removeStationRows, typeBadge, withCurrentWaiver } from './station-fixtures';

const screens = [
  { width: 1920, height: 1080 },
  { width: 1280, height: 720 },
];

function suffix(): string {
  return String(Date.now() % 1_000_000);
}

/** Opens the board, types its pairing code, and waits for the machines' strip at the foot. */
async function pairBoard(page: Page, pairingCode: string): Promise<void> {
  await page.goto('/kiosk/board');
  await page.getByLabel('Pairing code').fill(pairingCode);
  await expect(page.getByRole('contentinfo')).toContainText('Sign-off classes coming up');
}

/** A board device paired in its own browser context: its cookie is not the station's. */
async function openBoard(browser: Browser, baseURL: string, admin: CreatedMember) {
  const context = await browser.newContext({ baseURL });
  const page = await context.newPage();
  const station = await createStationAsAdmin(page.request, admin, { kind: 'board', name: `Board ${suffix()}` });
  await pairBoard(page, station.pairingCode);
  return { page, station, close: () => context.close() };
}

function plateOf(page: Page, machineName: string) {
  return page.getByRole('main').getByRole('listitem').filter({ hasText: machineName });
}

/** Signs a person in through the API, as the web app does (CSRF token first), for the routes that need one. */
async function signedIn(request: APIRequestContext, person: CreatedMember): Promise<Record<string, string>> {
  const { token } = (await (await request.get('/api/auth/csrf')).json()) as { token: string };
  const headers = { 'x-csrf-token': token };
  expect((await request.post('/api/auth/login', { headers, data: { email: person.email, password: person.password } })).status()).toBe(200);
  return headers;
}

async function removeBoardStation(db: Knex, stationId: string | undefined): Promise<void> {
  if (!stationId) return;
  await db('audit_log').where({ entity: 'station', entity_id: stationId }).delete();
  await db('stations').where({ id: stationId }).delete();
}

/**
 * `pairNewBoard(admin)` pairs the test's page as a new wall board, and `floorMachine(name,
 * category)` adds a machine in an area of its own; both are removed again after the test,
 * whatever it did.
 */
const boardTest = test.extend<{
  pairNewBoard: (admin: CreatedMember) => Promise<void>;
  floorMachine: (name: string, category: MachineCategory) => Promise<MachineRow>;
}>({
  pairNewBoard: async ({ page, db }, use) => {
    const boards: string[] = [];
    await use(async (admin) => {
      const board = await createStationAsAdmin(page.request, admin, { kind: 'board' });
      boards.push(board.id);
      await pairBoard(page, board.pairingCode);
    });
    for (const id of boards) await removeBoardStation(db, id);
  },
  floorMachine: async ({ db }, use) => {
    const machines: MachineRow[] = [];
    await use(async (name, category) => {
      const machine = await createMachine(db, { name: `${name} ${suffix()}`, category });
      machines.push(machine);
      return machine;
    });
    for (const machine of machines) {
      await db('machine_sessions').where({ machine_id: machine.id }).delete();
      await db('machines').where({ id: machine.id }).delete();
      await db('areas').where({ id: machine.area_id }).delete();
    }
  },
});

const machineNames: [string, MachineCategory][] = [
  ['Engine lathe', 'lathe'],
  ['Toolroom lathe', 'lathe'],
  ['Knee mill', 'mill'],
  ['Drill press', 'drill_press'],
  ['MIG welder', 'mig_welder'],
  ['TIG welder', 'tig_welder'],
  ['Horizontal band saw', 'band_saw'],
  ['Surface grinder', 'surface_grinder'],
];

/**
 * A shop floor of exactly `total` machines (with those already in the database) in four areas:
 * every fifth one in use, tagged out, or with a station gone silent, the rest available.
 */
async function arrangeFloor(db: Knex, total: number, member: CreatedMember) {
  const row = await db('machines').count<{ count: string }[]>({ count: '*' }).first();
  const existing = Number(row?.count ?? 0);
  if (existing > total) throw new Error(`the database already holds ${existing} machines, more than the ${total} this check lays out`);
  const tag = suffix();
  const areas = await Promise.all(
    ['Turning bay', 'Milling & drilling', 'Welding bay', 'Cutting & grinding'].map((name, i) =>
      createArea(db, { name: `${name} ${tag}`, sort_order: 100 + i }),
    ),
  );
  const machines: MachineRow[] = [];
  for (let i = 0; i < total - existing; i += 1) {
    const [name, category] = machineNames[i % machineNames.length]!;
    machines.push(await createMachine(db, { name: `${name} ${i + 1}·${tag}`, category, area_id: areas[i % areas.length]!.id }));
  }
  const stationIds: string[] = [];
  for (const [i, machine] of machines.entries()) {
    if (i % 5 === 1) {
      const startedAt = db.raw(`now() - interval '${10 + i} minutes'`);
      await db('machine_sessions').insert({ machine_id: machine.id, member_id: member.id, started_at: startedAt });
    } else if (i % 5 === 2) {
      await db('tag_outs').insert({ machine_id: machine.id, reason: 'Coolant pump leaks onto the ways', reported_by: member.id });
    } else if (i % 5 === 3) {
      // A paired station that last reported ten minutes ago: silent past the limit, so offline.
      const [station] = await db('stations')
        .insert({
          kind: 'machine',
          machine_id: machine.id,
          name: `Station ${i + 1}·${tag}`,
          device_token_hash: randomBytes(32).toString('hex'),
          paired_at: db.raw("now() - interval '1 hour'"),
          last_seen_at: db.raw("now() - interval '10 minutes'"),
        })
        .returning<{ id: string }[]>('id');
      if (station) stationIds.push(station.id);
    }
  }
  return {
    machines,
    async remove() {
      const ids = machines.map((machine) => machine.id);
      await db('machine_sessions').whereIn('machine_id', ids).delete();
      await db('stations').whereIn('id', stationIds).delete();
      await db('machines').whereIn('id', ids).delete();
      await db('areas').whereIn('id', areas.map((area) => area.id)).delete();
    },
  };
}

/** What the screen shows beyond its edges, and plates whose content is cut off. */
function fitProblems(page: Page) {
  return page.evaluate(() => {
    const root = document.documentElement;
    const plates = [...document.querySelectorAll('main li')];
    const offScreen = plates.filter((plate) => {
      const box = plate.getBoundingClientRect();
      return box.width === 0 || box.height === 0 || box.top < 0 || box.left < 0 || box.bottom > innerHeight || box.right > innerWidth;
    });
    const cutOff = plates.filter((plate) => {
      const inner = plate.firstElementChild;
      return !inner || inner.scrollHeight > inner.clientHeight + 1 || inner.scrollWidth > inner.clientWidth + 1;
    });
    const strips = [...document.querySelectorAll('header, footer')].filter((strip) => strip.getBoundingClientRect().bottom > innerHeight);
    return {
      scrollsDown: root.scrollHeight > innerHeight,
      scrollsAcross: root.scrollWidth > innerWidth,
      offScreen: offScreen.length,
      cutOff: cutOff.length,
      stripsOffScreen: strips.length,
    };
  });
}

const fits = { scrollsDown: false, scrollsAcross: false, offScreen: 0, cutOff: 0, stripsOffScreen: 0 };

test.describe('the wall board', () => {
  // Clearance needs the shop open; the database may be the demo shop's, with its hours.
  openShopForEachTest(test);

  test('a scan and start at a station changes the machine’s nameplate on the board within one second', async ({
    browser,
    baseURL,
    page,
    db,
    createUser,
  }) => {
    const admin = await createUser({ role: 'admin' });
    const instructor = await createUser({ role: 'instructor' });
    const member = await createUser({ role: 'member', first_name: 'Peregrine', last_name: `Vantongeren${suffix()}` });
    const machine = await createMachine(db, { name: `Gap-bed lathe ${suffix()}`, category: 'lathe' });
    const training = await createTraining(db, { name: `Lathe basics ${suffix()}`, machine_ids: [machine.id] });
    await createSignOff(db, { member_id: member.id, training_id: training.id, signed_by: instructor.id, level: 'independent' });
    const badge = await createBadge(db, { memberId: member.id, badgeSecret: badgeSecret() });
    const waiver = await withCurrentWaiver(db, member);
    let stationId: string | undefined;
    let board: Awaited<ReturnType<typeof openBoard>> | undefined;
    try {
      board = await openBoard(browser, baseURL!, admin);
      const plate = plateOf(board.page, machine.name);
      await expect(plate).toContainText('Available');

      const station = await createStationAsAdmin(page.request, admin, machine.id);
      stationId = station.id;
      await pairScreen(page, station.pairingCode);
      await typeBadge(page, badge.code);
      await page.getByRole('button', { name: 'Continue to safety check' }).click();
      const started = page.waitForResponse(
        (response) => response.url().endsWith('/api/station/sessions') && response.request().method() === 'POST',
      );
      await page.getByRole('button', { name: 'Start session' }).click();
      expect((await started).status()).toBe(201);

      // The issue's own limit: the board shows the change within one second of the start.
      await expect(plate).toContainText('In use', { timeout: 1_000 });
      await expect(plate).toContainText('Peregrine V.');
      await expect(plate).toContainText(/00:0\d/);
    } finally {
      await board?.close();
      await db('machine_sessions').where({ machine_id: machine.id }).delete();
      await db('waiver_records').where({ member_id: member.id }).delete();
      if (waiver) await db('waiver_versions').where({ version: waiver }).delete();
      await removeBoardStation(db, board?.station.id);
      await removeStationRows(db, { people: [admin.id, instructor.id, member.id], stationId, machine });
      await db('trainings').where({ id: training.id }).delete();
    }
  });

  boardTest('a tag-out reported by a signed-in member shows its reason on the board', async ({ page, request, createUser, pairNewBoard, floorMachine }) => {
    const admin = await createUser({ role: 'admin' });
    const member = await createUser({ role: 'member' });
    const machine = await floorMachine('Horizontal band saw', 'band_saw');
    await pairNewBoard(admin);
    const plate = plateOf(page, machine.name);
    await expect(plate).toContainText('Available');

    const headers = await signedIn(request, member);
    const reason = 'Blade guide bearing is seized';
    const tagged = await request.post(`/api/machines/${machine.id}/tag-out`, { headers, data: { reason } });
    expect(tagged.status()).toBe(201);

    await expect(plate).toContainText('Tagged out');
    await expect(plate).toContainText(reason);
  });

  boardTest('the board shows who is on a machine by first name and last initial, and no e-mail, last name or badge code', async ({
    page,
    db,
    createUser,
    pairNewBoard,
    floorMachine,
  }) => {
    const admin = await createUser({ role: 'admin' });
    const member = await createUser({ role: 'member', first_name: 'Marisol', last_name: `Quarrington${suffix()}` });
    const badge = await createBadge(db, { memberId: member.id, badgeSecret: badgeSecret() });
    const machine = await floorMachine('TIG welder', 'tig_welder');
    await db('machine_sessions').insert({ machine_id: machine.id, member_id: member.id, started_at: db.raw("now() - interval '25 minutes'") });
    const answers: Promise<string>[] = [];
    page.on('response', (response) => {
      if (new URL(response.url()).pathname === '/api/board' && response.ok()) answers.push(response.text());
    });
    await pairNewBoard(admin);

    const plate = plateOf(page, machine.name);
    await expect(plate).toContainText('In use');
    await expect(plate).toContainText('Marisol Q.');

    const rendered = await page.content();
    const payloads = (await Promise.all(answers)).join('\n');
    expect(payloads.length).toBeGreaterThan(0);
    for (const secret of [member.email, member.last_name, badge.code]) {
      expect(rendered).not.toContain(secret);
      expect(payloads).not.toContain(secret);
    }
  });

  test('after the server restarts the board says it is reconnecting, reconnects and is right again', async ({
    browser,
    baseURL,
    request,
    db,
    createUser,
  }) => {
    // Two server starts, each a full start of the server process.
    test.setTimeout(180_000);
    const admin = await createUser({ role: 'admin' });
    const member = await createUser({ role: 'member' });
    const machine = await createMachine(db, { name: `Surface grinder ${suffix()}`, category: 'surface_grinder' });
    // The suite's server is Playwright's and cannot be restarted from a test: the board talks to
    // a second server process of its own, on the same database.
    const port = Number(new URL(baseURL!).port || 80) + 11;
    const origin = `http://127.0.0.1:${port}`;
    let server = await startServer(port);
    let board: Awaited<ReturnType<typeof openBoard>> | undefined;
    try {
      board = await openBoard(browser, origin, admin);
      const plate = plateOf(board.page, machine.name);
      await expect(plate).toContainText('Available');
      await expect(board.page.getByRole('status').filter({ hasText: 'Connected' })).toHaveCount(1);

      await server.stop();
      await expect(board.page.getByText('Reconnecting…')).toBeVisible();

      // While the board's server is down the machine is tagged out through the suite's server:
      // no event can reach the board, only the refetch on reconnecting puts it right.
      const reason = 'Wheel guard cracked';
      const tagged = await request.post(`/api/machines/${machine.id}/tag-out`, { headers: await signedIn(request, member), data: { reason } });
      expect(tagged.status()).toBe(201);

      server = await startServer(port);
      await expect(board.page.getByText('Reconnecting…')).toHaveCount(0, { timeout: 30_000 });
      await expect(plate).toContainText('Tagged out');
      await expect(plate).toContainText(reason);
    } finally {
      await board?.close();
      await server.stop();
      await removeBoardStation(db, board?.station.id);
      await db('machines').where({ id: machine.id }).delete();
      await db('areas').where({ id: machine.area_id }).delete();
    }
  });

  for (const total of [10, 60]) {
    boardTest(`${total} machines fit a 1920×1080 and a 1280×720 screen without scrolling, every nameplate whole`, async ({
      page,
      db,
      createUser,
      pairNewBoard,
    }) => {
      const admin = await createUser({ role: 'admin' });
      const member = await createUser({ role: 'member' });
      const floor = await arrangeFloor(db, total, member);
      try {
        await pairNewBoard(admin);
        await expect(page.getByRole('main').getByRole('listitem')).toHaveCount(total);

        for (const screen of screens) {
          await page.setViewportSize(screen);
          await expect.poll(() => fitProblems(page), { message: `at ${screen.width}×${screen.height}` }).toEqual(fits);
        }
      } finally {
        await floor.remove();
      }
    });
  }

  boardTest('the board with machines in every state passes the automatic WCAG 2.2 AA checks', async ({ page, db, createUser, pairNewBoard }) => {
    const admin = await createUser({ role: 'admin' });
    const member = await createUser({ role: 'member' });
    const floor = await arrangeFloor(db, 10, member);
    try {
      await pairNewBoard(admin);
      for (const state of ['Available', 'In use', 'Tagged out', 'Offline']) {
        await expect(page.getByRole('main').getByText(state, { exact: true }).first()).toBeVisible();
      }

      await expectNoWcagViolations(page);
    } finally {
      await floor.remove();
    }
  });

  test.describe('on a screen set to another time zone', () => {
    // UTC+14, a zone no shop in the tests uses, so a clock that followed the screen would show.
    const screenZone = 'Pacific/Kiritimati';
    test.use({ timezoneId: screenZone });

    boardTest('the board’s clock shows the time in the shop’s time zone', async ({ page, shop, createUser, pairNewBoard }) => {
      const admin = await createUser({ role: 'admin' });
      const instant = new Date('2027-03-05T15:42:00Z');
      const clock = (timeZone: string) =>
        new Intl.DateTimeFormat('en', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone }).format(instant);
      expect(clock(shop.timeZone), 'the shop and the screen are in different zones').not.toBe(clock(screenZone));
      await page.clock.setFixedTime(instant);
      await pairNewBoard(admin);

      await expect(page.getByRole('banner').getByText(clock(shop.timeZone), { exact: true })).toBeVisible();
    });
  });
});

test.describe('the web app’s shop floor', () => {
  boardTest('shows a tag-out on the machine’s nameplate as it happens, without a reload', async ({ page, request, signInAs, createUser, floorMachine }) => {
    const machine = await floorMachine('Knee mill', 'mill');
    const reporter = await createUser({ role: 'member' });
    await signInAs('member');
    await page.goto('/');
    const plate = page.getByRole('article', { name: machine.name });
    await expect(plate).toContainText('Available');
    await expect(page.getByRole('status').filter({ hasText: 'Live' })).toBeVisible();

    const reason = 'Quill feed slips under load';
    const tagged = await request.post(`/api/machines/${machine.id}/tag-out`, { headers: await signedIn(request, reporter), data: { reason } });
    expect(tagged.status()).toBe(201);

    await expect(plate).toContainText('Tagged out');
    await expect(plate).toContainText(reason);
    await expectNoWcagViolations(page);
  });
});

test.describe('an unpaired board', () => {
  test('asks for a pairing code and says what pairing makes of it', async ({ page, shop }) => {
    await page.goto('/kiosk/board');

    await expect(page.getByRole('heading', { level: 1, name: shop.name })).toBeVisible();
    await expect(page.getByText(/becomes the shop’s wall board once an admin pairs it/)).toBeVisible();
    await expect(page.getByLabel('Pairing code')).toBeVisible();
  });

  for (const screen of screens) {
    test(`fits a ${screen.width}×${screen.height} screen without scrolling`, async ({ page }) => {
      await page.setViewportSize(screen);
      await page.goto('/kiosk/board');
      await expect(page.getByLabel('Pairing code')).toBeVisible();

      expect(await fitProblems(page)).toEqual(fits);
    });
  }

  test('passes the automatic WCAG 2.2 AA checks', async ({ page }) => {
    await page.goto('/kiosk/board');
    await expect(page.getByLabel('Pairing code')).toBeVisible();

    await expectNoWcagViolations(page);
  });
});

interface RunningServer {
  stop: () => Promise<void>;
}

const repositoryRoot = new URL('../..', import.meta.url).pathname;

/** Starts the server as `npm start` does, on its own port with the suite's environment, and waits until it answers. */
async function startServer(port: number): Promise<RunningServer> {
  const child: ChildProcess = spawn('pnpm', ['--filter', '@chuckkey/server', 'start'], {
    cwd: repositoryRoot,
    env: { ...process.env, PORT: String(port) },
    // A process group of its own, so that stopping it stops pnpm and the server under it.
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout?.on('data', (chunk: Buffer) => (output += chunk.toString()));
  child.stderr?.on('data', (chunk: Buffer) => (output += chunk.toString()));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));

  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null || !child.pid) return;
    process.kill(-child.pid, 'SIGTERM');
    const forced = setTimeout(() => child.pid && process.kill(-child.pid, 'SIGKILL'), 10_000);
    await exited;
    clearTimeout(forced);
  };

  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the second server stopped at start:\n${output}`);
    const healthy = await fetch(`http://127.0.0.1:${port}/api/health`).then(
      (response) => response.ok,
      () => false,
    );
    if (healthy) return { stop };
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  await stop();
  throw new Error(`the second server did not answer within a minute:\n${output}`);
}
