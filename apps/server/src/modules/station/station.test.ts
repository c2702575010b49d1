import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { STATION_COOKIE, STATION_REQUEST_HEADER, signOffSchema, stationInstructorResultSchema, stationSelfSchema } from '@chuckkey/core';
import { createBadge, createTraining } from '@chuckkey/db/factories';
import { browser, createTestContext, signedIn, type Browser, type TestContext } from '../../test/harness';
import { badgeHolder, createStation, pairedDevice } from './station.fixtures';
import { PIN_FAILURES_PER_INSTRUCTOR, PIN_FAILURES_PER_STATION } from './station.service';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

/** The device cookie the answer sets at its path, /api (the one at the earlier path is only ever removed). */
function stationCookie(res: { headers: Record<string, unknown> }): string | undefined {
  const cookies = (res.headers['set-cookie'] as string[] | undefined) ?? [];
  return cookies.find((cookie) => cookie.startsWith(`${STATION_COOKIE}=`) && /; Path=\/api(;|$)/i.test(cookie));
}

function cookieValue(cookie: string): string {
  return cookie.slice(STATION_COOKIE.length + 1).split(';')[0] ?? '';
}

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

describe('POST /api/station/pair', () => {
  it('sets an HttpOnly, SameSite=Strict device cookie for the API and answers the station', async () => {
    const { station, machine } = await createStation(ctx);
    const device = await browser(ctx);

    const res = await device.post('/api/station/pair', { pairingCode: station.pairingCode });

    expect(res.status).toBe(200);
    expect(stationSelfSchema.parse(res.body)).toMatchObject({ id: station.id, kind: 'machine', machine: { id: machine.id, name: machine.name } });
    const cookie = stationCookie(res);
    expect(cookie).toBeDefined();
    // RFC 6265 attributes: not readable by scripts, never sent from another site, only to /api
    // (the station routes, the board and the live-updates handshake read it; decision 010).
    expect(cookie).toMatch(/; HttpOnly/i);
    expect(cookie).toMatch(/; SameSite=Strict/i);
    expect(cookie).toMatch(/; Path=\/api(;|$)/i);
    expect(cookie).not.toMatch(/; Secure/i);
  });

  it('removes the cookie a device may still hold at the earlier path, /api/station', async () => {
    const { station } = await createStation(ctx);
    const res = await (await browser(ctx)).post('/api/station/pair', { pairingCode: station.pairingCode });

    // RFC 6265 §5.3: a cookie is replaced or removed only by one of the same name, domain and path.
    const cookies = (res.headers['set-cookie'] as unknown as string[]).filter((cookie) => cookie.startsWith(`${STATION_COOKIE}=`));
    expect(cookies).toHaveLength(2);
    expect(cookies[0]).toMatch(/; Path=\/api\/station(;|$)/i);
    expect(cookies[0]).toMatch(/Expires=Thu, 01 Jan 1970/);
    expect(cookies[1]).toMatch(/; Path=\/api(;|$)/i);
  });

  it('the device token has 256 random bits and only its SHA-256 is stored', async () => {
    const { station } = await createStation(ctx);
    const res = await (await browser(ctx)).post('/api/station/pair', { pairingCode: station.pairingCode });
    const token = cookieValue(stationCookie(res)!);

    // 32 bytes in base64url without padding are 43 characters.
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const row = await ctx.db('stations').first('*').where({ id: station.id });
    expect(row.device_token_hash).toBe(sha256(token));
    expect(JSON.stringify(row)).not.toContain(token);
    expect(row.pairing_code_hash).toBeNull();
  });

  it('over TLS the cookie is also Secure', async () => {
    const { station } = await createStation(ctx);
    const device = await browser(ctx);

    const res = await device.agent
      .post('/api/station/pair')
      .set('x-forwarded-for', device.ip)
      .set('x-forwarded-proto', 'https')
      .set(STATION_REQUEST_HEADER, '1')
      .send({ pairingCode: station.pairingCode });

    expect(res.status).toBe(200);
    expect(stationCookie(res)).toMatch(/; Secure/i);
  });

  it('takes the code in lower case and with a dash, as people type it', async () => {
    const { station } = await createStation(ctx);
    const typed = `${station.pairingCode.slice(0, 4)}-${station.pairingCode.slice(4)}`.toLowerCase();
    const res = await (await browser(ctx)).post('/api/station/pair', { pairingCode: typed });
    expect(res.status).toBe(200);
  });

  it('records station.paired in the audit log', async () => {
    const { station } = await pairedDevice(ctx);
    const entry = await ctx.db('audit_log').first('*').where({ action: 'station.paired', entity_id: station.id });
    expect(entry).toMatchObject({ actor_id: null, entity: 'station' });
  });

  it('a wrong, an expired and a used code all answer 400 with the same message', async () => {
    const wrong = await (await browser(ctx)).post('/api/station/pair', { pairingCode: 'ZZZZ2222' });

    const { station: expiring } = await createStation(ctx);
    await ctx.db('stations').where({ id: expiring.id }).update({ pairing_expires_at: ctx.db.raw("now() - interval '1 second'") });
    const expired = await (await browser(ctx)).post('/api/station/pair', { pairingCode: expiring.pairingCode });

    const { station: once } = await createStation(ctx);
    expect((await (await browser(ctx)).post('/api/station/pair', { pairingCode: once.pairingCode })).status).toBe(200);
    const used = await (await browser(ctx)).post('/api/station/pair', { pairingCode: once.pairingCode });

    for (const res of [wrong, expired, used]) {
      expect(res.status).toBe(400);
      expect(res.body.code).toBe('invalid_pairing_code');
      expect(res.body.detail).toBe(wrong.body.detail);
      expect(stationCookie(res)).toBeUndefined();
    }
  });

  it('a code is still good just before its 10 minutes are up', async () => {
    const { station } = await createStation(ctx);
    await ctx.db('stations').where({ id: station.id }).update({ pairing_expires_at: ctx.db.raw("now() + interval '5 seconds'") });
    const res = await (await browser(ctx)).post('/api/station/pair', { pairingCode: station.pairingCode });
    expect(res.status).toBe(200);
  });

  it('a malformed code answers 400 naming the field', async () => {
    const res = await (await browser(ctx)).post('/api/station/pair', { pairingCode: 'no!' });
    expect(res.status).toBe(400);
    expect(res.body.errors.pairingCode).toBeDefined();
  });

  it('successful pairings from one address do not use up its tries', async () => {
    const device = await browser(ctx);
    for (let i = 0; i < 11; i += 1) {
      const { station } = await createStation(ctx);
      expect((await device.post('/api/station/pair', { pairingCode: station.pairingCode })).status).toBe(200);
    }
  });

  it('after 10 wrong tries from one address answers 429', async () => {
    const device = await browser(ctx);
    const statuses: number[] = [];
    for (let i = 0; i < 11; i += 1) statuses.push((await device.post('/api/station/pair', { pairingCode: 'ZZZZ2222' })).status);
    expect(statuses.slice(0, 10).every((status) => status === 400)).toBe(true);
    expect(statuses[10]).toBe(429);
  });

  it('keeps CSRF protection: without the station request header pairing is refused', async () => {
    const { station } = await createStation(ctx);
    const device = await browser(ctx);
    const res = await device.agent.post('/api/station/pair').set('x-forwarded-for', device.ip).send({ pairingCode: station.pairingCode });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('csrf_invalid');
  });
});

describe('the device credential', () => {
  const deviceRoutes = (client: Browser) => [
    client.get('/api/station'),
    client.post('/api/station/heartbeat'),
    client.post('/api/station/instructor', { badge: 'a'.repeat(22), pin: '1234' }),
    client.post('/api/station/members/lookup', { badge: 'a'.repeat(22) }),
    client.post('/api/station/sign-offs', {
      instructorBadge: 'a'.repeat(22),
      pin: '1234',
      memberBadge: 'b'.repeat(22),
      trainingId: '00000000-0000-4000-8000-000000000000',
      level: 'independent',
      checklist: [],
    }),
  ];

  it('without the device cookie every station route answers 401 station_required', async () => {
    for (const res of await Promise.all(deviceRoutes(await browser(ctx)))) {
      expect(res.status).toBe(401);
      expect(res.body.code).toBe('station_required');
    }
  });

  it('a signed-in admin’s web session is no station credential', async () => {
    for (const res of await Promise.all(deviceRoutes(await signedIn(ctx, 'admin')))) {
      expect(res.status).toBe(401);
      expect(res.body.code).toBe('station_required');
    }
  });

  it('a paired device cannot manage stations', async () => {
    const { device } = await pairedDevice(ctx);
    const res = await device.get('/api/stations');
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  it('a made-up token answers 401 and the cookie is cleared', async () => {
    const device = await browser(ctx);
    const res = await device.agent.get('/api/station').set('x-forwarded-for', device.ip).set('cookie', `${STATION_COOKIE}=${'x'.repeat(43)}`);
    expect(res.status).toBe(401);
    expect(stationCookie(res)).toMatch(/Expires=Thu, 01 Jan 1970/);
  });

  it('stops working the moment an admin revokes the station', async () => {
    const { admin, device, station } = await pairedDevice(ctx);
    expect((await device.get('/api/station')).status).toBe(200);

    await admin.post(`/api/stations/${station.id}/revoke`);

    const res = await device.post('/api/station/heartbeat');
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('station_required');
  });

  it('pairing a new device with a new code replaces the old device', async () => {
    const { admin, device: old, station } = await pairedDevice(ctx);
    const { body } = await admin.post(`/api/stations/${station.id}/pairing-code`);
    expect((await old.get('/api/station')).status).toBe(200);

    const replacement = await browser(ctx);
    expect((await replacement.post('/api/station/pair', { pairingCode: body.pairingCode })).status).toBe(200);

    expect((await old.get('/api/station')).status).toBe(401);
    expect((await replacement.get('/api/station')).status).toBe(200);
  });

  it('a revoked station can be paired again with a new code', async () => {
    const { admin, station } = await pairedDevice(ctx);
    await admin.post(`/api/stations/${station.id}/revoke`);
    const { body } = await admin.post(`/api/stations/${station.id}/pairing-code`);

    const device = await browser(ctx);
    expect((await device.post('/api/station/pair', { pairingCode: body.pairingCode })).status).toBe(200);
    expect((await device.get('/api/station')).status).toBe(200);
    expect((await ctx.db('stations').first('revoked_at').where({ id: station.id })).revoked_at).toBeNull();
  });
});

describe('GET /api/station and the heartbeat', () => {
  it('tells the device its station, machine and shop', async () => {
    const { device, station, machine } = await pairedDevice(ctx);
    const shop = await ctx.db('shop').first('name').where({ id: 1 });
    const res = await device.get('/api/station');
    expect(res.status).toBe(200);
    expect(stationSelfSchema.parse(res.body)).toEqual({
      id: station.id,
      kind: 'machine',
      name: machine.name,
      shopName: shop.name,
      machine: { id: machine.id, name: machine.name, category: machine.category, requiresPin: false },
    });
  });

  it('the heartbeat answers 204 and moves the last contact, at most once a minute', async () => {
    const { device, station } = await pairedDevice(ctx);
    await ctx.db('stations').where({ id: station.id }).update({ last_seen_at: ctx.db.raw("now() - interval '5 minutes'") });

    expect((await device.post('/api/station/heartbeat')).status).toBe(204);
    const first = (await ctx.db('stations').first('last_seen_at').where({ id: station.id })).last_seen_at as Date;
    expect(Date.now() - first.getTime()).toBeLessThan(10_000);

    expect((await device.post('/api/station/heartbeat')).status).toBe(204);
    const second = (await ctx.db('stations').first('last_seen_at').where({ id: station.id })).last_seen_at as Date;
    expect(second.getTime()).toBe(first.getTime());
  });

  it('keeps CSRF protection on the heartbeat: no station request header, no answer', async () => {
    const { device } = await pairedDevice(ctx);
    const res = await device.agent.post('/api/station/heartbeat').set('x-forwarded-for', device.ip);
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('csrf_invalid');
  });
});

describe('POST /api/station/members/lookup', () => {
  it('answers a member’s id, first name and role for their badge', async () => {
    const { device } = await pairedDevice(ctx);
    const member = await badgeHolder(ctx, 'member', { firstName: 'Ottilie' });
    const instructor = await badgeHolder(ctx, 'instructor', { firstName: 'Bram' });

    expect((await device.post('/api/station/members/lookup', { badge: member.badge })).body).toEqual({
      member: { id: member.member.id, firstName: 'Ottilie', role: 'member' },
    });
    expect((await device.post('/api/station/members/lookup', { badge: instructor.badge })).body.member.role).toBe('instructor');
  });

  it('an unknown or reissued badge answers member null, unknown_badge', async () => {
    const { device } = await pairedDevice(ctx);
    const holder = await badgeHolder(ctx, 'member');
    await createBadge(ctx.db, { memberId: holder.member.id, badgeSecret: ctx.config.BADGE_SECRET });

    for (const badge of [holder.badge, 'q'.repeat(22)]) {
      const res = await device.post('/api/station/members/lookup', { badge });
      expect(res.status).toBe(200);
      expect(res.body).toEqual({ member: null, reason: 'unknown_badge' });
    }
  });

  it('an inactive member’s badge answers member null, member_inactive', async () => {
    const { device } = await pairedDevice(ctx);
    const holder = await badgeHolder(ctx, 'member', { active: false });
    const res = await device.post('/api/station/members/lookup', { badge: holder.badge });
    expect(res.body).toEqual({ member: null, reason: 'member_inactive' });
  });

  it('something that is not a badge code answers 400', async () => {
    const { device } = await pairedDevice(ctx);
    const res = await device.post('/api/station/members/lookup', { badge: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.errors.badge).toBeDefined();
  });
});

describe('POST /api/station/instructor', () => {
  it('with an instructor’s badge and PIN answers their first name and the active trainings, this machine’s first', async () => {
    const { device, machine } = await pairedDevice(ctx);
    const instructor = await badgeHolder(ctx, 'instructor', { firstName: 'Marguerite' });
    const elsewhere = await createTraining(ctx.db, { name: `A first by name ${Date.now()}` });
    const here = await createTraining(ctx.db, { name: `Z last by name ${Date.now()}`, machine_ids: [machine.id] });
    const retired = await createTraining(ctx.db, { active: false });

    const res = await device.post('/api/station/instructor', { badge: instructor.badge, pin: instructor.pin });

    expect(res.status).toBe(200);
    const answer = stationInstructorResultSchema.parse(res.body);
    expect(answer.instructor).toEqual({ id: instructor.member.id, firstName: 'Marguerite' });
    const ids = answer.trainings.map((t) => t.id);
    expect(ids[0]).toBe(here.id);
    expect(ids).toContain(elsewhere.id);
    expect(ids).not.toContain(retired.id);
  });

  it('an admin’s badge is accepted too', async () => {
    const { device } = await pairedDevice(ctx);
    const admin = await badgeHolder(ctx, 'admin');
    expect((await device.post('/api/station/instructor', { badge: admin.badge, pin: admin.pin })).status).toBe(200);
  });

  it('a wrong PIN answers 401 wrong_pin', async () => {
    const { device } = await pairedDevice(ctx);
    const instructor = await badgeHolder(ctx, 'instructor', { pin: '4827' });
    const res = await device.post('/api/station/instructor', { badge: instructor.badge, pin: '4828' });
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('wrong_pin');
  });

  it('a member’s badge answers 403 not_instructor, whatever the PIN', async () => {
    const { device } = await pairedDevice(ctx);
    const member = await badgeHolder(ctx, 'member');
    const res = await device.post('/api/station/instructor', { badge: member.badge, pin: member.pin });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('not_instructor');
  });

  it('an inactive instructor answers 403 not_instructor', async () => {
    const { device } = await pairedDevice(ctx);
    const instructor = await badgeHolder(ctx, 'instructor', { active: false });
    const res = await device.post('/api/station/instructor', { badge: instructor.badge, pin: instructor.pin });
    expect(res.status).toBe(403);
  });

  it('an unknown badge answers 401 unknown_badge', async () => {
    const { device } = await pairedDevice(ctx);
    const res = await device.post('/api/station/instructor', { badge: 'z'.repeat(22), pin: '1234' });
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unknown_badge');
  });

  it('an instructor without a PIN is told to set one', async () => {
    const { device } = await pairedDevice(ctx);
    const instructor = await badgeHolder(ctx, 'instructor', { pin: null });
    const res = await device.post('/api/station/instructor', { badge: instructor.badge, pin: '1234' });
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('pin_not_set');
  });

  it(`after ${PIN_FAILURES_PER_INSTRUCTOR} wrong PINs the instructor is locked out everywhere for 15 minutes, even with the right PIN`, async () => {
    const first = await pairedDevice(ctx);
    const second = await pairedDevice(ctx);
    const instructor = await badgeHolder(ctx, 'instructor');
    for (let i = 0; i < PIN_FAILURES_PER_INSTRUCTOR; i += 1) {
      const device = i % 2 ? first.device : second.device;
      expect((await device.post('/api/station/instructor', { badge: instructor.badge, pin: '0000' })).status).toBe(401);
    }

    const res = await first.device.post('/api/station/instructor', { badge: instructor.badge, pin: instructor.pin });

    expect(res.status).toBe(429);
    expect(res.body.code).toBe('too_many_pin_attempts');
    expect(res.headers['retry-after']).toBe('900');
  });

  it('the lockout ends when the failures are older than 15 minutes', async () => {
    const { device } = await pairedDevice(ctx);
    const instructor = await badgeHolder(ctx, 'instructor');
    for (let i = 0; i < PIN_FAILURES_PER_INSTRUCTOR; i += 1) await device.post('/api/station/instructor', { badge: instructor.badge, pin: '0000' });
    await ctx.db('station_pin_attempts').where({ member_id: instructor.member.id }).update({ attempted_at: ctx.db.raw("now() - interval '16 minutes'") });

    expect((await device.post('/api/station/instructor', { badge: instructor.badge, pin: instructor.pin })).status).toBe(200);
  });

  it('a right PIN clears the instructor’s earlier slips', async () => {
    const { device } = await pairedDevice(ctx);
    const instructor = await badgeHolder(ctx, 'instructor');
    const attempt = (pin: string) => device.post('/api/station/instructor', { badge: instructor.badge, pin });
    for (let i = 0; i < PIN_FAILURES_PER_INSTRUCTOR - 1; i += 1) await attempt('0000');
    expect((await attempt(instructor.pin)).status).toBe(200);
    for (let i = 0; i < PIN_FAILURES_PER_INSTRUCTOR - 1; i += 1) expect((await attempt('0000')).status).toBe(401);
    expect((await attempt(instructor.pin)).status).toBe(200);
  });

  it(`after ${PIN_FAILURES_PER_STATION} wrong PINs at one station, by several instructors, the station is locked out`, async () => {
    const { device } = await pairedDevice(ctx);
    const instructors = await Promise.all([badgeHolder(ctx, 'instructor'), badgeHolder(ctx, 'instructor'), badgeHolder(ctx, 'instructor')]);
    for (let i = 0; i < PIN_FAILURES_PER_STATION; i += 1) {
      const instructor = instructors[i % instructors.length]!;
      expect((await device.post('/api/station/instructor', { badge: instructor.badge, pin: '0000' })).status).toBe(401);
    }
    const fresh = await badgeHolder(ctx, 'instructor');

    const res = await device.post('/api/station/instructor', { badge: fresh.badge, pin: fresh.pin });

    expect(res.status).toBe(429);
    // The same instructor at another station is not held back by this station's lockout.
    const other = await pairedDevice(ctx);
    expect((await other.device.post('/api/station/instructor', { badge: fresh.badge, pin: fresh.pin })).status).toBe(200);
  });
});

describe('POST /api/station/sign-offs', () => {
  async function arrange() {
    const paired = await pairedDevice(ctx);
    const instructor = await badgeHolder(ctx, 'instructor');
    const member = await badgeHolder(ctx, 'member', { firstName: 'Ines' });
    const training = await createTraining(ctx.db, {
      machine_ids: [paired.machine.id],
      validity_months: 24,
      checklist: [
        { id: 'removes-the-chuck-key', label: 'Removes the chuck key before starting' },
        { id: 'sets-speed-for-diameter', label: 'Sets the spindle speed for the diameter' },
      ],
    });
    const body = {
      instructorBadge: instructor.badge,
      pin: instructor.pin,
      memberBadge: member.badge,
      trainingId: training.id,
      level: 'independent',
      checklist: ['removes-the-chuck-key', 'sets-speed-for-diameter'],
      note: 'Faced and turned a test piece.',
    };
    return { ...paired, instructor, member, training, body };
  }

  it('signs the member off, recorded as given at a station by the instructor', async () => {
    const { device, instructor, member, training, body } = await arrange();

    const res = await device.post('/api/station/sign-offs', body);

    expect(res.status).toBe(201);
    const signOff = signOffSchema.parse(res.body);
    expect(signOff).toMatchObject({ memberId: member.member.id, trainingId: training.id, signedVia: 'station', level: 'independent', state: 'valid' });
    expect(signOff.signedBy.id).toBe(instructor.member.id);
    expect(signOff.expiresAt).not.toBeNull();
    const row = await ctx.db('sign_offs').first('*').where({ id: signOff.id });
    expect(row).toMatchObject({ signed_via: 'station', signed_by: instructor.member.id, member_id: member.member.id, note: 'Faced and turned a test piece.' });
    const audit = await ctx.db('audit_log').first('*').where({ action: 'sign_off.created', entity_id: signOff.id });
    expect(audit.actor_id).toBe(instructor.member.id);
  });

  it('a wrong PIN answers 401 wrong_pin and records nothing', async () => {
    const { device, member, body } = await arrange();
    const res = await device.post('/api/station/sign-offs', { ...body, pin: '0000' });
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('wrong_pin');
    expect(await ctx.db('sign_offs').where({ member_id: member.member.id }).first()).toBeUndefined();
  });

  it('a member’s badge as the instructor’s answers 403 not_instructor', async () => {
    const { device, body } = await arrange();
    const other = await badgeHolder(ctx, 'member');
    const res = await device.post('/api/station/sign-offs', { ...body, instructorBadge: other.badge, pin: other.pin });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('not_instructor');
  });

  it('a checklist with an item missing answers 400 naming it', async () => {
    const { device, body } = await arrange();
    const res = await device.post('/api/station/sign-offs', { ...body, checklist: ['removes-the-chuck-key'] });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('checklist_incomplete');
    expect(res.body.errors.checklist).toEqual(['Sets the spindle speed for the diameter']);
  });

  it('an unknown member badge answers 404 member_not_found', async () => {
    const { device, body } = await arrange();
    const res = await device.post('/api/station/sign-offs', { ...body, memberBadge: 'n'.repeat(22) });
    expect(res.status).toBe(404);
    expect(res.body.code).toBe('member_not_found');
  });

  it('the instructor’s own badge as the member’s answers 403 cannot_sign_off_self', async () => {
    const { device, instructor, body } = await arrange();
    const res = await device.post('/api/station/sign-offs', { ...body, memberBadge: instructor.badge });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('cannot_sign_off_self');
  });

  it('an inactive member answers 409 member_inactive', async () => {
    const { device, body } = await arrange();
    const inactive = await badgeHolder(ctx, 'member', { active: false });
    const res = await device.post('/api/station/sign-offs', { ...body, memberBadge: inactive.badge });
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('member_inactive');
  });

  it('wrong PINs here count towards the same lockout', async () => {
    const { device, body } = await arrange();
    for (let i = 0; i < PIN_FAILURES_PER_INSTRUCTOR; i += 1) await device.post('/api/station/sign-offs', { ...body, pin: '0000' });
    const res = await device.post('/api/station/sign-offs', body);
    expect(res.status).toBe(429);
  });
});
