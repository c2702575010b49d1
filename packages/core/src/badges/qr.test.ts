import { describe, expect, it } from 'vitest';
import { QR_QUIET_ZONE_MODULES, qrDrawing, type QrModules } from './qr';

function grid(rows: string[]): QrModules {
  return { size: rows.length, get: (row, col) => rows[row]?.[col] === '#' };
}

describe('qrDrawing', () => {
  it('adds the quiet zone of 4 modules on every side', () => {
    // ISO/IEC 18004, the quiet zone: 4 modules wide on all four sides (the width from memory).
    expect(QR_QUIET_ZONE_MODULES).toBe(4);
    expect(qrDrawing(grid(['#.', '.#'])).size).toBe(2 + 2 * 4);
  });

  it('draws each horizontal run of dark modules as one rectangle, offset by the quiet zone', () => {
    const drawing = qrDrawing(grid(['##.#', '....', '.###', '#..#']));
    expect(drawing.runs).toEqual([
      { x: 4, y: 4, width: 2 },
      { x: 7, y: 4, width: 1 },
      { x: 5, y: 6, width: 3 },
      { x: 4, y: 7, width: 1 },
      { x: 7, y: 7, width: 1 },
    ]);
  });

  it('covers exactly the dark modules', () => {
    const rows = ['#.##.#', '######', '......', '#....#', '.#..#.', '##.###'];
    const dark = rows.join('').split('').filter((cell) => cell === '#').length;
    const drawn = qrDrawing(grid(rows)).runs.reduce((sum, run) => sum + run.width, 0);
    expect(drawn).toBe(dark);
  });
});
