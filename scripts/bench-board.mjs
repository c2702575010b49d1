// pnpm bench:board: how fast a machine's change reaches the wall boards. A throwaway database
// with the demo shop, the real server, 200 and then 1,000 board clients (socket.io-client, in a
// process of their own) on one paired board device, and 20 state changes a second for 30 s made
// through the real routes (an admin tagging machines out and clearing them). Prints the latency
// from each change's commit to each client's receipt, and whether any event was lost.
import { fork } from 'node:child_process';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import { setTimeout as sleep } from 'node:timers/promises';
import { done, fail, step } from './lib/log.mjs';
import { startBenchServer, throwawayStack } from './lib/bench.mjs';
import { prepareDatabase, root } from './lib/stack.mjs';

const RATE = 20;
const SECONDS = 30;
const CLIENT_COUNTS = [200, 1000];
const TARGETS = { 200: 30, 1000: 80 };

let stack;
let listeners;

/** A signed-in web client: keeps its session cookie and sends the CSRF token on writes. */
async function signIn(base, email, password) {
  let cookie = '';
  const keep = (res) => {
    const set = res.headers.getSetCookie().map((c) => c.split(';')[0]);
    if (set.length) cookie = set.join('; ');
  };
  const csrfRes = await fetch(`${base}/api/auth/csrf`);
  keep(csrfRes);
  const { token } = await csrfRes.json();
  const post = async (url, body) => {
    const res = await fetch(`${base}${url}`, {
      method: 'POST',
      headers: { cookie, 'x-csrf-token': token, 'content-type': 'application/json' },
      body: JSON.stringify(body),
    });
    keep(res);
    return res;
  };
  const login = await post('/api/auth/login', { email, password });
  if (!login.ok) throw new Error(`signing in as ${email} answered ${login.status}`);
  return { post, get: (url) => fetch(`${base}${url}`, { headers: { cookie } }) };
}

function ask(child, message, reply) {
  return new Promise((resolve, reject) => {
    const onMessage = (answer) => {
      if (answer.type !== reply) return;
      child.off('message', onMessage);
      resolve(answer);
    };
    child.on('message', onMessage);
    child.once('exit', (code) => reject(new Error(`the listeners' process stopped (exit code ${code})`)));
    child.send(message);
  });
}

async function main() {
  stack = await throwawayStack();
  const started = { url: stack.url };
  const badgeSecret = randomBytes(32).toString('hex');
  await prepareDatabase(started.url, { seed: true, env: { BADGE_SECRET: badgeSecret } });

  const base = await startBenchServer(stack, { badgeSecret });

  // The demo shop's admin pairs one board; every client below is that board's screen.
  const admin = await signIn(base, 'admin@example.org', 'chuckkey-demo');
  const created = await admin.post('/api/stations', { kind: 'board', name: 'Bench wall board' });
  if (created.status !== 201) throw new Error(`creating the board station answered ${created.status}`);
  const { pairingCode } = await created.json();
  const paired = await fetch(`${base}/api/station/pair`, {
    method: 'POST',
    headers: { 'x-chuckkey-station': '1', 'content-type': 'application/json' },
    body: JSON.stringify({ pairingCode }),
  });
  if (!paired.ok) throw new Error(`pairing the board answered ${paired.status}`);
  // The answer may also expire a copy of the cookie at an older path: the one with a value counts.
  const deviceCookie = paired.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith('chuckkey.station=') && c.length > 'chuckkey.station='.length);
  if (!deviceCookie) throw new Error('pairing the board set no device cookie');
  const boardRes = await fetch(`${base}/api/board`, { headers: { cookie: deviceCookie } });
  if (!boardRes.ok) throw new Error(`GET /api/board answered ${boardRes.status}`);
  const board = await boardRes.json();
  const machines = board.areas.flatMap((area) => area.machines.map((m) => m.id));
  done(`board paired; ${machines.length} machines on it`);

  const taggedOut = new Set();
  /** One state change through the real routes: tag the machine out, or clear its tag-out. */
  async function change(i) {
    const machineId = machines[i % machines.length];
    const res = taggedOut.has(machineId)
      ? await admin.post(`/api/machines/${machineId}/tag-out/clear`, { note: 'Checked and cleared' })
      : await admin.post(`/api/machines/${machineId}/tag-out`, { reason: 'Bench check: chuck guard loose' });
    if (!res.ok) throw new Error(`change ${i} answered ${res.status}`);
    if (taggedOut.has(machineId)) taggedOut.delete(machineId);
    else taggedOut.add(machineId);
  }

  const results = [];
  let changeIndex = 0;
  for (const clients of CLIENT_COUNTS) {
    step(`${clients} board clients`);
    listeners = fork(path.join(root, 'scripts', 'bench', 'board-clients.mjs'), [], {
      env: { ...process.env, BASE_URL: base, DEVICE_COOKIE: deviceCookie, CLIENTS: String(clients) },
      stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
    });
    const { clients: connected } = await ask(listeners, { type: 'connect' }, 'connected');
    done(`${connected} connected`);
    // A few changes to warm up, not counted.
    for (let i = 0; i < 20; i += 1) await change(changeIndex++);
    await sleep(500);
    await ask(listeners, { type: 'reset' }, 'reset');

    step(`${RATE} changes/s for ${SECONDS} s`);
    const total = RATE * SECONDS;
    const interval = 1000 / RATE;
    const start = performance.now() + 50;
    const inFlight = [];
    for (let i = 0; i < total; i += 1) {
      const due = start + i * interval;
      const wait = due - performance.now();
      if (wait > 1) await sleep(wait);
      inFlight.push(change(changeIndex++));
    }
    await Promise.all(inFlight);
    // Let the last events arrive.
    await sleep(1000);
    const report = await ask(listeners, { type: 'report' }, 'report');
    const expected = total * connected;
    const lost = expected - report.received;
    console.log(
      `${clients} clients: ${total} changes, ${report.received} of ${expected} events received (${lost} lost, ` +
        `${report.short} changes not seen by every client exactly once), latency p50 ${report.p50.toFixed(1)} ms, ` +
        `p99 ${report.p99.toFixed(1)} ms, max ${report.max.toFixed(1)} ms (target p99 under ${TARGETS[clients]} ms)`,
    );
    results.push({ clients, ...report, lost });
    listeners.send({ type: 'close' });
    await new Promise((resolve) => listeners.once('exit', resolve));
  }
  if (results.some((r) => r.lost !== 0 || r.short !== 0)) process.exitCode = 1;
}

main()
  .catch((error) => fail(error))
  .finally(async () => {
    if (listeners && listeners.exitCode === null) listeners.kill('SIGKILL');
    await stack?.stop();
  });
