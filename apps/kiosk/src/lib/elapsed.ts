/**
 * Elapsed time as the station's running screen and the board's nameplates show it: `mm:ss` for
 * the first hour, then `h:mm:ss`. A start a little in the future (the screen's clock behind the
 * server's) reads as 00:00.
 */
export function formatElapsed(ms: number): string {
  const total = Math.max(0, Math.floor(ms / 1000));
  const hours = Math.floor(total / 3600);
  const minutes = Math.floor((total % 3600) / 60);
  const seconds = total % 60;
  const mm = String(minutes).padStart(2, '0');
  const ss = String(seconds).padStart(2, '0');
  return hours > 0 ? `${hours}:${mm}:${ss}` : `${mm}:${ss}`;
}

/** The same time in words, for screen readers, which read "12:05" as a clock time. */
export function describeElapsed(ms: number): string {
  const total = Math.max(0, Math.floor(ms / 1000));
  const hours = Math.floor(total / 3600);
  const minutes = Math.floor((total % 3600) / 60);
  const seconds = total % 60;
  const part = (n: number, unit: string) => `${n} ${unit}${n === 1 ? '' : 's'}`;
  return [hours > 0 ? part(hours, 'hour') : null, part(minutes, 'minute'), part(seconds, 'second')].filter(Boolean).join(' ');
}
