import { checkInOpen, type ReservationCheckedIn } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { AppError, conflict, notFound } from '../../lib/errors';
import { badgesService } from '../badges/badges.service';
import { machineNotFound, notAMachineStation } from '../machine-sessions/machine-sessions.service';
import type { StationRecord } from '../stations/stations.repository';

interface LockedReservation {
  id: string;
  machineId: string;
  memberId: string;
  startsAt: Date;
  status: string;
  checkInMinutes: number;
  noShowGraceMinutes: number;
}

const reservationNotFound = () => notFound('reservation_not_found', 'There is no such reservation on this machine.');

/**
 * The holder claims their reservation at the machine's own station by scanning their badge. From
 * then on the reservation is checked in: the no-show release passes it by, and rule 6 keeps
 * walk-ups off the machine until it starts.
 */
export function reservationCheckInService(deps: Deps) {
  const { db, live } = deps;
  const badges = badgesService(deps);

  return {
    async checkIn(station: StationRecord, reservationId: string, badge: string, now: Date): Promise<ReservationCheckedIn> {
      if (station.kind !== 'machine') throw notAMachineStation();
      if (!station.machineId) throw machineNotFound();
      const machineId = station.machineId;
      const holder = await badges.findMemberByCode(badge);
      const changed = await db.transaction(async (trx) => {
        // Locked, so a check-in and the no-show release of the same reservation run one after the other.
        const reservation = (await trx('reservations as r')
          .join('machines as m', 'm.id', 'r.machine_id')
          .first({
            id: 'r.id',
            machineId: 'r.machine_id',
            memberId: 'r.member_id',
            startsAt: 'r.starts_at',
            status: 'r.status',
            checkInMinutes: 'm.check_in_minutes',
            noShowGraceMinutes: 'm.no_show_grace_minutes',
          })
          .where('r.id', reservationId)
          .forUpdate('r')) as LockedReservation | undefined;
        // A reservation on another machine is not this station's to speak of.
        if (!reservation || reservation.machineId !== machineId || reservation.status === 'cancelled') throw reservationNotFound();
        if (!holder || holder.id !== reservation.memberId) {
          throw new AppError(403, 'not_yours', 'Only the member who holds this reservation can check in for it, with their own badge.');
        }
        if (reservation.status === 'checked_in') return false;
        if (reservation.status !== 'active' || !checkInOpen(reservation.startsAt, now, reservation)) {
          throw conflict(
            'not_in_window',
            `Check-in is open from ${reservation.checkInMinutes} minutes before the reservation starts until ${reservation.noShowGraceMinutes} minutes after.`,
          );
        }
        await trx('reservations').where({ id: reservation.id }).update({ status: 'checked_in', checked_in_at: now });
        return true;
      });
      // A second check-in with the same badge changed nothing, so there is nothing to announce.
      if (changed) live.machineChanged(machineId);
      return { id: reservationId, status: 'checked_in' };
    },
  };
}
