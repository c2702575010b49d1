import { randomUUID } from 'node:crypto';
import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { auditPageSchema } from '@chuckkey/core';
import { createMember } from '@chuckkey/db/factories';
import { createTestContext, signedIn, type TestContext } from '../../test/harness';
import { auditLog } from './audit.repository';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

function auditQuery(params: Record<string, string | number>): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) query.set(key, String(value));
  return `/api/audit?${query.toString()}`;
}

describe('auditLog(db).record', () => {
  it('inside a transaction that rolls back, leaves no entry', async () => {
    const member = await createMember(ctx.db);
    const entityId = randomUUID();

    await expect(
      ctx.db.transaction(async (trx) => {
        await auditLog(trx).record({ actorId: null, action: 'badge.issued', entity: 'badge', entityId, memberId: member.id });
        throw new Error('the change failed');
      }),
    ).rejects.toThrow('the change failed');

    expect(await ctx.db('audit_log').where({ entity_id: entityId })).toEqual([]);
  });

  it('inside a transaction that commits, keeps the entry with its details', async () => {
    const member = await createMember(ctx.db);
    const entityId = randomUUID();

    await ctx.db.transaction((trx) => auditLog(trx).record({ actorId: member.id, action: 'waiver.accepted', entity: 'waiver_record', entityId, details: { version: 3 } }));

    const row = await ctx.db('audit_log').first('actor_id', 'member_id', 'details').where({ entity_id: entityId });
    expect(row).toEqual({ actor_id: member.id, member_id: null, details: { version: 3 } });
  });
});

describe('role and membership changes', () => {
  it('record member.role_changed with the admin as actor and the roles before and after', async () => {
    const target = await createMember(ctx.db, { role: 'member' });
    const admin = await signedIn(ctx, 'admin');

    await admin.patch(`/api/members/${target.id}`, { role: 'instructor' });

    const entries = await ctx.db('audit_log').select('action', 'actor_id', 'details').where({ member_id: target.id });
    expect(entries).toEqual([{ action: 'member.role_changed', actor_id: admin.member.id, details: { before: { role: 'member' }, after: { role: 'instructor' } } }]);
  });

  it('record member.deactivated and member.reactivated, and nothing when nothing changed', async () => {
    const target = await createMember(ctx.db);
    const admin = await signedIn(ctx, 'admin');

    await admin.patch(`/api/members/${target.id}`, { active: false });
    await admin.patch(`/api/members/${target.id}`, { active: true });
    await admin.patch(`/api/members/${target.id}`, { role: 'member', active: true });

    const entries = await ctx.db('audit_log').select('action', 'details').where({ member_id: target.id }).orderBy('id');
    expect(entries).toEqual([
      { action: 'member.deactivated', details: { before: { active: true }, after: { active: false } } },
      { action: 'member.reactivated', details: { before: { active: false }, after: { active: true } } },
    ]);
  });

  it('record nothing when the change is refused', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.patch(`/api/members/${admin.member.id}`, { role: 'member' });

    expect(res.status).toBe(409);
    expect(await ctx.db('audit_log').where({ member_id: admin.member.id })).toEqual([]);
  });
});

describe('GET /api/audit', () => {
  it('for an admin, pages the entries about a member, newest first, with names', async () => {
    const target = await createMember(ctx.db, { first_name: 'Kasimir', last_name: 'Jessop' });
    const admin = await signedIn(ctx, 'admin');
    await admin.patch(`/api/members/${target.id}`, { role: 'instructor' });
    await admin.patch(`/api/members/${target.id}`, { active: false });
    await admin.patch(`/api/members/${target.id}`, { active: true });

    const first = await admin.get(auditQuery({ memberId: target.id, pageSize: 2 }));
    const second = await admin.get(auditQuery({ memberId: target.id, pageSize: 2, page: 2 }));

    expect(first.status).toBe(200);
    const page = auditPageSchema.parse(first.body);
    expect(page.total).toBe(3);
    expect(page.items.map((e) => e.action)).toEqual(['member.reactivated', 'member.deactivated']);
    expect(page.items[0]).toMatchObject({
      actor: { id: admin.member.id, name: `${admin.member.first_name} ${admin.member.last_name}` },
      member: { id: target.id, name: 'Kasimir Jessop' },
      entity: 'member',
      entityId: target.id,
    });
    expect(second.body.items.map((e: { action: string }) => e.action)).toEqual(['member.role_changed']);
    expect(second.body.total).toBe(3);
  });

  it('filters by action', async () => {
    const target = await createMember(ctx.db);
    const admin = await signedIn(ctx, 'admin');
    await admin.patch(`/api/members/${target.id}`, { role: 'admin' });
    await admin.patch(`/api/members/${target.id}`, { active: false });

    const res = await admin.get(auditQuery({ memberId: target.id, action: 'member.deactivated' }));

    expect(res.status).toBe(200);
    expect(res.body.total).toBe(1);
    expect(res.body.items[0].action).toBe('member.deactivated');
  });

  it('past the last page, answers no items and the total', async () => {
    const target = await createMember(ctx.db);
    const admin = await signedIn(ctx, 'admin');
    await admin.patch(`/api/members/${target.id}`, { role: 'instructor' });

    const res = await admin.get(auditQuery({ memberId: target.id, page: 4 }));

    expect(res.body).toEqual({ items: [], total: 1 });
  });

  it('as CSV, answers an RFC 4180 attachment with one record per entry', async () => {
    const target = await createMember(ctx.db, { first_name: 'Thea', last_name: 'Salgado, "Tig"' });
    const admin = await signedIn(ctx, 'admin');
    await admin.patch(`/api/members/${target.id}`, { role: 'instructor' });

    const res = await admin.get(auditQuery({ memberId: target.id, format: 'csv' }));

    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    // RFC 6266 §4.1: the file name may be a token or a quoted string.
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?audit-log\.csv"?$/);
    // RFC 4180, parsed back with papaparse.
    const parsed = Papa.parse<string[]>(res.text, { delimiter: ',', newline: '\r\n', quoteChar: '"', skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data[0]).toEqual(['At', 'Action', 'By', 'Member', 'Entity', 'Entity id', 'Details']);
    expect(parsed.data).toHaveLength(2);
    const record = parsed.data[1]!;
    expect(record.slice(1, 6)).toEqual(['member.role_changed', `${admin.member.first_name} ${admin.member.last_name}`, 'Thea Salgado, "Tig"', 'member', target.id]);
    expect(JSON.parse(record[6]!)).toEqual({ before: { role: 'member' }, after: { role: 'instructor' } });
  });

  it('for an instructor or a member, answers 403; signed out, 401', async () => {
    const instructor = await signedIn(ctx, 'instructor');
    const member = await signedIn(ctx, 'member');

    expect((await instructor.get('/api/audit')).status).toBe(403);
    expect((await member.get('/api/audit')).status).toBe(403);
    expect((await request(ctx.app).get('/api/audit')).status).toBe(401);
  });

  it('with an unknown action, a bad member id and a page size too large, answers 400 naming each', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(auditQuery({ action: 'member.deleted', memberId: 'me', pageSize: 1000 }));

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.errors).sort()).toEqual(['action', 'memberId', 'pageSize']);
  });
});
