import { describe, expect, it } from 'vitest';
import { emptyBurst, feedKey, MAX_KEY_GAP_MS, type Burst } from './keystroke-burst';

const CODE = 'q3Vx9_Lm-2Rb7TgZk0PwYa';

function typeKeys(keys: string[], gapMs: number, start = 1_000): { codes: string[]; burst: Burst } {
  let burst = emptyBurst;
  const codes: string[] = [];
  keys.forEach((key, i) => {
    const result = feedKey(burst, key, start + i * gapMs);
    burst = result.burst;
    if (result.code) codes.push(result.code);
  });
  return { codes, burst };
}

describe('keyboard-wedge scan detection', () => {
  it('a fast burst of code characters ending in Enter is a scan', () => {
    expect(typeKeys([...CODE, 'Enter'], 8).codes).toEqual([CODE]);
  });

  it('keys typed at a person’s pace are not a scan', () => {
    expect(typeKeys([...CODE, 'Enter'], 120).codes).toEqual([]);
  });

  it('a pause inside the code starts the burst again from the key after it', () => {
    let burst = typeKeys([...'junkjunk'], 5).burst;
    const later = 10_000;
    [...CODE].forEach((key, i) => {
      burst = feedKey(burst, key, later + i * 5).burst;
    });
    expect(feedKey(burst, 'Enter', later + CODE.length * 5).code).toBe(CODE);
  });

  it('a short burst, such as a number typed quickly, is not a badge code', () => {
    expect(typeKeys([...'12345', 'Enter'], 5).codes).toEqual([]);
  });

  it('a character that cannot be in a badge code throws the burst away', () => {
    expect(typeKeys([...CODE.slice(0, 10), ' ', ...CODE.slice(10), 'Enter'], 5).codes).toEqual([]);
  });

  it('Enter long after the last key is not the end of a scan', () => {
    const { burst } = typeKeys([...CODE], 5);
    expect(feedKey(burst, 'Enter', burst.lastAt + MAX_KEY_GAP_MS + 1).code).toBeUndefined();
  });

  it('two scans in a row give two codes', () => {
    const other = 'Zz9yX8wV7uT6sR5qP4oN3m';
    expect(typeKeys([...CODE, 'Enter', ...other, 'Enter'], 5).codes).toEqual([CODE, other]);
  });
});
