import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { cribItemSchema, PHOTO_MAX_BYTES } from '@chuckkey/core';
import { signedIn, type Browser } from '../../test/harness';
import { cribFixtures } from './crib.fixtures';

const crib = cribFixtures();

function upload(client: Browser, itemId: string, data: Buffer, file: { filename: string; contentType: string }) {
  return client.agent.put(`/api/crib/items/${itemId}/photo`).set('x-forwarded-for', client.ip).set('x-csrf-token', client.token).attach('photo', data, file);
}

const png = (width: number, height: number) =>
  sharp({ create: { width, height, channels: 4, background: { r: 180, g: 40, b: 30, alpha: 1 } } }).png().toBuffer();

const storedPhotos = (itemId: string) => crib.ctx.db('crib_item_photos').where({ item_id: itemId });

describe('crib item photos', () => {
  it('stores a PNG, answers the item with hasPhoto, and serves the picture to a signed-in member', async () => {
    const item = await crib.tool();
    expect(item.hasPhoto).toBe(false);

    const res = await upload(crib.admin, item.id, await png(800, 400), { filename: 'gauge.png', contentType: 'image/png' });

    expect(res.status).toBe(200);
    expect(cribItemSchema.parse(res.body)).toMatchObject({ id: item.id, hasPhoto: true });
    const listed = ((await crib.admin.get('/api/crib/items')).body as unknown[]).map((row) => cribItemSchema.parse(row));
    expect(listed.find((row) => row.id === item.id)?.hasPhoto).toBe(true);

    const member = await signedIn(crib.ctx, 'member');
    const served = await member.get(`/api/crib/items/${item.id}/photo`).buffer(true);
    expect(served.status).toBe(200);
    // Stored as member photos are: at most 600 × 600 with the aspect ratio kept, re-encoded as JPEG.
    expect(served.headers['content-type']).toBe('image/jpeg');
    const meta = await sharp(served.body as Buffer).metadata();
    expect(meta).toMatchObject({ format: 'jpeg', width: 600, height: 300 });
    // The colour survives the re-encoding (JPEG is lossy, so within a small margin).
    const { data } = await sharp(served.body as Buffer).raw().toBuffer({ resolveWithObject: true });
    expect(Math.abs(data[0]! - 180)).toBeLessThan(8);
  });

  it('refuses a text file named .jpg with 415 unsupported_type, and stores nothing', async () => {
    const item = await crib.tool();

    const res = await upload(crib.admin, item.id, Buffer.from('this is a parts list, not a picture\n'.repeat(40)), { filename: 'gauge.jpg', contentType: 'image/jpeg' });

    expect(res.status).toBe(415);
    expect(res.headers['content-type']).toContain('application/problem+json');
    expect(res.body.code).toBe('unsupported_type');
    expect(res.body.errors.photo).toHaveLength(1);
    expect(await storedPhotos(item.id)).toHaveLength(0);
  });

  it('refuses a file over the member photos’ size limit with 413 too_large, and stores nothing', async () => {
    const item = await crib.tool();
    const big = Buffer.concat([await png(50, 50), Buffer.alloc(PHOTO_MAX_BYTES)]);

    const res = await upload(crib.admin, item.id, big, { filename: 'big.png', contentType: 'image/png' });

    expect(res.status).toBe(413);
    expect(res.body.code).toBe('too_large');
    expect(await storedPhotos(item.id)).toHaveLength(0);
  });

  it('refuses a member with 403 for setting or removing a photo', async () => {
    const item = await crib.tool();
    const member = await signedIn(crib.ctx, 'member');

    const put = await upload(member, item.id, await png(20, 20), { filename: 'p.png', contentType: 'image/png' });
    const remove = await member.delete(`/api/crib/items/${item.id}/photo`);

    expect(put.status).toBe(403);
    expect(remove.status).toBe(403);
    expect(await storedPhotos(item.id)).toHaveLength(0);
  });

  it('removes the photo with 204, after which the item has none and the picture answers 404 no_photo', async () => {
    const item = await crib.tool();
    await upload(crib.admin, item.id, await png(40, 40), { filename: 'p.png', contentType: 'image/png' });

    const res = await crib.admin.delete(`/api/crib/items/${item.id}/photo`);

    expect(res.status).toBe(204);
    expect(await storedPhotos(item.id)).toHaveLength(0);
    const photo = await crib.admin.get(`/api/crib/items/${item.id}/photo`);
    expect(photo.status).toBe(404);
    expect(photo.body.code).toBe('no_photo');
  });

  it('answers 404 crib_item_not_found for a photo of an item that does not exist', async () => {
    const res = await upload(crib.admin, randomUUID(), await png(20, 20), { filename: 'p.png', contentType: 'image/png' });
    expect(res.status).toBe(404);
    expect(res.body.code).toBe('crib_item_not_found');
  });
});
