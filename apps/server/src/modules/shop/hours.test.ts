import { randomUUID } from 'node:crypto';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { shopClosureSchema, shopHoursSchema } from '@chuckkey/core';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
// The hours are shop-wide: every test starts from a shop with none set, as the other test files expect.
afterEach(async () => {
  await ctx.db('shop_closures').delete();
  await ctx.db('shop_hours').delete();
});
afterAll(() => ctx.close());

const DAY = 86_400_000;
/** The test shop keeps UTC, so its calendar is UTC's. */
const utcDate = (offsetDays = 0) => new Date(Date.now() + offsetDays * DAY).toISOString().slice(0, 10);
/** ISO 8601 weekday of a UTC date: Monday 1 … Sunday 7. */
const isoWeekday = (offsetDays = 0) => ((new Date(Date.now() + offsetDays * DAY).getUTCDay() + 6) % 7) + 1;
const everyDay = (opensAt: string, closesAt: string) => [1, 2, 3, 4, 5, 6, 7].map((weekday) => ({ weekday, opensAt, closesAt }));

async function auditRows(action: string, actorId: string) {
  return ctx.db('audit_log').select('entity', 'entity_id', 'details').where({ action, actor_id: actorId }).orderBy('id');
}

describe('who may read and change the shop hours', () => {
  it('signed out, every route answers 401', async () => {
    const client = await browser(ctx);
    for (const res of [
      await client.get('/api/shop/hours'),
      await client.put('/api/shop/hours', { weekly: [] }),
      await client.post('/api/shop/closures', { startsOn: utcDate(), endsOn: utcDate(), reason: 'Stocktaking' }),
      await client.delete(`/api/shop/closures/${randomUUID()}`),
    ]) {
      expect(res.status).toBe(401);
      expect(res.body.code).toBe('unauthenticated');
    }
  });

  for (const role of ['member', 'instructor'] as const) {
    it(`a ${role} reads the hours but may not change them (403) and nothing changes`, async () => {
      const client = await signedIn(ctx, role);
      const [closure] = await ctx.db('shop_closures').insert({ starts_on: utcDate(1), ends_on: utcDate(1), reason: 'Stocktaking' }).returning('id');

      expect((await client.get('/api/shop/hours')).status).toBe(200);
      for (const res of [
        await client.put('/api/shop/hours', { weekly: everyDay('09:00', '17:00') }),
        await client.post('/api/shop/closures', { startsOn: utcDate(), endsOn: utcDate(), reason: 'Stocktaking' }),
        await client.delete(`/api/shop/closures/${closure.id}`),
      ]) {
        expect(res.status).toBe(403);
        expect(res.body.code).toBe('forbidden');
      }
      expect(await ctx.db('shop_hours').count({ count: '*' }).first()).toEqual({ count: 0 });
      expect(await ctx.db('shop_closures').count({ count: '*' }).first()).toEqual({ count: 1 });
    });
  }
});

describe('GET /api/shop/hours', () => {
  it('with no hours set, says the shop is open around the clock', async () => {
    const member = await signedIn(ctx, 'member');

    const res = await member.get('/api/shop/hours');

    expect(res.status).toBe(200);
    expect(shopHoursSchema.parse(res.body)).toEqual({
      timeZone: 'UTC',
      weekly: [],
      closures: [],
      today: { date: utcDate(), open: true, opensAt: null, closesAt: null, intervals: [{ opensAt: '00:00', closesAt: '24:00' }], closure: null },
    });
  });

  it('lists the closures ending today or later, soonest first, and a closure today shuts the shop until tomorrow', async () => {
    const member = await signedIn(ctx, 'member');
    await ctx.db('shop_hours').insert(everyDay('00:00', '24:00').map((row) => ({ weekday: row.weekday, opens_at: row.opensAt, closes_at: row.closesAt })));
    await ctx.db('shop_closures').insert([
      { starts_on: utcDate(20), ends_on: utcDate(22), reason: 'Winter deep clean' },
      { starts_on: utcDate(-3), ends_on: utcDate(-1), reason: 'Over already' },
      { starts_on: utcDate(-1), ends_on: utcDate(0), reason: 'Floor resurfacing' },
    ]);

    const body = shopHoursSchema.parse((await member.get('/api/shop/hours')).body);

    expect(body.closures.map((c) => [c.startsOn, c.endsOn, c.reason])).toEqual([
      [utcDate(-1), utcDate(0), 'Floor resurfacing'],
      [utcDate(20), utcDate(22), 'Winter deep clean'],
    ]);
    expect(body.today).toEqual({
      date: utcDate(),
      open: false,
      // Open 00:00–24:00 every day, so it opens again at tomorrow's midnight, UTC.
      opensAt: `${utcDate(1)}T00:00:00.000Z`,
      closesAt: null,
      intervals: [],
      closure: { reason: 'Floor resurfacing' },
    });
  });
});

describe('PUT /api/shop/hours', () => {
  it('an admin replaces the weekly schedule, gets it back in weekday order and the change is audited', async () => {
    const admin = await signedIn(ctx, 'admin');
    await admin.put('/api/shop/hours', { weekly: everyDay('08:00', '20:00') });

    const res = await admin.put('/api/shop/hours', {
      weekly: [
        { weekday: 6, opensAt: '9:00', closesAt: '18:00' },
        { weekday: 2, opensAt: '16:00', closesAt: '22:00' },
        { weekday: 2, opensAt: '10:00', closesAt: '12:00' },
        { weekday: 7, opensAt: '18:00', closesAt: '24:00' },
      ],
    });

    expect(res.status).toBe(200);
    const body = shopHoursSchema.parse(res.body);
    expect(body.weekly).toEqual([
      { weekday: 2, opensAt: '10:00', closesAt: '12:00' },
      { weekday: 2, opensAt: '16:00', closesAt: '22:00' },
      { weekday: 6, opensAt: '09:00', closesAt: '18:00' },
      { weekday: 7, opensAt: '18:00', closesAt: '24:00' },
    ]);
    const audits = await auditRows('shop.hours_changed', admin.member.id);
    expect(audits).toHaveLength(2);
    expect(audits[1]).toEqual({
      entity: 'shop',
      entity_id: '1',
      details: {
        before:
          'Monday 08:00–20:00; Tuesday 08:00–20:00; Wednesday 08:00–20:00; Thursday 08:00–20:00; Friday 08:00–20:00; Saturday 08:00–20:00; Sunday 08:00–20:00',
        after: 'Monday closed; Tuesday 10:00–12:00, 16:00–22:00; Wednesday closed; Thursday closed; Friday closed; Saturday 09:00–18:00; Sunday 18:00–24:00',
      },
    });
  });

  it('today’s answer follows the new hours: open now when today is open all day, closed when only tomorrow is', async () => {
    const admin = await signedIn(ctx, 'admin');

    const allDay = shopHoursSchema.parse((await admin.put('/api/shop/hours', { weekly: [{ weekday: isoWeekday(), opensAt: '00:00', closesAt: '24:00' }] })).body);
    expect(allDay.today).toMatchObject({ open: true, intervals: [{ opensAt: '00:00', closesAt: '24:00' }], closesAt: `${utcDate(1)}T00:00:00.000Z` });

    const tomorrow = shopHoursSchema.parse((await admin.put('/api/shop/hours', { weekly: [{ weekday: isoWeekday(1), opensAt: '10:00', closesAt: '12:00' }] })).body);
    expect(tomorrow.today).toMatchObject({ open: false, intervals: [], opensAt: `${utcDate(1)}T10:00:00.000Z`, closesAt: null });
  });

  it('an empty schedule removes the hours, and the shop counts as open at all times again', async () => {
    const admin = await signedIn(ctx, 'admin');
    await admin.put('/api/shop/hours', { weekly: [{ weekday: isoWeekday(1), opensAt: '10:00', closesAt: '12:00' }] });

    const body = shopHoursSchema.parse((await admin.put('/api/shop/hours', { weekly: [] })).body);

    expect(body.weekly).toEqual([]);
    expect(body.today.open).toBe(true);
    expect(await ctx.db('shop_hours').count({ count: '*' }).first()).toEqual({ count: 0 });
  });

  it('refuses bad times, closing before opening and overlaps with 400 and an error under each field, changing nothing', async () => {
    const admin = await signedIn(ctx, 'admin');
    await admin.put('/api/shop/hours', { weekly: [{ weekday: 1, opensAt: '09:00', closesAt: '17:00' }] });

    const res = await admin.put('/api/shop/hours', {
      weekly: [
        { weekday: 1, opensAt: '25:00', closesAt: '26:00' },
        { weekday: 2, opensAt: '18:00', closesAt: '09:00' },
        { weekday: 3, opensAt: '09:00', closesAt: '13:00' },
        { weekday: 3, opensAt: '12:00', closesAt: '15:00' },
        { weekday: 8, opensAt: '09:00', closesAt: '10:00' },
      ],
    });

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(res.body.errors).toEqual({
      'weekly.0.opensAt': ['Use a time from 00:00 to 24:00 (midnight at the end of the day).'],
      'weekly.0.closesAt': ['Use a time from 00:00 to 24:00 (midnight at the end of the day).'],
      'weekly.1.closesAt': ['The closing time must be after the opening time.'],
      'weekly.4.weekday': ['Choose a day from Monday (1) to Sunday (7).'],
    });
    const overlapping = await admin.put('/api/shop/hours', {
      weekly: [
        { weekday: 3, opensAt: '09:00', closesAt: '13:00' },
        { weekday: 3, opensAt: '12:00', closesAt: '15:00' },
      ],
    });
    expect(overlapping.status).toBe(400);
    expect(overlapping.body.errors).toEqual({ 'weekly.1.opensAt': ['Overlaps 09:00–13:00 on Wednesday.'] });

    const stored = await ctx.db('shop_hours').select(ctx.db.raw(`weekday, to_char(opens_at, 'HH24:MI') as opens, to_char(closes_at, 'HH24:MI') as closes`));
    expect(stored).toEqual([{ weekday: 1, opens: '09:00', closes: '17:00' }]);
    expect(await auditRows('shop.hours_changed', admin.member.id)).toHaveLength(1);
  });

  it('the database itself refuses overlapping openings of one weekday', async () => {
    await ctx.db('shop_hours').insert({ weekday: 4, opens_at: '09:00', closes_at: '13:00' });
    // A touching opening is fine; the half-open ranges only meet.
    await ctx.db('shop_hours').insert({ weekday: 4, opens_at: '13:00', closes_at: '24:00' });
    await ctx.db('shop_hours').insert({ weekday: 5, opens_at: '00:00', closes_at: '02:00' });

    // PostgreSQL: SQLSTATE 23P01 is exclusion_violation.
    await expect(ctx.db('shop_hours').insert({ weekday: 4, opens_at: '12:00', closes_at: '14:00' })).rejects.toMatchObject({ code: '23P01' });
    // SQLSTATE 23514 is check_violation.
    await expect(ctx.db('shop_hours').insert({ weekday: 4, opens_at: '14:00', closes_at: '14:00' })).rejects.toMatchObject({ code: '23514' });
    await expect(ctx.db('shop_hours').insert({ weekday: 0, opens_at: '09:00', closes_at: '10:00' })).rejects.toMatchObject({ code: '23514' });
  });
});

describe('closures', () => {
  it('an admin adds a closure (201), it is listed and audited, and removing it (204) is audited too', async () => {
    const admin = await signedIn(ctx, 'admin');

    const added = await admin.post('/api/shop/closures', { startsOn: utcDate(30), endsOn: utcDate(32), reason: ' Winter deep clean ' });

    expect(added.status).toBe(201);
    const closure = shopClosureSchema.parse(added.body);
    expect(closure).toMatchObject({ startsOn: utcDate(30), endsOn: utcDate(32), reason: 'Winter deep clean' });
    expect(await ctx.db('shop_closures').first('created_by').where({ id: closure.id })).toEqual({ created_by: admin.member.id });
    expect(shopHoursSchema.parse((await admin.get('/api/shop/hours')).body).closures).toEqual([closure]);
    expect(await auditRows('shop.closure_added', admin.member.id)).toEqual([
      { entity: 'shop_closure', entity_id: closure.id, details: { startsOn: utcDate(30), endsOn: utcDate(32), reason: 'Winter deep clean' } },
    ]);

    const removed = await admin.delete(`/api/shop/closures/${closure.id}`);

    expect(removed.status).toBe(204);
    expect(shopHoursSchema.parse((await admin.get('/api/shop/hours')).body).closures).toEqual([]);
    expect(await auditRows('shop.closure_removed', admin.member.id)).toEqual([
      { entity: 'shop_closure', entity_id: closure.id, details: { startsOn: utcDate(30), endsOn: utcDate(32), reason: 'Winter deep clean' } },
    ]);
    const again = await admin.delete(`/api/shop/closures/${closure.id}`);
    expect(again.status).toBe(404);
    expect(again.body.code).toBe('closure_not_found');
  });

  it('refuses a last day before the first, a missing reason, a date that is none, and a closure already over', async () => {
    const admin = await signedIn(ctx, 'admin');

    const backwards = await admin.post('/api/shop/closures', { startsOn: utcDate(5), endsOn: utcDate(4), reason: 'Stocktaking' });
    expect(backwards.status).toBe(400);
    expect(backwards.body.errors).toEqual({ endsOn: ['The last day cannot be before the first day.'] });

    const unexplained = await admin.post('/api/shop/closures', { startsOn: utcDate(5), endsOn: 'soon', reason: '' });
    expect(unexplained.status).toBe(400);
    expect(Object.keys(unexplained.body.errors).sort()).toEqual(['endsOn', 'reason']);

    const past = await admin.post('/api/shop/closures', { startsOn: utcDate(-3), endsOn: utcDate(-1), reason: 'Stocktaking' });
    expect(past.status).toBe(400);
    expect(past.body).toMatchObject({ code: 'closure_in_past', errors: { endsOn: ['The last day has already passed.'] } });

    expect(await ctx.db('shop_closures').count({ count: '*' }).first()).toEqual({ count: 0 });
    expect(await auditRows('shop.closure_added', admin.member.id)).toEqual([]);
  });

  it('a malformed id answers 400, an unknown one 404', async () => {
    const admin = await signedIn(ctx, 'admin');

    expect((await admin.delete('/api/shop/closures/not-an-id')).body).toMatchObject({ code: 'validation_failed', errors: { id: ['Not a valid id.'] } });
    expect((await admin.delete(`/api/shop/closures/${randomUUID()}`)).status).toBe(404);
  });
});
