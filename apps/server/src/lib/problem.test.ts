import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createTestContext, unreachableDatabaseUrl, signedIn, type TestContext } from '../test/harness';

// RFC 9457 (problem details): application/problem+json with type, title, status and detail.
function expectProblem(res: request.Response, status: number, code: string) {
  expect(res.status).toBe(status);
  expect(res.headers['content-type']).toContain('application/problem+json');
  expect(res.body).toMatchObject({ status, code });
  expect(typeof res.body.type).toBe('string');
  expect(typeof res.body.title).toBe('string');
  expect(typeof res.body.detail).toBe('string');
  expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js):\d+/);
}

let ctx: TestContext;
beforeAll(() => {
  ctx = createTestContext();
});
afterAll(() => ctx.close());

describe('errors under /api', () => {
  it('malformed JSON answers 400 malformed_json', async () => {
    const client = await signedIn(ctx, 'admin');
    const res = await client.agent
      .patch(`/api/members/${client.member.id}`)
      .set('x-csrf-token', client.token)
      .set('content-type', 'application/json')
      .send('{"role": "adm');
    expectProblem(res, 400, 'malformed_json');
  });

  it('an unknown route answers 404 route_not_found', async () => {
    expectProblem(await request(ctx.app).get('/api/no-such-thing'), 404, 'route_not_found');
    const client = await signedIn(ctx, 'member');
    expectProblem(await client.post('/api/members/everyone/delete', {}), 404, 'route_not_found');
  });

  it('a body that fails its schema answers 400 with the failing fields', async () => {
    const client = await signedIn(ctx, 'admin');
    const res = await client.post('/api/invitations', { email: 'nope', firstName: '', role: 'owner' });
    expectProblem(res, 400, 'validation_failed');
    expect(Object.keys(res.body.errors).sort()).toEqual(['email', 'firstName', 'lastName', 'role']);
  });

  it('bad query parameters and path parameters answer 400 naming them', async () => {
    const client = await signedIn(ctx, 'admin');
    const query = await client.get('/api/members?pageSize=lots');
    expectProblem(query, 400, 'validation_failed');
    expect(query.body.errors.pageSize).toBeDefined();
    const params = await client.patch('/api/members/not-a-uuid', { role: 'member' });
    expectProblem(params, 400, 'validation_failed');
    expect(params.body.errors.id).toBeDefined();
  });

  it('an unexpected failure answers a bare 500 with a reference and no stack', async () => {
    const down = createTestContext({ DATABASE_URL: await unreachableDatabaseUrl() });
    try {
      const res = await request(down.app).get('/api/shop').set('x-request-id', 'trace-me-123');
      expectProblem(res, 500, 'internal_error');
      expect(res.body.detail).toContain('trace-me-123');
      expect(res.body.errors).toBeUndefined();
      expect(res.headers['x-request-id']).toBe('trace-me-123');
    } finally {
      await down.close();
    }
  });
});
