import { PDFDocument } from 'pdf-lib';
import QRCode from 'qrcode';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PHOTO_MAX_BYTES } from '@chuckkey/core';
import { badgeCodeBox, badgeCodeHash, verifyPassword } from '@chuckkey/db';
import { createBadge, createMember } from '@chuckkey/db/factories';
import type { Deps } from '../../lib/deps';
import { createLogger } from '../../lib/logger';
import { createMailer } from '../../lib/mailer';
import { quietPublisher } from '../../realtime/publisher';
import { borderIsLight, decodeQr, fromRgba } from '../../test/pdf-and-qr';
import { browser, createTestContext, signedIn, type Browser, type TestContext } from '../../test/harness';
import { badgesService, type BadgesService } from './badges.service';

let ctx: TestContext;
let deps: Deps;
let service: BadgesService;
beforeAll(() => {
  ctx = createTestContext();
  deps = {
    config: ctx.config,
    db: ctx.db,
    logger: createLogger('silent'),
    mailer: createMailer(ctx.config.SMTP_URL, ctx.config.MAIL_FROM, createLogger('silent')),
    live: quietPublisher,
  };
  service = badgesService(deps);
});
afterAll(async () => {
  deps.mailer.close();
  await ctx.close();
});

const PT_TO_MM = 25.4 / 72;

function upload(client: Browser, path: string, field: string, data: Buffer, file: { filename: string; contentType: string }) {
  return client.agent.put(path).set('x-forwarded-for', client.ip).set('x-csrf-token', client.token).attach(field, data, file);
}

const jpeg = (width: number, height: number) => sharp({ create: { width, height, channels: 3, background: '#6b5b4b' } }).jpeg().toBuffer();
const png = (width: number, height: number) =>
  sharp({ create: { width, height, channels: 4, background: { r: 20, g: 120, b: 90, alpha: 0.5 } } }).png().toBuffer();

async function activeBadges(memberId: string) {
  return ctx.db('badges').select('id', 'code_hash', 'code_encrypted').where({ member_id: memberId }).whereNull('revoked_at');
}

describe('GET /api/members/:id/badge', () => {
  it('issues a badge on the first view and answers the same one after: a 22-character base64url code', async () => {
    const client = await signedIn(ctx, 'member');

    const first = await client.get(`/api/members/${client.member.id}/badge`);
    const again = await client.get(`/api/members/${client.member.id}/badge`);

    expect(first.status).toBe(200);
    expect(first.headers['cache-control']).toBe('no-store');
    expect(first.body).toEqual({ id: expect.any(String), issuedAt: expect.any(String), code: expect.stringMatching(/^[A-Za-z0-9_-]{22}$/) });
    // OWASP ASVS: at least 128 bits from a CSPRNG; 22 base64url characters carry 16 bytes.
    expect(Buffer.from(first.body.code, 'base64url')).toHaveLength(16);
    expect(again.body).toEqual(first.body);
    expect(await activeBadges(client.member.id)).toHaveLength(1);
    const audit = await ctx.db('audit_log').where({ action: 'badge.issued', member_id: client.member.id });
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({ actor_id: client.member.id, entity: 'badge', entity_id: first.body.id, details: { reissue: false } });
  });

  it('stores only the code’s SHA-256 and an encrypted copy, neither of which contains the code', async () => {
    const client = await signedIn(ctx, 'member');

    const { body } = await client.get(`/api/members/${client.member.id}/badge`);
    const [row] = await activeBadges(client.member.id);

    expect(row.code_hash).not.toBe(body.code);
    expect(row.code_hash).toBe(badgeCodeHash(body.code));
    expect(row.code_encrypted).not.toContain(body.code);
    expect(row.code_encrypted).toMatch(/^v1\.[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+\.[A-Za-z0-9_-]+$/);
    expect(badgeCodeBox(ctx.config.BADGE_SECRET).open(row.code_encrypted)).toBe(body.code);
  });

  it('gives two members different codes, not derived from who they are', async () => {
    const a = await signedIn(ctx, 'member', { first_name: 'Same', last_name: 'Name' });
    const b = await signedIn(ctx, 'member', { first_name: 'Same', last_name: 'Name' });

    const codeA = (await a.get(`/api/members/${a.member.id}/badge`)).body.code as string;
    const codeB = (await b.get(`/api/members/${b.member.id}/badge`)).body.code as string;

    expect(codeA).not.toBe(codeB);
    for (const code of [codeA, codeB]) {
      expect(code).not.toContain(a.member.id.slice(0, 8));
      expect(code).not.toContain(b.member.id.slice(0, 8));
    }
  });

  it('lets an admin read anyone’s badge; a member or an instructor reading another’s gets 403', async () => {
    const owner = await createMember(ctx.db);
    const admin = await signedIn(ctx, 'admin');
    const member = await signedIn(ctx, 'member');
    const instructor = await signedIn(ctx, 'instructor');

    expect((await admin.get(`/api/members/${owner.id}/badge`)).status).toBe(200);
    for (const other of [member, instructor]) {
      const res = await other.get(`/api/members/${owner.id}/badge`);
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('forbidden');
    }
  });

  it('answers 401 when signed out, 404 member_not_found for an unknown member and 400 for a malformed id', async () => {
    const admin = await signedIn(ctx, 'admin');

    expect((await request(ctx.app).get(`/api/members/${admin.member.id}/badge`)).status).toBe(401);
    const unknown = await admin.get('/api/members/00000000-0000-4000-8000-000000000000/badge');
    expect(unknown.status).toBe(404);
    expect(unknown.body.code).toBe('member_not_found');
    const malformed = await admin.get('/api/members/not-an-id/badge');
    expect(malformed.status).toBe(400);
    expect(Object.keys(malformed.body.errors)).toEqual(['id']);
  });

  it('answers 409 badge_unreadable for a badge sealed under another secret, and a reissue mends it', async () => {
    const client = await signedIn(ctx, 'member');
    await createBadge(ctx.db, { memberId: client.member.id, badgeSecret: 'an-earlier-badge-secret-no-longer-in-use' });

    const res = await client.get(`/api/members/${client.member.id}/badge`);
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('badge_unreadable');

    expect((await client.post(`/api/members/${client.member.id}/badge`)).status).toBe(201);
    expect((await client.get(`/api/members/${client.member.id}/badge`)).status).toBe(200);
  });
});

describe('POST /api/members/:id/badge (reissue)', () => {
  it('issues a new code and revokes the old one at once: the old code finds no one', async () => {
    const client = await signedIn(ctx, 'member', { first_name: 'Linnea', last_name: 'Coldridge' });
    const old = (await client.get(`/api/members/${client.member.id}/badge`)).body;
    expect(await service.findMemberByCode(old.code)).toMatchObject({ id: client.member.id });

    const res = await client.post(`/api/members/${client.member.id}/badge`);

    expect(res.status).toBe(201);
    expect(res.body.code).toMatch(/^[A-Za-z0-9_-]{22}$/);
    expect(res.body.code).not.toBe(old.code);
    expect(res.body.id).not.toBe(old.id);
    expect(await service.findMemberByCode(old.code)).toBeNull();
    expect(await service.findMemberByCode(res.body.code)).toEqual({
      id: client.member.id,
      firstName: 'Linnea',
      lastName: 'Coldridge',
      role: 'member',
      active: true,
    });
    expect(await activeBadges(client.member.id)).toEqual([expect.objectContaining({ id: res.body.id })]);
    const revoked = await ctx.db('badges').first('revoked_at').where({ id: old.id });
    expect(revoked.revoked_at).toBeInstanceOf(Date);
    const audit = await ctx.db('audit_log').where({ action: 'badge.issued', entity_id: res.body.id }).first();
    expect(audit.details).toEqual({ reissue: true, revokedBadgeId: old.id });
  });

  it('keeps one active badge per member even when reissued twice at the same moment', async () => {
    const client = await signedIn(ctx, 'member');
    await client.get(`/api/members/${client.member.id}/badge`);

    const results = await Promise.all([client.post(`/api/members/${client.member.id}/badge`), client.post(`/api/members/${client.member.id}/badge`)]);

    expect(results.map((r) => r.status)).toEqual([201, 201]);
    const active = await activeBadges(client.member.id);
    expect(active).toHaveLength(1);
  });

  it('is guarded by the database too: a second active badge for a member is refused (unique partial index)', async () => {
    const member = await createMember(ctx.db);
    await createBadge(ctx.db, { memberId: member.id, badgeSecret: ctx.config.BADGE_SECRET });

    const insert = ctx.db('badges').insert({ member_id: member.id, code_hash: badgeCodeHash('another-code-for-the-test'), code_encrypted: 'x' });

    await expect(insert).rejects.toMatchObject({ code: '23505' });
  });

  it('lets an admin reissue anyone’s badge; a member or an instructor reissuing another’s gets 403 and the code keeps working', async () => {
    const owner = await createMember(ctx.db);
    const badge = await createBadge(ctx.db, { memberId: owner.id, badgeSecret: ctx.config.BADGE_SECRET });
    const member = await signedIn(ctx, 'member');
    const instructor = await signedIn(ctx, 'instructor');
    const admin = await signedIn(ctx, 'admin');

    for (const other of [member, instructor]) expect((await other.post(`/api/members/${owner.id}/badge`)).status).toBe(403);
    expect(await service.findMemberByCode(badge.code)).toMatchObject({ id: owner.id });

    const res = await admin.post(`/api/members/${owner.id}/badge`);
    expect(res.status).toBe(201);
    expect(await service.findMemberByCode(badge.code)).toBeNull();
    const row = await ctx.db('badges').first('issued_by').where({ id: res.body.id });
    expect(row.issued_by).toBe(admin.member.id);
  });
});

describe('findMemberByCode', () => {
  it('answers null for unknown, malformed and empty codes, and finds inactive holders with active false', async () => {
    const member = await createMember(ctx.db, { active: false });
    const badge = await createBadge(ctx.db, { memberId: member.id, badgeSecret: ctx.config.BADGE_SECRET });

    expect(await service.findMemberByCode('AAAAAAAAAAAAAAAAAAAAAA')).toBeNull();
    expect(await service.findMemberByCode('')).toBeNull();
    expect(await service.findMemberByCode("' or 1=1 --")).toBeNull();
    expect(await service.findMemberByCode(`  ${badge.code}\n`)).toMatchObject({ id: member.id, active: false });
  });
});

describe('GET /api/members/:id/badge.svg', () => {
  it('is the QR as SVG that, rasterised, decodes back to the badge code with jsQR, inside a 4-module quiet zone', async () => {
    const client = await signedIn(ctx, 'member');
    const { code } = (await client.get(`/api/members/${client.member.id}/badge`)).body;

    const res = await client.get(`/api/members/${client.member.id}/badge.svg`).buffer(true);

    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('image/svg+xml');
    const svg = Buffer.isBuffer(res.body) ? res.body.toString('utf8') : res.text;
    const size = QRCode.create(code, { errorCorrectionLevel: 'M' }).modules.size;
    // ISO/IEC 18004: the symbol plus a quiet zone of 4 modules on each side.
    expect(svg).toContain(`viewBox="0 0 ${size + 8} ${size + 8}"`);
    const pxPerModule = 10;
    const { data, info } = await sharp(Buffer.from(svg))
      .resize((size + 8) * pxPerModule, (size + 8) * pxPerModule, { kernel: 'nearest' })
      .flatten({ background: '#ffffff' })
      .ensureAlpha()
      .raw()
      .toBuffer({ resolveWithObject: true });
    const bitmap = fromRgba(data, info.width, info.height);
    expect(borderIsLight(bitmap, 4 * pxPerModule - 1)).toBe(true);
    expect(decodeQr(bitmap)).toBe(code);
  });

  it('is refused with 403 to a member asking for another member’s QR', async () => {
    const owner = await createMember(ctx.db);
    const member = await signedIn(ctx, 'member');
    const admin = await signedIn(ctx, 'admin');

    expect((await member.get(`/api/members/${owner.id}/badge.svg`)).status).toBe(403);
    expect((await admin.get(`/api/members/${owner.id}/badge.svg`)).status).toBe(200);
  });
});

describe('GET /api/members/:id/badge-card.pdf', () => {
  it('is one page of ISO/IEC 7810 ID-1 size within 0.1 mm, read back with pdf-lib', async () => {
    const client = await signedIn(ctx, 'member');

    const res = await client.get(`/api/members/${client.member.id}/badge-card.pdf`).buffer(true);

    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect(res.headers['cache-control']).toBe('no-store');
    const doc = await PDFDocument.load(res.body as Buffer);
    expect(doc.getPageCount()).toBe(1);
    const { width, height } = doc.getPage(0).getSize();
    // ISO/IEC 7810 ID-1: 85.60 × 53.98 mm.
    expect(Math.abs(width * PT_TO_MM - 85.6)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(height * PT_TO_MM - 53.98)).toBeLessThanOrEqual(0.1);
    expect(await activeBadges(client.member.id)).toHaveLength(1);
  });

  it('lets an admin print anyone’s card; a member or an instructor printing another’s gets 403', async () => {
    const owner = await createMember(ctx.db);
    const member = await signedIn(ctx, 'member');
    const instructor = await signedIn(ctx, 'instructor');
    const admin = await signedIn(ctx, 'admin');

    for (const other of [member, instructor]) expect((await other.get(`/api/members/${owner.id}/badge-card.pdf`)).status).toBe(403);
    expect((await admin.get(`/api/members/${owner.id}/badge-card.pdf`)).status).toBe(200);
    expect((await request(ctx.app).get(`/api/members/${owner.id}/badge-card.pdf`)).status).toBe(401);
  });

  it('carries the member’s photo once one is uploaded', async () => {
    const client = await signedIn(ctx, 'member');
    const before = await client.get(`/api/members/${client.member.id}/badge-card.pdf`).buffer(true);
    expect((before.body as Buffer).toString('latin1')).not.toContain('/Subtype /Image');

    await upload(client, `/api/members/${client.member.id}/photo`, 'photo', await jpeg(300, 400), { filename: 'me.jpg', contentType: 'image/jpeg' });
    const after = await client.get(`/api/members/${client.member.id}/badge-card.pdf`).buffer(true);

    expect((after.body as Buffer).toString('latin1')).toContain('/Subtype /Image');
  });
});

describe('GET /api/badges/sheet.pdf', () => {
  it('lets an admin print cards for many members, eight to a US Letter page, issuing badges that were missing', async () => {
    const admin = await signedIn(ctx, 'admin');
    const members = await Promise.all(Array.from({ length: 9 }, () => createMember(ctx.db)));

    const res = await admin.get(`/api/badges/sheet.pdf?memberIds=${members.map((m) => m.id).join(',')}`).buffer(true);

    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const doc = await PDFDocument.load(res.body as Buffer);
    expect(doc.getPageCount()).toBe(2);
    // US Letter: 8.5 × 11 in.
    expect(doc.getPage(0).getSize()).toEqual({ width: 612, height: 792 });
    for (const member of members) expect(await activeBadges(member.id)).toHaveLength(1);
  });

  it('prints on A4 when asked (ISO 216: 210 × 297 mm)', async () => {
    const admin = await signedIn(ctx, 'admin');
    const member = await createMember(ctx.db);

    const res = await admin.get(`/api/badges/sheet.pdf?memberIds=${member.id}&paper=a4`).buffer(true);

    const { width, height } = (await PDFDocument.load(res.body as Buffer)).getPage(0).getSize();
    expect(Math.abs(width * PT_TO_MM - 210)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(height * PT_TO_MM - 297)).toBeLessThanOrEqual(0.1);
  });

  it('answers 404 member_not_found for an unknown id and 400 without ids', async () => {
    const admin = await signedIn(ctx, 'admin');
    const member = await createMember(ctx.db);

    const unknown = await admin.get(`/api/badges/sheet.pdf?memberIds=${member.id},00000000-0000-4000-8000-000000000000`);
    expect(unknown.status).toBe(404);
    expect(unknown.body.code).toBe('member_not_found');
    const none = await admin.get('/api/badges/sheet.pdf');
    expect(none.status).toBe(400);
    expect(Object.keys(none.body.errors)).toEqual(['memberIds']);
  });

  it('is refused with 403 to members and instructors, even for their own card', async () => {
    for (const role of ['member', 'instructor'] as const) {
      const client = await signedIn(ctx, role);
      const res = await client.get(`/api/badges/sheet.pdf?memberIds=${client.member.id}`);
      expect(res.status).toBe(403);
    }
  });
});

describe('PUT /api/members/:id/photo', () => {
  it('stores a PNG as a JPEG of at most 600 × 600, keeping the aspect ratio', async () => {
    const client = await signedIn(ctx, 'member');

    const res = await upload(client, `/api/members/${client.member.id}/photo`, 'photo', await png(1200, 800), { filename: 'me.png', contentType: 'image/png' });

    expect(res.status).toBe(204);
    const stored = await ctx.db('member_photos').first('image', 'content_type').where({ member_id: client.member.id });
    expect(stored.content_type).toBe('image/jpeg');
    const meta = await sharp(stored.image).metadata();
    expect(meta).toMatchObject({ format: 'jpeg', width: 600, height: 400 });
  });

  it('applies the EXIF orientation and strips the metadata', async () => {
    const client = await signedIn(ctx, 'member');
    // EXIF (CIPA DC-008) orientation 6: the camera was turned; the picture shows rotated 90° clockwise.
    const sideways = await sharp({ create: { width: 400, height: 200, channels: 3, background: '#336699' } })
      .jpeg()
      .withMetadata({ orientation: 6, exif: { IFD0: { Copyright: 'Test camera owner' } } })
      .toBuffer();
    expect((await sharp(sideways).metadata()).orientation).toBe(6);

    await upload(client, `/api/members/${client.member.id}/photo`, 'photo', sideways, { filename: 'me.jpg', contentType: 'image/jpeg' });

    const stored = await ctx.db('member_photos').first('image').where({ member_id: client.member.id });
    const meta = await sharp(stored.image).metadata();
    expect(meta).toMatchObject({ width: 200, height: 400 });
    expect(meta.orientation).toBeUndefined();
    expect(meta.exif).toBeUndefined();
    expect(meta.icc).toBeUndefined();
  });

  it('refuses a text file renamed photo.jpg with 415 unsupported_type, and stores nothing', async () => {
    const client = await signedIn(ctx, 'member');

    const res = await upload(client, `/api/members/${client.member.id}/photo`, 'photo', Buffer.from('not a picture at all\n'.repeat(50)), {
      filename: 'photo.jpg',
      contentType: 'image/jpeg',
    });

    expect(res.status).toBe(415);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('unsupported_type');
    expect(res.body.errors.photo).toHaveLength(1);
    expect(await ctx.db('member_photos').where({ member_id: client.member.id })).toHaveLength(0);
  });

  it('refuses a GIF, a PDF and a JPEG header on garbage with 415', async () => {
    const client = await signedIn(ctx, 'member');
    const gif = await sharp({ create: { width: 20, height: 20, channels: 3, background: '#000' } }).gif().toBuffer();
    const pdf = Buffer.from('%PDF-1.4\n1 0 obj\n<< >>\nendobj\ntrailer\n<< >>\n%%EOF\n');
    const brokenJpeg = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(2000, 7)]);

    for (const data of [gif, pdf, brokenJpeg]) {
      const res = await upload(client, `/api/members/${client.member.id}/photo`, 'photo', data, { filename: 'photo.jpg', contentType: 'image/jpeg' });
      expect(res.status).toBe(415);
      expect(res.body.code).toBe('unsupported_type');
    }
    expect(await ctx.db('member_photos').where({ member_id: client.member.id })).toHaveLength(0);
  });

  it('refuses a 6 MB file with 413 too_large, and stores nothing', async () => {
    const client = await signedIn(ctx, 'member');
    const big = Buffer.concat([await jpeg(100, 100), Buffer.alloc(6 * 1024 * 1024 - 10_000)]);
    expect(big.length).toBeGreaterThan(PHOTO_MAX_BYTES);

    const res = await upload(client, `/api/members/${client.member.id}/photo`, 'photo', big, { filename: 'big.jpg', contentType: 'image/jpeg' });

    expect(res.status).toBe(413);
    expect(res.body.code).toBe('too_large');
    expect(res.body.detail).toContain('5 MB');
    expect(await ctx.db('member_photos').where({ member_id: client.member.id })).toHaveLength(0);
  });

  it('answers 400 file_missing without a file and 400 unexpected_file for another field name', async () => {
    const client = await signedIn(ctx, 'member');

    const none = await client.agent
      .put(`/api/members/${client.member.id}/photo`)
      .set('x-forwarded-for', client.ip)
      .set('x-csrf-token', client.token)
      .field('note', 'no file here');
    const otherField = await upload(client, `/api/members/${client.member.id}/photo`, 'picture', await jpeg(10, 10), { filename: 'me.jpg', contentType: 'image/jpeg' });

    expect(none.status).toBe(400);
    expect(none.body.code).toBe('file_missing');
    expect(otherField.status).toBe(400);
    expect(otherField.body.code).toBe('unexpected_file');
  });

  it('lets an admin set anyone’s photo; a member or an instructor setting another’s gets 403', async () => {
    const owner = await createMember(ctx.db);
    const photo = await jpeg(50, 50);
    const file = { filename: 'p.jpg', contentType: 'image/jpeg' };

    for (const role of ['member', 'instructor'] as const) {
      const other = await signedIn(ctx, role);
      expect((await upload(other, `/api/members/${owner.id}/photo`, 'photo', photo, file)).status).toBe(403);
    }
    expect(await ctx.db('member_photos').where({ member_id: owner.id })).toHaveLength(0);
    const admin = await signedIn(ctx, 'admin');
    expect((await upload(admin, `/api/members/${owner.id}/photo`, 'photo', photo, file)).status).toBe(204);
  });

  it('answers 401 when signed out, and 403 csrf_invalid without the CSRF header', async () => {
    const client = await signedIn(ctx, 'member');
    const photo = await jpeg(10, 10);

    const anonymous = await browser(ctx);
    const signedOut = await upload(anonymous, `/api/members/${client.member.id}/photo`, 'photo', photo, { filename: 'p.jpg', contentType: 'image/jpeg' });
    const noCsrf = await client.agent.put(`/api/members/${client.member.id}/photo`).set('x-forwarded-for', client.ip).attach('photo', photo, 'p.jpg');

    expect(signedOut.status).toBe(401);
    expect(noCsrf.status).toBe(403);
    expect(noCsrf.body.code).toBe('csrf_invalid');
  });
});

describe('GET /api/members/:id/photo', () => {
  it('answers the member their own photo as image/jpeg, and instructors and admins anyone’s', async () => {
    const owner = await signedIn(ctx, 'member');
    await upload(owner, `/api/members/${owner.member.id}/photo`, 'photo', await jpeg(120, 160), { filename: 'me.jpg', contentType: 'image/jpeg' });

    for (const client of [owner, await signedIn(ctx, 'instructor'), await signedIn(ctx, 'admin')]) {
      const res = await client.get(`/api/members/${owner.member.id}/photo`).buffer(true);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('image/jpeg');
      expect((await sharp(res.body as Buffer).metadata()).format).toBe('jpeg');
    }
  });

  it('is refused with 403 to a member asking for another member’s photo', async () => {
    const owner = await signedIn(ctx, 'member');
    await upload(owner, `/api/members/${owner.member.id}/photo`, 'photo', await jpeg(20, 20), { filename: 'me.jpg', contentType: 'image/jpeg' });
    const other = await signedIn(ctx, 'member');

    const res = await other.get(`/api/members/${owner.member.id}/photo`);

    expect(res.status).toBe(403);
  });

  it('answers 404 no_photo when there is none', async () => {
    const client = await signedIn(ctx, 'member');

    const res = await client.get(`/api/members/${client.member.id}/photo`);

    expect(res.status).toBe(404);
    expect(res.body.code).toBe('no_photo');
  });
});

describe('PUT /api/profile/pin', () => {
  it.each(['123', '1234567', 'abcd', '12 34', '', '١٢٣٤'])('refuses %j with 400 naming pin (4 to 6 ASCII digits)', async (pin) => {
    const client = await signedIn(ctx, 'member');

    const res = await client.put('/api/profile/pin', { pin });

    expect(res.status).toBe(400);
    expect(Object.keys(res.body.errors)).toEqual(['pin']);
    expect((await ctx.db('members').first('pin_hash').where({ id: client.member.id })).pin_hash).toBeNull();
  });

  it('stores the PIN as an argon2id hash that verifyPin accepts, and only that PIN', async () => {
    const client = await signedIn(ctx, 'instructor');

    const res = await client.put('/api/profile/pin', { pin: '480913' });

    expect(res.status).toBe(204);
    const { pin_hash: pinHash } = await ctx.db('members').first('pin_hash').where({ id: client.member.id });
    // OWASP Password Storage Cheat Sheet: argon2id, m = 19 MiB, t = 2, p = 1.
    expect(pinHash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
    expect(pinHash).not.toContain('480913');
    expect(await verifyPassword(pinHash, '480913')).toBe(true);
    expect(await service.verifyPin(client.member.id, '480913')).toBe(true);
    expect(await service.verifyPin(client.member.id, '480914')).toBe(false);
    expect(await service.verifyPin(client.member.id, '48091')).toBe(false);
  });

  it('replaces an earlier PIN', async () => {
    const client = await signedIn(ctx, 'member');
    await client.put('/api/profile/pin', { pin: '2468' });

    await client.put('/api/profile/pin', { pin: '1357' });

    expect(await service.verifyPin(client.member.id, '2468')).toBe(false);
    expect(await service.verifyPin(client.member.id, '1357')).toBe(true);
  });

  it('verifyPin is false for a member without a PIN and for an unknown member', async () => {
    const member = await createMember(ctx.db);

    expect(await service.verifyPin(member.id, '0000')).toBe(false);
    expect(await service.verifyPin('00000000-0000-4000-8000-000000000000', '0000')).toBe(false);
  });

  it('answers 401 when signed out', async () => {
    const anonymous = await browser(ctx);

    const res = await anonymous.put('/api/profile/pin', { pin: '1234' });

    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });
});
