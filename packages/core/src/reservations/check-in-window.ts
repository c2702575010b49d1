const MINUTE = 60_000;

/**
 * Whether a reservation may be checked into at `now`: from `checkInMinutes` before its start until
 * `graceMinutes` after it, both ends included. After that the reservation is released as a no-show.
 */
export function checkInOpen(startsAt: Date, now: Date, rules: { checkInMinutes: number; noShowGraceMinutes: number }): boolean {
  const t = now.getTime();
  const start = startsAt.getTime();
  return t >= start - rules.checkInMinutes * MINUTE && t <= start + rules.noShowGraceMinutes * MINUTE;
}
