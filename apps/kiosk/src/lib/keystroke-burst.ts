/**
 * Hand-held and desk scanners that act as a keyboard ("keyboard wedge") type a code and press
 * Enter, a few milliseconds between keys. People type 80 ms or more apart, so a fast burst that
 * ends in Enter is a scan even when no field has focus. Common practice, no published source
 * for the gap: 50 ms leaves room for slow Bluetooth links and none for a person.
 */
export const MAX_KEY_GAP_MS = 50;
/** The shortest badge code (core's badgeCodeSchema): 22 base64url characters. */
export const MIN_CODE_LENGTH = 22;

/** What one kind of scanned code looks like: how short it may be and which characters it holds. */
export interface ScanShape {
  minLength: number;
  character: RegExp;
}

/** A badge code: base64url, at least 22 characters. */
export const badgeScan: ScanShape = { minLength: MIN_CODE_LENGTH, character: /^[A-Za-z0-9_-]$/ };

export interface Burst {
  chars: string;
  lastAt: number;
}

export const emptyBurst: Burst = { chars: '', lastAt: Number.NEGATIVE_INFINITY };

/** Feeds one key press (its `key` and time in ms) to the burst; gives a code when a scan ends. */
export function feedKey(burst: Burst, key: string, at: number, shape: ScanShape = badgeScan): { burst: Burst; code?: string } {
  const fast = at - burst.lastAt <= MAX_KEY_GAP_MS;
  if (key === 'Enter') {
    if (fast && burst.chars.length >= shape.minLength) return { burst: emptyBurst, code: burst.chars };
    return { burst: emptyBurst };
  }
  if (!shape.character.test(key)) return { burst: emptyBurst };
  return { burst: { chars: fast ? burst.chars + key : key, lastAt: at } };
}
