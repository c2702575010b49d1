import { existsSync } from 'node:fs';
import { aptInstall } from './packages.mjs';
import { done, note, step } from './log.mjs';

export const CHROMIUM = '/usr/bin/chromium';

/** Browser tests drive Debian's Chromium; Playwright never downloads a browser of its own. */
export async function ensureChromium() {
  step('Checking Chromium for the browser tests');
  if (!existsSync(CHROMIUM)) {
    note('Chromium is missing; installing Debian\'s chromium package (about 500 MB)');
    await aptInstall(['chromium', 'fonts-liberation'], 'The browser tests');
  }
  done(`Chromium at ${CHROMIUM}`);
}
