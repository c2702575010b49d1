import type { BoardMachine, BoardPerson, BoardState } from '@chuckkey/core';

/** The shop floor's words for a machine's state: the same as the wall board's. */
export const machineStateLabels: Record<BoardState, string> = {
  available: 'Available',
  in_use: 'In use',
  reserved: 'Reserved next',
  tagged_out: 'Tagged out',
  offline: 'Offline',
};

/** Signed-in people see on the floor what the wall board shows: a first name and a last initial. */
export function shortName({ firstName, lastInitial }: BoardPerson): string {
  return lastInitial ? `${firstName} ${lastInitial}.` : firstName;
}

export function supervisorLine(supervisor: BoardPerson | null): string {
  return supervisor ? `Supervisor on duty: ${shortName(supervisor)}` : 'No supervisor on duty';
}

/**
 * The words beside the state: who is on the machine and since when, why it is tagged out, or when
 * it is reserved next. `time` writes an instant on the shop's clock.
 */
export function machineStateDetail(machine: BoardMachine, time: (iso: string) => string): string {
  const next = machine.nextReservationAt ? time(machine.nextReservationAt) : null;
  switch (machine.state) {
    case 'in_use': {
      const who = machine.member ? shortName(machine.member) : 'A member';
      return machine.startedAt ? `${who}, since ${time(machine.startedAt)}` : who;
    }
    case 'tagged_out':
      return machine.tagOut ? `${machine.tagOut.reason} (since ${time(machine.tagOut.since)})` : '';
    case 'offline':
      return 'The station is not reporting';
    case 'reserved':
      return next ? `From ${next}` : '';
    case 'available':
      return next ? `Next reservation ${next}` : '';
  }
}

/** Every machine's board entry by its id, for the shop floor's nameplates. */
export function statesById(areas: readonly { machines: readonly BoardMachine[] }[]): Map<string, BoardMachine> {
  return new Map(areas.flatMap((area) => area.machines.map((machine) => [machine.id, machine] as const)));
}
