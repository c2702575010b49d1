import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMember } from '@chuckkey/db/factories';
import { browser, caughtMail, createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

interface Listed {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  receivedAt: string;
}

async function outboxCount(): Promise<number> {
  const [row] = await ctx.db('outbox_messages').count({ count: '*' });
  return Number(row?.count ?? 0);
}

describe('GET /api/outbox', () => {
  it('for an admin, lists caught mail newest first with the total', async () => {
    const first = await createMember(ctx.db, { first_name: 'Petra' });
    const second = await createMember(ctx.db, { first_name: 'Quill' });
    const visitor = await browser(ctx);
    expect((await visitor.post('/api/auth/password-reset', { email: first.email })).status).toBe(202);
    await caughtMail(ctx.db, first.email);
    expect((await visitor.post('/api/auth/password-reset', { email: second.email })).status).toBe(202);
    await caughtMail(ctx.db, second.email);
    const admin = await signedIn(ctx, 'admin');
    const before = await outboxCount();

    const res = await admin.get('/api/outbox?pageSize=100');

    const after = await outboxCount();
    expect(res.status).toBe(200);
    const items = res.body.items as Listed[];
    // Other test files send mail at the same time, so the total lies between two counts.
    expect(res.body.total).toBeGreaterThanOrEqual(before);
    expect(res.body.total).toBeLessThanOrEqual(after);
    expect(res.body.total).toBeGreaterThanOrEqual(items.length);
    const times = items.map((m) => Date.parse(m.receivedAt));
    expect(times).toEqual([...times].sort((a, b) => b - a));
    const firstIndex = items.findIndex((m) => m.to.includes(first.email));
    const secondIndex = items.findIndex((m) => m.to.includes(second.email));
    expect(secondIndex).toBeGreaterThanOrEqual(0);
    expect(firstIndex).toBeGreaterThan(secondIndex);
    const mail = items[secondIndex]!;
    expect(mail).toEqual({
      id: expect.stringMatching(/^[0-9a-f-]{36}$/),
      from: expect.stringContaining('chuckkey@example.org'),
      to: [second.email],
      subject: 'Reset your Chuckkey password',
      text: expect.stringContaining(`${ctx.config.publicUrl}/reset-password?token=`),
      receivedAt: expect.stringMatching(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/),
    });
    expect(mail.text).toContain('Hello Quill,');
  });

  it('pages through the mail with page and pageSize', async () => {
    const member = await createMember(ctx.db);
    await (await browser(ctx)).post('/api/auth/password-reset', { email: member.email });
    await caughtMail(ctx.db, member.email);
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get('/api/outbox?page=1&pageSize=1');

    expect(res.status).toBe(200);
    expect(res.body.items).toHaveLength(1);
    expect(res.body.total).toBeGreaterThanOrEqual(1);
  });

  it('with more than 100 rows asked for, answers 400 naming pageSize', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get('/api/outbox?pageSize=101');

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(Object.keys(res.body.errors)).toEqual(['pageSize']);
  });

  it('for a member, answers 403', async () => {
    const member = await signedIn(ctx, 'member');

    const res = await member.get('/api/outbox');

    expect(res.status).toBe(403);
    expect(res.body.code).toBe('forbidden');
  });

  it('when signed out, answers 401', async () => {
    const res = await request(ctx.app).get('/api/outbox');

    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });
});
