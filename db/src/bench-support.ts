/** What the benchmark seeds share: their settings from the environment and timed steps. */

export function env(name: string): string {
  const value = process.env[name];
  if (!value) throw new Error(`${name} is not set`);
  return value;
}

/** Runs one step of a seed and prints how long it took. */
export async function timed(what: string, work: () => Promise<unknown>): Promise<void> {
  const started = Date.now();
  await work();
  console.log(`  ${what} (${((Date.now() - started) / 1000).toFixed(1)} s)`);
}
