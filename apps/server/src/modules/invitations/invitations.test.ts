import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMember, uniqueEmail } from '@chuckkey/db/factories';
import { browser, caughtMail, countMail, createTestContext, linkToken, signedIn, type Browser, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const NEW_PASSWORD = 'chuck-and-collet-2026';

/** An admin invites someone and the test reads the link out of the caught mail. */
async function invite(admin: Browser, fields: Partial<{ email: string; firstName: string; lastName: string; role: string }> = {}) {
  const body = { email: uniqueEmail('invitee'), firstName: 'Ines', lastName: 'Faceplate', role: 'member', ...fields };
  const before = await countMail(ctx.db, body.email);
  const res = await admin.post('/api/invitations', body);
  if (res.status !== 201) throw new Error(`invitation for the test failed: ${res.status} ${JSON.stringify(res.body)}`);
  const deadline = Date.now() + 5_000;
  while ((await countMail(ctx.db, body.email)) === before) {
    if (Date.now() > deadline) throw new Error(`no invitation mail to ${body.email}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  const mail = await caughtMail(ctx.db, body.email);
  return { res, body, mail, token: linkToken(mail.text, '/accept-invitation') };
}

describe('POST /api/invitations', () => {
  it('when an admin invites someone, answers 201 and mails them a link to accept', async () => {
    const admin = await signedIn(ctx, 'admin', { first_name: 'Hedda', last_name: 'Tailstock' });
    const email = uniqueEmail('invitee');

    const res = await admin.post('/api/invitations', { email, firstName: 'Ines', lastName: 'Faceplate', role: 'instructor' });

    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email, firstName: 'Ines', lastName: 'Faceplate', role: 'instructor', invitedBy: 'Hedda Tailstock' });
    expect(res.body.id).toMatch(/^[0-9a-f-]{36}$/);
    const days = (Date.parse(res.body.expiresAt) - Date.parse(res.body.createdAt)) / 86_400_000;
    expect(days).toBeCloseTo(7, 1);
    const mail = await caughtMail(ctx.db, email);
    expect(mail.text).toContain(`${ctx.config.publicUrl}/accept-invitation?token=`);
    expect(linkToken(mail.text, '/accept-invitation')).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(mail.subject).toContain('Test Shop');
  });

  it('normalises the address to lower case before inviting', async () => {
    const admin = await signedIn(ctx, 'admin');
    const email = uniqueEmail('invitee');

    const res = await admin.post('/api/invitations', { email: `  ${email.toUpperCase()} `, firstName: 'Ines', lastName: 'Faceplate' });

    expect(res.status).toBe(201);
    expect(res.body.email).toBe(email);
    expect(res.body.role).toBe('member');
  });

  it('for a member, answers 403 and sends no mail', async () => {
    const member = await signedIn(ctx, 'member');
    const email = uniqueEmail('invitee');

    const res = await member.post('/api/invitations', { email, firstName: 'Ines', lastName: 'Faceplate', role: 'member' });

    expect(res.status).toBe(403);
    expect(res.body.code).toBe('forbidden');
    expect(await countMail(ctx.db, email)).toBe(0);
  });

  it("for an existing member's address, answers 409 already_member naming email", async () => {
    const existing = await createMember(ctx.db);
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.post('/api/invitations', { email: existing.email.toUpperCase(), firstName: 'Ines', lastName: 'Faceplate', role: 'member' });

    expect(res.status).toBe(409);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('already_member');
    expect(res.body.errors.email).toHaveLength(1);
  });

  it('without an e-mail address or with an unknown role, answers 400 naming each field', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.post('/api/invitations', { firstName: 'Ines', lastName: 'Faceplate', role: 'wizard' });

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(Object.keys(res.body.errors).sort()).toEqual(['email', 'role']);
  });
});

describe('GET /api/invitations', () => {
  it('for an admin, lists the open invitation with who sent it', async () => {
    const admin = await signedIn(ctx, 'admin', { first_name: 'Hedda', last_name: 'Tailstock' });
    const { res: created, body } = await invite(admin, { firstName: 'Jonas', lastName: 'Spindle', role: 'instructor' });

    const res = await admin.get('/api/invitations');

    expect(res.status).toBe(200);
    const listed = res.body.items.find((i: { id: string }) => i.id === created.body.id);
    expect(listed).toEqual({
      id: created.body.id,
      email: body.email,
      firstName: 'Jonas',
      lastName: 'Spindle',
      role: 'instructor',
      invitedBy: 'Hedda Tailstock',
      expiresAt: created.body.expiresAt,
      createdAt: created.body.createdAt,
    });
  });

  it('for a member, answers 403', async () => {
    const member = await signedIn(ctx, 'member');

    const res = await member.get('/api/invitations');

    expect(res.status).toBe(403);
    expect(res.body.code).toBe('forbidden');
  });
});

describe('GET /api/invitations/:token', () => {
  it('without signing in, previews the invitation with the names and the shop', async () => {
    const admin = await signedIn(ctx, 'admin');
    const { body, token } = await invite(admin, { firstName: 'Kaja', lastName: 'Arbor' });
    const visitor = await browser(ctx);

    const res = await visitor.get(`/api/invitations/${token}`);

    expect(res.status).toBe(200);
    expect(res.body).toEqual({ email: body.email, firstName: 'Kaja', lastName: 'Arbor', shopName: 'Test Shop' });
  });

  it('for a well-formed token nobody was sent, answers 404 invitation_not_found', async () => {
    const visitor = await browser(ctx);

    const res = await visitor.get(`/api/invitations/${'A'.repeat(43)}`);

    expect(res.status).toBe(404);
    expect(res.body.code).toBe('invitation_not_found');
  });
});

describe('POST /api/invitations/accept', () => {
  it('with a password under 12 characters, answers 400 naming password and creates no member', async () => {
    const admin = await signedIn(ctx, 'admin');
    const { body, token } = await invite(admin);
    const visitor = await browser(ctx);

    const res = await visitor.post('/api/invitations/accept', { token, password: 'short-pass1' });

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.errors)).toEqual(['password']);
    expect(await ctx.db('members').first('id').where({ email: body.email })).toBeUndefined();
  });

  it('creates the member with the invited role, signs them in, and they can sign in again later', async () => {
    const admin = await signedIn(ctx, 'admin');
    const { body, token } = await invite(admin, { firstName: 'Lotte', lastName: 'Mandrel', role: 'instructor' });
    const visitor = await browser(ctx);

    const res = await visitor.post('/api/invitations/accept', { token, password: NEW_PASSWORD });

    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: expect.any(String), email: body.email, name: 'Lotte Mandrel', role: 'instructor' });
    const me = await visitor.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body).toEqual(res.body);
    const later = await (await browser(ctx)).post('/api/auth/login', { email: body.email, password: NEW_PASSWORD });
    expect(later.status).toBe(200);
    expect(later.body.id).toBe(res.body.id);
  });

  it('after accepting, the page goes on with the same CSRF token', async () => {
    const admin = await signedIn(ctx, 'admin');
    const { token } = await invite(admin);
    const visitor = await browser(ctx);
    expect((await visitor.post('/api/invitations/accept', { token, password: NEW_PASSWORD })).status).toBe(200);

    const csrf = await visitor.get('/api/auth/csrf');
    const logout = await visitor.post('/api/auth/logout');

    expect(csrf.body.token).toBe(visitor.token);
    expect(logout.status).toBe(204);
  });

  it('once used, the link answers 404 invitation_not_found on preview and on accept', async () => {
    const admin = await signedIn(ctx, 'admin');
    const { token } = await invite(admin);
    const first = await browser(ctx);
    expect((await first.post('/api/invitations/accept', { token, password: NEW_PASSWORD })).status).toBe(200);
    const second = await browser(ctx);

    const preview = await second.get(`/api/invitations/${token}`);
    const accept = await second.post('/api/invitations/accept', { token, password: 'another-long-password' });

    expect(preview.status).toBe(404);
    expect(preview.body.code).toBe('invitation_not_found');
    expect(accept.status).toBe(404);
    expect(accept.body.code).toBe('invitation_not_found');
    expect((await second.get('/api/auth/me')).status).toBe(401);
  });

  it('when the same address is invited twice, only the newer link works', async () => {
    const admin = await signedIn(ctx, 'admin');
    const email = uniqueEmail('invitee');
    const older = await invite(admin, { email });
    const newer = await invite(admin, { email });
    expect(newer.token).not.toBe(older.token);
    const visitor = await browser(ctx);

    const oldPreview = await visitor.get(`/api/invitations/${older.token}`);
    const oldAccept = await visitor.post('/api/invitations/accept', { token: older.token, password: NEW_PASSWORD });
    const newPreview = await visitor.get(`/api/invitations/${newer.token}`);

    expect(oldPreview.status).toBe(404);
    expect(oldPreview.body.code).toBe('invitation_not_found');
    expect(oldAccept.status).toBe(404);
    expect(newPreview.status).toBe(200);
    const listed = (await admin.get('/api/invitations')).body.items.filter((i: { email: string }) => i.email === email);
    expect(listed.map((i: { id: string }) => i.id)).toEqual([newer.res.body.id]);
  });

  it('once the invitation has expired, the link answers 404 on preview and on accept', async () => {
    const admin = await signedIn(ctx, 'admin');
    const { res: created, token } = await invite(admin);
    await ctx.db('invitations').where({ id: created.body.id }).update({ expires_at: new Date(Date.now() - 60_000) });
    const visitor = await browser(ctx);

    const preview = await visitor.get(`/api/invitations/${token}`);
    const accept = await visitor.post('/api/invitations/accept', { token, password: NEW_PASSWORD });

    expect(preview.status).toBe(404);
    expect(preview.body.code).toBe('invitation_not_found');
    expect(accept.status).toBe(404);
    expect(accept.body.code).toBe('invitation_not_found');
    const open = (await admin.get('/api/invitations')).body.items.map((i: { id: string }) => i.id);
    expect(open).not.toContain(created.body.id);
  });

  it('without the x-csrf-token header, answers 403 csrf_invalid', async () => {
    const admin = await signedIn(ctx, 'admin');
    const { token } = await invite(admin);

    const res = await request(ctx.app).post('/api/invitations/accept').send({ token, password: NEW_PASSWORD });

    expect(res.status).toBe(403);
    expect(res.body.code).toBe('csrf_invalid');
  });
});
