/** ISO/IEC 18004: at least 4 light modules on every side of the symbol. */
export const QR_QUIET_ZONE_MODULES = 4;

/** Level M restores about 15 % of the symbol, enough for a badge card kept in a wallet. */
export const BADGE_QR_ERROR_CORRECTION = 'M' as const;

/**
 * Level Q restores up to about 25 % of the symbol: labels on tools in a metal shop get oil,
 * swarf scratches and worn corners, which the badge cards in a wallet do not.
 */
export const ASSET_TAG_QR_ERROR_CORRECTION = 'Q' as const;

/** The symbol's modules as a QR encoder gives them: `size` across, dark where `get` is truthy. */
export interface QrModules {
  size: number;
  get(row: number, col: number): number | boolean;
}

export interface QrDrawing {
  /** Width and height in modules, the quiet zone included. */
  size: number;
  /** The dark modules as horizontal runs, one rectangle each, in module units from the top-left of the quiet zone. */
  runs: { x: number; y: number; width: number }[];
}

/**
 * The symbol as rectangles, one per horizontal run of dark modules: far fewer shapes than one
 * per module, and no hairline seams between neighbours when printed.
 */
export function qrDrawing(modules: QrModules): QrDrawing {
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
