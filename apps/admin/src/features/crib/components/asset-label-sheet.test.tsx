import { render, screen, within } from '@testing-library/react';
import jsQR from 'jsqr';
import { describe, expect, it } from 'vitest';
import { AssetLabelSheet, AssetTagQr } from './asset-label-sheet';

const PIXELS_PER_MODULE = 6;

/**
 * Paints the drawn SVG (its white ground and black rectangles) into an RGBA bitmap and reads it
 * with jsQR, a decoder of ISO/IEC 18004 written independently of the qrcode package that drew it.
 */
function decodeSvg(svg: SVGSVGElement): string | null {
  const size = Number(svg.getAttribute('viewBox')?.split(' ')[2]);
  const side = size * PIXELS_PER_MODULE;
  const rgba = new Uint8ClampedArray(side * side * 4).fill(255);
  for (const rect of svg.querySelectorAll('rect')) {
    if (rect.getAttribute('fill') !== '#000000') continue;
    const x = Number(rect.getAttribute('x')) * PIXELS_PER_MODULE;
    const y = Number(rect.getAttribute('y')) * PIXELS_PER_MODULE;
    const width = Number(rect.getAttribute('width')) * PIXELS_PER_MODULE;
    const height = Number(rect.getAttribute('height')) * PIXELS_PER_MODULE;
    for (let row = y; row < y + height; row++) {
      for (let col = x; col < x + width; col++) rgba.set([0, 0, 0, 255], (row * side + col) * 4);
    }
  }
  return jsQR(rgba, side, side, { inversionAttempts: 'dontInvert' })?.data ?? null;
}

describe('asset tag QR codes', () => {
  it.each(['MIC-001', 'BG-0042', 'thread gauge 60° #7', 'T-2026-0001-ABCDEFGHIJKLMNOPQRSTUVWXYZ12'])(
    'decode to exactly the asset tag %s',
    (assetTag) => {
      render(<AssetTagQr assetTag={assetTag} />);
      const svg = screen.getByRole('img', { name: `QR code of asset tag ${assetTag}` });
      expect(decodeSvg(svg as unknown as SVGSVGElement)).toBe(assetTag);
    },
  );

  it('keeps a quiet zone of four light modules on every side (ISO/IEC 18004)', () => {
    render(<AssetTagQr assetTag="MIC-001" />);
    const svg = screen.getByRole('img');
    const size = Number(svg.getAttribute('viewBox')?.split(' ')[2]);
    const dark = [...svg.querySelectorAll('rect[fill="#000000"]')];
    expect(dark.length).toBeGreaterThan(0);
    for (const rect of dark) {
      const x = Number(rect.getAttribute('x'));
      const y = Number(rect.getAttribute('y'));
      expect(x).toBeGreaterThanOrEqual(4);
      expect(y).toBeGreaterThanOrEqual(4);
      expect(x + Number(rect.getAttribute('width'))).toBeLessThanOrEqual(size - 4);
      expect(y + 1).toBeLessThanOrEqual(size - 4);
    }
  });
});

describe('AssetLabelSheet', () => {
  const tools = Array.from({ length: 25 }, (_, index) => ({ id: `tool-${index}`, name: `Boring bar ${index + 1}`, assetTag: `BB-${String(index + 1).padStart(3, '0')}` }));

  it('puts 24 labels on a sheet, each with the tool’s name, its tag and the shop’s name', () => {
    render(<AssetLabelSheet tools={tools} shopName="Ferrule Street Metalworks" />);

    const sheets = screen.getAllByRole('list');
    expect(sheets).toHaveLength(2);
    expect(within(sheets[0]!).getAllByRole('listitem')).toHaveLength(24);
    const last = within(sheets[1]!).getByRole('listitem');
    expect(last.textContent).toContain('Boring bar 25');
    expect(last.textContent).toContain('BB-025');
    expect(last.textContent).toContain('Ferrule Street Metalworks');
    expect(decodeSvg(within(last).getByRole('img') as unknown as SVGSVGElement)).toBe('BB-025');
  });

  it('sets the 7 mm page margins only while the sheets are shown', () => {
    // CSS Paged Media Level 3, the @page rule: it has no selector for one part of an app, so the rule lives and leaves with the sheets.
    const pageRules = () => [...document.querySelectorAll('style')].filter((style) => /@page\s*\{\s*margin:\s*7mm/.test(style.textContent ?? ''));
    const { unmount } = render(<AssetLabelSheet tools={tools} shopName={undefined} />);
    expect(pageRules()).toHaveLength(1);
    unmount();
    expect(pageRules()).toHaveLength(0);
  });
});
