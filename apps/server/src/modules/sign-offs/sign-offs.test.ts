import { randomUUID } from 'node:crypto';
import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signOffExpiry, signOffListSchema, signOffSchema } from '@chuckkey/core';
import { createMachine, createMember, createSignOff, createTraining } from '@chuckkey/db/factories';
import { createLogger } from '../../lib/logger';
import { createMailer } from '../../lib/mailer';
import { quietPublisher } from '../../realtime/publisher';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';
import { signOffsService } from './sign-offs.service';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const DAY = 86_400_000;
const daysFromNow = (days: number) => new Date(Date.now() + days * DAY);

const latheChecklist = [
  { id: 'removes-chuck-key', label: 'Removes the chuck key before starting the spindle' },
  { id: 'sets-speed', label: 'Sets the spindle speed for the stock and the tool' },
  { id: 'stops-in-emergency', label: 'Finds and uses the emergency stop' },
];

async function lathe(overrides: Parameters<typeof createTraining>[1] = {}) {
  const machine = await createMachine(ctx.db, { name: `Lathe ${randomUUID().slice(0, 8)}` });
  const training = await createTraining(ctx.db, {
    name: `Metal lathe fundamentals ${randomUUID().slice(0, 8)}`,
    checklist: latheChecklist,
    validity_months: 24,
    machine_ids: [machine.id],
    ...overrides,
  });
  return { machine, training };
}

function signOffBody(memberId: string, trainingId: string, overrides: Record<string, unknown> = {}) {
  return {
    memberId,
    trainingId,
    level: 'independent',
    checklist: latheChecklist.map((item) => item.id),
    note: 'Faced and turned a shoulder to 0.05 mm.',
    ...overrides,
  };
}

describe('POST /api/sign-offs', () => {
  it('when an instructor signs off a member, answers 201 with the sign-off, its expiry and the machines it opens', async () => {
    const { machine, training } = await lathe();
    const member = await createMember(ctx.db, { first_name: 'Rosalind', last_name: 'Penhallow' });
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post('/api/sign-offs', signOffBody(member.id, training.id, { level: 'supervised' }));

    expect(res.status).toBe(201);
    const signOff = signOffSchema.parse(res.body);
    expect(signOff).toMatchObject({
      memberId: member.id,
      memberName: 'Rosalind Penhallow',
      trainingId: training.id,
      trainingName: training.name,
      level: 'supervised',
      note: 'Faced and turned a shoulder to 0.05 mm.',
      signedBy: { id: instructor.member.id, name: `${instructor.member.first_name} ${instructor.member.last_name}` },
      signedVia: 'web',
      revokedAt: null,
      revokeReason: null,
      state: 'valid',
      machines: [{ id: machine.id, name: machine.name }],
    });
    expect(signOff.checklist).toEqual(latheChecklist.map((item) => ({ ...item, seen: true })));
    // The test shop keeps UTC; core's rule decides the date.
    expect(signOff.expiresAt).toBe(signOffExpiry(new Date(signOff.signedAt), 24, 'UTC')!.toISOString());
    expect(Math.abs(new Date(signOff.signedAt).getTime() - Date.now())).toBeLessThan(60_000);
  });

  it('stores the checklist as it stood, with labels, so later edits of the training do not rewrite it', async () => {
    const { training } = await lathe();
    const member = await createMember(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post('/api/sign-offs', signOffBody(member.id, training.id));
    await ctx.db('trainings').where({ id: training.id }).update({ checklist: JSON.stringify([{ id: 'new-item', label: 'Something new' }]) });

    const row = await ctx.db('sign_offs').first('checklist', 'signed_by', 'signed_via').where({ id: res.body.id });
    expect(row).toEqual({ checklist: latheChecklist.map((item) => ({ ...item, seen: true })), signed_by: instructor.member.id, signed_via: 'web' });
  });

  it('records sign_off.created in the audit log with the instructor as actor', async () => {
    const { training } = await lathe();
    const member = await createMember(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post('/api/sign-offs', signOffBody(member.id, training.id));

    const entry = await ctx.db('audit_log').first('*').where({ entity_id: res.body.id });
    expect(entry).toMatchObject({ action: 'sign_off.created', entity: 'sign_off', actor_id: instructor.member.id, member_id: member.id });
    expect(entry.details).toMatchObject({ trainingId: training.id, level: 'independent', via: 'web', expiresAt: res.body.expiresAt });
  });

  it('for a training that never lapses, has no expiry and is valid', async () => {
    const { training } = await lathe({ validity_months: 0 });
    const member = await createMember(ctx.db);
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.post('/api/sign-offs', signOffBody(member.id, training.id));

    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ expiresAt: null, state: 'valid' });
  });

  it('when a checklist item was not ticked, answers 400 checklist_incomplete naming its label and stores nothing', async () => {
    const { training } = await lathe();
    const member = await createMember(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post('/api/sign-offs', signOffBody(member.id, training.id, { checklist: ['sets-speed'] }));

    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('checklist_incomplete');
    expect(res.body.errors.checklist).toEqual([latheChecklist[0]!.label, latheChecklist[2]!.label]);
    expect(res.body.detail).toContain(latheChecklist[0]!.label);
    expect(await ctx.db('sign_offs').where({ member_id: member.id })).toEqual([]);
  });

  it('when the checklist names an item the training does not have, answers 400 checklist_unknown_items', async () => {
    const { training } = await lathe();
    const member = await createMember(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post(
      '/api/sign-offs',
      signOffBody(member.id, training.id, { checklist: [...latheChecklist.map((item) => item.id), 'juggles-chucks'] }),
    );

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('checklist_unknown_items');
    expect(res.body.errors.checklist).toHaveLength(1);
    expect(res.body.errors.checklist[0]).toContain('juggles-chucks');
    expect(await ctx.db('sign_offs').where({ member_id: member.id })).toEqual([]);
  });

  it('when an instructor signs themself off, answers 403 cannot_sign_off_self', async () => {
    const { training } = await lathe();
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post('/api/sign-offs', signOffBody(instructor.member.id, training.id));

    expect(res.status).toBe(403);
    expect(res.body.code).toBe('cannot_sign_off_self');
    expect(await ctx.db('sign_offs').where({ member_id: instructor.member.id })).toEqual([]);
  });

  it('the database itself refuses a sign-off signed by its own member', async () => {
    const { training } = await lathe();
    const instructor = await createMember(ctx.db, { role: 'instructor' });

    // PostgreSQL SQLSTATE 23514: check_violation.
    await expect(createSignOff(ctx.db, { member_id: instructor.id, signed_by: instructor.id, training_id: training.id })).rejects.toMatchObject({
      code: '23514',
      constraint: 'sign_offs_not_self',
    });
  });

  it('for an inactive member, answers 409 member_inactive with a reason', async () => {
    const { training } = await lathe();
    const member = await createMember(ctx.db, { active: false });
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post('/api/sign-offs', signOffBody(member.id, training.id));

    expect(res.status).toBe(409);
    expect(res.body.code).toBe('member_inactive');
    expect(res.body.detail).toMatch(/not active/);
  });

  it('for a retired training, answers 409 training_inactive', async () => {
    const { training } = await lathe({ active: false });
    const member = await createMember(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post('/api/sign-offs', signOffBody(member.id, training.id));

    expect(res.status).toBe(409);
    expect(res.body.code).toBe('training_inactive');
  });

  it('for an unknown member or training, answers 404 member_not_found or training_not_found', async () => {
    const { training } = await lathe();
    const member = await createMember(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    const noMember = await instructor.post('/api/sign-offs', signOffBody(randomUUID(), training.id));
    const noTraining = await instructor.post('/api/sign-offs', signOffBody(member.id, randomUUID()));

    expect(noMember.status).toBe(404);
    expect(noMember.body.code).toBe('member_not_found');
    expect(noTraining.status).toBe(404);
    expect(noTraining.body.code).toBe('training_not_found');
  });

  it('with a bad level and ids that are not uuids, answers 400 naming each field', async () => {
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post('/api/sign-offs', { memberId: 'someone', trainingId: 'lathe', level: 'expert', checklist: 'all' });

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(Object.keys(res.body.errors).sort()).toEqual(['checklist', 'level', 'memberId', 'trainingId']);
  });

  it('for a member, answers 403 forbidden; signed out, 401', async () => {
    const { training } = await lathe();
    const other = await createMember(ctx.db);
    const member = await signedIn(ctx, 'member');

    const asMember = await member.post('/api/sign-offs', signOffBody(other.id, training.id));
    const anonymous = await (await browser(ctx)).post('/api/sign-offs', signOffBody(other.id, training.id));

    expect(asMember.status).toBe(403);
    expect(asMember.body.code).toBe('forbidden');
    expect(anonymous.status).toBe(401);
    expect(await ctx.db('sign_offs').where({ member_id: other.id })).toEqual([]);
  });
});

describe('signOffsService(deps).create', () => {
  const logger = createLogger('silent');
  const service = () => signOffsService({ config: ctx.config, db: ctx.db, logger, mailer: createMailer(ctx.config.SMTP_URL, ctx.config.MAIL_FROM, logger), live: quietPublisher });
  const asUser = (row: Awaited<ReturnType<typeof createMember>>): Express.User => ({
    id: row.id,
    email: row.email,
    firstName: row.first_name,
    lastName: row.last_name,
    name: `${row.first_name} ${row.last_name}`,
    role: row.role,
  });

  it('records a sign-off given at a station as signed via the station', async () => {
    const { training } = await lathe();
    const member = await createMember(ctx.db);
    const instructor = await createMember(ctx.db, { role: 'instructor' });

    const signOff = await service().create(asUser(instructor), { ...signOffBody(member.id, training.id), level: 'independent' }, 'station');

    expect(signOff).toMatchObject({ signedVia: 'station', memberId: member.id, signedBy: { id: instructor.id } });
  });

  it('refuses a member as the one signing, even when called directly', async () => {
    const { training } = await lathe();
    const member = await createMember(ctx.db);
    const other = await createMember(ctx.db);

    await expect(service().create(asUser(other), { ...signOffBody(member.id, training.id), level: 'independent' }, 'station')).rejects.toMatchObject({
      status: 403,
    });
  });
});

describe('POST /api/sign-offs/:id/revoke', () => {
  it('when an instructor revokes with a reason, answers the sign-off as revoked and audits it', async () => {
    const signOff = await createSignOff(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post(`/api/sign-offs/${signOff.id}/revoke`, { reason: 'Left the chuck key in the chuck twice.' });

    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: signOff.id, state: 'revoked', revokeReason: 'Left the chuck key in the chuck twice.' });
    expect(res.body.revokedAt).not.toBeNull();
    const row = await ctx.db('sign_offs').first('revoked_by').where({ id: signOff.id });
    expect(row.revoked_by).toBe(instructor.member.id);
    const entry = await ctx.db('audit_log').first('*').where({ entity_id: signOff.id, action: 'sign_off.revoked' });
    expect(entry).toMatchObject({ actor_id: instructor.member.id, member_id: signOff.member_id });
    expect(entry.details.reason).toBe('Left the chuck key in the chuck twice.');
  });

  it('when it is already revoked, answers 409 already_revoked and keeps the first reason', async () => {
    const signOff = await createSignOff(ctx.db, { revoked_at: new Date(), revoke_reason: 'First reason' });
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.post(`/api/sign-offs/${signOff.id}/revoke`, { reason: 'Second reason' });

    expect(res.status).toBe(409);
    expect(res.body.code).toBe('already_revoked');
    expect((await ctx.db('sign_offs').first('revoke_reason').where({ id: signOff.id })).revoke_reason).toBe('First reason');
  });

  it('for an unknown sign-off, answers 404 sign_off_not_found; without a reason, 400 naming reason', async () => {
    const signOff = await createSignOff(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    const missing = await instructor.post(`/api/sign-offs/${randomUUID()}/revoke`, { reason: 'Not seen for a year' });
    const noReason = await instructor.post(`/api/sign-offs/${signOff.id}/revoke`, { reason: ' ' });
    const badId = await instructor.post('/api/sign-offs/one/revoke', { reason: 'Not seen for a year' });

    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('sign_off_not_found');
    expect(noReason.status).toBe(400);
    expect(Object.keys(noReason.body.errors)).toEqual(['reason']);
    expect(badId.status).toBe(400);
    expect(Object.keys(badId.body.errors)).toEqual(['id']);
  });

  it('for a member, answers 403; signed out, 401; and revokes nothing', async () => {
    const signOff = await createSignOff(ctx.db);
    const member = await signedIn(ctx, 'member');

    const res = await member.post(`/api/sign-offs/${signOff.id}/revoke`, { reason: 'I do not like it' });
    const anonymous = await (await browser(ctx)).post(`/api/sign-offs/${signOff.id}/revoke`, { reason: 'I do not like it' });

    expect(res.status).toBe(403);
    expect(anonymous.status).toBe(401);
    expect((await ctx.db('sign_offs').first('revoked_at').where({ id: signOff.id })).revoked_at).toBeNull();
  });
});

describe('GET /api/members/:id/sign-offs', () => {
  it('shows a member their own sign-offs newest first, each with its state and the machines it opens', async () => {
    const { machine, training } = await lathe();
    const member = await signedIn(ctx, 'member');
    const memberId = member.member.id;
    const expired = await createSignOff(ctx.db, { member_id: memberId, training_id: training.id, signed_at: daysFromNow(-400), expires_at: daysFromNow(-35) });
    const revoked = await createSignOff(ctx.db, {
      member_id: memberId,
      training_id: training.id,
      signed_at: daysFromNow(-300),
      expires_at: daysFromNow(65),
      revoked_at: daysFromNow(-10),
      revoke_reason: 'Unsafe work holding',
    });
    const expiring = await createSignOff(ctx.db, { member_id: memberId, training_id: training.id, signed_at: daysFromNow(-200), expires_at: daysFromNow(12) });
    const valid = await createSignOff(ctx.db, { member_id: memberId, training_id: training.id, signed_at: daysFromNow(-2), expires_at: daysFromNow(700) });

    const res = await member.get(`/api/members/${memberId}/sign-offs`);

    expect(res.status).toBe(200);
    const list = signOffListSchema.parse(res.body);
    expect(list.map((s) => [s.id, s.state])).toEqual([
      [valid.id, 'valid'],
      [expiring.id, 'expiring'],
      [revoked.id, 'revoked'],
      [expired.id, 'expired'],
    ]);
    expect(list[2]!.revokeReason).toBe('Unsafe work holding');
    for (const signOff of list) expect(signOff.machines).toEqual([{ id: machine.id, name: machine.name }]);
  });

  it('for a member asking for someone else’s, answers 403', async () => {
    const other = await createMember(ctx.db);
    const member = await signedIn(ctx, 'member');

    const res = await member.get(`/api/members/${other.id}/sign-offs`);

    expect(res.status).toBe(403);
    expect(res.body.code).toBe('forbidden');
  });

  it('lets an instructor read anyone’s, and answers 404 member_not_found for nobody', async () => {
    const signOff = await createSignOff(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.get(`/api/members/${signOff.member_id}/sign-offs`);
    const nobody = await instructor.get(`/api/members/${randomUUID()}/sign-offs`);

    expect(res.status).toBe(200);
    expect(res.body.map((s: { id: string }) => s.id)).toEqual([signOff.id]);
    expect(nobody.status).toBe(404);
    expect(nobody.body.code).toBe('member_not_found');
  });

  it('when signed out, answers 401; for a bad id, 400', async () => {
    const member = await createMember(ctx.db);
    const instructor = await signedIn(ctx, 'instructor');

    expect((await request(ctx.app).get(`/api/members/${member.id}/sign-offs`)).status).toBe(401);
    const bad = await instructor.get('/api/members/me/sign-offs');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.errors)).toEqual(['id']);
  });
});

describe('GET /api/sign-offs/report', () => {
  async function reportFixture() {
    const { training } = await lathe();
    const member = await createMember(ctx.db, { first_name: 'Esme', last_name: `O'Brien, "Jr" ${randomUUID().slice(0, 6)}` });
    const expiring = await createSignOff(ctx.db, { member_id: member.id, training_id: training.id, signed_at: daysFromNow(-700), expires_at: daysFromNow(10) });
    const later = await createSignOff(ctx.db, { training_id: training.id, signed_at: daysFromNow(-100), expires_at: daysFromNow(45) });
    const revoked = await createSignOff(ctx.db, { training_id: training.id, signed_at: daysFromNow(-700), expires_at: daysFromNow(5), revoked_at: daysFromNow(-1) });
    const expired = await createSignOff(ctx.db, { training_id: training.id, signed_at: daysFromNow(-800), expires_at: daysFromNow(-20) });
    // Renewed: the old sign-off lapses soon, but a newer one holds.
    const renewedMember = await createMember(ctx.db);
    const superseded = await createSignOff(ctx.db, { member_id: renewedMember.id, training_id: training.id, signed_at: daysFromNow(-700), expires_at: daysFromNow(8) });
    await createSignOff(ctx.db, { member_id: renewedMember.id, training_id: training.id, signed_at: daysFromNow(-3), expires_at: daysFromNow(727) });
    const leftShop = await createMember(ctx.db, { active: false });
    const inactive = await createSignOff(ctx.db, { member_id: leftShop.id, training_id: training.id, signed_at: daysFromNow(-700), expires_at: daysFromNow(9) });
    return { training, member, expiring, later, revoked, expired, superseded, inactive };
  }

  it('lists sign-offs of active members that lapse in the next 30 days, soonest first, leaving out revoked and renewed ones', async () => {
    const f = await reportFixture();
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get('/api/sign-offs/report?status=expiring');

    expect(res.status).toBe(200);
    const ids = signOffListSchema.parse(res.body).map((s) => s.id);
    expect(ids).toContain(f.expiring.id);
    for (const excluded of [f.later, f.revoked, f.expired, f.superseded, f.inactive]) expect(ids).not.toContain(excluded.id);
    expect(res.body.every((s: { state: string }) => s.state === 'expiring')).toBe(true);
    const expiresAt = res.body.map((s: { expiresAt: string }) => s.expiresAt);
    expect(expiresAt).toEqual([...expiresAt].sort());
  });

  it('with status=expired, lists the lapsed ones', async () => {
    const f = await reportFixture();
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get('/api/sign-offs/report?status=expired');

    expect(res.status).toBe(200);
    const ids = res.body.map((s: { id: string }) => s.id);
    expect(ids).toContain(f.expired.id);
    expect(ids).not.toContain(f.expiring.id);
    expect(res.body.every((s: { state: string }) => s.state === 'expired')).toBe(true);
  });

  it('as CSV, answers an RFC 4180 attachment that survives commas and quotes in names', async () => {
    const f = await reportFixture();
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get('/api/sign-offs/report?status=expiring&format=csv');

    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    // RFC 6266 §4.1: the file name may be a token or a quoted string.
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?sign-offs-expiring\.csv"?$/);
    // RFC 4180 §2.1: every record ends with CRLF.
    expect(res.text.endsWith('\r\n')).toBe(true);
    // RFC 4180, parsed back with papaparse.
    const parsed = Papa.parse<string[]>(res.text, { delimiter: ',', newline: '\r\n', quoteChar: '"', skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...records] = parsed.data;
    expect(header).toEqual(['Member', 'E-mail', 'Training', 'Level', 'State', 'Signed at', 'Signed by', 'Expires at', 'Days to expiry']);
    // RFC 4180 §2.4: the same number of fields on each line.
    for (const record of parsed.data) expect(record).toHaveLength(9);
    const ours = records.find((r) => r[1] === f.member.email);
    expect(ours).toEqual([
      `Esme ${f.member.last_name}`,
      f.member.email,
      f.training.name,
      'Independent',
      'Expiring soon',
      f.expiring.signed_at.toISOString(),
      expect.any(String),
      f.expiring.expires_at!.toISOString(),
      expect.stringMatching(/^(10|11)$/),
    ]);
  });

  it('for an instructor or a member, answers 403; with a bad status, 400', async () => {
    const instructor = await signedIn(ctx, 'instructor');
    const member = await signedIn(ctx, 'member');
    const admin = await signedIn(ctx, 'admin');

    expect((await instructor.get('/api/sign-offs/report')).status).toBe(403);
    expect((await member.get('/api/sign-offs/report')).status).toBe(403);
    expect((await request(ctx.app).get('/api/sign-offs/report')).status).toBe(401);
    const bad = await admin.get('/api/sign-offs/report?status=soon&format=xls');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.errors).sort()).toEqual(['format', 'status']);
  });
});
