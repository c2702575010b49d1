import { describe, expect, it } from 'vitest';
import { fitNameScale, nameplateLook, nameplateStates } from './nameplate-looks';

describe('nameplate looks', () => {
  it('names every state in the words of the shop floor', () => {
    expect(nameplateStates.map((state) => nameplateLook(state).label)).toEqual([
      'Available',
      'In use',
      'Reserved next',
      'Tagged out',
      'Offline',
    ]);
  });

  it('gives every state its own icon so that no state is told apart by colour alone', () => {
    const icons = nameplateStates.map((state) => nameplateLook(state).icon);
    expect(new Set(icons).size).toBe(nameplateStates.length);
  });

  it('knows exactly the states of the board', () => {
    expect(nameplateStates).toEqual(['available', 'in_use', 'reserved', 'tagged_out', 'offline']);
  });

  it('stripes a tagged-out plate and leaves an offline plate as a grey outline', () => {
    expect(nameplateLook('tagged_out').plate).toContain('stripes-tagged-out');
    expect(nameplateLook('offline').plate).toContain('bg-transparent');
    expect(nameplateLook('offline').plate).toContain('border-state-offline');
  });
});

describe('fitNameScale', () => {
  it('keeps short names at full size and sets longer ones smaller in proportion, to a floor', () => {
    expect(fitNameScale('Drill press')).toBe(1);
    expect(fitNameScale('MIG welder 1')).toBe(1);
    expect(fitNameScale('Horizontal band saw')).toBeCloseTo(13 / 19, 5);
    expect(fitNameScale('A very long machine name for a small plate')).toBe(0.6);
  });
});
