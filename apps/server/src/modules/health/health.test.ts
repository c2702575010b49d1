import net from 'node:net';
import { afterAll, afterEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { inject } from 'vitest';
import { createTestContext, unreachableDatabaseUrl, type TestContext } from '../../test/harness';

/** A TCP relay to PostgreSQL that the test can cut and restore, to play a database outage. */
async function databaseRelay() {
  const target = new URL(inject('databaseUrl'));
  const sockets = new Set<net.Socket>();
  let up = true;
  const server = net.createServer((client) => {
    if (!up) {
      client.destroy();
      return;
    }
    const upstream = net.connect(Number(target.port), target.hostname);
    for (const s of [client, upstream]) {
      sockets.add(s);
      s.on('error', () => s.destroy());
      s.on('close', () => sockets.delete(s));
    }
    client.pipe(upstream).pipe(client);
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const port = (server.address() as net.AddressInfo).port;
  const url = new URL(target);
  url.port = String(port);
  return {
    url: url.toString(),
    cut() {
      up = false;
      for (const s of sockets) s.destroy();
    },
    restore() {
      up = true;
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

describe('GET /api/health', () => {
  const contexts: TestContext[] = [];
  afterEach(async () => {
    await Promise.all(contexts.splice(0).map((c) => c.close()));
  });
  afterAll(async () => {
    await Promise.all(contexts.map((c) => c.close()));
  });

  it('when PostgreSQL answers, says the service and the database are ok', async () => {
    const ctx = createTestContext();
    contexts.push(ctx);
    const res = await request(ctx.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'ok' });
  });

  it('when PostgreSQL is unreachable, answers 503 with database down and keeps serving', async () => {
    const ctx = createTestContext({ DATABASE_URL: await unreachableDatabaseUrl() });
    contexts.push(ctx);
    const first = await request(ctx.app).get('/api/health');
    expect(first.status).toBe(503);
    expect(first.body).toEqual({ status: 'degraded', database: 'down' });
    const second = await request(ctx.app).get('/api/health');
    expect(second.status).toBe(503);
  });

  it('after an outage, recovers by itself once PostgreSQL is back', async () => {
    const relay = await databaseRelay();
    const ctx = createTestContext({ DATABASE_URL: relay.url });
    contexts.push(ctx);
    try {
      expect((await request(ctx.app).get('/api/health')).status).toBe(200);
      relay.cut();
      expect((await request(ctx.app).get('/api/health')).body.database).toBe('down');
      relay.restore();
      const back = await request(ctx.app).get('/api/health');
      expect(back.status).toBe(200);
      expect(back.body).toEqual({ status: 'ok', database: 'ok' });
    } finally {
      await ctx.close();
      contexts.pop();
      await relay.close();
    }
  });
});
