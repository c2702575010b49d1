import { randomUUID } from 'node:crypto';
import type { StationTagOut, StationTagOutResult } from '@chuckkey/core';
import type { Deps } from '../../lib/deps';
import { AppError, badRequest } from '../../lib/errors';
import { badgesService } from '../badges/badges.service';
import { machineSessionsService, notAMachineStation } from '../machine-sessions/machine-sessions.service';
import type { StationRecord } from '../stations/stations.repository';
import { tagOutsRepository } from '../tag-outs/tag-outs.repository';
import { tagOutsService } from '../tag-outs/tag-outs.service';

const badgeNeeded = () =>
  badRequest('badge_required', 'Scan your badge to report a problem: the report says who found it.', { badge: ['Scan your badge.'] });

/**
 * "Report a problem" at a machine's station. The machine is tagged out at once, as from the web
 * app (the admins are mailed by the same service). A session running on it is ended as by its
 * member: the station has told them to stop the machine safely, and a machine out of service
 * must not keep counting hours or holding a reservation for someone who cannot use it.
 */
export function stationTagOutService(deps: Deps) {
  const badges = badgesService(deps);
  const tagOuts = tagOutsService(deps);
  const sessions = machineSessionsService(deps);

  return {
    async report(station: StationRecord, input: StationTagOut, now: Date): Promise<StationTagOutResult> {
      if (station.kind !== 'machine' || !station.machineId) throw notAMachineStation();
      const machineId = station.machineId;
      const running = await tagOutsRepository(deps.db).runningSession(machineId);

      let reporterId: string;
      if (input.badge) {
        const holder = await badges.findMemberByCode(input.badge);
        if (!holder) throw new AppError(401, 'unknown_badge', 'This badge is not known here. Scan it again, or ask an admin for a new card.');
        if (!holder.active) throw new AppError(403, 'member_inactive', 'This membership is not active. Tell an instructor or an admin about the problem.');
        reporterId = holder.id;
      } else if (running) {
        reporterId = running.memberId;
      } else {
        throw badgeNeeded();
      }

      const tagOut = await tagOuts.tagOut({ id: reporterId }, machineId, input.reason);
      if (!running) return { tagOut, endedSessionId: null };
      try {
        await sessions.end(station, running.id, { idempotencyKey: randomUUID() }, now);
      } catch (error) {
        // The member may have pressed End in the same moment; the session is over either way.
        if (!(error instanceof AppError && error.code === 'already_ended')) throw error;
      }
      return { tagOut, endedSessionId: running.id };
    },
  };
}
