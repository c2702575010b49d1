import jsQR from 'jsqr';

/** Frames are read at most this wide: a badge held up fills much of the view, and it is quicker. */
export const READ_WIDTH = 640;

/**
 * The second reader of the camera's frames. html5-qrcode's own decoder misses a few of the
 * badge codes in every hundred, however sharp the picture (measured on rendered frames of
 * version 2, level M codes); jsQR reads those. RGBA pixels in, the QR's text or null out.
 */
export function readQr(rgba: Uint8ClampedArray, width: number, height: number): string | null {
  const found = jsQR(rgba, width, height, { inversionAttempts: 'dontInvert' });
  return found?.data || null;
}
