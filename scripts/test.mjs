// npm test: the same set-up as npm start on a throwaway database, then every test.
import { existsSync, mkdtempSync, readFileSync, rmSync, chmodSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import { ensureChromium } from './lib/chromium.mjs';
import { ensurePnpm, installPackages } from './lib/packages.mjs';
import { done, fail, note, step, warn } from './lib/log.mjs';
import { freePort } from './lib/postgres.mjs';
import { run } from './lib/run.mjs';
import { buildApps, prepareDatabase, root, startCluster, startMailCatcher, stopChild } from './lib/stack.mjs';

const resultsDir = path.join(root, 'test-results');
const failures = [];
const totals = { passed: 0, failed: 0, skipped: 0 };
let cluster;
let home;
let catcher;

function countVitest(file) {
  if (!existsSync(file)) return false;
  const report = JSON.parse(readFileSync(file, 'utf8'));
  totals.passed += report.numPassedTests;
  totals.failed += report.numFailedTests;
  totals.skipped += report.numPendingTests + report.numTodoTests;
  return true;
}

function countPlaywright(file) {
  if (!existsSync(file)) return false;
  const { stats } = JSON.parse(readFileSync(file, 'utf8'));
  totals.passed += stats.expected + stats.flaky;
  totals.failed += stats.unexpected;
  totals.skipped += stats.skipped;
  return true;
}

async function stage(name, command, args, { env = {}, count } = {}) {
  step(name);
  try {
    await run(command, args, { cwd: root, env: { ...process.env, ...env } });
    done(`${name}: passed`);
  } catch (error) {
    failures.push(name);
    warn(`${name}: FAILED (${error.message})`);
  }
  if (count && !count()) {
    failures.push(`${name} (no report)`);
    totals.failed += 1;
  }
}

function vitest(pkg, name, env) {
  const report = path.join(resultsDir, `${name}.json`);
  rmSync(report, { force: true });
  return stage(`${name} tests`, 'pnpm', ['--filter', pkg, 'exec', 'vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`], {
    env,
    count: () => countVitest(report),
  });
}

async function cleanup() {
  await stopChild(catcher?.child);
  if (cluster) {
    try {
      cluster.stop();
    } catch (error) {
      warn(`could not stop the throwaway cluster: ${error.message}`);
    }
  }
  if (home) rmSync(home, { recursive: true, force: true });
}

async function main() {
  await ensurePnpm();
  await installPackages(root);
  await ensureChromium();

  home = mkdtempSync(path.join(os.tmpdir(), 'chuckkey-test-'));
  chmodSync(home, 0o755);
  const started = await startCluster({ home, port: await freePort(), throwaway: true, database: 'chuckkey_e2e' });
  cluster = started.cluster;
  const serverTestUrl = cluster.url('chuckkey_server_test');
  const e2eUrl = started.url;

  await stage('Type-check', 'pnpm', ['-r', 'typecheck']);
  await stage('Lint', 'pnpm', ['lint']);
  await vitest('@chuckkey/core', 'core', {});
  await vitest('@chuckkey/db', 'db', { DATABASE_URL: cluster.url('chuckkey_db_test') });
  await vitest('@chuckkey/server', 'server', { DATABASE_URL: serverTestUrl });
  await vitest('@chuckkey/admin', 'admin', {});
  await vitest('@chuckkey/kiosk', 'kiosk', {});

  await buildApps();
  await prepareDatabase(e2eUrl, { seed: false });
  catcher = await startMailCatcher(e2eUrl);
  const e2eReport = path.join(resultsDir, 'e2e.json');
  rmSync(e2eReport, { force: true });
  await stage('Browser tests (Playwright, Debian Chromium)', 'pnpm', ['--filter', '@chuckkey/e2e', 'test'], {
    env: {
      DATABASE_URL: e2eUrl,
      SMTP_URL: catcher.url,
      SESSION_SECRET: randomBytes(32).toString('hex'),
      BADGE_SECRET: randomBytes(32).toString('hex'),
      PLAYWRIGHT_JSON_OUTPUT_NAME: e2eReport,
      CI: process.env.CI ?? 'true',
    },
    count: () => countPlaywright(e2eReport),
  });

  console.log('');
  if (failures.length) note(`Failed stages: ${failures.join(', ')}`);
  console.log(`${totals.passed} passed, ${totals.failed} failed, ${totals.skipped} skipped`);
  process.exitCode = failures.length || totals.failed ? 1 : 0;
}

main()
  .catch((error) => fail(error))
  .finally(cleanup);
