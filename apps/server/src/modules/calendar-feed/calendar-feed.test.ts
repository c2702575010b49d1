import ICAL from 'ical.js';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { calendarFeedCreatedSchema, calendarFeedStatusSchema } from '@chuckkey/core';
import { createMachine } from '@chuckkey/db/factories';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';
import { slot } from '../../test/slots';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

/** The feed's path on this server, from the URL the member was given. */
const pathOf = (url: string) => new URL(url).pathname;

describe('a member’s calendar feed', () => {
  it('is made once with a secret URL and read without a sign-in, listing their reservations with cancelled ones marked', async () => {
    const machine = await createMachine(ctx.db, { category: 'mig_welder', reservable: true });
    const member = await signedIn(ctx, 'member');
    const other = await signedIn(ctx, 'member');
    const kept = await member.post('/api/reservations', { machineId: machine.id, start: slot(2, 9).toISOString(), end: slot(2, 10).toISOString() });
    const dropped = await member.post('/api/reservations', { machineId: machine.id, start: slot(3, 9).toISOString(), end: slot(3, 10).toISOString() });
    expect((await member.delete(`/api/reservations/${dropped.body.id}`)).status).toBe(204);
    const others = await other.post('/api/reservations', { machineId: machine.id, start: slot(4, 9).toISOString(), end: slot(4, 10).toISOString() });
    expect(others.status).toBe(201);

    const created = await member.post('/api/profile/calendar-feed');
    expect(created.status).toBe(201);
    const { url } = calendarFeedCreatedSchema.parse(created.body);
    expect(url).toMatch(/^http:\/\/chuckkey\.test\/api\/calendar\/[A-Za-z0-9_-]{43}\.ics$/);
    // The secret is kept hashed: the URL's token is nowhere in the table.
    const token = /calendar\/([^.]+)\.ics$/.exec(url)![1]!;
    const stored = await ctx.db('calendar_feeds').first('token_hash').where({ member_id: member.member.id });
    expect(stored.token_hash).not.toContain(token);

    const feed = await request(ctx.app).get(pathOf(url));
    expect(feed.status).toBe(200);
    expect(feed.headers['content-type']).toMatch(/^text\/calendar/);
    // RFC 5545 §3.1: content lines end in CRLF; §3.7.2: a feed is no scheduling message, so no METHOD.
    expect(feed.text).toMatch(/\r\n$/);
    const calendar = new ICAL.Component(ICAL.parse(feed.text));
    expect(calendar.getFirstPropertyValue('method')).toBeNull();
    const events = calendar.getAllSubcomponents('vevent').map((event) => ({
      uid: event.getFirstPropertyValue('uid'),
      status: event.getFirstPropertyValue('status'),
    }));
    // RFC 5545 §3.8.4.7: the UID of each entry is the one its mails carried.
    expect(events).toEqual([
      { uid: `${kept.body.id}@chuckkey`, status: 'CONFIRMED' },
      { uid: `${dropped.body.id}@chuckkey`, status: 'CANCELLED' },
    ]);
  });

  it('ends a reservation released early at the time it was given back', async () => {
    const machine = await createMachine(ctx.db, { category: 'mig_welder', reservable: true });
    const member = await signedIn(ctx, 'member');
    const start = new Date(Math.floor(Date.now() / 3_600_000) * 3_600_000 + 2 * 3_600_000);
    const end = new Date(start.getTime() + 2 * 3_600_000);
    const releasedAt = new Date(start.getTime() + 40 * 60_000);
    const [row] = await ctx
      .db('reservations')
      .insert({ machine_id: machine.id, member_id: member.member.id, starts_at: start, ends_at: end, blocked_until: end, status: 'released', checked_in_at: start, released_at: releasedAt })
      .returning<{ id: string }[]>('id');
    const { url } = calendarFeedCreatedSchema.parse((await member.post('/api/profile/calendar-feed')).body);

    const calendar = new ICAL.Component(ICAL.parse((await request(ctx.app).get(pathOf(url))).text));
    const [event] = calendar.getAllSubcomponents('vevent');
    // RFC 5545 §3.8.2.2 (DTEND): the entry ends when the member gave the rest of the time back.
    expect(event!.getFirstPropertyValue('uid')).toBe(`${row!.id}@chuckkey`);
    expect((event!.getFirstPropertyValue('dtend') as ICAL.Time).toJSDate().toISOString()).toBe(releasedAt.toISOString());
    expect(event!.getFirstPropertyValue('status')).toBe('CONFIRMED');
  });

  it('stops working when replaced or turned off, and answers 404 to an unknown secret', async () => {
    const member = await signedIn(ctx, 'member');
    const first = calendarFeedCreatedSchema.parse((await member.post('/api/profile/calendar-feed')).body).url;
    const second = calendarFeedCreatedSchema.parse((await member.post('/api/profile/calendar-feed')).body).url;
    expect(second).not.toBe(first);
    expect((await request(ctx.app).get(pathOf(first))).status).toBe(404);
    expect((await request(ctx.app).get(pathOf(second))).status).toBe(200);

    expect((await member.delete('/api/profile/calendar-feed')).status).toBe(204);
    const gone = await request(ctx.app).get(pathOf(second));
    expect([gone.status, gone.body.code]).toEqual([404, 'calendar_feed_not_found']);
    expect((await member.delete('/api/profile/calendar-feed')).status).toBe(404);
  });

  it('needs a sign-in to make one', async () => {
    const anonymous = await browser(ctx);
    expect((await anonymous.post('/api/profile/calendar-feed')).status).toBe(401);
  });
});

describe('GET /api/profile/calendar-feed', () => {
  const status = async (client: Awaited<ReturnType<typeof signedIn>>) => {
    const res = await client.get('/api/profile/calendar-feed');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toBe('no-store');
    return calendarFeedStatusSchema.parse(res.body);
  };

  it('says whether the member has a feed and since when, never its address, through a new link and turning it off', async () => {
    const member = await signedIn(ctx, 'member');
    const other = await signedIn(ctx, 'member');
    expect(await status(member)).toEqual({ exists: false, createdAt: null });

    const before = Date.now();
    const { url } = calendarFeedCreatedSchema.parse((await member.post('/api/profile/calendar-feed')).body);
    const made = await status(member);
    expect(made.exists).toBe(true);
    const madeAt = new Date(made.createdAt!).getTime();
    // The database's clock and the test's may differ by a little; a second either way is plenty.
    expect(madeAt).toBeGreaterThanOrEqual(before - 1000);
    expect(madeAt).toBeLessThanOrEqual(Date.now() + 1000);
    // Only the secret's hash is stored, so the answer cannot and does not carry the address.
    expect(JSON.stringify(made)).not.toContain(pathOf(url));
    // Someone else's feed is no part of another member's answer.
    expect(await status(other)).toEqual({ exists: false, createdAt: null });

    await ctx.db('calendar_feeds').where({ member_id: member.member.id }).update({ created_at: new Date(madeAt - 60_000) });
    expect((await member.post('/api/profile/calendar-feed')).status).toBe(201);
    const replaced = await status(member);
    expect(new Date(replaced.createdAt!).getTime()).toBeGreaterThan(madeAt - 60_000);

    expect((await member.delete('/api/profile/calendar-feed')).status).toBe(204);
    expect(await status(member)).toEqual({ exists: false, createdAt: null });
  });

  it('needs a sign-in', async () => {
    expect((await (await browser(ctx)).get('/api/profile/calendar-feed')).status).toBe(401);
  });
});
