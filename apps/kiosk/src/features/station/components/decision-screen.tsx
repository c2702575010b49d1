import type { StationScanResult } from '@chuckkey/core';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { useIdleReturn } from '@/hooks/use-idle-return';
import { RuleLadder } from './rule-ladder';

// screens.md: the answer to a badge returns to idle by itself after 20 seconds without a touch.
export const OUTCOME_IDLE_MS = 20_000;

/** The answer to a member's badge: who, the rule ladder, and what they can do next. */
export function DecisionScreen({
  answer,
  changed = false,
  checkIn,
  onContinue,
  onEndOwn,
  onDone,
}: {
  answer: StationScanResult;
  /** Shown again because the server refused to start after the safety check. */
  changed?: boolean;
  /** Offered when the member may check in for their reservation now; `done` once they have. */
  checkIn?: { onCheckIn: () => void; busy: boolean; done: boolean; message: string | null };
  onContinue: () => void;
  onEndOwn: () => void;
  onDone: () => void;
}) {
  useIdleReturn(OUTCOME_IDLE_MS, onDone);
  const [photoFailed, setPhotoFailed] = useState(false);
  const member = answer.member;

  if (!member) {
    return (
      <div role="status" className="flex max-w-4xl flex-col items-center gap-6 text-center">
        <Icon name="cross" className="size-20" />
        <h1 className="text-kiosk-title font-bold">We don’t know this badge</h1>
        {answer.reasons.map((reason) => (
          <div key={reason.code} className="flex flex-col gap-2">
            <h2 className="text-kiosk-lead">{reason.message}</h2>
            <p className="text-kiosk-lead font-bold text-balance">{reason.nextStep}</p>
          </div>
        ))}
        <p className="text-kiosk-body text-balance">A lost or reissued card no longer works: an admin can print a new one.</p>
        <Button onClick={onDone}>Done</Button>
      </div>
    );
  }

  const running = answer.runningSession;
  return (
    <div className="flex w-full max-w-6xl flex-col items-center gap-5">
      <div className="flex items-center gap-6">
        {member.photoToken && !photoFailed ? (
          <img
            src={`/api/station/members/${member.id}/photo?t=${encodeURIComponent(member.photoToken)}`}
            alt=""
            onError={() => setPhotoFailed(true)}
            className="size-28 rounded-xl border-4 border-ink-muted object-cover"
          />
        ) : (
          <Icon name="person" className="size-20" />
        )}
        <div className="flex flex-col gap-1">
          <h1 className="text-kiosk-title font-bold">Hello, {member.firstName}</h1>
          <p role="status" className="flex items-center gap-3 text-kiosk-lead font-bold">
            <Icon name={answer.cleared ? 'check' : 'cross'} className={`size-12 ${answer.cleared ? 'text-link-up' : 'text-link-down'}`} />
            {running?.own ? 'Your session is running' : answer.cleared ? 'Cleared to start' : 'Not cleared to start yet'}
          </p>
        </div>
      </div>

      {changed ? (
        <p role="alert" className="flex items-center gap-4 rounded-xl border-4 border-link-down px-6 py-3 text-kiosk-lead font-bold text-balance">
          <Icon name="warning" className="size-12 text-link-down" />
          <span>Something changed since your scan, so the session did not start. Here is the answer now.</span>
        </p>
      ) : null}

      {checkIn?.done ? (
        <p role="status" className="flex items-center gap-4 rounded-xl border-4 border-state-reserved px-6 py-3 text-kiosk-lead font-bold text-balance">
          <Icon name="check" className="size-12 text-state-reserved" />
          <span>You are checked in for your reservation. The machine is held for you.</span>
        </p>
      ) : null}
      {checkIn?.message ? (
        <p role="alert" className="flex items-center gap-4 rounded-xl border-4 border-link-down px-6 py-3 text-kiosk-lead text-balance">
          <Icon name="warning" className="size-12 text-link-down" />
          <span>{checkIn.message}</span>
        </p>
      ) : null}

      {running && !running.own ? (
        <p className="flex items-center gap-4 rounded-xl border-4 border-link-down px-6 py-3 text-kiosk-lead text-balance">
          <Icon name="chuck" className="size-12" />
          <span>
            {running.memberFirstName} is on this machine. Ending their session needs {running.memberFirstName} or a supervisor.
          </span>
        </p>
      ) : null}

      {/* The answer's buttons come before the ladder, so that they are in sight on a landscape screen. */}
      <div className="flex flex-wrap justify-center gap-4">
        {running?.own ? (
          <Button onClick={onEndOwn} className="min-h-24">
            End session
          </Button>
        ) : null}
        {answer.nextReservation?.canCheckIn && checkIn && !checkIn.done ? (
          <Button onClick={checkIn.onCheckIn} disabled={checkIn.busy} className="min-h-24 px-14">
            Check in for your reservation
          </Button>
        ) : null}
        {answer.cleared && !running ? (
          <Button onClick={onContinue} className="min-h-24 px-14">
            Continue to safety check
          </Button>
        ) : null}
        <Button variant={answer.cleared || running?.own ? 'quiet' : 'primary'} onClick={onDone}>
          {answer.cleared || running?.own ? 'Not now' : 'Done'}
        </Button>
      </div>
      {running?.own ? null : <RuleLadder rungs={answer.rungs} />}
    </div>
  );
}
