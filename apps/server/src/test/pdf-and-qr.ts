import jsQR from 'jsqr';
import { decodePDFRawStream, PDFArray, PDFDocument, type PDFRawStream } from 'pdf-lib';
import { PNG } from 'pngjs';

/** A greyscale bitmap, 0 = black, 255 = white. */
export interface Bitmap {
  width: number;
  height: number;
  pixels: Uint8Array;
}

export function fromPng(png: Buffer): Bitmap {
  const image = PNG.sync.read(png);
  const pixels = new Uint8Array(image.width * image.height);
  for (let i = 0; i < pixels.length; i++) pixels[i] = image.data[i * 4]!;
  return { width: image.width, height: image.height, pixels };
}

export function fromRgba(data: Buffer, width: number, height: number): Bitmap {
  const pixels = new Uint8Array(width * height);
  for (let i = 0; i < pixels.length; i++) pixels[i] = data[i * 4]!;
  return { width, height, pixels };
}

/** Decodes a QR code with jsQR, an implementation independent of the qrcode package that drew it. */
export function decodeQr(bitmap: Bitmap): string | null {
  const rgba = new Uint8ClampedArray(bitmap.width * bitmap.height * 4);
  bitmap.pixels.forEach((value, i) => {
    rgba.set([value, value, value, 255], i * 4);
  });
  return jsQR(rgba, bitmap.width, bitmap.height, { inversionAttempts: 'dontInvert' })?.data ?? null;
}

/** True when every pixel of the band `border` pixels wide around the edge is light. */
export function borderIsLight(bitmap: Bitmap, border: number): boolean {
  for (let y = 0; y < bitmap.height; y++) {
    for (let x = 0; x < bitmap.width; x++) {
      const inBand = x < border || y < border || x >= bitmap.width - border || y >= bitmap.height - border;
      if (inBand && bitmap.pixels[y * bitmap.width + x]! < 128) return false;
    }
  }
  return true;
}

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** The decompressed content stream of a page, read with pdf-lib. */
export async function pageContent(pdf: Buffer, pageIndex = 0): Promise<{ text: string; width: number; height: number }> {
  const doc = await PDFDocument.load(pdf);
  const page = doc.getPage(pageIndex);
  const contents = page.node.Contents();
  const streams = contents instanceof PDFArray ? contents.asArray().map((ref) => doc.context.lookup(ref)) : [contents];
  const text = streams.map((s) => Buffer.from(decodePDFRawStream(s as PDFRawStream).decode()).toString('latin1')).join('\n');
  return { text, ...page.getSize() };
}

/**
 * The rectangles a content stream fills, by colour, in the page's top-down coordinates (the
 * stream starts by flipping the y axis). Reads only what the card drawing emits: `re`, `scn` and
 * `f`; paths clipped with `W n` are not fills.
 */
export function filledRects(content: string): { color: string; rect: Rect }[] {
  const fills: { color: string; rect: Rect }[] = [];
  let pending: Rect[] = [];
  let color = '';
  for (const line of content.split('\n')) {
    const re = /^(-?[\d.]+) (-?[\d.]+) (-?[\d.]+) (-?[\d.]+) re$/.exec(line);
    if (re) {
      pending.push({ x: Number(re[1]), y: Number(re[2]), width: Number(re[3]), height: Number(re[4]) });
    } else if (line.endsWith(' scn')) {
      color = line.slice(0, -4);
    } else if (line === 'f') {
      for (const rect of pending) fills.push({ color, rect });
      pending = [];
    } else if (line === 'W n' || line === 'n') {
      pending = [];
    }
  }
  return fills;
}

/** Paints black rectangles onto a white bitmap of the given area, `scale` pixels per point. */
export function rasterize(area: Rect, rects: Rect[], scale: number): Bitmap {
  const width = Math.round(area.width * scale);
  const height = Math.round(area.height * scale);
  const pixels = new Uint8Array(width * height).fill(255);
  for (const rect of rects) {
    const x0 = Math.max(0, Math.round((rect.x - area.x) * scale));
    const y0 = Math.max(0, Math.round((rect.y - area.y) * scale));
    const x1 = Math.min(width, Math.round((rect.x + rect.width - area.x) * scale));
    const y1 = Math.min(height, Math.round((rect.y + rect.height - area.y) * scale));
    for (let y = y0; y < y1; y++) pixels.fill(0, y * width + x0, y * width + x1);
  }
  return { width, height, pixels };
}
