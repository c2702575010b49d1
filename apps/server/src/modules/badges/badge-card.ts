import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import { BADGE_QR_ERROR_CORRECTION, ID1_MM, POINTS_PER_MM, QR_QUIET_ZONE_MODULES, qrDrawing, type BadgeSheetQuery } from '@chuckkey/core';

/**
 * The printable badge card: an ISO/IEC 7810 ID-1 card (85.60 × 53.98 mm) with the shop's name on
 * a band of the brand blue, the member's photo (or a drawn placeholder), name and role, and the
 * badge QR drawn as vectors with its quiet zone, so it prints sharp at any resolution.
 */

export interface CardContent {
  shopName: string;
  fullName: string;
  roleLabel: string;
  /** The badge code the QR carries. */
  code: string;
  /** A JPEG as stored by the photo upload; none draws the placeholder. */
  photo?: Buffer | undefined;
}

const mm = (value: number) => value * POINTS_PER_MM;

export const CARD_WIDTH_PT = mm(ID1_MM.width);
export const CARD_HEIGHT_PT = mm(ID1_MM.height);

const BRAND = '#1e3a8a';
const INK = '#111827';
const MUTED = '#4b5563';
const GUIDE = '#9ca3af';
const PLACEHOLDER_FILL = '#e5e7eb';
const PLACEHOLDER_FIGURE = '#9ca3af';

// Card layout in millimetres, measured from the card's top-left corner.
const layout = {
  band: { height: 10 },
  shopName: { x: 4, maxSize: 8.5, minSize: 6 },
  photo: { x: 4, y: 13, width: 20, height: 25 },
  qr: { side: 31, right: 2, y: 11.5 },
  middle: { x: 26.5 },
  name: { x: 4, baseline: 50.2, maxSize: 12, minSize: 6.5 },
};

// Fontsource ships the typeface as per-script subsets in WOFF, which pdfkit embeds (as a subset
// of the glyphs used). A name mixing scripts is drawn run by run with the subset holding each letter.
const require = createRequire(import.meta.url);
const fontDir = path.dirname(require.resolve('@fontsource/atkinson-hyperlegible/package.json'));
const subsets = ['latin', 'latin-ext'] as const;
type Subset = (typeof subsets)[number];
type Weight = 400 | 700;
const fontFiles = new Map<string, Buffer>();
for (const subset of subsets) {
  for (const weight of [400, 700] as const) {
    fontFiles.set(fontName(subset, weight), readFileSync(path.join(fontDir, 'files', `atkinson-hyperlegible-${subset}-${weight}-normal.woff`)));
  }
}
function fontName(subset: Subset, weight: Weight): string {
  return `atkinson-${subset}-${weight}`;
}

const unicodeRanges: Record<Subset, [number, number][]> = (() => {
  const table = JSON.parse(readFileSync(path.join(fontDir, 'unicode.json'), 'utf8')) as Record<string, string>;
  const parse = (spec: string | undefined): [number, number][] =>
    (spec ?? '').split(',').map((part) => {
      const [from, to] = part.trim().replace(/^U\+/i, '').split('-');
      const start = parseInt(from!, 16);
      return [start, to ? parseInt(to, 16) : start];
    });
  return { latin: parse(table.latin), 'latin-ext': parse(table['latin-ext']) };
})();

function subsetFor(codePoint: number): Subset {
  const within = (ranges: [number, number][]) => ranges.some(([from, to]) => codePoint >= from && codePoint <= to);
  if (within(unicodeRanges.latin)) return 'latin';
  if (within(unicodeRanges['latin-ext'])) return 'latin-ext';
  return 'latin';
}

/** Splits text into runs that one font subset can draw each. */
export function fontRuns(text: string): { subset: Subset; text: string }[] {
  const runs: { subset: Subset; text: string }[] = [];
  for (const char of text) {
    const subset = subsetFor(char.codePointAt(0)!);
    const last = runs.at(-1);
    if (last && last.subset === subset) last.text += char;
    else runs.push({ subset, text: char });
  }
  return runs;
}

type Doc = PDFKit.PDFDocument;

function registerFonts(doc: Doc): void {
  for (const [name, data] of fontFiles) doc.registerFont(name, data);
}

function runsWidth(doc: Doc, text: string, weight: Weight, size: number): number {
  let width = 0;
  for (const run of fontRuns(text)) width += doc.font(fontName(run.subset, weight)).fontSize(size).widthOfString(run.text);
  return width;
}

/** The largest size from max down to min (half points) at which the line fits the width. */
function fittingSize(doc: Doc, text: string, weight: Weight, width: number, max: number, min: number): number {
  for (let size = max; size > min; size -= 0.5) {
    if (runsWidth(doc, text, weight, size) <= width) return size;
  }
  return min;
}

/** Draws one line of text with its top at y, clipped to the width so an overlong name cannot reach the QR. */
function line(doc: Doc, text: string, x: number, y: number, options: { weight: Weight; size: number; color: string; width: number }): void {
  doc.save();
  doc.rect(x, y - options.size, options.width, options.size * 2.5).clip();
  let cursor = x;
  for (const run of fontRuns(text)) {
    doc.font(fontName(run.subset, options.weight)).fontSize(options.size).fillColor(options.color);
    doc.text(run.text, cursor, y, { lineBreak: false });
    cursor += doc.widthOfString(run.text);
  }
  doc.restore();
}

/** The QR symbol as filled rectangles, one per horizontal run of dark modules, on a light square with its quiet zone. */
function drawQr(doc: Doc, code: string, x: number, y: number, side: number): void {
  const { size, runs } = qrDrawing(QRCode.create(code, { errorCorrectionLevel: BADGE_QR_ERROR_CORRECTION }).modules);
  const unit = side / size;
  doc.rect(x, y, side, side).fill('#ffffff');
  for (const run of runs) doc.rect(x + run.x * unit, y + run.y * unit, run.width * unit, unit);
  doc.fill('#000000');
}

/** A neutral head-and-shoulders figure for a member without a photo. */
function drawPlaceholder(doc: Doc, x: number, y: number, width: number, height: number): void {
  doc.save();
  doc.rect(x, y, width, height).clip();
  doc.rect(x, y, width, height).fill(PLACEHOLDER_FILL);
  const cx = x + width / 2;
  doc.circle(cx, y + height * 0.38, width * 0.2).fill(PLACEHOLDER_FIGURE);
  doc.ellipse(cx, y + height * 1.0, width * 0.42, height * 0.34).fill(PLACEHOLDER_FIGURE);
  doc.restore();
}

function drawCard(doc: Doc, card: CardContent): void {
  const width = CARD_WIDTH_PT;
  const height = CARD_HEIGHT_PT;
  const radius = mm(ID1_MM.cornerRadius);

  doc.save();
  doc.roundedRect(0, 0, width, height, radius).clip();
  doc.rect(0, 0, width, height).fill('#ffffff');
  doc.rect(0, 0, width, mm(layout.band.height)).fill(BRAND);
  doc.restore();

  const shopWidth = width - 2 * mm(layout.shopName.x);
  const shopSize = fittingSize(doc, card.shopName, 700, shopWidth, layout.shopName.maxSize, layout.shopName.minSize);
  line(doc, card.shopName, mm(layout.shopName.x), (mm(layout.band.height) - shopSize) / 2, { weight: 700, size: shopSize, color: '#ffffff', width: shopWidth });

  const photo = layout.photo;
  if (card.photo) {
    doc.save();
    doc.rect(mm(photo.x), mm(photo.y), mm(photo.width), mm(photo.height)).clip();
    doc.image(card.photo, mm(photo.x), mm(photo.y), { cover: [mm(photo.width), mm(photo.height)], align: 'center', valign: 'center' });
    doc.restore();
  } else {
    drawPlaceholder(doc, mm(photo.x), mm(photo.y), mm(photo.width), mm(photo.height));
  }

  const qrX = width - mm(layout.qr.right) - mm(layout.qr.side);
  drawQr(doc, card.code, qrX, mm(layout.qr.y), mm(layout.qr.side));

  // The QR's quiet zone is light already; the middle column ends where the symbol's own margin begins.
  const middleX = mm(layout.middle.x);
  const middleWidth = qrX - middleX;
  const roleSize = fittingSize(doc, card.roleLabel.toUpperCase(), 700, middleWidth, 9, 6);
  line(doc, card.roleLabel.toUpperCase(), middleX, mm(photo.y) + 1, { weight: 700, size: roleSize, color: BRAND, width: middleWidth });
  doc
    .font(fontName('latin', 400))
    .fontSize(5.5)
    .fillColor(MUTED)
    .text('Scan at a station to start. Report a lost card at once.', middleX, mm(photo.y) + roleSize + 5, { width: middleWidth - mm(1), lineGap: 0.5 });

  const nameWidth = width - 2 * mm(layout.name.x);
  const nameSize = fittingSize(doc, card.fullName, 700, nameWidth, layout.name.maxSize, layout.name.minSize);
  line(doc, card.fullName, mm(layout.name.x), mm(layout.name.baseline) - nameSize, { weight: 700, size: nameSize, color: INK, width: nameWidth });

  // A hairline at the card's edge with ISO/IEC 7813's 3.18 mm corners: the guide for cutting and rounding.
  const stroke = 0.5;
  doc
    .roundedRect(stroke / 2, stroke / 2, width - stroke, height - stroke, radius - stroke / 2)
    .lineWidth(stroke)
    .stroke(GUIDE);
}

function collect(doc: Doc): Promise<Buffer> {
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  return new Promise((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
}

function newDocument(title: string, size: [number, number]): Doc {
  const doc = new PDFDocument({ size, margin: 0, autoFirstPage: false, info: { Title: title, Creator: 'Chuckkey' } });
  registerFonts(doc);
  return doc;
}

/** One card on one page of exactly the card's size. */
export async function cardPdf(card: CardContent): Promise<Buffer> {
  const doc = newDocument(`Badge card: ${card.fullName}`, [CARD_WIDTH_PT, CARD_HEIGHT_PT]);
  const done = collect(doc);
  doc.addPage();
  drawCard(doc, card);
  doc.end();
  return done;
}

/** US Letter (8.5 × 11 in) and ISO 216 A4 (210 × 297 mm), in points. */
export const PAPER_PT: Record<BadgeSheetQuery['paper'], [number, number]> = {
  letter: [8.5 * 72, 11 * 72],
  a4: [mm(210), mm(297)],
};

/**
 * Sheets of 2 × 4 cards at full size with a 1/4 in gutter, centred, so the cards stay clear of the
 * unprintable border of office printers; crop marks in the gutters and margins show each cut.
 */
export const SHEET = { columns: 2, rows: 4, gutter: 18, markOffset: 3, markLength: 9 } as const;

export function sheetSlots(paper: BadgeSheetQuery['paper']): { x: number; y: number }[] {
  const [pageWidth, pageHeight] = PAPER_PT[paper];
  const blockWidth = SHEET.columns * CARD_WIDTH_PT + (SHEET.columns - 1) * SHEET.gutter;
  const blockHeight = SHEET.rows * CARD_HEIGHT_PT + (SHEET.rows - 1) * SHEET.gutter;
  const left = (pageWidth - blockWidth) / 2;
  const top = (pageHeight - blockHeight) / 2;
  const slots: { x: number; y: number }[] = [];
  for (let row = 0; row < SHEET.rows; row++) {
    for (let col = 0; col < SHEET.columns; col++) {
      slots.push({ x: left + col * (CARD_WIDTH_PT + SHEET.gutter), y: top + row * (CARD_HEIGHT_PT + SHEET.gutter) });
    }
  }
  return slots;
}

function cropMarks(doc: Doc, x: number, y: number): void {
  const { markOffset: gap, markLength: length } = SHEET;
  const right = x + CARD_WIDTH_PT;
  const bottom = y + CARD_HEIGHT_PT;
  doc.save().lineWidth(0.25).strokeColor('#000000');
  for (const cornerY of [y, bottom]) {
    doc.moveTo(x - gap - length, cornerY).lineTo(x - gap, cornerY);
    doc.moveTo(right + gap, cornerY).lineTo(right + gap + length, cornerY);
  }
  for (const cornerX of [x, right]) {
    doc.moveTo(cornerX, y - gap - length).lineTo(cornerX, y - gap);
    doc.moveTo(cornerX, bottom + gap).lineTo(cornerX, bottom + gap + length);
  }
  doc.stroke().restore();
}

/** Cards for many members, eight to a page, in the order given. */
export async function sheetPdf(cards: CardContent[], paper: BadgeSheetQuery['paper']): Promise<Buffer> {
  const doc = newDocument(`Badge cards (${cards.length})`, PAPER_PT[paper]);
  const done = collect(doc);
  const slots = sheetSlots(paper);
  cards.forEach((card, index) => {
    const slot = slots[index % slots.length]!;
    if (index % slots.length === 0) doc.addPage();
    cropMarks(doc, slot.x, slot.y);
    doc.save().translate(slot.x, slot.y);
    drawCard(doc, card);
    doc.restore();
  });
  doc.end();
  return done;
}

/** The QR alone as SVG, for the web app's badge page. */
export function qrSvg(code: string): Promise<string> {
  return QRCode.toString(code, { type: 'svg', errorCorrectionLevel: BADGE_QR_ERROR_CORRECTION, margin: QR_QUIET_ZONE_MODULES });
}
