import { describe, expect, it } from 'vitest';
import { boardStateSchema } from './schemas';
import { boardStateIcons } from './state-icons';

// SVG 2, §9.3 (path data): commands and numbers only, every subpath starting with a moveto.
const PATH_DATA = /^(?:[MmLlHhVvCcSsQqTtAaZz](?:\s*-?\d*\.?\d+(?:\s*,?\s*-?\d*\.?\d+)*)?\s*)+$/;

describe('boardStateIcons', () => {
  it('has a distinct shape for every board state', () => {
    const states = boardStateSchema.options;
    expect(Object.keys(boardStateIcons).sort()).toEqual([...states].sort());
    expect(new Set(Object.values(boardStateIcons)).size).toBe(states.length);
  });

  it('is plain SVG path data on the 24 × 24 grid, starting with a moveto', () => {
    for (const [state, d] of Object.entries(boardStateIcons)) {
      expect(d, state).toMatch(PATH_DATA);
      expect(d.startsWith('M'), state).toBe(true);
      const numbers = d.match(/-?\d*\.?\d+/g)!.map(Number);
      // Absolute coordinates stay on the grid (relative steps and arc flags are small as well).
      for (const n of numbers) expect(Math.abs(n), state).toBeLessThanOrEqual(24);
    }
  });
});
