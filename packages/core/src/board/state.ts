import { HEARTBEAT_SILENCE_MINUTES } from '../stations/check-in';
import type { BoardState } from './schemas';

/** What decides a machine's state on the board, read for every machine in one query. */
export interface MachineStateFacts {
  /** The open tag-out, if there is one. */
  tagOut: { reason: string } | null;
  sessionRunning: boolean;
  /** Paired, unrevoked stations at the machine. */
  stations: number;
  /** The latest contact of any of those stations. */
  lastHeardAt: Date | null;
  /** The machine's earliest reservation not yet checked into that has not ended, with its check-in window. */
  nextReservation?: { startsAt: Date; endsAt: Date; checkInMinutes: number } | null;
}

const SILENCE_MS = HEARTBEAT_SILENCE_MINUTES * 60_000;

/**
 * The machine's state at `now`, the one rule behind GET /api/board and every `machine:update`:
 * tagged out first (a tag-out outranks whatever else is true), then in use, then reserved from the
 * start of the holder's check-in window until the reservation is checked into, released or over (a
 * walk-up would take time that is someone's), then offline when the
 * machine has stations and all of them have been silent longer than HEARTBEAT_SILENCE_MINUTES, else
 * available. A machine without a station cannot go offline: nothing reports on it.
 */
export function machineBoardState(facts: MachineStateFacts, now: Date): BoardState {
  if (facts.tagOut) return 'tagged_out';
  if (facts.sessionRunning) return 'in_use';
  const next = facts.nextReservation;
  if (next && now.getTime() >= next.startsAt.getTime() - next.checkInMinutes * 60_000 && now.getTime() < next.endsAt.getTime()) return 'reserved';
  if (facts.stations > 0 && (facts.lastHeardAt === null || now.getTime() - facts.lastHeardAt.getTime() > SILENCE_MS)) return 'offline';
  return 'available';
}

/** The initial of a last name as the board shows it: its first character, upper-cased. */
export function lastInitial(lastName: string): string {
  const [first = ''] = Array.from(lastName.trim());
  return first.toLocaleUpperCase('en');
}
