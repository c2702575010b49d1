import QRCode from 'qrcode';
import { describe, expect, it } from 'vitest';
import { readQr } from './frame-reader';

const WIDTH = 640;
const HEIGHT = 480;

/** A camera frame of the QR as the card prints it: level M, the 4-module quiet zone of ISO/IEC 18004. */
function frame(code: string): Uint8ClampedArray {
  const { modules } = QRCode.create(code, { errorCorrectionLevel: 'M' });
  const scale = Math.floor(400 / (modules.size + 8));
  const left = Math.floor((WIDTH - (modules.size + 8) * scale) / 2) + 4 * scale;
  const top = Math.floor((HEIGHT - (modules.size + 8) * scale) / 2) + 4 * scale;
  const rgba = new Uint8ClampedArray(WIDTH * HEIGHT * 4).fill(235);
  for (let y = 0; y < HEIGHT; y += 1) {
    for (let x = 0; x < WIDTH; x += 1) {
      const row = Math.floor((y - top) / scale);
      const col = Math.floor((x - left) / scale);
      const dark = row >= 0 && col >= 0 && row < modules.size && col < modules.size && modules.get(row, col);
      if (dark) rgba.fill(16, (y * WIDTH + x) * 4, (y * WIDTH + x) * 4 + 3);
    }
  }
  return rgba;
}

describe('the second camera reader', () => {
  // Badge codes that html5-qrcode 2.3.8's bundled decoder does not read from a sharp frame.
  it.each(['zXCFHNacmxv0piPbXMYcQw', 'X5Tw0DkUf9tZ0OrXBFpNMw', 'yGVueegeiC6PvelvEqkIug', 'LwNPL0TeOMD23UbeD19QoQ', 'WpU6BvfzmRq-SUMN294tGw'])(
    'reads the badge code %s',
    (code) => {
      expect(readQr(frame(code), WIDTH, HEIGHT)).toBe(code);
    },
  );

  it('finds nothing in a frame without a code', () => {
    expect(readQr(new Uint8ClampedArray(WIDTH * HEIGHT * 4).fill(200), WIDTH, HEIGHT)).toBeNull();
  });
});
