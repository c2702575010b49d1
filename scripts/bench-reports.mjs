// pnpm bench:reports: time GET /api/reports/usage over a busy shop's year (1,000,000 sessions),
// through the real server, for each grouping. Prints figures; asserts nothing. Runs on a throwaway
// cluster, or on the database in BENCH_DATABASE_URL, which it drops and fills (never a real one).
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import { done, fail, step } from './lib/log.mjs';
import { percentile, startBenchServer, throwawayStack } from './lib/bench.mjs';
import { run } from './lib/run.mjs';
import { prepareDatabase, root, stopChild } from './lib/stack.mjs';

const RUNS = 15;
const WARM_UP = 2;
const GROUPINGS = ['machine', 'member', 'day'];

let stack;

/** A signed-in admin's cookie header, through the same sign-in the web app uses. */
async function signIn(base, { email, password }) {
  const csrf = await fetch(`${base}/api/auth/csrf`);
  const cookie = csrf.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const { token } = await csrf.json();
  const login = await fetch(`${base}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-csrf-token': token, cookie },
    body: JSON.stringify({ email, password }),
  });
  if (login.status !== 200) throw new Error(`the admin's sign-in answered ${login.status}`);
  return login.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ') || cookie;
}

/** The shop-calendar dates a year back from today, as UTC sees them (a day either way changes nothing here). */
function lastYear() {
  const to = new Date();
  const from = new Date(to.getTime() - 364 * 86_400_000);
  return { from: from.toISOString().slice(0, 10), to: to.toISOString().slice(0, 10) };
}

async function main() {
  const own = process.env.BENCH_DATABASE_URL;
  if (!own) stack = await throwawayStack();
  else {
    // The database is left as the run filled it; only the server started here is stopped.
    const children = [];
    stack = {
      url: own,
      track: (child) => (children.push(child), child),
      stop: async () => {
        for (const child of children.reverse()) await stopChild(child);
      },
    };
    step('Dropping the benchmark database named by BENCH_DATABASE_URL');
    await run(path.join(root, 'db', 'node_modules', '.bin', 'tsx'), ['-e', `import('./src/setup.ts').then((m) => m.dropDatabase(${JSON.stringify(own)}))`], {
      cwd: path.join(root, 'db'),
      fix: 'BENCH_DATABASE_URL must name a database this run may drop.',
    });
  }
  await prepareDatabase(stack.url, { seed: false });

  // The seed's note of the admin's password lives in a folder of the run's own, removed once read.
  const folder = stack.home ?? mkdtempSync(path.join(os.tmpdir(), 'chuckkey-bench-'));
  const output = path.join(folder, 'bench-reports-seed.json');
  step('Seeding a busy year: 800 members, 30 machines, 1,000,000 sessions, reservations, refused scans, sign-offs');
  await run(path.join(root, 'db', 'node_modules', '.bin', 'tsx'), ['src/bench-reports-seed.ts'], {
    cwd: path.join(root, 'db'),
    env: { ...process.env, DATABASE_URL: stack.url, BENCH_OUTPUT: output },
    fix: 'the lines above say which step of the seed failed.',
  });
  const admin = JSON.parse(readFileSync(output, 'utf8'));
  if (!stack.home) rmSync(folder, { recursive: true, force: true });
  done('seeded');

  const base = await startBenchServer(stack, { badgeSecret: randomBytes(32).toString('hex') });
  const cookie = await signIn(base, admin);
  const { from, to } = lastYear();

  for (const groupBy of GROUPINGS) {
    const url = `${base}/api/reports/usage?from=${from}&to=${to}&groupBy=${groupBy}`;
    step(`GET /api/reports/usage over ${from} … ${to}, groupBy=${groupBy}: ${RUNS} runs after ${WARM_UP} to warm up`);
    const latencies = [];
    let rows = 0;
    for (let i = 0; i < WARM_UP + RUNS; i += 1) {
      const started = performance.now();
      const res = await fetch(url, { headers: { cookie } });
      const body = await res.json();
      const ms = performance.now() - started;
      if (res.status !== 200) throw new Error(`the report answered ${res.status}: ${JSON.stringify(body)}`);
      rows = body.rows.length;
      if (i >= WARM_UP) latencies.push(ms);
    }
    const sorted = Float64Array.from(latencies).sort();
    console.log(
      `groupBy=${groupBy}: ${rows} rows, median ${percentile(sorted, 50).toFixed(1)} ms, p95 ${percentile(sorted, 95).toFixed(1)} ms, ` +
        `min ${sorted[0].toFixed(1)} ms, max ${sorted[sorted.length - 1].toFixed(1)} ms`,
    );
  }
}

main()
  .catch((error) => fail(error))
  .finally(() => stack?.stop());
