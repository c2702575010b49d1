import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { clusterHome, Cluster, ensurePostgres, freePort, portInUse } from './postgres.mjs';
import { done, note, step, SetupError } from './log.mjs';
import { run } from './run.mjs';

export const root = path.resolve(path.dirname(new URL(import.meta.url).pathname), '..', '..');
const bin = (pkg, name) => path.join(root, pkg, 'node_modules', '.bin', name);

/** Starts (creating on first use) a PostgreSQL cluster; returns it and a URL for `database`. */
export async function startCluster({ home, port, throwaway, database }) {
  const pgBin = await ensurePostgres();
  const cluster = new Cluster({ bin: pgBin, home, port, throwaway });
  step(throwaway ? 'Starting a throwaway PostgreSQL cluster' : 'Starting the project\'s PostgreSQL cluster');
  if (!cluster.initialised) {
    if (await portInUse(port)) {
      throw new SetupError(`Port ${port} on 127.0.0.1 is taken by another program.`, 'set PG_PORT to a free port, or point DATABASE_URL at a PostgreSQL you already run.');
    }
    note(`creating a new cluster in ${cluster.dataDir}`);
    cluster.init();
  } else {
    cluster.port = cluster.credentials().port;
  }
  try {
    cluster.start();
  } catch (error) {
    throw new SetupError(`PostgreSQL did not start: ${error.message}\n${cluster.logTail()}`, `read ${path.join(cluster.dataDir, 'server.log')}; a stale cluster can be removed with: rm -rf ${cluster.home}`);
  }
  done(`PostgreSQL on 127.0.0.1:${cluster.port}${throwaway ? '' : `, data in ${cluster.dataDir}`}`);
  return { cluster, url: cluster.url(database) };
}

export function projectClusterHome() {
  return clusterHome(root);
}

export async function prepareDatabase(databaseUrl, { seed, env = {} }) {
  step(seed ? 'Preparing the database (migrations, demo shop on first start)' : 'Preparing the database (migrations)');
  await run(bin('db', 'tsx'), ['src/cli.ts', 'setup'], {
    cwd: path.join(root, 'db'),
    env: { ...process.env, ...env, DATABASE_URL: databaseUrl, SEED_DEMO: String(seed) },
    fix: 'check that PostgreSQL is running and DATABASE_URL is right; the lines above say which step failed.',
  });
  done('database ready');
}

export async function buildApps() {
  step('Building the web app and the kiosk app');
  await run('pnpm', ['--filter', '@chuckkey/admin', '--filter', '@chuckkey/kiosk', 'build'], {
    cwd: root,
    fix: 'the build errors above say what to fix; run pnpm build to try again.',
  });
  done('apps built');
}

/** A random secret kept in .data, so that sign-ins and badge cards survive a restart. */
export function storedSecret(name) {
  const file = path.join(root, '.data', name);
  if (!existsSync(file)) {
    mkdirSync(path.dirname(file), { recursive: true });
    writeFileSync(file, randomBytes(48).toString('base64url'), { mode: 0o600 });
  }
  return readFileSync(file, 'utf8').trim();
}

export function spawnService(name, args, env) {
  const child = spawn(bin('apps/server', 'tsx'), args, {
    cwd: path.join(root, 'apps', 'server'),
    env: { ...process.env, ...env },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  child.serviceName = name;
  return child;
}

export async function startMailCatcher(databaseUrl, port) {
  step('Starting the development mail catcher (mail shows on the Outbox page)');
  const mailPort = port ?? (await freePort());
  const child = spawnService('mail catcher', ['src/mail-catcher.ts'], { DATABASE_URL: databaseUrl, MAIL_CATCHER_PORT: String(mailPort), LOG_LEVEL: 'warn' });
  await waitFor(() => portInUse(mailPort), child, 'the mail catcher');
  done(`mail catcher on smtp://127.0.0.1:${mailPort}`);
  return { child, url: `smtp://127.0.0.1:${mailPort}` };
}

export async function waitFor(check, child, what, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new SetupError(`${what} stopped (exit code ${child.exitCode}).`, 'the lines above say why.');
    if (await check()) return;
    await sleep(200);
  }
  throw new SetupError(`${what} did not become ready within ${timeoutMs / 1000} s.`, 'the lines above say why.');
}

export async function healthy(url) {
  try {
    const res = await fetch(`${url}/api/health`);
    return res.ok;
  } catch {
    return false;
  }
}

export function stopChild(child, timeoutMs = 15_000) {
  return new Promise((resolve) => {
    if (!child || child.exitCode !== null || child.signalCode !== null) return resolve();
    const timer = setTimeout(() => child.kill('SIGKILL'), timeoutMs);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve();
    });
    child.kill('SIGTERM');
  });
}
