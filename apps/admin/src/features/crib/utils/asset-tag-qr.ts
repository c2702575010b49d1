import QRCode from 'qrcode';

/** ISO/IEC 18004: at least 4 light modules on every side of the symbol. */
export const QR_QUIET_ZONE_MODULES = 4;
/**
 * Level Q restores up to about 25 % of the symbol: labels on tools in a metal shop get oil,
 * swarf scratches and worn corners, which the badge cards in a wallet do not.
 */
export const ASSET_TAG_ERROR_CORRECTION = 'Q' as const;

export interface QrDrawing {
  /** Width and height in modules, the quiet zone included. */
  size: number;
  /** The dark modules as horizontal runs, one rectangle each, in module units. */
  runs: { x: number; y: number; width: number }[];
}

/** The QR symbol of an asset tag: its text is exactly the tag, so a scan reads back what the crib stores. */
export function assetTagQr(assetTag: string): QrDrawing {
  const { modules } = QRCode.create(assetTag, { errorCorrectionLevel: ASSET_TAG_ERROR_CORRECTION });
  const runs: QrDrawing['runs'] = [];
  for (let row = 0; row < modules.size; row++) {
    let col = 0;
    while (col < modules.size) {
      if (!modules.get(row, col)) {
        col++;
        continue;
      }
      const start = col;
      while (col < modules.size && modules.get(row, col)) col++;
      runs.push({ x: start + QR_QUIET_ZONE_MODULES, y: row + QR_QUIET_ZONE_MODULES, width: col - start });
    }
  }
  return { size: modules.size + 2 * QR_QUIET_ZONE_MODULES, runs };
}
