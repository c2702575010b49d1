import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createArea, createMachine } from '@chuckkey/db/factories';
import { createTestContext, signedIn, type TestContext } from '../../test/harness';

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

describe('GET /api/shop', () => {
  it('without signing in, answers the name, town and time zone of the shop', async () => {
    const res = await request(ctx.app).get('/api/shop');

    expect(res.status).toBe(200);
    expect(res.body).toEqual({ name: 'Test Shop', town: 'Testville', timeZone: 'UTC' });
  });
});

describe('GET /api/machines', () => {
  it('when signed out, answers 401 unauthenticated', async () => {
    const res = await request(ctx.app).get('/api/machines');

    expect(res.status).toBe(401);
    expect(res.body.code).toBe('unauthenticated');
  });

  it('for a signed-in member, lists a machine with its area name, category and meter hours as a number', async () => {
    const area = await createArea(ctx.db, { name: `Welding bay ${randomUUID().slice(0, 8)}` });
    const machine = await createMachine(ctx.db, { name: `TIG ${randomUUID().slice(0, 8)}`, category: 'tig_welder', area_id: area.id, reservable: true, meter_hours: 1234.5 });
    const member = await signedIn(ctx, 'member');

    const res = await member.get('/api/machines');

    expect(res.status).toBe(200);
    const listed = res.body.items.find((m: { id: string }) => m.id === machine.id);
    expect(listed).toEqual({ id: machine.id, name: machine.name, category: 'tig_welder', area: area.name, reservable: true, meterHours: 1234.5 });
    expect(typeof listed.meterHours).toBe('number');
  });
});
