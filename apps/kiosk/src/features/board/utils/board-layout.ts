/**
 * How the board lays out its nameplates: one column per shop area, the plates of a crowded area
 * in several files side by side, and one font size for every plate, the largest that lets all of
 * them fit the screen. Nobody scrolls a TV on the wall.
 */

/** A nameplate's narrowest comfortable width at a font size of 1 px (the kiosk Nameplate's `fit` size). */
export const PLATE_WIDTH_EM = 11;
/** Border, band, state line and one detail line of the `fit` nameplate add up to just under this. */
export const PLATE_HEIGHT_EM = 4.9;
/** One more detail line (0.9em at line height 1.2), so that a long tag-out reason shows whole. */
export const DETAIL_LINE_EM = 1.08;
/** Beyond this a plate only grows emptier: ten machines on a big screen stay a comfortable size. */
export const MAX_PLATE_FONT_PX = 40;

export interface BoardSpace {
  /** The content box the areas share, in CSS px. */
  width: number;
  height: number;
  /** Machines per area, in the order the areas are shown. */
  areas: readonly number[];
}

export interface BoardLayout {
  /** Between plates, in px. */
  gap: number;
  /** Between areas, in px. */
  areaGap: number;
  headingFontSize: number;
  /** The area heading with the space under it, in px. */
  headingHeight: number;
  /** Files of plates per area, in the order of `areas`. */
  columns: number[];
  /** Plates in the longest file. */
  rows: number;
  plateFontSize: number;
  plateHeight: number;
  /** Lines of detail a plate has room for. */
  detailLines: 1 | 2;
}

const HEADING_LINE_HEIGHT = 1.25;
/** A second detail line is worth this much of the plates' size, no more. */
const SECOND_LINE_COST = 0.95;

function clamp(value: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, value));
}

interface Fit {
  rows: number;
  columns: number[];
  fontSize: number;
}

/**
 * The font size at which `rows` plates a file fit, and the files each area needs for it. Areas
 * share the width in proportion to their files (flex-grow), so every file is nearly as wide.
 */
function fitFor(rows: number, space: BoardSpace, gaps: { gap: number; areaGap: number }, plateSpace: number, plateEm: number): Fit {
  const columns = space.areas.map((count) => Math.max(1, Math.ceil(count / rows)));
  const total = columns.reduce((sum, n) => sum + n, 0);
  const shared = space.width - (columns.length - 1) * gaps.areaGap;
  const plateWidth = Math.min(...columns.map((files) => (shared * (files / total) - (files - 1) * gaps.gap) / files));
  const plateHeight = (plateSpace - (rows - 1) * gaps.gap) / rows;
  const fontSize = Math.min(plateWidth / PLATE_WIDTH_EM, plateHeight / plateEm, MAX_PLATE_FONT_PX);
  return { rows, columns, fontSize };
}

/** Every possible length of the longest file, from one plate to a whole area in one file. */
function bestFit(space: BoardSpace, gaps: { gap: number; areaGap: number }, plateSpace: number, plateEm: number): Fit {
  let best = fitFor(1, space, gaps, plateSpace, plateEm);
  for (let rows = 2; rows <= Math.max(1, ...space.areas); rows += 1) {
    const fit = fitFor(rows, space, gaps, plateSpace, plateEm);
    if (fit.fontSize > best.fontSize) best = fit;
  }
  return best;
}

function headingHeight(fontSize: number, gap: number): number {
  return Math.ceil(fontSize * HEADING_LINE_HEIGHT) + gap;
}

export function boardLayout(space: BoardSpace): BoardLayout {
  // The spacing follows the screen, so a 720p TV and a 1080p one look alike from across the room.
  const gap = clamp(Math.round(Math.min(space.width, space.height) / 90), 4, 16);
  const gaps = { gap, areaGap: gap * 2 };
  const baseHeading = clamp(Math.round(space.height * 0.028), 14, 30);
  if (space.areas.length === 0) {
    const heading = { headingFontSize: baseHeading, headingHeight: headingHeight(baseHeading, gap) };
    return { ...gaps, ...heading, columns: [], rows: 0, plateFontSize: 0, plateHeight: 0, detailLines: 1 };
  }

  const place = (headingFontSize: number) => {
    const plateSpace = space.height - headingHeight(headingFontSize, gap);
    const oneLine = bestFit(space, gaps, plateSpace, PLATE_HEIGHT_EM);
    const twoLines = bestFit(space, gaps, plateSpace, PLATE_HEIGHT_EM + DETAIL_LINE_EM);
    return twoLines.fontSize >= oneLine.fontSize * SECOND_LINE_COST
      ? { fit: twoLines, detailLines: 2 as const }
      : { fit: oneLine, detailLines: 1 as const };
  };

  // Large plates under small area names look lost: a board of few machines names its areas larger.
  let headingFontSize = baseHeading;
  let placed = place(headingFontSize);
  const grown = Math.min(Math.round(placed.fit.fontSize * 0.85), Math.round(space.height * 0.045));
  if (grown > headingFontSize) {
    headingFontSize = grown;
    placed = place(headingFontSize);
  }

  // Whole tenths of a pixel, rounded down, so rounding never pushes the last plate off the screen.
  const plateFontSize = Math.max(0, Math.floor(placed.fit.fontSize * 10) / 10);
  const plateEm = PLATE_HEIGHT_EM + (placed.detailLines === 2 ? DETAIL_LINE_EM : 0);
  return {
    ...gaps,
    headingFontSize,
    headingHeight: headingHeight(headingFontSize, gap),
    columns: placed.fit.columns,
    rows: Math.max(...placed.fit.columns.map((files, i) => Math.ceil((space.areas[i] ?? 0) / files))),
    plateFontSize,
    plateHeight: Math.floor(plateFontSize * plateEm),
    detailLines: placed.detailLines,
  };
}
