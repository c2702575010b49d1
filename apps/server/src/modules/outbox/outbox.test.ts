import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMember } from '@chuckkey/db/factories';
import { browser, caughtMail, createTestContext, signedIn, type TestContext } from '../../test/harness';
import { outboxRepository } from './outbox.repository';

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
  attachments: { filename: string | null; contentType: string; size: number }[];
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
      attachments: [],
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

/** A caught message with a calendar entry, stored the way the mail catcher stores one. */
async function mailWithCalendarEntry(to: string, content: string): Promise<string> {
  const subject = `Reservation confirmed ${to}`;
  await outboxRepository(ctx.db).insert({
    messageId: null,
    from: 'Chuckkey <chuckkey@example.org>',
    to: [to],
    subject,
    text: 'See the attached calendar entry.',
    html: null,
    attachments: [{ filename: 'reservation.ics', contentType: 'text/calendar; charset=utf-8; method=REQUEST', content }],
  });
  const row = await ctx.db('outbox_messages').first('id').where({ subject });
  return (row as { id: string }).id;
}

// "é" is two bytes in UTF-8, so the size is counted in bytes rather than characters.
const CALENDAR = 'BEGIN:VCALENDAR\r\nMETHOD:REQUEST\r\nSUMMARY:Café MIG welder\r\nEND:VCALENDAR\r\n';

describe('attachments of caught mail', () => {
  it('the list names each attachment with its content type and size in bytes', async () => {
    const to = (await createMember(ctx.db)).email;
    const id = await mailWithCalendarEntry(to, CALENDAR);
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get('/api/outbox?pageSize=100');

    expect(res.status).toBe(200);
    const mail = (res.body.items as Listed[]).find((m) => m.id === id);
    // RFC 6047 section 2.4: an iTIP message travels as text/calendar with its method parameter.
    expect(mail?.attachments).toEqual([
      { filename: 'reservation.ics', contentType: 'text/calendar; charset=utf-8; method=REQUEST', size: Buffer.byteLength(CALENDAR) },
    ]);
    expect(mail?.attachments[0]?.size).toBe(CALENDAR.length + 1);
  });

  it('downloads an attachment with its content type and file name', async () => {
    const to = (await createMember(ctx.db)).email;
    const id = await mailWithCalendarEntry(to, CALENDAR);
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get(`/api/outbox/${id}/attachments/0`);

    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('text/calendar; charset=utf-8; method=REQUEST');
    // RFC 6266 section 4.1: "attachment" with a filename parameter (a token here, so unquoted)
    // makes the browser save the file.
    expect(res.headers['content-disposition']).toBe('attachment; filename=reservation.ics');
    expect(res.text).toBe(CALENDAR);
  });

  it('answers 404 for an attachment number the message does not have, and for an unknown message', async () => {
    const to = (await createMember(ctx.db)).email;
    const id = await mailWithCalendarEntry(to, CALENDAR);
    const admin = await signedIn(ctx, 'admin');

    const pastEnd = await admin.get(`/api/outbox/${id}/attachments/1`);
    const unknown = await admin.get('/api/outbox/00000000-0000-4000-8000-000000000000/attachments/0');

    expect(pastEnd.status).toBe(404);
    expect(pastEnd.body.code).toBe('attachment_not_found');
    expect(unknown.status).toBe(404);
    expect(unknown.body.code).toBe('attachment_not_found');
  });

  it('answers 400 naming index when the attachment number is not a whole number', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.get('/api/outbox/00000000-0000-4000-8000-000000000000/attachments/first');

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.errors)).toEqual(['index']);
  });

  it('for a member answers 403, and signed out 401', async () => {
    const to = (await createMember(ctx.db)).email;
    const id = await mailWithCalendarEntry(to, CALENDAR);
    const member = await signedIn(ctx, 'member');

    const forbidden = await member.get(`/api/outbox/${id}/attachments/0`);
    const signedOut = await request(ctx.app).get(`/api/outbox/${id}/attachments/0`);

    expect(forbidden.status).toBe(403);
    expect(forbidden.body.code).toBe('forbidden');
    expect(signedOut.status).toBe(401);
    expect(signedOut.body.code).toBe('unauthenticated');
  });
});
