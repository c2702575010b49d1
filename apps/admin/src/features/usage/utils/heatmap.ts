import type { UsageHeatmapCell } from '@chuckkey/core';

/** ISO 8601 weekdays, Monday 1 … Sunday 7, as the report numbers them. */
export const weekdays = [1, 2, 3, 4, 5, 6, 7] as const;
export const weekdayNames = ['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'] as const;
export const weekdayShortNames = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'] as const;

/** Four shades of use above "none": few enough to tell apart, and each named in the legend. */
export const HEAT_LEVELS = 4;

/** Light to dark on the shop's brand blue; the top two carry white text to keep the contrast. */
export const heatColours = ['#ffffff', '#dbe4f5', '#a9bde6', '#4766b8', '#1e3a8a'] as const;
export const heatTextColours = ['#404040', '#171717', '#171717', '#ffffff', '#ffffff'] as const;

/** The hours of use in one weekday and hour of the wall clock; 0 where the report has no cell. */
export type HeatGrid = number[][];

/** Seven rows (Monday first) of 24 hours each, filled from the report's cells. */
export function heatGrid(cells: readonly UsageHeatmapCell[]): HeatGrid {
  const grid = weekdays.map(() => Array.from({ length: 24 }, () => 0));
  for (const cell of cells) {
    const row = grid[cell.weekday - 1];
    if (row && cell.hour >= 0 && cell.hour < 24) row[cell.hour] = (row[cell.hour] ?? 0) + cell.hours;
  }
  return grid;
}

/**
 * The shade of a cell, 0 for no use, else 1…HEAT_LEVELS in equal steps of the busiest cell; a
 * scale of the range's own maximum, so a quiet month still shows where its peaks are.
 */
export function heatLevel(hours: number, max: number): number {
  if (hours <= 0 || max <= 0) return 0;
  return Math.min(HEAT_LEVELS, Math.max(1, Math.ceil((hours / max) * HEAT_LEVELS - 1e-9)));
}

export interface HeatLegendStep {
  level: number;
  /** Hours above which the step starts (exclusive) and where it ends (inclusive). */
  above: number;
  upTo: number;
}

/** The legend's steps from the busiest cell: none, then each shade's span of hours. */
export function heatLegend(max: number): HeatLegendStep[] {
  const steps: HeatLegendStep[] = [{ level: 0, above: 0, upTo: 0 }];
  if (max <= 0) return steps;
  for (let level = 1; level <= HEAT_LEVELS; level += 1) {
    steps.push({ level, above: (max * (level - 1)) / HEAT_LEVELS, upTo: (max * level) / HEAT_LEVELS });
  }
  return steps;
}

/** The hours of the day worth a column: from the first to the last with any use, or the whole day when there was none. */
export function usedHourSpan(grid: HeatGrid): { first: number; last: number } {
  let first = 24;
  let last = -1;
  for (const row of grid) {
    row.forEach((hours, hour) => {
      if (hours > 0) {
        first = Math.min(first, hour);
        last = Math.max(last, hour);
      }
    });
  }
  return last < 0 ? { first: 0, last: 23 } : { first, last };
}

export function gridMax(grid: HeatGrid): number {
  return Math.max(0, ...grid.flat());
}
