import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createMember } from '@chuckkey/db/factories';
import { browser, caughtMail, countMail, createTestContext, linkToken, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext({ SIGN_IN_MAX_FAILURES_PER_ACCOUNT: '5', SIGN_IN_MAX_FAILURES_PER_ADDRESS: '8' });
});
afterAll(() => ctx.close());

function sessionCookie(res: request.Response): string | undefined {
  const cookies = ([] as string[]).concat(res.headers['set-cookie'] ?? []);
  return cookies.find((c) => c.startsWith('chuckkey.sid='));
}

describe('CSRF token', () => {
  it('is handed out by GET /api/auth/csrf and stays the same within a session', async () => {
    const client = await browser(ctx);
    const again = await client.get('/api/auth/csrf');
    expect(again.status).toBe(200);
    expect(again.body.token).toBe(client.token);
    // OWASP ASVS: at least 128 bits from a CSPRNG; 32 bytes in base64url is 43 characters.
    expect(client.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
  });

  it('without the header, a sign-in is refused with 403 csrf_invalid', async () => {
    const member = await createMember(ctx.db);
    const client = await browser(ctx);
    const res = await client.agent.post('/api/auth/login').set('x-forwarded-for', client.ip).send({ email: member.email, password: member.password });
    expect(res.status).toBe(403);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('csrf_invalid');
  });

  it('with a token from another session, a state-changing request is refused', async () => {
    const member = await createMember(ctx.db);
    const mine = await browser(ctx);
    const theirs = await browser(ctx);
    const res = await mine.agent
      .post('/api/auth/login')
      .set('x-forwarded-for', mine.ip)
      .set('x-csrf-token', theirs.token)
      .send({ email: member.email, password: member.password });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('csrf_invalid');
  });
});

describe('POST /api/auth/login', () => {
  it('with the right password, answers the user and starts a new session id', async () => {
    const member = await createMember(ctx.db, { first_name: 'Ada', last_name: 'Quench', role: 'instructor' });
    const client = await browser(ctx);
    const before = await client.get('/api/auth/csrf');
    const res = await client.post('/api/auth/login', { email: member.email.toUpperCase(), password: member.password });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: member.id, email: member.email, name: 'Ada Quench', role: 'instructor' });
    const cookie = sessionCookie(res);
    expect(cookie).toBeDefined();
    // OWASP Session Management: a new session id at sign-in; HttpOnly and SameSite=Lax cookie.
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const anonymousCookie = sessionCookie(before) ?? '';
    expect(cookie!.split(';')[0]).not.toBe(anonymousCookie.split(';')[0]);
    const me = await client.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body).toEqual(res.body);
  });

  it('keeps the CSRF token across sign-in so the page can go on', async () => {
    const client = await signedIn(ctx, 'member');
    const res = await client.post('/api/auth/logout');
    expect(res.status).toBe(204);
  });

  it('with a wrong password or an unknown e-mail, answers 401 with the same generic message', async () => {
    const member = await createMember(ctx.db);
    const wrong = await (await browser(ctx)).post('/api/auth/login', { email: member.email, password: 'not-the-password' });
    const unknown = await (await browser(ctx)).post('/api/auth/login', { email: 'nobody-here@test.example.org', password: 'whatever-it-is' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.code).toBe('invalid_credentials');
    expect(unknown.body).toEqual(wrong.body);
    expect(wrong.headers['content-type']).toContain('application/problem+json');
  });

  it('refuses a deactivated member with the same 401', async () => {
    const member = await createMember(ctx.db, { active: false });
    const res = await (await browser(ctx)).post('/api/auth/login', { email: member.email, password: member.password });
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('invalid_credentials');
  });

  it('with a missing or malformed e-mail, answers 400 naming the fields', async () => {
    const client = await browser(ctx);
    const res = await client.post('/api/auth/login', { email: 'not-an-address', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(Object.keys(res.body.errors).sort()).toEqual(['email', 'password']);
  });

  it('after repeated failures for one account, answers 429 even from new addresses and with the right password', async () => {
    const member = await createMember(ctx.db);
    for (let i = 0; i < 5; i++) {
      const res = await (await browser(ctx)).post('/api/auth/login', { email: member.email, password: `wrong-${i}-password` });
      expect(res.status).toBe(401);
    }
    const blocked = await (await browser(ctx)).post('/api/auth/login', { email: member.email, password: member.password });
    expect(blocked.status).toBe(429);
    expect(blocked.body.code).toBe('too_many_attempts');
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('after repeated failures from one address, answers 429 for every account from it', async () => {
    const client = await browser(ctx);
    for (let i = 0; i < 8; i++) {
      const res = await client.post('/api/auth/login', { email: `guess-${i}@test.example.org`, password: 'guessing-password' });
      expect(res.status).toBe(401);
    }
    const member = await createMember(ctx.db);
    const blocked = await client.post('/api/auth/login', { email: member.email, password: member.password });
    expect(blocked.status).toBe(429);
    const elsewhere = await (await browser(ctx)).post('/api/auth/login', { email: member.email, password: member.password });
    expect(elsewhere.status).toBe(200);
  });

  it('stores passwords as argon2id with the OWASP parameters', async () => {
    const member = await createMember(ctx.db);
    const row = await ctx.db('members').first('password_hash').where({ id: member.id });
    // OWASP Password Storage Cheat Sheet: argon2id, m = 19 MiB (19456 KiB), t = 2, p = 1.
    expect(row.password_hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });
});

describe('GET /api/auth/me and POST /api/auth/logout', () => {
  it('when signed out, me answers 401 unauthenticated', async () => {
    const res = await request(ctx.app).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  it('sign-out destroys the session: the old cookie no longer signs anyone in', async () => {
    const client = await signedIn(ctx, 'member');
    const cookie = (await client.get('/api/auth/me')).request.cookies;
    const rows = await ctx.db('web_sessions').whereRaw("sess -> 'passport' ->> 'user' = ?", [client.member.id]).count({ count: '*' });
    expect(Number(rows[0]?.count)).toBe(1);
    const out = await client.post('/api/auth/logout');
    expect(out.status).toBe(204);
    const left = await ctx.db('web_sessions').whereRaw("sess -> 'passport' ->> 'user' = ?", [client.member.id]).count({ count: '*' });
    expect(Number(left[0]?.count)).toBe(0);
    const replay = await request(ctx.app).get('/api/auth/me').set('Cookie', cookie);
    expect(replay.status).toBe(401);
  });
});

describe('password reset by e-mail', () => {
  it('for an unknown address answers 202 and sends nothing', async () => {
    const address = 'nobody-to-reset@test.example.org';
    const res = await (await browser(ctx)).post('/api/auth/password-reset', { email: address });
    expect(res.status).toBe(202);
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(await countMail(ctx.db, address)).toBe(0);
  });

  it('mails a single-use link that sets a new password and ends other sessions', async () => {
    const other = await signedIn(ctx, 'member');
    const member = other.member;
    const client = await browser(ctx);
    expect((await client.post('/api/auth/password-reset', { email: member.email })).status).toBe(202);
    const mail = await caughtMail(ctx.db, member.email);
    expect(mail.subject).toMatch(/reset/i);
    const token = linkToken(mail.text, 'http://chuckkey.test/reset-password');

    const short = await client.post('/api/auth/password-reset/confirm', { token, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.errors.password).toBeDefined();

    const done = await client.post('/api/auth/password-reset/confirm', { token, password: 'a-brand-new-passphrase' });
    expect(done.status).toBe(204);
    expect((await other.get('/api/auth/me')).status).toBe(401);

    const reuse = await client.post('/api/auth/password-reset/confirm', { token, password: 'another-new-passphrase' });
    expect(reuse.status).toBe(400);
    expect(reuse.body.code).toBe('invalid_token');

    const oldPassword = await (await browser(ctx)).post('/api/auth/login', { email: member.email, password: member.password });
    expect(oldPassword.status).toBe(401);
    const newPassword = await (await browser(ctx)).post('/api/auth/login', { email: member.email, password: 'a-brand-new-passphrase' });
    expect(newPassword.status).toBe(200);
  });

  it('refuses an expired link', async () => {
    const member = await createMember(ctx.db);
    const client = await browser(ctx);
    await client.post('/api/auth/password-reset', { email: member.email });
    const token = linkToken((await caughtMail(ctx.db, member.email)).text, '/reset-password');
    await ctx.db('password_reset_tokens').where({ member_id: member.id }).update({ expires_at: ctx.db.raw("now() - interval '1 minute'") });
    const res = await client.post('/api/auth/password-reset/confirm', { token, password: 'a-brand-new-passphrase' });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('invalid_token');
  });
});
