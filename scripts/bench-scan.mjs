// pnpm bench:scan: scan-to-decision latency and throughput of POST /api/station/scan on a
// throwaway database seeded to a busy shop's size, through the real server.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import { setTimeout as sleep } from 'node:timers/promises';
import { done, fail, step } from './lib/log.mjs';
import { percentile, startBenchServer, throwawayStack } from './lib/bench.mjs';
import { leanConnection } from './lib/lean-http.mjs';
import { run } from './lib/run.mjs';
import { prepareDatabase, root } from './lib/stack.mjs';

const RATE = 200;
const OPEN_LOOP_SECONDS = 30;
const CONCURRENCY = 32;
const SATURATION_SECONDS = 15;
const WARM_UP = 500;

let stack;

function summary(label, latencies, seconds, failures) {
  const sorted = Float64Array.from(latencies).sort();
  const ms = (v) => v.toFixed(2);
  console.log(
    `${label}: ${latencies.length} requests in ${seconds.toFixed(1)} s, ${(latencies.length / seconds).toFixed(0)} decisions/s, ` +
      `p50 ${ms(percentile(sorted, 50))} ms, p95 ${ms(percentile(sorted, 95))} ms, p99 ${ms(percentile(sorted, 99))} ms, ` +
      `max ${ms(sorted[sorted.length - 1] ?? NaN)} ms, non-200 answers ${failures}`,
  );
}

async function main() {
  stack = await throwawayStack();
  const databaseUrl = stack.url;
  await prepareDatabase(databaseUrl, { seed: false });

  const badgeSecret = randomBytes(32).toString('hex');
  const output = path.join(stack.home, 'bench-seed.json');
  step('Seeding 10,000 members, 100 machines and 1,000,000 past sessions');
  await run(path.join(root, 'db', 'node_modules', '.bin', 'tsx'), ['src/bench-seed.ts'], {
    cwd: path.join(root, 'db'),
    env: { ...process.env, DATABASE_URL: databaseUrl, BADGE_SECRET: badgeSecret, BENCH_OUTPUT: output },
    fix: 'the lines above say which step of the seed failed.',
  });
  const { badges, stations } = JSON.parse(readFileSync(output, 'utf8'));
  done(`seeded ${badges.length} badges and ${stations.length} stations`);

  const base = await startBenchServer(stack, { badgeSecret, env: { STATION_SCAN_LIMIT_PER_MINUTE: '1000000' } });

  // Each kiosk holds its own device cookie, as in the shop.
  const kiosks = stations.map((token) => ({ cookie: `chuckkey.station=${token}` }));

  const pick = (list) => list[Math.floor(Math.random() * list.length)];
  const cleared = { yes: 0, no: 0 };
  const statuses = new Map();
  // Keep-alive connections, each carrying one request at a time; a scan takes an idle one or opens one.
  const idle = [];
  const { hostname, port: serverPort } = new URL(base);
  async function scan() {
    const connection = idle.pop() ?? leanConnection(hostname, Number(serverPort));
    const kiosk = pick(kiosks);
    const { status, body } = await connection.post(
      '/api/station/scan',
      { cookie: kiosk.cookie, 'x-chuckkey-station': '1', 'content-type': 'application/json' },
      JSON.stringify({ badge: pick(badges) }),
    );
    idle.push(connection);
    const answer = JSON.parse(body.toString('utf8'));
    if (status === 200) cleared[answer.cleared ? 'yes' : 'no'] += 1;
    else statuses.set(`${status} ${answer.code ?? ''}`.trim(), (statuses.get(`${status} ${answer.code ?? ''}`.trim()) ?? 0) + 1);
    return status;
  }

  step(`Warming up (${WARM_UP} scans)`);
  const first = await scan();
  if (first !== 200) throw new Error(`the first scan answered ${first}`);
  for (let i = 0; i < WARM_UP / 10; i += 1) await Promise.all(Array.from({ length: 10 }, scan));
  cleared.yes = 0;
  cleared.no = 0;

  step(`Open loop: ${RATE} scans/s for ${OPEN_LOOP_SECONDS} s, latency from each scan's due time`);
  {
    const total = RATE * OPEN_LOOP_SECONDS;
    const interval = 1000 / RATE;
    const latencies = [];
    let failures = 0;
    const inFlight = [];
    const start = performance.now() + 50;
    for (let i = 0; i < total; i += 1) {
      const due = start + i * interval;
      const wait = due - performance.now();
      if (wait > 1) await sleep(wait - 0.5);
      while (performance.now() < due) { /* the last fraction of a millisecond */ }
      inFlight.push(
        scan().then(
          (status) => {
            latencies.push(performance.now() - due);
            if (status !== 200) failures += 1;
          },
          (error) => {
            latencies.push(performance.now() - due);
            failures += 1;
            statuses.set(`failed: ${error.cause?.code ?? error.message}`, (statuses.get(`failed: ${error.cause?.code ?? error.message}`) ?? 0) + 1);
          },
        ),
      );
    }
    await Promise.all(inFlight);
    summary(`open loop ${RATE}/s`, latencies, (performance.now() - start) / 1000, failures);
  }

  step(`Saturation: ${CONCURRENCY} concurrent loops for ${SATURATION_SECONDS} s`);
  {
    const latencies = [];
    let failures = 0;
    const start = performance.now();
    const end = start + SATURATION_SECONDS * 1000;
    await Promise.all(
      Array.from({ length: CONCURRENCY }, async () => {
        while (performance.now() < end) {
          const t = performance.now();
          try {
            if ((await scan()) !== 200) failures += 1;
          } catch {
            failures += 1;
          }
          latencies.push(performance.now() - t);
        }
      }),
    );
    summary(`saturation x${CONCURRENCY}`, latencies, (performance.now() - start) / 1000, failures);
  }
  console.log(`decisions: ${cleared.yes} cleared, ${cleared.no} not cleared (both are answers)`);
  if (statuses.size) console.log(`non-200 answers by status: ${[...statuses].map(([k, v]) => `${k}: ${v}`).join(', ')}`);
  for (const connection of idle) connection.close();
}

main()
  .catch((error) => fail(error))
  .finally(() => stack?.stop());
