import type { Deps } from '../../lib/deps';
import { auditLog } from '../audit/audit.repository';
import { reservationMail } from './reservation-mail';
import { reservationsRepository } from './reservations.repository';

/** How often the job runs: each run announces what turned since the last one. */
export const RESERVATION_CLOCK_PERIOD_MS = 60_000;

/** The reminder goes out this long before a reservation starts. */
export const RESERVATION_REMINDER_LEAD_MS = 2 * 3_600_000;

/**
 * The reservations' clock, run by a job every minute with the time passed in (tests set it).
 * Suspension needs no run of its own: the booking rules count a member's recent no-shows.
 */
export function reservationJobsService(deps: Deps) {
  const { db, live, logger, mailer } = deps;
  const mail = reservationMail(deps);
  return {
    /** Frees the time of reservations not checked into within the grace, announces it, and tells each member. */
    async releaseNoShows(now: Date): Promise<string[]> {
      const released = await db.transaction(async (trx) => {
        const rows = await reservationsRepository(trx).releaseNoShows(now);
        for (const row of rows) {
          await auditLog(trx).record({
            actorId: null,
            action: 'reservation.no_show',
            entity: 'reservation',
            entityId: row.id,
            memberId: row.memberId,
            details: { machineId: row.machineId },
          });
        }
        return rows;
      });
      for (const machineId of new Set(released.map((row) => row.machineId))) live.machineChanged(machineId);
      for (const row of released) await mail.send('no_show', row.id, now);
      if (released.length) logger.info({ reservations: released.map((row) => row.id) }, 'reservations released as no-shows');
      return released.map((row) => row.id);
    },

    /**
     * Announces machines whose board state turns with the clock alone: a check-in window opened
     * (the machine shows reserved) or an active reservation ended, within the last `periodMs`.
     */
    async announceTurns(now: Date, periodMs = RESERVATION_CLOCK_PERIOD_MS): Promise<string[]> {
      const machines = await reservationsRepository(db).machinesTurning(new Date(now.getTime() - periodMs), now);
      for (const machineId of machines) live.machineChanged(machineId);
      return machines;
    },

    /**
     * Mails each member two hours before their reservation starts, once. The claim and the hand-off
     * to SMTP share a transaction: a failed send rolls the claim back for the next run, and a
     * second process waits on the row lock, then finds it taken.
     */
    async sendReminders(now: Date): Promise<string[]> {
      const due = await reservationsRepository(db).dueReminders(now, RESERVATION_REMINDER_LEAD_MS);
      const sent: string[] = [];
      for (const id of due) {
        try {
          const claimed = await db.transaction(async (trx) => {
            if (!(await reservationsRepository(trx).claimReminder(id, now))) return false;
            const reminder = await mail.compose('reminder', id, now);
            if (!reminder) return false;
            await mailer.send(reminder);
            return true;
          });
          if (claimed) sent.push(id);
        } catch (error) {
          logger.error({ err: error, reservationId: id }, 'reservation reminder not sent; the next run tries again');
        }
      }
      return sent;
    },
  };
}
