import {
  hoursOnDate,
  lastInitial,
  machineBoardState,
  shopDate,
  shopHoursAt,
  type Board,
  type BoardMachine,
  type BoardState,
} from '@chuckkey/core';
import type { Db } from '../../lib/db';
import { boardRepository, type MachineTileRow } from './board.repository';

const iso = (value: string | null) => (value === null ? null : new Date(value).toISOString());

function stateOf(row: MachineTileRow, now: Date): BoardState {
  return machineBoardState(
    {
      tagOut: row.tagOut,
      sessionRunning: row.session !== null,
      stations: row.stations,
      lastHeardAt: row.lastHeardAt === null ? null : new Date(row.lastHeardAt),
      nextReservation: row.nextReservation && {
        startsAt: new Date(row.nextReservation.startsAt),
        endsAt: new Date(row.nextReservation.endsAt),
        checkInMinutes: row.nextReservation.checkInMinutes,
      },
    },
    now,
  );
}

/**
 * The board is public, so a tile names the member by first name and last initial and carries no
 * id, e-mail or badge; a reservation shows as its start alone, never whose it is.
 */
function toTile(row: MachineTileRow, now: Date): BoardMachine {
  return {
    id: row.id,
    name: row.name,
    category: row.category,
    state: stateOf(row, now),
    member: row.session ? { firstName: row.session.firstName, lastInitial: lastInitial(row.session.lastName) } : null,
    startedAt: row.session ? iso(row.session.startedAt) : null,
    nextReservationAt: row.nextReservation ? iso(row.nextReservation.startsAt) : null,
    tagOut: row.tagOut ? { reason: row.tagOut.reason, since: new Date(row.tagOut.since).toISOString() } : null,
  };
}

/** What the wall board shows, and the state of one machine as the board would show it. */
export function boardService({ db }: { db: Db }) {
  const board = boardRepository(db);
  return {
    async board(now: Date): Promise<Board> {
      const row = await board.board();
      const shop = row.shop ?? { name: '', timeZone: 'UTC' };
      const today = shopDate(now, shop.timeZone);
      const day = hoursOnDate(row.weeklyHours, row.closures, shop.timeZone, today);
      return {
        shop,
        generatedAt: now.toISOString(),
        today: {
          date: today,
          open: shopHoursAt(row.weeklyHours, row.closures, shop.timeZone, now).open,
          intervals: day.intervals,
          closure: day.closure,
        },
        supervisorOnDuty: row.supervisor ? { firstName: row.supervisor.firstName, lastInitial: lastInitial(row.supervisor.lastName) } : null,
        areas: row.areas.map((area) => ({ id: area.id, name: area.name, machines: area.machines.map((machine) => toTile(machine, now)) })),
        classes: row.classes.map((meeting) => ({
          id: meeting.id,
          classId: meeting.classId,
          name: meeting.title,
          startsAt: new Date(meeting.startsAt).toISOString(),
          machineName: meeting.machineName,
        })),
      };
    },

    /** By the same rule as the board's tiles; undefined when the machine no longer exists. */
    async machineState(machineId: string, now: Date): Promise<BoardState | undefined> {
      const row = await board.machine(machineId);
      return row ? stateOf(row, now) : undefined;
    },
  };
}
export type BoardService = ReturnType<typeof boardService>;
