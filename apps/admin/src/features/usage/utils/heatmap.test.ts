import { describe, expect, it } from 'vitest';
import { gridMax, heatColours, heatGrid, heatLegend, heatLevel, heatTextColours, usedHourSpan } from './heatmap';

/** WCAG 2.x relative luminance and contrast ratio (WCAG 2.2, "relative luminance" definition). */
function luminance(hex: string): number {
  const channel = (offset: number) => {
    const value = parseInt(hex.slice(offset, offset + 2), 16) / 255;
    return value <= 0.04045 ? value / 12.92 : ((value + 0.055) / 1.055) ** 2.4;
  };
  return 0.2126 * channel(1) + 0.7152 * channel(3) + 0.0722 * channel(5);
}

function contrast(a: string, b: string): number {
  const [light, dark] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (light + 0.05) / (dark + 0.05);
}

describe('heatGrid', () => {
  it('lays the cells out Monday first, ISO 8601 weekdays 1–7, with 0 where the report has none', () => {
    const grid = heatGrid([
      { weekday: 1, hour: 9, hours: 1.5 },
      { weekday: 7, hour: 23, hours: 0.25 },
    ]);
    expect(grid).toHaveLength(7);
    expect(grid.every((row) => row.length === 24)).toBe(true);
    expect(grid[0]?.[9]).toBe(1.5);
    expect(grid[6]?.[23]).toBe(0.25);
    expect(grid[3]?.[12]).toBe(0);
    expect(gridMax(grid)).toBe(1.5);
  });
});

describe('heatLevel', () => {
  it('shades in four equal steps of the busiest cell, and keeps "none" for no use', () => {
    expect(heatLevel(0, 8)).toBe(0);
    expect(heatLevel(0.1, 8)).toBe(1);
    expect(heatLevel(2, 8)).toBe(1);
    expect(heatLevel(2.01, 8)).toBe(2);
    expect(heatLevel(6, 8)).toBe(3);
    expect(heatLevel(8, 8)).toBe(4);
  });

  it('shows no shade at all in a range without use', () => {
    expect(heatLevel(0, 0)).toBe(0);
  });
});

describe('heatLegend', () => {
  it('gives each shade its span of hours, ending at the busiest cell', () => {
    expect(heatLegend(8)).toEqual([
      { level: 0, above: 0, upTo: 0 },
      { level: 1, above: 0, upTo: 2 },
      { level: 2, above: 2, upTo: 4 },
      { level: 3, above: 4, upTo: 6 },
      { level: 4, above: 6, upTo: 8 },
    ]);
    expect(heatLegend(0)).toEqual([{ level: 0, above: 0, upTo: 0 }]);
  });

  it('puts every legend span on the level heatLevel gives its top value', () => {
    for (const step of heatLegend(5).slice(1)) expect(heatLevel(step.upTo, 5)).toBe(step.level);
  });
});

describe('heat colours', () => {
  it('keeps every cell’s text readable on its shade', () => {
    // WCAG 2.2 success criterion 1.4.3: at least 4.5:1 for normal text.
    heatColours.forEach((background, level) => expect(contrast(background, heatTextColours[level] ?? '#000000')).toBeGreaterThanOrEqual(4.5));
  });
});

describe('usedHourSpan', () => {
  it('keeps the hours from the first to the last with any use, or the whole day without use', () => {
    expect(usedHourSpan(heatGrid([{ weekday: 2, hour: 8, hours: 1 }, { weekday: 5, hour: 17, hours: 2 }]))).toEqual({ first: 8, last: 17 });
    expect(usedHourSpan(heatGrid([]))).toEqual({ first: 0, last: 23 });
  });
});
