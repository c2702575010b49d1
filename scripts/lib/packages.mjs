import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { done, note, step, SetupError } from './log.mjs';
import { capture, commandExists, isRoot, run } from './run.mjs';

export const PNPM_VERSION = '12.4.2';

export async function ensurePnpm() {
  step('Checking pnpm');
  if (commandExists('pnpm')) {
    const version = capture('pnpm', ['--version']).trim();
    if (version === PNPM_VERSION) {
      done(`pnpm ${version}`);
      return;
    }
    note(`pnpm ${version} found; the project pins ${PNPM_VERSION}`);
  }
  note(`installing pnpm ${PNPM_VERSION} with npm`);
  await run('npm', ['install', '--global', `pnpm@${PNPM_VERSION}`], {
    fix: 'check that npm can reach its registry, or install pnpm yourself: npm install --global pnpm@' + PNPM_VERSION,
  });
  done(`pnpm ${PNPM_VERSION} installed`);
}

/** Installs the workspace's packages exactly as the lockfile says, skipping when nothing changed. */
export async function installPackages(root) {
  step('Installing the workspace packages (pnpm install)');
  const marker = path.join(root, 'node_modules', '.pnpm', 'lock.yaml');
  const lock = path.join(root, 'pnpm-lock.yaml');
  if (existsSync(marker) && readFileSync(marker, 'utf8') === readFileSync(lock, 'utf8')) {
    done('packages are up to date');
    return;
  }
  await run('pnpm', ['install', '--frozen-lockfile', '--reporter=default'], {
    cwd: root,
    fix: 'check the network connection to the npm registry and run npm start again',
  });
  done('packages installed');
}

/** Installs Debian packages with apt-get, showing its progress. */
export async function aptInstall(packages, why) {
  if (!isRoot) {
    throw new SetupError(
      `${why} needs the Debian package(s) ${packages.join(', ')}, and only root can install them.`,
      `run: sudo apt-get update && sudo apt-get install -y ${packages.join(' ')}  — then try again.`,
    );
  }
  if (!commandExists('apt-get')) {
    throw new SetupError(`${why} needs ${packages.join(', ')}, and this machine has no apt-get.`, 'install them with your system\'s package manager and try again.');
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  note('apt-get update');
  await run('apt-get', ['update'], { env, fix: 'check that the machine can reach Debian\'s package mirrors' });
  note(`apt-get install ${packages.join(' ')}`);
  // Keep any configuration file already on the machine instead of stopping to ask.
  const dpkgOptions = ['-o', 'Dpkg::Options::=--force-confdef', '-o', 'Dpkg::Options::=--force-confold'];
  await run('apt-get', ['install', '-y', '--no-install-recommends', ...dpkgOptions, ...packages], {
    env,
    fix: `install them yourself: apt-get install -y ${packages.join(' ')}`,
  });
}
