import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import QRCode from 'qrcode';
import { createBadge, createMachine } from '@chuckkey/db/factories';
import { expect, test } from './fixtures';
import { badgeSecret, createStationAsAdmin, pairScreen, removeStationRows } from './station-fixtures';

const WIDTH = 640;
const HEIGHT = 480;

/**
 * One frame of the badge's QR code as a Y4M video for Chromium's fake camera: dark modules at
 * luma 16 and light at 235 (ITU-R BT.601 video range), with the 4-module quiet zone of
 * ISO/IEC 18004, error correction level M as on the printed card.
 */
function writeBadgeVideo(file: string, code: string): void {
  const qr = QRCode.create(code, { errorCorrectionLevel: 'M' });
  const modules = qr.modules.size + 8;
  const scale = Math.floor(400 / modules);
  const left = Math.floor((WIDTH - modules * scale) / 2);
  const top = Math.floor((HEIGHT - modules * scale) / 2);
  const luma = Buffer.alloc(WIDTH * HEIGHT, 235);
  for (let row = 0; row < qr.modules.size; row += 1) {
    for (let col = 0; col < qr.modules.size; col += 1) {
      if (!qr.modules.get(row, col)) continue;
      for (let y = 0; y < scale; y += 1) {
        const start = (top + (row + 4) * scale + y) * WIDTH + left + (col + 4) * scale;
        luma.fill(16, start, start + scale);
      }
    }
  }
  // 4:2:0 chroma planes at a quarter of the size each; 128 is no colour.
  const chroma = Buffer.alloc((WIDTH / 2) * (HEIGHT / 2) * 2, 128);
  writeFileSync(file, Buffer.concat([Buffer.from(`YUV4MPEG2 W${WIDTH} H${HEIGHT} F30:1 Ip A1:1 C420\n`), Buffer.from('FRAME\n'), luma, chroma]));
}

test('a badge held to the station’s camera is read and greets the member', async ({ playwright, launchOptions, baseURL, db, createUser }) => {
  const admin = await createUser({ role: 'admin' });
  const member = await createUser({ role: 'member', first_name: 'Wilhelmina' });
  const badge = await createBadge(db, { memberId: member.id, badgeSecret: badgeSecret() });
  const machine = await createMachine(db, { category: 'mill' });
  // Outside test-results, which another run of the suite may empty while this browser reads it.
  const folder = mkdtempSync(path.join(os.tmpdir(), 'chuckkey-camera-'));
  const video = path.join(folder, 'badge.y4m');
  writeBadgeVideo(video, badge.code);

  // A browser of its own: the fake camera plays the file given at launch.
  const browser = await playwright.chromium.launch({
    ...launchOptions,
    args: [...(launchOptions.args ?? []), '--use-fake-ui-for-media-stream', '--use-fake-device-for-media-stream', `--use-file-for-fake-video-capture=${video}`],
  });
  let stationId: string | undefined;
  try {
    const context = await browser.newContext({ baseURL });
    const page = await context.newPage();
    const station = await createStationAsAdmin(context.request, admin, machine.id);
    stationId = station.id;
    await pairScreen(page, station.pairingCode);

    await expect(page.getByRole('heading', { name: 'Hello, Wilhelmina' })).toBeVisible({ timeout: 15_000 });
    // The camera scan reaches the clearance decision, whichever way it goes for this member.
    await expect(page.getByText(/cleared to start/i).first()).toBeVisible();
  } finally {
    await browser.close();
    rmSync(folder, { recursive: true, force: true });
    await removeStationRows(db, { people: [admin.id, member.id], stationId, machine });
  }
});
