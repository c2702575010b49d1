import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestContext, type TestContext } from '../../test/harness';

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
