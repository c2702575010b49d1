import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { clearedTagOutSchema, tagOutListSchema, tagOutSchema } from '@chuckkey/core';
import { createMachine } from '@chuckkey/db/factories';
import { browser, caughtMail, createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const tagOut = (path: string) => `/api/machines/${path}/tag-out`;

async function taggedOutMachine(role: 'member' | 'instructor' | 'admin' = 'member') {
  const machine = await createMachine(ctx.db);
  const reporter = await signedIn(ctx, role);
  const res = await reporter.post(tagOut(machine.id), { reason: 'Cross-slide gib is loose.' });
  expect(res.status).toBe(201);
  return { machine, reporter, tag: tagOutSchema.parse(res.body) };
}

async function auditEntries(action: string, machineId: string) {
  return ctx.db('audit_log').select('actor_id', 'entity', 'details').where({ action, entity_id: machineId });
}

describe('POST /api/machines/:id/tag-out', () => {
  it('lets any signed-in member tag a machine out and records it in the audit log', async () => {
    const machine = await createMachine(ctx.db);
    const member = await signedIn(ctx, 'member');

    const res = await member.post(tagOut(machine.id), { reason: '  Chuck guard cracked.  ' });

    expect(res.status).toBe(201);
    const tag = tagOutSchema.parse(res.body);
    expect(tag).toEqual({ id: tag.id, machineId: machine.id, reason: 'Chuck guard cracked.', reportedAt: expect.any(String) });
    const row = await ctx.db('tag_outs').first('*').where({ id: tag.id });
    expect(row).toMatchObject({ machine_id: machine.id, reported_by: member.member.id, cleared_at: null });
    expect(await auditEntries('machine.tagged_out', machine.id)).toEqual([
      { actor_id: member.member.id, entity: 'machine', details: { tagOutId: tag.id, reason: 'Chuck guard cracked.' } },
    ]);
  });

  it('answers 409 already_tagged_out while the machine has an open tag-out', async () => {
    const { machine } = await taggedOutMachine();
    const res = await (await signedIn(ctx, 'admin')).post(tagOut(machine.id), { reason: 'Spindle bearing noise.' });
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('already_tagged_out');
  });

  it('of two tag-outs sent at once, one lands and the other answers 409', async () => {
    const machine = await createMachine(ctx.db);
    const [first, second] = await Promise.all([
      (await signedIn(ctx, 'member')).post(tagOut(machine.id), { reason: 'Belt squeals.' }),
      (await signedIn(ctx, 'member')).post(tagOut(machine.id), { reason: 'Belt is slipping.' }),
    ]);
    expect([first.status, second.status].sort()).toEqual([201, 409]);
    const rows = await ctx.db('tag_outs').where({ machine_id: machine.id }).select('id');
    expect(rows).toHaveLength(1);
  });

  it('needs a reason', async () => {
    const machine = await createMachine(ctx.db);
    const res = await (await signedIn(ctx, 'member')).post(tagOut(machine.id), { reason: ' ' });
    expect(res.status).toBe(400);
    expect(res.body.errors.reason).toBeDefined();
  });

  it('answers 404 machine_not_found for a machine that does not exist, and 400 for a malformed id', async () => {
    const member = await signedIn(ctx, 'member');
    const missing = await member.post(tagOut(randomUUID()), { reason: 'Vice is cracked.' });
    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('machine_not_found');
    const malformed = await member.post(tagOut('lathe-1'), { reason: 'Vice is cracked.' });
    expect(malformed.status).toBe(400);
    expect(malformed.body.errors.id).toBeDefined();
  });

  it('answers 401 when signed out', async () => {
    const machine = await createMachine(ctx.db);
    const res = await (await browser(ctx)).post(tagOut(machine.id), { reason: 'Vice is cracked.' });
    expect(res.status).toBe(401);
  });
});

describe('POST /api/machines/:id/tag-out/clear', () => {
  it('lets an admin clear any tag-out, with a note, and records it in the audit log', async () => {
    const { machine, tag } = await taggedOutMachine('member');
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.post(`${tagOut(machine.id)}/clear`, { note: 'Gib adjusted and locked.' });

    expect(res.status).toBe(200);
    expect(clearedTagOutSchema.parse(res.body)).toEqual({ ...tag, clearedAt: expect.any(String), clearNote: 'Gib adjusted and locked.' });
    const row = await ctx.db('tag_outs').first('*').where({ id: tag.id });
    expect(row).toMatchObject({ cleared_by: admin.member.id, clear_note: 'Gib adjusted and locked.' });
    expect(row.cleared_at).not.toBeNull();
    expect(await auditEntries('machine.tag_out_cleared', machine.id)).toEqual([
      { actor_id: admin.member.id, entity: 'machine', details: { tagOutId: tag.id, reason: tag.reason, note: 'Gib adjusted and locked.' } },
    ]);
  });

  it('lets the instructor who tagged the machine out clear it', async () => {
    const { machine, reporter } = await taggedOutMachine('instructor');
    const res = await reporter.post(`${tagOut(machine.id)}/clear`, { note: 'Checked, safe to run.' });
    expect(res.status).toBe(200);
  });

  it('refuses another instructor, and a member even for their own tag-out, with 403', async () => {
    const byInstructor = await taggedOutMachine('instructor');
    const other = await (await signedIn(ctx, 'instructor')).post(`${tagOut(byInstructor.machine.id)}/clear`, { note: 'Looks fine.' });
    expect(other.status).toBe(403);

    const byMember = await taggedOutMachine('member');
    const own = await byMember.reporter.post(`${tagOut(byMember.machine.id)}/clear`, { note: 'Looks fine.' });
    expect(own.status).toBe(403);
    expect(own.body.code).toBe('forbidden');

    for (const machineId of [byInstructor.machine.id, byMember.machine.id]) {
      expect(await ctx.db('tag_outs').where({ machine_id: machineId }).whereNull('cleared_at').first()).toBeDefined();
    }
  });

  it('answers 409 not_tagged_out when there is no open tag-out, also after clearing', async () => {
    const admin = await signedIn(ctx, 'admin');
    const never = await createMachine(ctx.db);
    const res = await admin.post(`${tagOut(never.id)}/clear`, { note: 'Nothing to do.' });
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('not_tagged_out');

    const { machine } = await taggedOutMachine();
    expect((await admin.post(`${tagOut(machine.id)}/clear`, { note: 'Fixed.' })).status).toBe(200);
    expect((await admin.post(`${tagOut(machine.id)}/clear`, { note: 'Fixed again.' })).body.code).toBe('not_tagged_out');
  });

  it('after clearing, the machine can be tagged out again', async () => {
    const { machine } = await taggedOutMachine();
    await (await signedIn(ctx, 'admin')).post(`${tagOut(machine.id)}/clear`, { note: 'Fixed.' });
    const again = await (await signedIn(ctx, 'member')).post(tagOut(machine.id), { reason: 'Noisy again.' });
    expect(again.status).toBe(201);
  });

  it('needs a note', async () => {
    const { machine } = await taggedOutMachine();
    const res = await (await signedIn(ctx, 'admin')).post(`${tagOut(machine.id)}/clear`, {});
    expect(res.status).toBe(400);
    expect(res.body.errors.note).toBeDefined();
  });

  it('answers 404 for a machine that does not exist and 401 when signed out', async () => {
    const missing = await (await signedIn(ctx, 'admin')).post(`${tagOut(randomUUID())}/clear`, { note: 'Fixed.' });
    expect(missing.status).toBe(404);
    const { machine } = await taggedOutMachine();
    expect((await (await browser(ctx)).post(`${tagOut(machine.id)}/clear`, { note: 'Fixed.' })).status).toBe(401);
  });
});

describe('the tag_outs table', () => {
  it('holds at most one open tag-out per machine, whatever writes it', async () => {
    const { machine } = await taggedOutMachine();
    // The partial unique index, not only the service, keeps the second one out.
    await expect(ctx.db('tag_outs').insert({ machine_id: machine.id, reason: 'Second tag.' })).rejects.toMatchObject({ code: '23505' });
  });
});

describe('the admins’ mail about a tag-out', () => {
  it('tells every active admin who reported which machine, why and when, with a link to Upkeep › Tag-outs', async () => {
    const admin = await signedIn(ctx, 'admin');
    const machine = await createMachine(ctx.db, { name: `Bandsaw ${randomUUID().slice(0, 6)}` });
    const member = await signedIn(ctx, 'member', { first_name: 'Odile', last_name: 'Brandt' });

    const res = await member.post(tagOut(machine.id), { reason: 'Blade guard bent.' });
    expect(res.status).toBe(201);

    const mail = await caughtMail(ctx.db, admin.member.email);
    expect(mail.subject).toBe(`Tagged out: ${machine.name}`);
    expect(mail.text).toContain(`Odile Brandt tagged out the ${machine.name} on `);
    expect(mail.text).toContain('Reason: Blade guard bent.');
    // The time is written in the shop's zone as Intl's en-US full date (IANA tz database via Intl).
    const shop = await ctx.db('shop').first('time_zone').where({ id: 1 });
    const day = new Intl.DateTimeFormat('en-US', { dateStyle: 'full', timeZone: shop.time_zone }).format(new Date(res.body.reportedAt));
    expect(mail.text).toContain(day);
    expect(mail.text).toContain(`${ctx.config.publicUrl}/upkeep/tag-outs`);
  });

  it('is not sent to a deactivated admin', async () => {
    const gone = await signedIn(ctx, 'admin');
    await ctx.db('members').where({ id: gone.member.id }).update({ active: false });
    const active = await signedIn(ctx, 'admin');
    const machine = await createMachine(ctx.db);
    expect((await (await signedIn(ctx, 'member')).post(tagOut(machine.id), { reason: 'Table lock slips.' })).status).toBe(201);

    // Both would be on the one message: once the active admin has it, the other is known left out.
    const mail = await caughtMail(ctx.db, active.member.email);
    expect(mail.subject).toBe(`Tagged out: ${machine.name}`);
    const rows = await ctx.db('outbox_messages').select('id').where({ subject: mail.subject }).whereRaw('? = any(to_addresses)', [gone.member.email]);
    expect(rows).toEqual([]);
  });
});

describe('GET /api/tag-outs', () => {
  it('lists open tag-outs for an admin with the machine and reporter, and cleared ones with the note under open=false', async () => {
    const { machine, reporter, tag } = await taggedOutMachine('member');
    const admin = await signedIn(ctx, 'admin');

    const open = await admin.get('/api/tag-outs');
    expect(open.status).toBe(200);
    const listed = tagOutListSchema.parse(open.body).items.find((item) => item.id === tag.id);
    expect(listed).toEqual({
      ...tag,
      machineName: machine.name,
      reportedBy: { id: reporter.member.id, firstName: reporter.member.first_name, lastName: reporter.member.last_name },
      clearedAt: null,
      clearedBy: null,
      clearNote: null,
    });

    await admin.post(`${tagOut(machine.id)}/clear`, { note: 'Gib adjusted.' });
    const stillOpen = tagOutListSchema.parse((await admin.get('/api/tag-outs?open=true')).body).items;
    expect(stillOpen.map((item) => item.id)).not.toContain(tag.id);
    const cleared = tagOutListSchema.parse((await admin.get('/api/tag-outs?open=false')).body).items.find((item) => item.id === tag.id);
    expect(cleared).toMatchObject({ clearNote: 'Gib adjusted.', clearedBy: { id: admin.member.id } });
    expect(cleared?.clearedAt).toEqual(expect.any(String));
  });

  it('lets an instructor read the list, refuses a member with 403 and the signed-out with 401', async () => {
    expect((await (await signedIn(ctx, 'instructor')).get('/api/tag-outs')).status).toBe(200);
    const member = await (await signedIn(ctx, 'member')).get('/api/tag-outs');
    expect(member.status).toBe(403);
    expect((await (await browser(ctx)).get('/api/tag-outs')).status).toBe(401);
  });

  it('answers 400 validation_failed for an open that is neither true nor false', async () => {
    const res = await (await signedIn(ctx, 'admin')).get('/api/tag-outs?open=yes');
    expect(res.status).toBe(400);
    expect(res.body.errors.open).toBeDefined();
  });
});
