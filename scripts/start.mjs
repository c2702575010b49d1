// npm start: sets up everything a fresh machine lacks, then serves Chuckkey.
import { ensurePnpm, installPackages } from './lib/packages.mjs';
import { fail, note, step, done } from './lib/log.mjs';
import { buildApps, healthy, prepareDatabase, projectClusterHome, root, storedSecret, spawnService, startCluster, startMailCatcher, stopChild, waitFor } from './lib/stack.mjs';

const DEMO_ACCOUNTS = [
  ['admin', 'admin@example.org'],
  ['instructor', 'instructor@example.org'],
  ['member', 'member@example.org'],
];

const children = [];
let cluster;
let stopping = false;

async function stop(code) {
  if (stopping) return;
  stopping = true;
  console.log('');
  step('Stopping Chuckkey');
  for (const child of [...children].reverse()) await stopChild(child);
  if (cluster?.startedHere) {
    cluster.stop();
    done('PostgreSQL stopped (your data is kept)');
  }
  done('stopped');
  process.exit(code);
}

async function main() {
  process.on('SIGINT', () => void stop(0));
  process.on('SIGTERM', () => void stop(0));

  await ensurePnpm();
  await installPackages(root);

  let databaseUrl = process.env.DATABASE_URL;
  if (databaseUrl) {
    step('Using the PostgreSQL at DATABASE_URL');
  } else {
    ({ cluster, url: databaseUrl } = await startCluster({
      home: projectClusterHome(),
      port: Number(process.env.PG_PORT ?? 54329),
      throwaway: false,
      database: 'chuckkey',
    }));
  }
  const secrets = {
    SESSION_SECRET: process.env.SESSION_SECRET ?? storedSecret('session-secret'),
    // The demo shop's badge cards are encrypted with it when they are seeded.
    BADGE_SECRET: process.env.BADGE_SECRET ?? storedSecret('badge-secret'),
  };
  await prepareDatabase(databaseUrl, { seed: true, env: secrets });
  await buildApps();

  let smtpUrl = process.env.SMTP_URL;
  if (!smtpUrl) {
    const catcher = await startMailCatcher(databaseUrl, Number(process.env.MAIL_CATCHER_PORT ?? 2525));
    children.push(catcher.child);
    smtpUrl = catcher.url;
  }

  const port = Number(process.env.PORT ?? 3000);
  const host = process.env.HOST ?? '127.0.0.1';
  const url = `http://${host}:${port}`;
  step('Starting the Chuckkey server');
  const server = spawnService('server', ['src/main.ts'], {
    NODE_ENV: process.env.NODE_ENV ?? 'production',
    DATABASE_URL: databaseUrl,
    SMTP_URL: smtpUrl,
    ...secrets,
    PORT: String(port),
    HOST: host,
    COOKIE_SECURE: process.env.COOKIE_SECURE ?? 'auto',
  });
  children.push(server);
  for (const child of children) {
    child.once('exit', (code) => {
      if (!stopping) {
        console.error(`The ${child.serviceName} stopped unexpectedly (exit code ${code}).`);
        void stop(1);
      }
    });
  }
  await waitFor(() => healthy(url), server, 'the server');

  console.log('');
  done(`Chuckkey is ready at ${url}`);
  note(`web app:     ${url}/`);
  note(`station:     ${url}/kiosk/station`);
  note(`wall board:  ${url}/kiosk/board`);
  note('demo accounts (password chuckkey-demo):');
  for (const [role, email] of DEMO_ACCOUNTS) note(`  ${role.padEnd(11)} ${email}`);
  note('Press Ctrl-C to stop.');
}

main().catch(async (error) => {
  fail(error);
  await stop(1);
});
