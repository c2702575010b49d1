import { spawn, spawnSync } from 'node:child_process';
import { SetupError } from './log.mjs';

/** Runs a command with its output shown live; rejects with a SetupError when it fails. */
export function run(command, args, { fix = '', ...options } = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { stdio: 'inherit', ...options });
    child.on('error', (error) => reject(new SetupError(`${command} could not start: ${error.message}`, fix)));
    child.on('exit', (code, signal) => {
      if (code === 0) resolve();
      else reject(new SetupError(`${[command, ...args].join(' ')} failed (${signal ?? `exit code ${code}`}).`, fix));
    });
  });
}

/** Runs a command and returns its output; throws a SetupError with the output when it fails. */
export function capture(command, args, { fix = '', ...options } = {}) {
  const result = spawnSync(command, args, { encoding: 'utf8', ...options });
  if (result.error) throw new SetupError(`${command} could not start: ${result.error.message}`, fix);
  if (result.status !== 0) {
    const output = `${result.stdout ?? ''}${result.stderr ?? ''}`.trim();
    throw new SetupError(`${[command, ...args].join(' ')} failed:\n${output}`, fix);
  }
  return result.stdout;
}

export function commandExists(command) {
  return spawnSync('sh', ['-c', `command -v ${command}`], { stdio: 'ignore' }).status === 0;
}

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
