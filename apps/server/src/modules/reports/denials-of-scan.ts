import { signOffState, UNKNOWN_BADGE, type ClearanceDecision } from '@chuckkey/core';
import type { ScanFacts } from '../machine-sessions/machine-sessions.repository';
import type { Denial } from './denial-recorder';

/**
 * The rows a refused scan leaves: one per reason, or one unknown_badge when no member holds the
 * badge; none when the member is cleared. Rule 2 gives one reason per required training without a
 * valid sign-off, in the machine's order of its trainings, so those trainings name the reasons in turn.
 */
export function denialsOfScan(stationId: string, facts: ScanFacts, decision: ClearanceDecision | null, now: Date): Denial[] {
  const base = { at: now, stationId, machineId: facts.machine.id, memberId: facts.member?.id ?? null };
  if (!facts.member || !decision) return [{ ...base, memberId: null, code: UNKNOWN_BADGE, rule: null, trainingId: null }];
  if (decision.cleared) return [];
  const lacking = facts.requiredTrainings
    .filter((t) => !facts.signOffs.some((s) => s.trainingId === t.id && ['valid', 'expiring'].includes(signOffState(s, now))))
    .map((t) => t.id);
  let next = 0;
  return decision.reasons.map((reason) => ({
    ...base,
    code: reason.code,
    rule: reason.rule,
    trainingId: reason.rule === 2 ? (lacking[next++] ?? null) : null,
  }));
}
