import { randomUUID } from 'node:crypto';
import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMember, uniqueEmail } from '@chuckkey/db/factories';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

/** A last name no other test uses, so a search for it finds only this test's rows. */
function uniqueLastName(prefix = 'Knurl'): string {
  return `${prefix}${randomUUID().replace(/-/g, '').slice(0, 10)}`;
}

function membersQuery(params: Record<string, string | number>): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) query.set(key, String(value));
  return `/api/members?${query.toString()}`;
}

describe('GET /api/members', () => {
  it('when signed out, answers 401 unauthenticated', async () => {
    const res = await request(ctx.app).get('/api/members');
    expect(res.status).toBe(401);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('unauthenticated');
  });

  it('for a member or an instructor, answers 403 forbidden', async () => {
    const member = await signedIn(ctx, 'member');
    const instructor = await signedIn(ctx, 'instructor');
    const asMember = await member.get('/api/members');
    const asInstructor = await instructor.get('/api/members');
    expect(asMember.status).toBe(403);
    expect(asMember.body.code).toBe('forbidden');
    expect(asInstructor.status).toBe(403);
    expect(asInstructor.body.code).toBe('forbidden');
  });

  it('for an admin, answers one page of members with the total across pages', async () => {
    const lastName = uniqueLastName();
    const created = [];
    for (const first of ['Alma', 'Bruno', 'Cleo']) created.push(await createMember(ctx.db, { first_name: first, last_name: lastName }));
    const admin = await signedIn(ctx, 'admin');

    const first = await admin.get(membersQuery({ search: lastName, pageSize: 2, page: 1 }));
    const second = await admin.get(membersQuery({ search: lastName, pageSize: 2, page: 2 }));

    expect(first.status).toBe(200);
    expect(first.body.total).toBe(3);
    expect(first.body.page).toBe(1);
    expect(first.body.pageSize).toBe(2);
    expect(first.body.items.map((m: { firstName: string }) => m.firstName)).toEqual(['Alma', 'Bruno']);
    expect(second.body.total).toBe(3);
    expect(second.body.items.map((m: { firstName: string }) => m.firstName)).toEqual(['Cleo']);
    const alma = created[0]!;
    expect(first.body.items[0]).toEqual({
      id: alma.id,
      email: alma.email,
      firstName: 'Alma',
      lastName,
      name: `Alma ${lastName}`,
      role: 'member',
      active: true,
      createdAt: alma.created_at.toISOString(),
    });
  });

  it('finds members by part of their name, in any case', async () => {
    const lastName = uniqueLastName();
    const wanted = await createMember(ctx.db, { first_name: 'Dorota', last_name: lastName });
    await createMember(ctx.db, { first_name: 'Dorota', last_name: uniqueLastName() });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(membersQuery({ search: `rota ${lastName.slice(0, 12).toUpperCase()}` }));

    expect(res.status).toBe(200);
    expect(res.body.total).toBe(1);
    expect(res.body.items.map((m: { id: string }) => m.id)).toEqual([wanted.id]);
  });

  it('finds members by part of their e-mail address', async () => {
    const email = uniqueEmail('grinder');
    const wanted = await createMember(ctx.db, { email, last_name: uniqueLastName() });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(membersQuery({ search: email.split('@')[0]!.slice(3) }));

    expect(res.status).toBe(200);
    expect(res.body.items.map((m: { id: string }) => m.id)).toEqual([wanted.id]);
    expect(res.body.total).toBe(1);
  });

  it('treats % and _ in the search as plain characters, not wildcards', async () => {
    const lastName = uniqueLastName();
    await createMember(ctx.db, { last_name: lastName });
    const admin = await signedIn(ctx, 'admin');

    const percent = await admin.get(membersQuery({ search: `${lastName}%` }));
    const underscore = await admin.get(membersQuery({ search: `${lastName.slice(0, -1)}_` }));

    expect(percent.status).toBe(200);
    expect(percent.body.total).toBe(0);
    expect(underscore.body.total).toBe(0);
  });

  it('with a role filter, lists only people with that role', async () => {
    const lastName = uniqueLastName();
    const instructor = await createMember(ctx.db, { role: 'instructor', last_name: lastName });
    await createMember(ctx.db, { role: 'member', last_name: lastName });
    await createMember(ctx.db, { role: 'admin', last_name: lastName });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(membersQuery({ search: lastName, role: 'instructor' }));

    expect(res.status).toBe(200);
    expect(res.body.total).toBe(1);
    expect(res.body.items).toHaveLength(1);
    expect(res.body.items[0]).toMatchObject({ id: instructor.id, role: 'instructor' });
  });

  it('sorted by e-mail descending, lists the addresses from last to first', async () => {
    const lastName = uniqueLastName();
    const b = await createMember(ctx.db, { email: uniqueEmail('bravo'), last_name: lastName });
    const a = await createMember(ctx.db, { email: uniqueEmail('alpha'), last_name: lastName });
    const c = await createMember(ctx.db, { email: uniqueEmail('charlie'), last_name: lastName });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(membersQuery({ search: lastName, sort: 'email', order: 'desc' }));

    expect(res.status).toBe(200);
    expect(res.body.items.map((m: { email: string }) => m.email)).toEqual([c.email, b.email, a.email]);
  });

  it('for a page beyond the end, answers no items and still the right total', async () => {
    const lastName = uniqueLastName();
    await createMember(ctx.db, { last_name: lastName });
    await createMember(ctx.db, { last_name: lastName });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(membersQuery({ search: lastName, page: 5, pageSize: 10 }));

    expect(res.status).toBe(200);
    expect(res.body).toEqual({ items: [], total: 2, page: 5, pageSize: 10 });
  });

  it('with a bad query, answers 400 problem details naming each bad field', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(membersQuery({ page: 0, pageSize: 101, role: 'wizard', sort: 'nope' }));

    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body).toMatchObject({ status: 400, code: 'validation_failed' });
    expect(Object.keys(res.body.errors).sort()).toEqual(['page', 'pageSize', 'role', 'sort']);
    for (const messages of Object.values(res.body.errors)) expect((messages as string[]).length).toBeGreaterThan(0);
  });

  it('as CSV, answers an RFC 4180 attachment that survives commas and quotes in names', async () => {
    const lastName = `${uniqueLastName('Ortiz')}, "Junior"`;
    const tricky = await createMember(ctx.db, { first_name: 'Wren', last_name: lastName, role: 'instructor' });
    const plain = await createMember(ctx.db, { first_name: 'Yusuf', last_name: lastName });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(membersQuery({ search: lastName.slice(0, 15), format: 'csv' }));

    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    // RFC 6266 §4.1: the file name may be a token or a quoted string.
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?members\.csv"?$/);
    const csv = res.text;
    // RFC 4180 §2.1: every record, the last one too, ends with CRLF; no bare LF.
    expect(csv.endsWith('\r\n')).toBe(true);
    expect(csv.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/);
    // RFC 4180 §2.7: a quote inside a field is doubled.
    expect(csv).toContain(`"${lastName.replace(/"/g, '""')}"`);
    // RFC 4180, parsed back with papaparse.
    const parsed = Papa.parse<string[]>(csv, { delimiter: ',', newline: '\r\n', quoteChar: '"', skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    const [header, ...records] = parsed.data;
    expect(header).toEqual(['First name', 'Last name', 'E-mail', 'Role', 'Active', 'Joined']);
    // RFC 4180 §2.4: the same number of fields on each line.
    for (const record of parsed.data) expect(record).toHaveLength(6);
    expect(records).toEqual([
      ['Wren', lastName, tricky.email, 'instructor', 'yes', tricky.created_at.toISOString()],
      ['Yusuf', lastName, plain.email, 'member', 'yes', plain.created_at.toISOString()],
    ]);
  });

  it('as CSV, neutralises a name that a spreadsheet would run as a formula', async () => {
    const marker = uniqueLastName('Vise');
    await createMember(ctx.db, { first_name: marker, last_name: '=HYPERLINK("http://evil.test","open")' });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(membersQuery({ search: marker, format: 'csv' }));

    expect(res.status).toBe(200);
    const parsed = Papa.parse<string[]>(res.text, { delimiter: ',', newline: '\r\n', quoteChar: '"', skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data).toHaveLength(2);
    const lastNameCell = parsed.data[1]![1]!;
    // OWASP "CSV Injection": a cell starting with = is prefixed with a single quote.
    expect(lastNameCell).toBe(`'=HYPERLINK("http://evil.test","open")`);
    expect(lastNameCell.startsWith('=')).toBe(false);
  });
});

describe('PATCH /api/members/:id', () => {
  it('when an admin changes a role, the member is answered with it and their next request has it', async () => {
    const member = await signedIn(ctx, 'member');
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.patch(`/api/members/${member.member.id}`, { role: 'instructor' });

    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: member.member.id, email: member.member.email, role: 'instructor', active: true });
    const me = await member.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.role).toBe('instructor');
  });

  it('when an admin deactivates a member, their sign-in ends and they cannot sign in again', async () => {
    const member = await signedIn(ctx, 'member');
    const admin = await signedIn(ctx, 'admin');
    expect((await member.get('/api/auth/me')).status).toBe(200);

    const res = await admin.patch(`/api/members/${member.member.id}`, { active: false });

    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: member.member.id, active: false });
    const me = await member.get('/api/auth/me');
    expect(me.status).toBe(401);
    expect(me.body.code).toBe('unauthenticated');
    const again = await (await browser(ctx)).post('/api/auth/login', { email: member.member.email, password: member.member.password });
    expect(again.status).toBe(401);
    expect(again.body.code).toBe('invalid_credentials');
  });

  it('when an admin reactivates a member, they can sign in again', async () => {
    const member = await createMember(ctx.db, { active: false });
    const admin = await signedIn(ctx, 'admin');
    const before = await (await browser(ctx)).post('/api/auth/login', { email: member.email, password: member.password });
    expect(before.status).toBe(401);

    const res = await admin.patch(`/api/members/${member.id}`, { active: true });

    expect(res.status).toBe(200);
    expect(res.body.active).toBe(true);
    const after = await (await browser(ctx)).post('/api/auth/login', { email: member.email, password: member.password });
    expect(after.status).toBe(200);
    expect(after.body.id).toBe(member.id);
  });

  it('when an admin changes their own role, answers 409 cannot_change_self and keeps the role', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.patch(`/api/members/${admin.member.id}`, { role: 'member' });

    expect(res.status).toBe(409);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('cannot_change_self');
    const me = await admin.get('/api/auth/me');
    expect(me.body.role).toBe('admin');
  });

  it('when an admin deactivates themself, answers 409 cannot_change_self and stays signed in', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.patch(`/api/members/${admin.member.id}`, { active: false });

    expect(res.status).toBe(409);
    expect(res.body.code).toBe('cannot_change_self');
    const me = await admin.get('/api/auth/me');
    expect(me.status).toBe(200);
    const row = await ctx.db('members').first('active').where({ id: admin.member.id });
    expect(row.active).toBe(true);
  });

  it('for an id nobody has, answers 404 member_not_found', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.patch(`/api/members/${randomUUID()}`, { role: 'instructor' });

    expect(res.status).toBe(404);
    expect(res.body.code).toBe('member_not_found');
  });

  it('for an id that is not a uuid, answers 400 naming id', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.patch('/api/members/not-a-uuid', { role: 'instructor' });

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(Object.keys(res.body.errors)).toEqual(['id']);
  });

  it('with an empty body, answers 400 and changes nothing', async () => {
    const member = await createMember(ctx.db, { role: 'member' });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.patch(`/api/members/${member.id}`, {});

    expect(res.status).toBe(400);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('validation_failed');
    const row = await ctx.db('members').first('role', 'active').where({ id: member.id });
    expect(row).toEqual({ role: 'member', active: true });
  });

  it('for a member, answers 403 and changes nothing', async () => {
    const target = await createMember(ctx.db, { role: 'member' });
    const member = await signedIn(ctx, 'member');

    const res = await member.patch(`/api/members/${target.id}`, { role: 'admin' });

    expect(res.status).toBe(403);
    expect(res.body.code).toBe('forbidden');
    const row = await ctx.db('members').first('role').where({ id: target.id });
    expect(row.role).toBe('member');
  });

  it('without the x-csrf-token header, answers 403 csrf_invalid and changes nothing', async () => {
    const target = await createMember(ctx.db, { role: 'member' });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.agent.patch(`/api/members/${target.id}`).set('x-forwarded-for', admin.ip).send({ role: 'admin' });

    expect(res.status).toBe(403);
    expect(res.body.code).toBe('csrf_invalid');
    const row = await ctx.db('members').first('role').where({ id: target.id });
    expect(row.role).toBe('member');
  });
});
