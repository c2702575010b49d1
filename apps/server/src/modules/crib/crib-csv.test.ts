import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cribItemSchema } from '@chuckkey/core';
import { createTestContext, ownDatabase, signedIn, type Browser, type TestContext } from '../../test/harness';

let ctx: TestContext;
let admin: Browser;
// A database of its own: the round trip counts every item in the crib, which other files add to.
beforeAll(async () => {
  ctx = createTestContext({ DATABASE_URL: await ownDatabase('crib_csv') });
  admin = await signedIn(ctx, 'admin');
});
afterAll(() => ctx.close());

const awkwardName = 'Bore gauge, "long" reach\nset of 6';

async function exported(): Promise<Record<string, string>[]> {
  const res = await admin.get('/api/crib/items/export.csv');
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toMatch(/^text\/csv/);
  // RFC 4180, read by papaparse as the independent parser.
  const parsed = Papa.parse<Record<string, string>>(res.text, { header: true, skipEmptyLines: true });
  expect(parsed.errors).toEqual([]);
  return parsed.data;
}

describe('crib inventory as CSV', () => {
  it('exports names holding commas, quotes and line breaks so that an independent parser reads them back whole', async () => {
    const created = await admin.post('/api/crib/items', { kind: 'tool', name: awkwardName, assetTag: 'CSV-1', binLocation: 'Drawer 2, left' });
    expect(created.status).toBe(201);
    const rows = await exported();
    // RFC 4180 §2.6–2.7: quoted fields keep commas, doubled quotes and line breaks.
    expect(rows.find((row) => row.asset_tag === 'CSV-1')).toMatchObject({ name: awkwardName, bin_location: 'Drawer 2, left', kind: 'tool', in_circulation: 'true' });
  });

  it('re-imports its own export unchanged, and adds rows without an id', async () => {
    await admin.post('/api/crib/items', { kind: 'consumable', name: '-Flap disc, "zirconia"', unit: 'each', stock: 7, priceCents: 525 });
    const before = ((await admin.get('/api/crib/items')).body as unknown[]).map((row) => cribItemSchema.parse(row));
    const csv = (await admin.get('/api/crib/items/export.csv')).text;
    const added = 'id,kind,name,asset_tag,serial_number,bin_location,condition,in_circulation,loan_period_hours,unit,stock,reorder_level,price_cents\r\n,tool,"Parting blade, 3/32 in",CSV-2,,,good,true,,,,,\r\n';

    const again = await admin.post('/api/crib/items/import', { csv });
    expect(again.status).toBe(200);
    expect(again.body).toEqual({ created: 0, updated: before.length });
    const after = ((await admin.get('/api/crib/items')).body as unknown[]).map((row) => cribItemSchema.parse(row));
    expect(after).toEqual(before);

    const more = await admin.post('/api/crib/items/import', { csv: added });
    expect(more.body).toEqual({ created: 1, updated: 0 });
    expect(await ctx.db('crib_items').first('name').where({ asset_tag: 'CSV-2' })).toEqual({ name: 'Parting blade, 3/32 in' });
  });

  it('imports nothing when a row is invalid, naming its line', async () => {
    const count = async () => Number((await ctx.db('crib_items').count({ n: '*' }).first())?.n);
    const start = await count();
    const csv =
      'id,kind,name,asset_tag,serial_number,bin_location,condition,in_circulation,loan_period_hours,unit,stock,reorder_level,price_cents\r\n' +
      ',consumable,Good row,,,,,true,,each,3,,100\r\n' +
      ',consumable,Bad row,,,,,true,,each,-2,,100\r\n';
    const res = await admin.post('/api/crib/items/import', { csv });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('csv_rows_invalid');
    expect(res.body.errors['line 3.stock']).toBeDefined();
    expect(await count()).toBe(start);
  });

  it('refuses a file that is not readable CSV, storing nothing', async () => {
    const count = async () => Number((await ctx.db('crib_items').count({ n: '*' }).first())?.n);
    const start = await count();
    // RFC 4180 §2.5–2.7: a quoted field must end in a quote; this one never does.
    const csv =
      'id,kind,name,asset_tag,serial_number,bin_location,condition,in_circulation,loan_period_hours,unit,stock,reorder_level,price_cents\r\n' +
      ',consumable,"Flap discs, 80 grit,,,,,true,,each,3,,100\r\n';
    const res = await admin.post('/api/crib/items/import', { csv });
    expect([res.status, res.body.code]).toEqual([400, 'csv_unreadable']);
    expect(await count()).toBe(start);
  });

  it('answers 403 to a member', async () => {
    const member = await signedIn(ctx, 'member');
    expect((await member.get('/api/crib/items/export.csv')).status).toBe(403);
    expect((await member.post('/api/crib/items/import', { csv: 'id\r\n' })).status).toBe(403);
  });
});
