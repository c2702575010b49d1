// What the benchmarks share: a throwaway PostgreSQL cluster in a folder of its own, removed with
// everything else the run started, and percentiles.
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { freePort } from './postgres.mjs';
import { startCluster, stopChild } from './stack.mjs';

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
