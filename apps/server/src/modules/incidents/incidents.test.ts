import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { INCIDENT_PHOTO_MAX_BYTES, incidentListSchema, incidentNoteSchema, incidentSchema, type Incident } from '@chuckkey/core';
import { createArea, createMachine, createMember } from '@chuckkey/db/factories';
import { caughtMail, clientAddress, countMail, createTestContext, signedIn, type Browser, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

interface Attachment {
  data: Buffer;
  filename: string;
  contentType: string;
}

const png = (width = 40, height = 30) =>
  sharp({ create: { width, height, channels: 3, background: { r: 30, g: 90, b: 160 } } }).png().toBuffer();
const jpeg = () => sharp({ create: { width: 32, height: 32, channels: 3, background: { r: 200, g: 200, b: 40 } } }).jpeg().toBuffer();
const pngFile = async (name = 'vise.png'): Promise<Attachment> => ({ data: await png(), filename: name, contentType: 'image/png' });

function fields(overrides: Record<string, string> = {}): Record<string, string> {
  return {
    occurredAt: new Date(Date.now() - 60 * 60 * 1000).toISOString(),
    location: 'Beside the surface grinder',
    kind: 'near_miss',
    description: 'A chuck key was left in the lathe chuck; the spindle was stopped before it turned.',
    ...overrides,
  };
}

function report(client: Browser, body: Record<string, string>, photos: Attachment[] = []) {
  let req = client.agent.post('/api/incidents').set('x-forwarded-for', client.ip).set('x-csrf-token', client.token);
  for (const [key, value] of Object.entries(body)) req = req.field(key, value);
  for (const photo of photos) req = req.attach('photos', photo.data, { filename: photo.filename, contentType: photo.contentType });
  return req;
}

async function reported(client: Browser, body = fields(), photos: Attachment[] = []): Promise<Incident> {
  const res = await report(client, body, photos);
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return incidentSchema.parse(res.body);
}

/** Everything a refused report could have left behind: the report, its photos, its audit entry. */
async function storedBy(memberId: string) {
  const incidents = await ctx.db('incidents').where({ reported_by: memberId }).select('id');
  const photos = await ctx.db('incident_photos').whereIn('incident_id', incidents.map((row) => row.id)).count({ count: '*' });
  const audit = await ctx.db('audit_log').where({ actor_id: memberId, action: 'incident.reported' }).count({ count: '*' });
  return { incidents: incidents.length, photos: Number(photos[0]?.count), audit: Number(audit[0]?.count) };
}

const nothing = { incidents: 0, photos: 0, audit: 0 };

describe('POST /api/incidents', () => {
  it('stores a member’s report with its photos as sent, and records it in the audit log', async () => {
    const member = await signedIn(ctx, 'member');
    const area = await createArea(ctx.db);
    const machine = await createMachine(ctx.db, { area_id: area.id });
    const first = await pngFile('guard.png');
    const second = { data: await jpeg(), filename: 'blade.jpg', contentType: 'image/jpeg' };

    const incident = await reported(member, fields({ areaId: area.id, machineId: machine.id, location: '', firstAid: '' }), [first, second]);

    expect(incident).toMatchObject({
      kind: 'near_miss',
      status: 'open',
      area: { id: area.id, name: area.name },
      location: null,
      machine: { id: machine.id, name: machine.name },
      reportedBy: { id: member.member.id },
      firstAid: null,
      photoCount: 2,
      notes: [],
    });
    expect(incident.photos).toEqual([
      { n: 1, contentType: 'image/png', size: first.data.length },
      { n: 2, contentType: 'image/jpeg', size: second.data.length },
    ]);
    const served = await member.get(`/api/incidents/${incident.id}/photos/1`).buffer(true);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(served.body as Buffer, first.data)).toBe(0);
    expect(await storedBy(member.member.id)).toEqual({ incidents: 1, photos: 2, audit: 1 });
  });

  it('refuses a GIF among PNGs with 415 unsupported_type, and stores nothing', async () => {
    const member = await signedIn(ctx, 'member');
    // GIF89a signature (the GIF89a specification, "Header"); the IANA type image/gif is not allowed.
    const gif = await sharp({ create: { width: 8, height: 8, channels: 3, background: '#888' } }).gif().toBuffer();
    expect(gif.subarray(0, 6).toString('latin1')).toBe('GIF89a');

    const res = await report(member, fields(), [await pngFile(), { data: gif, filename: 'sparks.png', contentType: 'image/png' }]);

    expect(res.status).toBe(415);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('unsupported_type');
    expect(res.body.errors.photos[0]).toContain('sparks.png');
    expect(await storedBy(member.member.id)).toEqual(nothing);
  });

  it('refuses a text file named .jpg, and a PNG cut off after its header, with 415 and stores nothing', async () => {
    const member = await signedIn(ctx, 'member');
    const whole = await png(400, 400);
    // The PNG signature and IHDR survive (PNG specification §5.2, §11.2.2), the image data does not.
    const cut = whole.subarray(0, 40);

    const text = await report(member, fields(), [{ data: Buffer.from('feeds and speeds for 6061\n'.repeat(50)), filename: 'chart.jpg', contentType: 'image/jpeg' }]);
    const truncated = await report(member, fields(), [{ data: cut, filename: 'cut.png', contentType: 'image/png' }]);

    expect(text.status).toBe(415);
    expect(text.body.code).toBe('unsupported_type');
    expect(truncated.status).toBe(415);
    expect(truncated.body.code).toBe('unsupported_type');
    expect(await storedBy(member.member.id)).toEqual(nothing);
  });

  it('refuses a photo one byte over 10 MB with 413 too_large, and stores nothing', async () => {
    const member = await signedIn(ctx, 'member');
    const small = await png();
    const big = Buffer.concat([small, Buffer.alloc(INCIDENT_PHOTO_MAX_BYTES + 1 - small.length)]);
    expect(big.length).toBe(10 * 1024 * 1024 + 1);

    const res = await report(member, fields(), [await pngFile(), { data: big, filename: 'big.png', contentType: 'image/png' }]);

    expect(res.status).toBe(413);
    expect(res.body.code).toBe('too_large');
    expect(res.body.errors.photos).toHaveLength(1);
    expect(await storedBy(member.member.id)).toEqual(nothing);
  });

  it('takes five photos and refuses six with 400 too_many_photos, storing nothing', async () => {
    const member = await signedIn(ctx, 'member');
    const photo = await pngFile();

    const six = await report(member, fields(), Array.from({ length: 6 }, () => photo));
    expect(six.status).toBe(400);
    expect(six.body.code).toBe('too_many_photos');
    expect(await storedBy(member.member.id)).toEqual(nothing);

    const five = await reported(member, fields(), Array.from({ length: 5 }, () => photo));
    expect(five.photos.map((p) => p.n)).toEqual([1, 2, 3, 4, 5]);
  });

  it('refuses missing fields with 400 validation_failed naming each one, and stores nothing', async () => {
    const member = await signedIn(ctx, 'member');

    const res = await report(member, { kind: 'fire', location: '', description: 'short' }, [await pngFile()]);

    expect(res.status).toBe(400);
    expect(res.body.code).toBe('validation_failed');
    expect(Object.keys(res.body.errors).sort()).toEqual(['description', 'kind', 'location', 'occurredAt']);
    expect(await storedBy(member.member.id)).toEqual(nothing);
  });

  it('refuses a time in the future and an unknown machine, and stores nothing', async () => {
    const member = await signedIn(ctx, 'member');

    const future = await report(member, fields({ occurredAt: new Date(Date.now() + 24 * 60 * 60 * 1000).toISOString() }));
    const unknown = await report(member, fields({ machineId: randomUUID() }), [await pngFile()]);

    expect(future.status).toBe(400);
    expect(future.body.errors.occurredAt).toHaveLength(1);
    expect(unknown.status).toBe(400);
    expect(unknown.body.code).toBe('unknown_machine');
    expect(await storedBy(member.member.id)).toEqual(nothing);
  });

  it('answers 401 when signed out', async () => {
    const ip = clientAddress();
    const agent = request.agent(ctx.app);
    const { token } = (await agent.get('/api/auth/csrf').set('x-forwarded-for', ip)).body as { token: string };
    const res = await agent.post('/api/incidents').set('x-forwarded-for', ip).set('x-csrf-token', token).field(fields());
    expect(res.status).toBe(401);
  });
});

describe('injury mail', () => {
  it('mails every active admin at once about an injury, and no one else', async () => {
    const [first, second] = [await createMember(ctx.db, { role: 'admin' }), await createMember(ctx.db, { role: 'admin' })];
    const inactive = await createMember(ctx.db, { role: 'admin', active: false });
    const instructor = await createMember(ctx.db, { role: 'instructor' });
    const machine = await createMachine(ctx.db);
    const member = await signedIn(ctx, 'member', { first_name: 'Odalys', last_name: 'Brennick' });

    const incident = await reported(
      member,
      fields({ kind: 'injury', machineId: machine.id, description: 'Cut to the left thumb on a burr while deburring.', firstAid: 'Washed, plaster from the first-aid box.' }),
    );

    for (const admin of [first, second]) {
      const mail = await caughtMail(ctx.db, admin.email);
      expect(mail.subject).toBe(`Injury reported: ${machine.name}`);
      expect(mail.text).toContain('Odalys Brennick reported an injury');
      expect(mail.text).toContain('Cut to the left thumb on a burr while deburring.');
      expect(mail.text).toContain('First aid given: Washed, plaster from the first-aid box.');
      expect(mail.text).toContain(`http://chuckkey.test/upkeep/incidents/${incident.id}`);
    }
    expect(await countMail(ctx.db, inactive.email)).toBe(0);
    expect(await countMail(ctx.db, instructor.email)).toBe(0);
    expect(await countMail(ctx.db, member.member.email)).toBe(0);
  });

  it('sends nothing for a near miss or damage', async () => {
    const admin = await createMember(ctx.db, { role: 'admin' });
    const member = await signedIn(ctx, 'member');

    await reported(member, fields({ kind: 'near_miss' }));
    await reported(member, fields({ kind: 'damage', description: 'The band saw blade guard was bent by a falling bar.' }));
    // An injury reported after them is the only mail that arrives.
    await reported(member, fields({ kind: 'injury', description: 'A metal splinter in the palm, removed with tweezers.' }));

    const mail = await caughtMail(ctx.db, admin.email);
    expect(mail.text).toContain('metal splinter');
    expect(await countMail(ctx.db, admin.email)).toBe(1);
  });
});

describe('reading and reviewing reports', () => {
  it('lists reports for admins newest first, filtered by status and kind', async () => {
    const admin = await signedIn(ctx, 'admin');
    const member = await signedIn(ctx, 'member');
    const older = await reported(member, fields({ occurredAt: '2026-11-02T10:00:00Z', kind: 'damage', description: 'Vise jaw chipped by a hammer blow.' }));
    const newer = await reported(member, fields({ occurredAt: '2026-11-03T10:00:00Z' }));
    await admin.patch(`/api/incidents/${older.id}`, { status: 'closed' });

    const all = incidentListSchema.parse((await admin.get('/api/incidents')).body).items.map((row) => row.id);
    const closedDamage = incidentListSchema.parse((await admin.get('/api/incidents?status=closed&kind=damage')).body).items.map((row) => row.id);
    const openNearMiss = incidentListSchema.parse((await admin.get('/api/incidents?status=open&kind=near_miss')).body).items.map((row) => row.id);

    expect(all.indexOf(newer.id)).toBeLessThan(all.indexOf(older.id));
    expect(closedDamage).toContain(older.id);
    expect(closedDamage).not.toContain(newer.id);
    expect(openNearMiss).toContain(newer.id);
    expect(openNearMiss).not.toContain(older.id);
    const bad = await admin.get('/api/incidents?status=lost');
    expect(bad.status).toBe(400);
    expect(bad.body.errors.status).toHaveLength(1);
  });

  it('lets the reporter read their own report and photos, and answers 404 to other members and instructors', async () => {
    const reporter = await signedIn(ctx, 'member');
    const other = await signedIn(ctx, 'member');
    const instructor = await signedIn(ctx, 'instructor');
    const admin = await signedIn(ctx, 'admin');
    const incident = await reported(reporter, fields(), [await pngFile()]);

    expect((await reporter.get(`/api/incidents/${incident.id}`)).status).toBe(200);
    expect((await admin.get(`/api/incidents/${incident.id}/photos/1`)).status).toBe(200);
    for (const client of [other, instructor]) {
      const page = await client.get(`/api/incidents/${incident.id}`);
      const photo = await client.get(`/api/incidents/${incident.id}/photos/1`);
      expect(page.status).toBe(404);
      expect(page.body.code).toBe('incident_not_found');
      expect(photo.status).toBe(404);
    }
    const missing = await reporter.get(`/api/incidents/${incident.id}/photos/2`);
    expect(missing.status).toBe(404);
    expect(missing.body.code).toBe('photo_not_found');
  });

  it('keeps the list, the status and the notes to admins (403 for members and instructors)', async () => {
    const reporter = await signedIn(ctx, 'member');
    const instructor = await signedIn(ctx, 'instructor');
    const incident = await reported(reporter, fields());

    for (const client of [reporter, instructor]) {
      expect((await client.get('/api/incidents')).status).toBe(403);
      expect((await client.patch(`/api/incidents/${incident.id}`, { status: 'closed' })).status).toBe(403);
      expect((await client.post(`/api/incidents/${incident.id}/notes`, { note: 'Done.' })).status).toBe(403);
    }
    const row = await ctx.db('incidents').first('status').where({ id: incident.id });
    expect(row.status).toBe('open');
  });

  it('lets an admin change the status and add notes, each in the audit log; notes cannot be rewritten', async () => {
    const reporter = await signedIn(ctx, 'member');
    const admin = await signedIn(ctx, 'admin', { first_name: 'Ilse', last_name: 'Marrow' });
    const incident = await reported(reporter, fields());

    const review = await admin.patch(`/api/incidents/${incident.id}`, { status: 'under_review' });
    const added = await admin.post(`/api/incidents/${incident.id}/notes`, { note: '  Chuck key holder with a spring return ordered.  ' });
    const closed = await admin.patch(`/api/incidents/${incident.id}`, { status: 'closed' });

    expect(review.status).toBe(200);
    expect(added.status).toBe(201);
    const note = incidentNoteSchema.parse(added.body);
    expect(note).toMatchObject({ author: { id: admin.member.id, name: 'Ilse Marrow' }, note: 'Chuck key holder with a spring return ordered.' });
    expect(incidentSchema.parse(closed.body)).toMatchObject({ status: 'closed', notes: [{ id: note.id }] });
    const audit = await ctx.db('audit_log').select('action', 'details').where({ entity: 'incident', entity_id: incident.id }).orderBy('id');
    expect(audit).toEqual([
      { action: 'incident.reported', details: { kind: 'near_miss', machineId: null, photos: 0 } },
      { action: 'incident.status_changed', details: { before: 'open', after: 'under_review' } },
      { action: 'incident.note_added', details: { noteId: note.id } },
      { action: 'incident.status_changed', details: { before: 'under_review', after: 'closed' } },
    ]);
    await expect(ctx.db('incident_notes').where({ id: note.id }).update({ note: 'Nothing happened.' })).rejects.toThrow(/never edited/);

    const badStatus = await admin.patch(`/api/incidents/${incident.id}`, { status: 'done' });
    const emptyNote = await admin.post(`/api/incidents/${incident.id}/notes`, { note: '   ' });
    const unknown = await admin.patch(`/api/incidents/${randomUUID()}`, { status: 'closed' });
    expect(badStatus.status).toBe(400);
    expect(badStatus.body.errors.status).toHaveLength(1);
    expect(emptyNote.status).toBe(400);
    expect(emptyNote.body.errors.note).toHaveLength(1);
    expect(unknown.status).toBe(404);
    expect(unknown.body.code).toBe('incident_not_found');
  });
});
