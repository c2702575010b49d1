const MINUTE = 60_000;

/** screens.md: the running screen warns this long before someone else's reservation starts. */
export const RESERVATION_WARNING_MINUTES = 10;

interface NextReservation {
  startsAt: string;
  endsAt: string;
  memberFirstName: string;
}

function dayKey(at: Date, timeZone: string): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(at);
}

/** Wall-clock times in the shop's zone, with the weekday when the reservation is not today. */
export function reservationLine(next: NextReservation, now: Date, timeZone: string): string {
  const start = new Date(next.startsAt);
  const clock = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
  const times = `${clock.format(start)}–${clock.format(new Date(next.endsAt))}`;
  const day = dayKey(start, timeZone) === dayKey(now, timeZone) ? '' : `${new Intl.DateTimeFormat('en-GB', { timeZone, weekday: 'long' }).format(start)} `;
  return `Next reservation: ${next.memberFirstName}, ${day}${times}`;
}

/**
 * The warning the running screen shows when someone other than the member on the machine has a
 * reservation starting within the warning time (or already started): the session is never cut
 * short, so the member is asked to finish.
 */
export function reservationWarning(
  next: (NextReservation & { memberId: string }) | null | undefined,
  runningMemberId: string | null,
  now: Date,
  timeZone: string,
): string | null {
  if (!next || next.memberId === runningMemberId) return null;
  const start = new Date(next.startsAt).getTime();
  if (start - now.getTime() > RESERVATION_WARNING_MINUTES * MINUTE || new Date(next.endsAt).getTime() <= now.getTime()) return null;
  const at = new Intl.DateTimeFormat('en-GB', { timeZone, hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(start));
  return start > now.getTime()
    ? `${next.memberFirstName} has reserved this machine from ${at}. Please finish up and end your session.`
    : `${next.memberFirstName}’s reservation began at ${at}. Please end your session.`;
}
