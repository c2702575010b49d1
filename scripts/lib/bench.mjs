// What the benchmarks share: a throwaway PostgreSQL cluster in a folder of its own, removed with
// everything else the run started, and percentiles.
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import { done, step } from './log.mjs';
import { freePort } from './postgres.mjs';
import { healthy, spawnService, startCluster, stopChild, waitFor } from './stack.mjs';

/** The nearest-rank percentile of sorted values (NaN for none). */
export function percentile(sorted, p) {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

/** Starts a throwaway cluster; `stop()` ends the child processes given to `track`, then the cluster, then removes its folder. */
export async function throwawayStack() {
  const home = mkdtempSync(path.join(os.tmpdir(), 'chuckkey-bench-'));
  chmodSync(home, 0o755);
  const children = [];
  let cluster;
  const stack = {
    /** The run's own folder, removed at the end: a place for its files. */
    home,
    url: undefined,
    track(child) {
      children.push(child);
      return child;
    },
    async stop() {
      for (const child of children.reverse()) await stopChild(child);
      if (cluster) {
        try {
          cluster.stop();
        } catch (error) {
          console.error(`could not stop the throwaway cluster: ${error.message}`);
        }
      }
      rmSync(home, { recursive: true, force: true });
    },
  };
  try {
    const started = await startCluster({ home, port: await freePort(), throwaway: true, database: 'chuckkey_bench' });
    cluster = started.cluster;
    stack.url = started.url;
  } catch (error) {
    await stack.stop();
    throw error;
  }
  return stack;
}

/**
 * Starts the real server in production mode on a free port against the stack's database, tracked
 * by the stack, and waits until it answers its health check. `env` adds to (or overrides) the
 * settings every benchmark runs with. Resolves to the server's base URL.
 */
export async function startBenchServer(stack, { badgeSecret, env = {} }) {
  step('Starting the server (production mode)');
  const port = await freePort();
  const server = stack.track(
    spawnService('server', ['src/main.ts'], {
      NODE_ENV: 'production',
      LOG_LEVEL: 'warn',
      HOST: '127.0.0.1',
      PORT: String(port),
      DATABASE_URL: stack.url,
      SESSION_SECRET: randomBytes(32).toString('hex'),
      BADGE_SECRET: badgeSecret,
      SERVE_APPS: 'false',
      COOKIE_SECURE: 'false',
      ...env,
    }),
  );
  const base = `http://127.0.0.1:${port}`;
  await waitFor(() => healthy(base), server, 'the server');
  done(`server on ${base}`);
  return base;
}
