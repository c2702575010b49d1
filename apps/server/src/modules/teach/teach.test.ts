import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TEACH_SEARCH_LIMIT, teachMemberListSchema } from '@chuckkey/core';
import { createMember } from '@chuckkey/db/factories';
import { createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const uniqueLastName = () => `Coldridge${randomUUID().replace(/-/g, '').slice(0, 10)}`;

describe('GET /api/teach/members', () => {
  it('for an instructor, finds members by part of their name with only id, name, e-mail and active', async () => {
    const lastName = uniqueLastName();
    const active = await createMember(ctx.db, { first_name: 'Anouk', last_name: lastName });
    const left = await createMember(ctx.db, { first_name: 'Bram', last_name: lastName, active: false });
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.get(`/api/teach/members?search=${encodeURIComponent(lastName.toLowerCase())}`);

    expect(res.status).toBe(200);
    expect(teachMemberListSchema.parse(res.body)).toEqual(res.body);
    expect(res.body).toEqual([
      { id: active.id, name: `Anouk ${lastName}`, email: active.email, active: true },
      { id: left.id, name: `Bram ${lastName}`, email: left.email, active: false },
    ]);
  });

  it(`answers at most ${TEACH_SEARCH_LIMIT} people`, async () => {
    const lastName = uniqueLastName();
    for (let i = 0; i < TEACH_SEARCH_LIMIT + 2; i++) await createMember(ctx.db, { first_name: `Member${String(i).padStart(2, '0')}`, last_name: lastName });
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(`/api/teach/members?search=${lastName}`);

    expect(res.status).toBe(200);
    expect(res.body).toHaveLength(TEACH_SEARCH_LIMIT);
  });

  it('for a member, answers 403; signed out, 401', async () => {
    const member = await signedIn(ctx, 'member');

    expect((await member.get('/api/teach/members?search=a')).status).toBe(403);
    expect((await request(ctx.app).get('/api/teach/members?search=a')).status).toBe(401);
  });

  it('with a search longer than 100 characters, answers 400 naming search', async () => {
    const instructor = await signedIn(ctx, 'instructor');

    const res = await instructor.get(`/api/teach/members?search=${'x'.repeat(101)}`);

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.errors)).toEqual(['search']);
  });
});
