import { describe, expect, it } from 'vitest';
import { boardLayout, DETAIL_LINE_EM, MAX_PLATE_FONT_PX, PLATE_HEIGHT_EM, PLATE_WIDTH_EM, type BoardLayout, type BoardSpace } from './board-layout';

/** The room the areas get on a screen once the header and footer strips are drawn. */
const fullHd = { width: 1872, height: 900 };
const hdReady = { width: 1248, height: 590 };

function spread(machines: number, areas: number): number[] {
  return Array.from({ length: areas }, (_, i) => Math.floor(machines / areas) + (i < machines % areas ? 1 : 0));
}

/** Where every plate lands when the areas take their share of the width as the board's CSS gives it. */
function overflows(space: BoardSpace, layout: BoardLayout) {
  const total = layout.columns.reduce((sum, n) => sum + n, 0);
  const shared = space.width - (layout.columns.length - 1) * layout.areaGap;
  const tallest = Math.max(
    ...space.areas.map((count, i) => {
      const files = layout.columns[i] ?? 1;
      const rows = Math.ceil(count / files);
      return layout.headingHeight + rows * layout.plateHeight + (rows - 1) * layout.gap;
    }),
  );
  const narrowest = Math.min(
    ...layout.columns.map((files) => (shared * (files / total) - (files - 1) * layout.gap) / files),
  );
  return {
    tooTall: tallest > space.height,
    tooNarrow: narrowest < layout.plateFontSize * PLATE_WIDTH_EM,
  };
}

describe('board layout', () => {
  for (const [label, screen] of [
    ['1920×1080', fullHd],
    ['1280×720', hdReady],
  ] as const) {
    for (const machines of [10, 25, 60]) {
      for (const areas of [1, 4, 6]) {
        it(`fits ${machines} machines in ${areas} area(s) on a ${label} screen`, () => {
          const space = { ...screen, areas: spread(machines, areas) };
          const layout = boardLayout(space);

          expect(layout.columns.reduce((sum, n) => sum + n, 0) * layout.rows).toBeGreaterThanOrEqual(machines);
          expect(overflows(space, layout)).toEqual({ tooTall: false, tooNarrow: false });
        });
      }
    }
  }

  it('keeps 60 machines in four even areas readable on a 1280×720 TV', () => {
    const layout = boardLayout({ ...hdReady, areas: [15, 15, 15, 15] });

    // Common practice, no published source: about 12 CSS px is the least a 720p TV shows legibly
    // from a few metres; the state word is 1.45 times the plate's font size.
    expect(layout.plateFontSize).toBeGreaterThanOrEqual(12);
  });

  it('gives a crowded area more files than a quiet one', () => {
    const layout = boardLayout({ ...fullHd, areas: [30, 5, 5] });

    expect(layout.columns[0]).toBeGreaterThan(layout.columns[1] ?? 0);
    expect(layout.columns[1]).toBe(layout.columns[2]);
  });

  it('stops growing plates at a comfortable size when there are only a few machines', () => {
    const layout = boardLayout({ ...fullHd, areas: [1, 1] });

    expect(layout.plateFontSize).toBe(MAX_PLATE_FONT_PX);
    expect(layout.plateHeight).toBe(Math.floor(MAX_PLATE_FONT_PX * (PLATE_HEIGHT_EM + DETAIL_LINE_EM)));
  });

  it('gives plates a second line of detail where there is room, and keeps a crowded board to one', () => {
    expect(boardLayout({ ...fullHd, areas: spread(10, 4) }).detailLines).toBe(2);
    expect(boardLayout({ ...hdReady, areas: spread(60, 4) }).detailLines).toBe(1);
  });

  it('names the areas larger when the plates under them are large', () => {
    const few = boardLayout({ ...fullHd, areas: spread(10, 4) });
    const many = boardLayout({ ...fullHd, areas: spread(60, 4) });

    expect(few.headingFontSize).toBeGreaterThan(many.headingFontSize);
    expect(few.headingFontSize).toBeLessThan(few.plateFontSize);
  });

  it('grows the plates when the screen grows', () => {
    const areas = spread(40, 4);

    expect(boardLayout({ ...fullHd, areas }).plateFontSize).toBeGreaterThan(boardLayout({ ...hdReady, areas }).plateFontSize);
  });

  it('lays out nothing when no area has a machine', () => {
    expect(boardLayout({ ...fullHd, areas: [] })).toMatchObject({ columns: [], rows: 0, plateFontSize: 0 });
  });
});
