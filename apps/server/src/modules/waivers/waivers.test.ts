import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { WAIVER_SCAN_MAX_BYTES } from '@chuckkey/core';
import { createMember, createWaiverVersion, recordWaiver } from '@chuckkey/db/factories';
import { createTestContext, signedIn, type Browser, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

const WAIVER_BODY = 'Machine and welding work can injure you. Wear the protection the job calls for and follow the shop rules.';

function uploadScan(client: Browser, memberId: string, data: Buffer, file: { filename: string; contentType: string }, field = 'scan') {
  return client.agent
    .post(`/api/members/${memberId}/waiver-scan`)
    .set('x-forwarded-for', client.ip)
    .set('x-csrf-token', client.token)
    .attach(field, data, file);
}

/** A small PDF: the header and trailer are what content sniffing reads (ISO 32000-1, 7.5.2). */
const PDF = Buffer.from('%PDF-1.4\n1 0 obj\n<< /Type /Catalog >>\nendobj\ntrailer\n<< /Root 1 0 R >>\n%%EOF\n');

async function publish(admin: Browser, title = 'Shop safety waiver') {
  const res = await admin.post('/api/waivers', { title, body: WAIVER_BODY });
  expect(res.status).toBe(201);
  return res.body as { version: number; title: string; body: string; publishedAt: string };
}

// Waiver versions are shop-wide, so the tests in this file run in order and each reads the current version.
describe('before any waiver is published', () => {
  it('GET /api/waivers/current answers 404 no_waiver and a member’s status has nothing on file', async () => {
    const client = await signedIn(ctx, 'member');

    const current = await client.get('/api/waivers/current');
    const status = await client.get(`/api/members/${client.member.id}/waiver`);

    expect(current.status).toBe(404);
    expect(current.body.code).toBe('no_waiver');
    expect(status.body).toEqual({ current: null, record: null, onFile: false });
  });

  it('POST /api/waivers/accept answers 404 no_waiver', async () => {
    const client = await signedIn(ctx, 'member', { first_name: 'Ada', last_name: 'Penhallow' });

    const res = await client.post('/api/waivers/accept', { version: 1, typedName: 'Ada Penhallow' });

    expect(res.status).toBe(404);
    expect(res.body.code).toBe('no_waiver');
  });
});

describe('POST /api/waivers (publish)', () => {
  it('lets an admin publish the next version, which becomes current, with an audit entry', async () => {
    const admin = await signedIn(ctx, 'admin');
    const before = await admin.get('/api/waivers/current');
    const previous = before.status === 200 ? (before.body.version as number) : 0;

    const published = await publish(admin, 'Shop safety waiver, spring edition');

    expect(published).toEqual({ version: previous + 1, title: 'Shop safety waiver, spring edition', body: WAIVER_BODY, publishedAt: expect.any(String) });
    expect((await admin.get('/api/waivers/current')).body).toEqual(published);
    const audit = await ctx.db('audit_log').where({ action: 'waiver.published', entity_id: String(published.version) }).first();
    expect(audit).toMatchObject({ actor_id: admin.member.id, entity: 'waiver_version' });
  });

  it('numbers versions one after another when two admins publish at the same moment', async () => {
    const admin = await signedIn(ctx, 'admin');
    const other = await signedIn(ctx, 'admin');

    const [a, b] = await Promise.all([publish(admin, 'Version A'), publish(other, 'Version B')]);

    expect(Math.abs(a.version - b.version)).toBe(1);
  });

  it('is refused with 403 to members and instructors', async () => {
    for (const role of ['member', 'instructor'] as const) {
      const client = await signedIn(ctx, role);
      const res = await client.post('/api/waivers', { title: 'Mine', body: WAIVER_BODY });
      expect(res.status).toBe(403);
    }
  });

  it('answers 400 naming title and body when they are missing', async () => {
    const admin = await signedIn(ctx, 'admin');

    const res = await admin.post('/api/waivers', { title: ' ', body: 'short' });

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.errors).sort()).toEqual(['body', 'title']);
  });
});

describe('POST /api/waivers/accept', () => {
  it('records the member’s acceptance of the current version with the typed name, ignoring case and extra spaces', async () => {
    const admin = await signedIn(ctx, 'admin');
    const current = await publish(admin);
    const client = await signedIn(ctx, 'member', { first_name: 'Juniper', last_name: 'Salgado' });

    const res = await client.post('/api/waivers/accept', { version: current.version, typedName: '  juniper   SALGADO ' });

    expect(res.status).toBe(201);
    expect(res.body).toEqual({
      current,
      record: { id: expect.any(String), version: current.version, method: 'accepted_online', typedName: 'juniper   SALGADO', recordedAt: expect.any(String) },
      onFile: true,
    });
    expect((await client.get(`/api/members/${client.member.id}/waiver`)).body).toEqual(res.body);
    const audit = await ctx.db('audit_log').where({ action: 'waiver.accepted', member_id: client.member.id }).first();
    expect(audit).toMatchObject({ actor_id: client.member.id, entity: 'waiver_record', entity_id: res.body.record.id });
  });

  it('accepting again keeps the first record and answers 200', async () => {
    const client = await signedIn(ctx, 'member', { first_name: 'Kiri', last_name: 'Jessop' });
    const { version } = (await client.get('/api/waivers/current')).body;
    const first = await client.post('/api/waivers/accept', { version, typedName: 'Kiri Jessop' });

    const again = await client.post('/api/waivers/accept', { version, typedName: 'Kiri Jessop' });

    expect(again.status).toBe(200);
    expect(again.body.record.id).toBe(first.body.record.id);
    expect(await ctx.db('waiver_records').where({ member_id: client.member.id })).toHaveLength(1);
  });

  it('answers 400 name_mismatch naming typedName when the typed name is not the member’s full name, and records nothing', async () => {
    const client = await signedIn(ctx, 'member', { first_name: 'Orson', last_name: 'Whitcombe' });
    const { version } = (await client.get('/api/waivers/current')).body;

    for (const typedName of ['Orson', 'Orson Whitcomb', 'Whitcombe Orson']) {
      const res = await client.post('/api/waivers/accept', { version, typedName });
      expect(res.status).toBe(400);
      expect(res.body.code).toBe('name_mismatch');
      expect(Object.keys(res.body.errors)).toEqual(['typedName']);
    }
    expect(await ctx.db('waiver_records').where({ member_id: client.member.id })).toHaveLength(0);
  });

  it('answers 409 outdated_version for a version that is not the current one', async () => {
    const client = await signedIn(ctx, 'member', { first_name: 'Thea', last_name: 'Rowntree' });
    const { version } = (await client.get('/api/waivers/current')).body;

    const res = await client.post('/api/waivers/accept', { version: version - 1, typedName: 'Thea Rowntree' });

    expect(res.status).toBe(409);
    expect(res.body.code).toBe('outdated_version');
    expect(await ctx.db('waiver_records').where({ member_id: client.member.id })).toHaveLength(0);
  });

  it('answers 400 naming the fields for a body without them, and 401 when signed out', async () => {
    const client = await signedIn(ctx, 'member');

    const res = await client.post('/api/waivers/accept', {});

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.errors).sort()).toEqual(['typedName', 'version']);
    expect((await request(ctx.app).get('/api/waivers/current')).status).toBe(401);
  });
});

describe('a new waiver version', () => {
  it('asks everyone again: a member who accepted the old one has nothing on file until they accept the new one', async () => {
    const admin = await signedIn(ctx, 'admin');
    const client = await signedIn(ctx, 'member', { first_name: 'Bram', last_name: 'Eastlake' });
    const old = (await client.get('/api/waivers/current')).body;
    await client.post('/api/waivers/accept', { version: old.version, typedName: 'Bram Eastlake' });
    expect((await client.get(`/api/members/${client.member.id}/waiver`)).body.onFile).toBe(true);

    const next = await publish(admin, 'Shop safety waiver, with the new plasma table');

    const status = (await client.get(`/api/members/${client.member.id}/waiver`)).body;
    expect(status).toEqual({ current: next, record: null, onFile: false });
    const stale = await client.post('/api/waivers/accept', { version: old.version, typedName: 'Bram Eastlake' });
    expect(stale.status).toBe(409);
    const accepted = await client.post('/api/waivers/accept', { version: next.version, typedName: 'Bram Eastlake' });
    expect(accepted.status).toBe(201);
    expect(accepted.body.onFile).toBe(true);
  });
});

describe('GET /api/members/:id/waiver', () => {
  it('answers an admin anyone’s status; a member or an instructor asking for another’s gets 403', async () => {
    const owner = await createMember(ctx.db);
    const admin = await signedIn(ctx, 'admin');

    expect((await admin.get(`/api/members/${owner.id}/waiver`)).status).toBe(200);
    for (const role of ['member', 'instructor'] as const) {
      const other = await signedIn(ctx, role);
      expect((await other.get(`/api/members/${owner.id}/waiver`)).status).toBe(403);
    }
    const unknown = await admin.get('/api/members/00000000-0000-4000-8000-000000000000/waiver');
    expect(unknown.status).toBe(404);
    expect(unknown.body.code).toBe('member_not_found');
  });

  it('counts a record made with the factories like one made through the API', async () => {
    const member = await createMember(ctx.db, { first_name: 'Gideon', last_name: 'Dunmore' });
    const version = await createWaiverVersion(ctx.db, { title: 'Factory-made version' });
    await recordWaiver(ctx.db, { memberId: member.id, version: version.version, typedName: 'Gideon Dunmore' });
    const admin = await signedIn(ctx, 'admin');

    const status = (await admin.get(`/api/members/${member.id}/waiver`)).body;

    expect(status.current.version).toBe(version.version);
    expect(status.record).toMatchObject({ method: 'accepted_online', typedName: 'Gideon Dunmore' });
    expect(status.onFile).toBe(true);
  });
});

describe('POST /api/members/:id/waiver-scan', () => {
  it('files a signed PDF for the current version; the member’s waiver is then on file and the admin can download it', async () => {
    const admin = await signedIn(ctx, 'admin');
    const member = await createMember(ctx.db);

    const res = await uploadScan(admin, member.id, PDF, { filename: 'signed.pdf', contentType: 'application/pdf' });

    expect(res.status).toBe(201);
    expect(res.body.onFile).toBe(true);
    expect(res.body.record).toMatchObject({ method: 'uploaded_scan', typedName: null, version: res.body.current.version });
    const download = await admin.get(`/api/members/${member.id}/waiver-scan`).buffer(true);
    expect(download.status).toBe(200);
    expect(download.headers['content-type']).toBe('application/pdf');
    expect(download.headers['content-disposition']).toMatch(/^attachment; filename="?waiver-v\d+-scan\.pdf"?$/);
    expect(Buffer.compare(download.body as Buffer, PDF)).toBe(0);
    const audit = await ctx.db('audit_log').where({ action: 'waiver.scan_uploaded', member_id: member.id }).first();
    expect(audit).toMatchObject({ actor_id: admin.member.id, entity_id: res.body.record.id });
    expect(audit.details).toMatchObject({ type: 'application/pdf', bytes: PDF.length });
  });

  it('accepts JPEG and PNG photos of the paper, by their content', async () => {
    const admin = await signedIn(ctx, 'admin');
    const member = await createMember(ctx.db);
    const jpeg = await sharp({ create: { width: 80, height: 100, channels: 3, background: '#fff' } }).jpeg().toBuffer();
    const png = await sharp({ create: { width: 80, height: 100, channels: 3, background: '#fff' } }).png().toBuffer();

    // Named wrongly on purpose: the content decides.
    expect((await uploadScan(admin, member.id, jpeg, { filename: 'scan.pdf', contentType: 'application/pdf' })).status).toBe(201);
    expect((await uploadScan(admin, member.id, png, { filename: 'scan.jpg', contentType: 'image/jpeg' })).status).toBe(201);

    const download = await admin.get(`/api/members/${member.id}/waiver-scan`);
    expect(download.headers['content-type']).toBe('image/png');
  });

  it('refuses a text file renamed signed.pdf with 415 unsupported_type, and stores nothing', async () => {
    const admin = await signedIn(ctx, 'admin');
    const member = await createMember(ctx.db);

    const res = await uploadScan(admin, member.id, Buffer.from('I agree, signed by nobody.\n'), { filename: 'signed.pdf', contentType: 'application/pdf' });

    expect(res.status).toBe(415);
    expect(res.body.code).toBe('unsupported_type');
    expect(Object.keys(res.body.errors)).toEqual(['scan']);
    expect(await ctx.db('waiver_records').where({ member_id: member.id })).toHaveLength(0);
  });

  it('refuses a file over 10 MB with 413 too_large, and stores nothing', async () => {
    const admin = await signedIn(ctx, 'admin');
    const member = await createMember(ctx.db);
    const big = Buffer.concat([PDF, Buffer.alloc(WAIVER_SCAN_MAX_BYTES + 1024, 0x20)]);

    const res = await uploadScan(admin, member.id, big, { filename: 'signed.pdf', contentType: 'application/pdf' });

    expect(res.status).toBe(413);
    expect(res.body.code).toBe('too_large');
    expect(res.body.detail).toContain('10 MB');
    expect(await ctx.db('waiver_records').where({ member_id: member.id })).toHaveLength(0);
  });

  it('is refused with 403 to members and instructors, for uploading and for downloading, even their own', async () => {
    for (const role of ['member', 'instructor'] as const) {
      const client = await signedIn(ctx, role);
      expect((await uploadScan(client, client.member.id, PDF, { filename: 's.pdf', contentType: 'application/pdf' })).status).toBe(403);
      expect((await client.get(`/api/members/${client.member.id}/waiver-scan`)).status).toBe(403);
    }
  });

  it('answers 404 member_not_found for an unknown member and 404 no_scan when none was filed', async () => {
    const admin = await signedIn(ctx, 'admin');
    const member = await createMember(ctx.db);

    const unknown = await uploadScan(admin, '00000000-0000-4000-8000-000000000000', PDF, { filename: 's.pdf', contentType: 'application/pdf' });
    const none = await admin.get(`/api/members/${member.id}/waiver-scan`);

    expect(unknown.status).toBe(404);
    expect(unknown.body.code).toBe('member_not_found');
    expect(none.status).toBe(404);
    expect(none.body.code).toBe('no_scan');
  });
});
