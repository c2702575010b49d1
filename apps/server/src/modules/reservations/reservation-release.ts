import type { Db } from '../../lib/db';
import { auditLog } from '../audit/audit.repository';
import { reservationsRepository, type ReservationRecord } from './reservations.repository';

/** How the holder gave the time back: by ending their session at the station, or from the web app. */
export type ReleaseVia = 'session_end' | 'web';

/**
 * Marks a checked-in reservation released at `at` and records who did it; call inside the
 * transaction that locked it. The exclusion constraint covers only active and checked-in claims, so
 * from the commit on the rest of the slot can be reserved or walked up to.
 */
export async function releaseReservation(trx: Db, reservation: ReservationRecord, actorId: string, at: Date, via: ReleaseVia): Promise<ReservationRecord> {
  const row = await reservationsRepository(trx).release(reservation.id, at);
  await auditLog(trx).record({
    actorId,
    action: 'reservation.released',
    entity: 'reservation',
    entityId: row.id,
    memberId: row.memberId,
    details: { machineId: row.machineId, start: row.startsAt.toISOString(), end: row.endsAt.toISOString(), releasedAt: at.toISOString(), via },
  });
  return row;
}
