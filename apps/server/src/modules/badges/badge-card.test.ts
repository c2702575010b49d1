import { PDFDocument } from 'pdf-lib';
import QRCode from 'qrcode';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { ID1_MM, QR_QUIET_ZONE_MODULES } from '@chuckkey/core';
import { generateBadgeCode } from '@chuckkey/db';
import { borderIsLight, decodeQr, filledRects, fromPng, pageContent, rasterize, type Rect } from '../../test/pdf-and-qr';
import { CARD_HEIGHT_PT, CARD_WIDTH_PT, cardPdf, fontRuns, PAPER_PT, SHEET, sheetPdf, sheetSlots, type CardContent } from './badge-card';

const PT_TO_MM = 25.4 / 72;

function card(overrides: Partial<CardContent> = {}): CardContent {
  return {
    shopName: 'Quillmere Forge & Lathe Collective',
    fullName: 'Perpetua Quarrington',
    roleLabel: 'Instructor',
    code: generateBadgeCode(),
    ...overrides,
  };
}

const WHITE = '1 1 1';
const BLACK = '0 0 0';

/** The QR square of a card drawn at (0, 0) and the dark modules inside it, read back from the PDF. */
function qrInContent(content: string, origin: { x: number; y: number } = { x: 0, y: 0 }): { square: Rect; modules: Rect[] } {
  const fills = filledRects(content);
  const square = fills.find(
    (f) => f.color === WHITE && Math.abs(f.rect.width - f.rect.height) < 1e-6 && f.rect.width > 60 && f.rect.width < CARD_WIDTH_PT / 2,
  )?.rect;
  if (!square) throw new Error('no QR square in the content stream');
  const inside = (r: Rect) => r.x >= square.x - 1e-6 && r.y >= square.y - 1e-6 && r.x + r.width <= square.x + square.width + 1e-6 && r.y + r.height <= square.y + square.height + 1e-6;
  const modules = fills.filter((f) => f.color === BLACK && inside(f.rect)).map((f) => f.rect);
  return { square: { ...square, x: square.x + origin.x, y: square.y + origin.y }, modules };
}

describe('QR codes for badge codes (the qrcode package, level M)', () => {
  it('hold a 22-character code in version 2 at level M, even when all of it is encoded as bytes', () => {
    // ISO/IEC 18004, table 7: at level M, version 1 holds 14 bytes and version 2 holds 26, so a
    // 22-byte code needs version 2. qrcode may mix modes to save bits, never needing more.
    for (let i = 0; i < 200; i++) {
      const code = generateBadgeCode();
      expect(code).toHaveLength(22);
      expect(QRCode.create(code, { errorCorrectionLevel: 'M' }).version).toBe(2);
    }
    const asBytes = QRCode.create([{ data: Buffer.from(generateBadgeCode()), mode: 'byte' }], { errorCorrectionLevel: 'M' });
    expect(asBytes.version).toBe(2);
    expect(asBytes.segments.map((s) => s.mode.id)).toEqual(['Byte']);
    // ISO/IEC 18004 format information: level M is the bit pair 00.
    expect(asBytes.errorCorrectionLevel.bit).toBe(0);
    // ISO/IEC 18004: a version V symbol is 17 + 4V modules a side.
    expect(asBytes.modules.size).toBe(17 + 4 * 2);
  });

  it('follow the level M byte capacities of ISO/IEC 18004: 14, 26 and 42 bytes for versions 1 to 3', () => {
    // ISO/IEC 18004, table 7 (level M, byte mode): version 1 — 14, version 2 — 26, version 3 — 42.
    const version = (bytes: number) => QRCode.create('a'.repeat(bytes).replace(/^a/, 'z'), { errorCorrectionLevel: 'M' }).version;
    expect(version(14)).toBe(1);
    expect(version(15)).toBe(2);
    expect(version(26)).toBe(2);
    expect(version(27)).toBe(3);
    expect(version(42)).toBe(3);
    expect(version(43)).toBe(4);
  });

  it('rendered to PNG at level M with margin 4 decode back to the code with jsQR, inside a light quiet zone of 4 modules', async () => {
    const code = generateBadgeCode();
    const scale = 6;
    const { modules } = QRCode.create(code, { errorCorrectionLevel: 'M' });

    const png = await QRCode.toBuffer(code, { type: 'png', errorCorrectionLevel: 'M', margin: QR_QUIET_ZONE_MODULES, scale });
    const bitmap = fromPng(png);

    // ISO/IEC 18004: the quiet zone is 4 modules wide on every side.
    expect(bitmap.width).toBe((modules.size + 2 * 4) * scale);
    expect(bitmap.height).toBe(bitmap.width);
    expect(borderIsLight(bitmap, 4 * scale)).toBe(true);
    // The finder pattern's dark corner sits right inside the quiet zone.
    expect(bitmap.pixels[4 * scale * bitmap.width + 4 * scale]).toBeLessThan(128);
    expect(decodeQr(bitmap)).toBe(code);
  });
});

describe('the badge card PDF', () => {
  it('is one page of ISO/IEC 7810 ID-1 size, 85.60 × 53.98 mm within 0.1 mm, read back with pdf-lib', async () => {
    const pdf = await cardPdf(card());

    const doc = await PDFDocument.load(pdf);
    const { width, height } = doc.getPage(0).getSize();

    expect(doc.getPageCount()).toBe(1);
    // ISO/IEC 7810 ID-1: 85.60 × 53.98 mm (242.65 × 153.01 pt).
    expect(Math.abs(width * PT_TO_MM - 85.6)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(height * PT_TO_MM - 53.98)).toBeLessThanOrEqual(0.1);
    expect(width).toBeCloseTo(242.65, 1);
    expect(height).toBeCloseTo(153.01, 1);
  });

  it('draws the QR as vectors that decode back to the code with jsQR, with nothing in its 4-module quiet zone', async () => {
    const code = generateBadgeCode();
    const { text } = await pageContent(await cardPdf(card({ code })));

    const { square, modules } = qrInContent(text);
    const size = QRCode.create(code, { errorCorrectionLevel: 'M' }).modules.size;
    const unit = square.width / (size + 2 * QR_QUIET_ZONE_MODULES);
    const bitmap = rasterize(square, modules, 8);

    // ISO/IEC 18004: 4 light modules on every side; the card prints modules of at least 0.8 mm.
    expect(borderIsLight(bitmap, Math.floor(4 * unit * 8))).toBe(true);
    expect(unit * PT_TO_MM).toBeGreaterThanOrEqual(0.8);
    expect(decodeQr(bitmap)).toBe(code);
    expect(square.x + square.width).toBeLessThanOrEqual(CARD_WIDTH_PT);
    expect(square.y + square.height).toBeLessThanOrEqual(CARD_HEIGHT_PT);
  });

  it('fills a band in the brand blue #1e3a8a and strokes the card outline with 3.18 mm corners', async () => {
    const { text } = await pageContent(await cardPdf(card()));

    const blue = [0x1e, 0x3a, 0x8a].map((c) => c / 255);
    const band = filledRects(text).find((f) => f.color.split(' ').map(Number).every((v, i) => Math.abs(v - blue[i]!) < 1e-9));
    expect(band?.rect).toMatchObject({ x: 0, y: 0, width: expect.closeTo(CARD_WIDTH_PT, 3) });
    // ISO/IEC 7813: corner radius 3.18 mm; the outline's first corner curve starts one radius in.
    const radius = (ID1_MM.cornerRadius * 72) / 25.4;
    const start = /^(-?[\d.]+) (-?[\d.]+) m$/m.exec(text);
    expect(Number(start?.[1])).toBeCloseTo(radius, 2);
  });

  it('embeds the Atkinson Hyperlegible typeface, not a standard PDF font', async () => {
    const pdf = (await cardPdf(card({ fullName: 'Łucja Ðorđević-Ashdown' }))).toString('latin1');

    expect(pdf).toMatch(/\/FontName \/[A-Z]{6}\+AtkinsonHyperlegible-Bold/);
    expect(pdf).not.toMatch(/\/BaseFont \/Helvetica/);
  });

  it('draws the member photo as an image when there is one, and a vector placeholder when not', async () => {
    const photo = await sharp({ create: { width: 240, height: 300, channels: 3, background: '#7a6a5a' } }).jpeg().toBuffer();

    const withPhoto = (await cardPdf(card({ photo }))).toString('latin1');
    const without = (await cardPdf(card())).toString('latin1');

    expect(withPhoto).toContain('/Subtype /Image');
    expect(without).not.toContain('/Subtype /Image');
  });
});

describe('font runs', () => {
  it('keep Latin-1 letters in the latin subset and send Latin Extended letters to latin-ext', () => {
    expect(fontRuns('Zoë Ashdown')).toEqual([{ subset: 'latin', text: 'Zoë Ashdown' }]);
    expect(fontRuns('Łucja Đorđević')).toEqual([
      { subset: 'latin-ext', text: 'Ł' },
      { subset: 'latin', text: 'ucja ' },
      { subset: 'latin-ext', text: 'Đ' },
      { subset: 'latin', text: 'or' },
      { subset: 'latin-ext', text: 'đ' },
      { subset: 'latin', text: 'evi' },
      { subset: 'latin-ext', text: 'ć' },
    ]);
  });
});

describe('the badge sheet', () => {
  it.each(['letter', 'a4'] as const)('on %s places 8 full-size cards inside the page with at least 1/4 in of margin, none overlapping', (paper) => {
    const [pageWidth, pageHeight] = PAPER_PT[paper];
    const slots = sheetSlots(paper);

    expect(slots).toHaveLength(SHEET.columns * SHEET.rows);
    // Common practice, no published source: office printers leave about 1/4 in unprinted at the edges.
    for (const { x, y } of slots) {
      expect(x).toBeGreaterThanOrEqual(18);
      expect(y).toBeGreaterThanOrEqual(18);
      expect(x + CARD_WIDTH_PT).toBeLessThanOrEqual(pageWidth - 18);
      expect(y + CARD_HEIGHT_PT).toBeLessThanOrEqual(pageHeight - 18);
      // The crop marks reach into the margin but stay on the page.
      expect(x - SHEET.markOffset - SHEET.markLength).toBeGreaterThan(0);
      expect(y - SHEET.markOffset - SHEET.markLength).toBeGreaterThan(0);
    }
    for (const [i, a] of slots.entries()) {
      for (const b of slots.slice(i + 1)) {
        const apart = a.x + CARD_WIDTH_PT <= b.x || b.x + CARD_WIDTH_PT <= a.x || a.y + CARD_HEIGHT_PT <= b.y || b.y + CARD_HEIGHT_PT <= a.y;
        expect(apart).toBe(true);
      }
    }
  });

  it('pages US Letter (8.5 × 11 in) and A4 (ISO 216, 210 × 297 mm) eight cards at a time', async () => {
    const cards = Array.from({ length: 9 }, () => card());

    const letter = await PDFDocument.load(await sheetPdf(cards, 'letter'));
    const a4 = await PDFDocument.load(await sheetPdf(cards.slice(0, 8), 'a4'));

    expect(letter.getPageCount()).toBe(2);
    expect(letter.getPage(0).getSize()).toEqual({ width: 612, height: 792 });
    expect(a4.getPageCount()).toBe(1);
    // ISO 216 A4: 210 × 297 mm.
    const { width, height } = a4.getPage(0).getSize();
    expect(Math.abs(width * PT_TO_MM - 210)).toBeLessThanOrEqual(0.1);
    expect(Math.abs(height * PT_TO_MM - 297)).toBeLessThanOrEqual(0.1);
  });

  it('draws each card’s QR so it decodes back to that card’s code', async () => {
    const cards = Array.from({ length: 3 }, () => card());
    const { text } = await pageContent(await sheetPdf(cards, 'letter'));

    // Each card is drawn after a translate to its slot; split the stream at those.
    const parts = text.split(/\n1 0 0 1 (-?[\d.]+) (-?[\d.]+) cm\n/);
    const decoded: (string | null)[] = [];
    for (let i = 3; i < parts.length; i += 3) {
      const { square, modules } = qrInContent(parts[i]!);
      decoded.push(decodeQr(rasterize(square, modules, 8)));
    }
    expect(decoded).toEqual(cards.map((c) => c.code));
  });
});
