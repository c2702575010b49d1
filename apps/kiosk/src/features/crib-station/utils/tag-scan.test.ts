import { describe, expect, it } from 'vitest';
import { emptyBurst, feedKey, type Burst } from '@/lib/keystroke-burst';
import { tagScan } from './tag-scan';

function scan(keys: string[], gapMs: number): string[] {
  let burst: Burst = emptyBurst;
  const codes: string[] = [];
  keys.forEach((key, i) => {
    const result = feedKey(burst, key, 1_000 + i * gapMs, tagScan);
    burst = result.burst;
    if (result.code) codes.push(result.code);
  });
  return codes;
}

describe('asset tags from a keyboard-wedge scanner', () => {
  it('a fast burst of a tag’s characters ending in Enter is a tag', () => {
    expect(scan([...'CK-0104', 'Enter'], 8)).toEqual(['CK-0104']);
  });

  it('a tag typed at a person’s pace is not a scan (common practice: people type 80 ms or more apart)', () => {
    expect(scan([...'CK-0104', 'Enter'], 120)).toEqual([]);
  });

  it('two keys and Enter are too short to be a tag', () => {
    expect(scan([...'ok', 'Enter'], 5)).toEqual([]);
  });
});
