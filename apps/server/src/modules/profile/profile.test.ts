import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMember, uniqueEmail } from '@chuckkey/db/factories';
import { browser, createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const NEW_PASSWORD = 'dovetail-and-gib-2026';

describe('GET /api/profile', () => {
  it('answers the signed-in person their own profile', async () => {
    const client = await signedIn(ctx, 'instructor', { first_name: 'Mireille', last_name: 'Cutoff' });

    const res = await client.get('/api/profile');

    expect(res.status).toBe(200);
    expect(res.body).toEqual({
      id: client.member.id,
      email: client.member.email,
      firstName: 'Mireille',
      lastName: 'Cutoff',
      name: 'Mireille Cutoff',
      role: 'instructor',
    });
  });

  it('when signed out, answers 401 unauthenticated', async () => {
    const res = await request(ctx.app).get('/api/profile');

    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });
});

describe('PUT /api/profile', () => {
  it('changes the names and the e-mail address, stored in lower case', async () => {
    const client = await signedIn(ctx, 'member');
    const email = uniqueEmail('renamed');

    const res = await client.put('/api/profile', { firstName: ' Niamh ', lastName: 'Fixture', email: `  ${email.toUpperCase()}  ` });

    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: client.member.id, email, firstName: 'Niamh', lastName: 'Fixture', name: 'Niamh Fixture', role: 'member' });
    const again = await client.get('/api/profile');
    expect(again.body).toEqual(res.body);
    const me = await client.get('/api/auth/me');
    expect(me.body).toMatchObject({ email, name: 'Niamh Fixture' });
  });

  it("to another account's e-mail address, answers 409 email_taken naming email and changes nothing", async () => {
    const other = await createMember(ctx.db);
    const client = await signedIn(ctx, 'member', { first_name: 'Orla', last_name: 'Arbor' });

    const res = await client.put('/api/profile', { firstName: 'Changed', lastName: 'Arbor', email: other.email.toUpperCase() });

    expect(res.status).toBe(409);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('email_taken');
    expect(res.body.errors.email).toHaveLength(1);
    const profile = await client.get('/api/profile');
    expect(profile.body).toMatchObject({ email: client.member.email, firstName: 'Orla' });
  });

  it('with an empty first name, answers 400 naming firstName', async () => {
    const client = await signedIn(ctx, 'member');

    const res = await client.put('/api/profile', { firstName: '   ', lastName: 'Arbor', email: client.member.email });

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(Object.keys(res.body.errors)).toEqual(['firstName']);
  });
});

describe('POST /api/profile/password', () => {
  it('with the wrong current password, answers 400 wrong_password naming currentPassword', async () => {
    const client = await signedIn(ctx, 'member');

    const res = await client.post('/api/profile/password', { currentPassword: 'not-my-password', newPassword: NEW_PASSWORD });

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('wrong_password');
    expect(Object.keys(res.body.errors)).toEqual(['currentPassword']);
    const old = await (await browser(ctx)).post('/api/auth/login', { email: client.member.email, password: client.member.password });
    expect(old.status).toBe(200);
  });

  it('with a new password under 12 characters, answers 400 naming newPassword', async () => {
    const client = await signedIn(ctx, 'member');

    const res = await client.post('/api/profile/password', { currentPassword: client.member.password, newPassword: 'eleven-char' });

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(Object.keys(res.body.errors)).toEqual(['newPassword']);
  });

  it('changes the password: the new one signs in, the old one does not, other browsers are signed out', async () => {
    const client = await signedIn(ctx, 'member');
    const elsewhere = await browser(ctx);
    const signIn = await elsewhere.post('/api/auth/login', { email: client.member.email, password: client.member.password });
    expect(signIn.status).toBe(200);

    const res = await client.post('/api/profile/password', { currentPassword: client.member.password, newPassword: NEW_PASSWORD });

    expect(res.status).toBe(204);
    expect((await client.get('/api/auth/me')).status).toBe(200);
    const other = await elsewhere.get('/api/auth/me');
    expect(other.status).toBe(401);
    expect(other.body.code).toBe('unauthenticated');
    const withNew = await (await browser(ctx)).post('/api/auth/login', { email: client.member.email, password: NEW_PASSWORD });
    expect(withNew.status).toBe(200);
    const withOld = await (await browser(ctx)).post('/api/auth/login', { email: client.member.email, password: client.member.password });
    expect(withOld.status).toBe(401);
    expect(withOld.body.code).toBe('invalid_credentials');
  });
});
