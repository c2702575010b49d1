import { describe, expect, it } from 'vitest';
import { orderRungs } from './ladder';

const rung = (rule: number, passed: boolean) => ({ rule, passed });

describe('orderRungs', () => {
  it('puts the failing rungs first, each group in rule order', () => {
    const ordered = orderRungs([rung(1, true), rung(5, false), rung(2, false), rung(8, true), rung(3, true), rung(7, false)]);
    expect(ordered.map((r) => [r.rule, r.passed])).toEqual([
      [2, false],
      [5, false],
      [7, false],
      [1, true],
      [3, true],
      [8, true],
    ]);
  });

  it('keeps all eight rungs of a cleared decision in rule order', () => {
    const ordered = orderRungs([8, 7, 6, 5, 4, 3, 2, 1].map((rule) => rung(rule, true)));
    expect(ordered.map((r) => r.rule)).toEqual([1, 2, 3, 4, 5, 6, 7, 8]);
  });

  it('leaves the rungs it was given as they were', () => {
    const given = [rung(2, true), rung(1, false)];
    orderRungs(given);
    expect(given.map((r) => r.rule)).toEqual([2, 1]);
  });
});
