import { io as connect, type Socket as ClientSocket } from 'socket.io-client';
import type { Server } from 'socket.io';
import { LIVE_PATH, MACHINE_UPDATE, machineUpdateSchema, type BoardState, type MachineUpdate, type Role } from '@chuckkey/core';
import { createMember, type CreatedMember } from '@chuckkey/db/factories';
import { createApp } from '../app';
import { createDb } from '../lib/db';
import type { Deps } from '../lib/deps';
import { createLogger } from '../lib/logger';
import { createMailer } from '../lib/mailer';
import { listen } from '../http-server';
import { createLiveUpdates } from '../realtime/live-updates';
import { SESSION_COOKIE } from '../middleware/session';
import { setCookie } from '../modules/station/station.fixtures';
import { browser, testConfig, type Browser, type TestContext } from './harness';

/** A server process of its own in the test: the app on a real HTTP server, with live updates. */
export interface LiveServer extends TestContext {
  url: string;
  io: Server;
  deps: Deps;
}

/**
 * Starts the app as main.ts does, on a free loopback port. Processes tell each other they are alive
 * every 100 ms instead of every 5 s, so that a test need not wait long to see the other process
 * (pass `{}` as options for the production heartbeat).
 */
export async function startLiveServer(
  overrides: Record<string, string> = {},
  options: { heartbeatIntervalMs?: number } = { heartbeatIntervalMs: 100 },
): Promise<LiveServer> {
  const config = testConfig(overrides);
  const logger = createLogger(process.env.TEST_LOG_LEVEL ?? 'silent');
  const db = createDb(config.DATABASE_URL, logger, 5);
  const mailer = createMailer(config.SMTP_URL, config.MAIL_FROM, logger);
  const live = createLiveUpdates({ config, db, logger }, options);
  const deps: Deps = { config, db, logger, mailer, live };
  const { app, close, signIn } = createApp(deps);
  const http = await listen(app, 0, '127.0.0.1');
  const io = live.attach(http.server, signIn);
  return {
    app,
    db,
    config,
    deps,
    io,
    url: `http://127.0.0.1:${http.port}`,
    async close() {
      const finished = http.shutdown(1_000);
      await live.close();
      await finished;
      await close();
      mailer.close();
      await db.destroy();
    },
  };
}

/** Waits until every server sees all the others through PostgreSQL, so a broadcast reaches each. */
export async function serversSeeEachOther(servers: LiveServer[]): Promise<void> {
  for (;;) {
    const counts = await Promise.all(servers.map((server) => server.io.of('/').adapter.serverCount()));
    if (counts.every((count) => count >= servers.length)) return;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** A socket.io client as the kiosk's, over WebSocket, sending the cookie a browser would. */
export function liveClient(server: { url: string }, cookie?: string): ClientSocket {
  return connect(server.url, {
    path: LIVE_PATH,
    transports: ['websocket'],
    extraHeaders: cookie ? { cookie } : {},
    reconnection: false,
    forceNew: true,
  });
}

/** Resolves once connected; rejects with the server's reason when the handshake is refused. */
export function connected(socket: ClientSocket): Promise<ClientSocket> {
  return new Promise((resolve, reject) => {
    socket.once('connect', () => resolve(socket));
    socket.once('connect_error', reject);
  });
}

/** The message of the handshake's refusal. */
export function refusal(socket: ClientSocket): Promise<string> {
  return new Promise((resolve, reject) => {
    socket.once('connect', () => reject(new Error('the handshake was accepted')));
    socket.once('connect_error', (error) => resolve(error.message));
  });
}

/** The arguments of the next event of that name. */
export function nextEvent(socket: ClientSocket, name: string): Promise<unknown[]> {
  return new Promise((resolve) => socket.once(name, (...args: unknown[]) => resolve(args)));
}

/**
 * The next `machine:update` about this machine in that state, checked against the core schema, and
 * the raw payload as it arrived. Other machines' events, and this one's earlier announcements still
 * on their way (its pairing, say), are passed over.
 */
export function nextUpdate(socket: ClientSocket, machineId: string, state: BoardState): Promise<{ update: MachineUpdate; raw: unknown }> {
  return new Promise((resolve) => {
    const listener = (raw: unknown) => {
      const update = machineUpdateSchema.parse(raw);
      if (update.machineId !== machineId || update.state !== state) return;
      socket.off(MACHINE_UPDATE, listener);
      resolve({ update, raw });
    };
    socket.on(MACHINE_UPDATE, listener);
  });
}

/** A person signed in through POST /api/auth/login, with the session cookie their browser holds. */
export async function signedInWithCookie(ctx: TestContext, role: Role = 'member', fields: Parameters<typeof createMember>[1] = {}) {
  const member: CreatedMember = await createMember(ctx.db, { role, ...fields });
  const client: Browser = await browser(ctx);
  const res = await client.post('/api/auth/login', { email: member.email, password: member.password });
  if (res.status !== 200) throw new Error(`sign-in for the test failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { ...client, member, cookie: setCookie(res, SESSION_COOKIE) };
}
