// Plain, step-by-step output for the two commands: each step says what it does and whether it worked.
const useColour = process.stdout.isTTY && !process.env.NO_COLOR;
const paint = (code, text) => (useColour ? `\x1b[${code}m${text}\x1b[0m` : text);

export function step(text) {
  console.log(`${paint('1;34', '▸')} ${text}`);
}
export function done(text) {
  console.log(`  ${paint('32', '✓')} ${text}`);
}
export function note(text) {
  console.log(`  ${text}`);
}
export function warn(text) {
  console.log(`  ${paint('33', '!')} ${text}`);
}

export class SetupError extends Error {
  /** @param {string} what what failed @param {string} fix what the person can do about it */
  constructor(what, fix) {
    super(what);
    this.fix = fix;
  }
}

export function fail(error) {
  console.error('');
  console.error(`${paint('1;31', '✗')} ${error instanceof Error ? error.message : String(error)}`);
  if (error instanceof SetupError && error.fix) console.error(`  What to do: ${error.fix}`);
  process.exitCode = 1;
}
