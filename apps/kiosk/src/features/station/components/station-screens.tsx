import type { SessionStarted, StationScanResult, StationSelf, StationTagOutResult } from '@chuckkey/core';
import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { TimeBar, type TimeBarItem } from '@/components/ui/time-bar';
import { useNow } from '@/hooks/use-now';
import { isApiError } from '@/lib/api-client';
import { formatElapsed } from '@/lib/elapsed';
import { stationStateKey, useStationState } from '../api/get-station-state';
import { useCheckInReservation } from '../api/check-in-reservation';
import { useScanBadge } from '../api/scan-badge';
import { useEndQueue } from '../hooks/use-end-queue';
import { useHeartbeat } from '../hooks/use-heartbeat';
import { useIdleReturn } from '@/hooks/use-idle-return';
import { useStationLost } from '../hooks/use-station-lost';
import { ReportProblem } from '../../tag-out/components/report-problem';
import { stationMessage } from '../utils/messages';
import { reservationLine, reservationWarning } from '../utils/reservation-text';
import { BadgeReader } from './badge-reader';
import { DecisionScreen } from './decision-screen';
import { DutyFlow } from './duty-flow';
import { InstructorMenu } from './instructor-menu';
import { RunningScreen } from './running-screen';
import { SafetyCheck } from './safety-check';
import { SignOffFlow, type ScannedInstructor } from './sign-off-flow';
import { StationHeader } from './station-header';

type Screen =
  | { name: 'idle' }
  | { name: 'decision'; badge: string; answer: StationScanResult; changed?: boolean; checkedIn?: boolean }
  | { name: 'instructor-menu'; instructor: ScannedInstructor; answer: StationScanResult }
  | { name: 'duty'; instructor: ScannedInstructor }
  | { name: 'sign-off'; instructor: ScannedInstructor }
  | { name: 'safety'; badge: string; answer: StationScanResult }
  | { name: 'report'; reporter: { badge: string } | 'running' | 'scan' }
  | { name: 'ended'; text: string };

interface Running {
  id: string;
  memberFirstName: string;
  startedAt: string;
}

/** A session this screen started, and when (station clock), until the next state answer knows it. */
type Started = Running & { at: number };

/** A tag-out this screen reported, and when (station clock), until the next state answer knows it. */
interface Reported {
  reason: string;
  at: number;
}

const ENDED_SHOWN_MS = 10_000;
const KEPT_OFFLINE = 'Ending is saved on this station and will be sent when the server is back.';

function scanMessage(error: unknown): string {
  if (isApiError(error, 429)) return 'Too many scans in a minute. Wait a moment, then scan again.';
  return stationMessage(error);
}

/** A paired station: idle or running, then whatever the scanned badge opens. */
export function StationScreens({ station, timeZone }: { station: StationSelf; timeZone: string }) {
  const queryClient = useQueryClient();
  const [screen, setScreen] = useState<Screen>({ name: 'idle' });
  const [message, setMessage] = useState<string | null>(null);
  const [started, setStarted] = useState<Started | null>(null);
  const [endedIds, setEndedIds] = useState<ReadonlySet<string>>(new Set());
  const [ending, setEnding] = useState(false);
  const [reported, setReported] = useState<Reported | null>(null);
  const scanner = useScanBadge();
  const checkIn = useCheckInReservation();
  // Once a minute is enough for the reservation lines; the running clock keeps its own second tick.
  const now = useNow(30_000);
  const state = useStationState(station.kind === 'machine');
  const { pending, end } = useEndQueue();
  useHeartbeat();
  useStationLost();

  const toIdle = useCallback(() => setScreen({ name: 'idle' }), []);

  // What the server says runs here, or the session just started before the next refresh; an end
  // already pressed on this station (sent or kept) is over for the screen.
  const candidate: Running | null =
    state.data?.runningSession ?? (started && (!state.data || state.dataUpdatedAt < started.at) ? started : null);
  const gone = (id: string) => endedIds.has(id) || pending.some((kept) => kept.sessionId === id);
  const running = candidate && !gone(candidate.id) ? candidate : null;

  /** `changed`: the server refused a start after this badge was cleared, so the answer is asked again. */
  const scan = (badge: string, changed = false) => {
    setMessage(null);
    checkIn.reset();
    scanner.mutate(badge, {
      onSuccess: (answer) => {
        if (answer.member && answer.canSupervise && !changed) {
          setScreen({ name: 'instructor-menu', instructor: { badge, id: answer.member.id, firstName: answer.member.firstName }, answer });
        } else setScreen({ name: 'decision', badge, answer, changed });
      },
      onError: (error) => {
        setScreen({ name: 'idle' });
        setMessage(scanMessage(error));
      },
    });
  };

  const onStarted = (session: SessionStarted) => {
    setStarted({ id: session.id, memberFirstName: session.member.firstName, startedAt: session.startedAt, at: Date.now() });
    void queryClient.invalidateQueries({ queryKey: stationStateKey() });
    setScreen({ name: 'idle' });
  };

  const endSession = async (sessionId: string, badge?: string) => {
    setEnding(true);
    setMessage(null);
    try {
      const outcome = await end(sessionId, badge);
      if (outcome.kind === 'refused') {
        setMessage(stationMessage(outcome.error));
        setScreen({ name: 'idle' });
        return;
      }
      setEndedIds((current) => new Set([...current, sessionId]));
      setStarted(null);
      setScreen({
        name: 'ended',
        text:
          outcome.kind === 'ended'
            ? `Session ended after ${formatElapsed(new Date(outcome.ended.endedAt).getTime() - new Date(outcome.ended.startedAt).getTime())}.`
            : KEPT_OFFLINE,
      });
    } finally {
      setEnding(false);
    }
  };

  const supervisorOnDuty = state.data?.supervisorOnDuty?.firstName ?? null;
  const nextReservation = state.data?.nextReservation ?? null;
  const reservedToday: TimeBarItem[] = (state.data?.today ?? []).map((r) => ({ startsAt: r.startsAt, endsAt: r.endsAt, kind: r.kind, who: r.memberFirstName }));
  const idle = screen.name === 'idle' && !running;
  const taggedOut =
    state.data && (!reported || state.dataUpdatedAt >= reported.at) ? (state.data.taggedOut ?? null) : reported ? { reason: reported.reason } : null;

  const onReported = (result: StationTagOutResult) => {
    setReported({ reason: result.tagOut.reason, at: Date.now() });
    const endedId = result.endedSessionId;
    if (endedId) {
      setEndedIds((current) => new Set([...current, endedId]));
      setStarted(null);
    }
    setMessage(null);
    setScreen({ name: 'idle' });
  };

  const checkInFor = (badge: string, answer: StationScanResult) => {
    const reservation = answer.nextReservation;
    if (!reservation) return;
    checkIn.reset();
    checkIn.mutate(
      { reservationId: reservation.id, badge },
      {
        onSuccess: () => {
          void queryClient.invalidateQueries({ queryKey: stationStateKey() });
          setScreen({ name: 'decision', badge, answer: { ...answer, nextReservation: { ...reservation, canCheckIn: false } }, checkedIn: true });
        },
      },
    );
  };

  return (
    <>
      <StationHeader station={station} compact={screen.name !== 'idle'} inUse={Boolean(running)} taggedOut={taggedOut}>
        {idle && state.data ? (
          <TimeBar
            size="mini"
            label="Today on this machine"
            items={reservedToday}
            now={new Date(now)}
            timeZone={timeZone}
            caption={
              nextReservation ? (
                <>
                  <Icon name="hourglass" className="size-9" />
                  {reservationLine(nextReservation, new Date(now), timeZone)}
                </>
              ) : null
            }
          />
        ) : null}
      </StationHeader>
      <main className="flex flex-1 flex-col items-center justify-center gap-6 px-8 py-6">
        {screen.name === 'idle' && running ? (
          <RunningScreen
            firstName={running.memberFirstName}
            startedAt={running.startedAt}
            ending={ending}
            onEnd={() => void endSession(running.id)}
            onReport={() => setScreen({ name: 'report', reporter: 'running' })}
            onBadge={scan}
            scanning={scanner.isPending}
            message={message}
            warning={reservationWarning(nextReservation, state.data?.runningSession?.memberId ?? null, new Date(now), timeZone)}
            reservedToday={reservedToday}
            nextReservationLine={nextReservation ? reservationLine(nextReservation, new Date(now), timeZone) : null}
            timeZone={timeZone}
          />
        ) : null}
        {idle ? (
          <>
            {pending.length ? (
              <p role="status" className="flex items-center gap-4 rounded-lg border-2 border-link-down px-6 py-3 text-kiosk-body">
                <Icon name="hourglass" className="size-9" />
                {KEPT_OFFLINE}
              </p>
            ) : null}
            {taggedOut ? (
              <p role="status" className="flex max-w-4xl items-center gap-4 text-center text-kiosk-lead font-bold text-balance">
                <Icon name="padlock" className="size-12 shrink-0" />
                {/* A reason typed with its own full stop keeps one. */}
                Tagged out: {taggedOut.reason.replace(/[.!]+$/, '')}. An admin, or the instructor who tagged it, clears it once it is safe.
              </p>
            ) : null}
            <BadgeReader prompt="Hold your badge to the camera or scan it" onBadge={scan} busy={scanner.isPending} message={message} />
            {state.data && !taggedOut ? (
              <Button variant="quiet" onClick={() => setScreen({ name: 'report', reporter: 'scan' })}>
                <Icon name="warning" className="size-9" />
                Report a problem
              </Button>
            ) : null}
            {state.data ? (
              <p className="flex items-center gap-3 text-kiosk-body">
                <Icon name="person" className="size-9" />
                {supervisorOnDuty ? `Supervisor on duty: ${supervisorOnDuty}` : 'No supervisor on duty'}
              </p>
            ) : null}
          </>
        ) : null}
        {screen.name === 'decision' ? (
          <DecisionScreen
            answer={screen.answer}
            changed={screen.changed ?? false}
            checkIn={{
              onCheckIn: () => checkInFor(screen.badge, screen.answer),
              busy: checkIn.isPending,
              done: screen.checkedIn ?? false,
              message: checkIn.error ? stationMessage(checkIn.error) : null,
            }}
            onContinue={() => setScreen({ name: 'safety', badge: screen.badge, answer: screen.answer })}
            onEndOwn={() => {
              if (screen.answer.runningSession) void endSession(screen.answer.runningSession.id, screen.badge);
            }}
            onDone={toIdle}
          />
        ) : null}
        {screen.name === 'instructor-menu' ? (
          <InstructorMenu
            firstName={screen.instructor.firstName}
            supervisorOnDuty={supervisorOnDuty}
            onDuty={() => setScreen({ name: 'duty', instructor: screen.instructor })}
            onSignOff={() => setScreen({ name: 'sign-off', instructor: screen.instructor })}
            onTagOut={taggedOut ? undefined : () => setScreen({ name: 'report', reporter: { badge: screen.instructor.badge } })}
            onContinue={
              screen.answer.cleared && !screen.answer.runningSession
                ? () => setScreen({ name: 'safety', badge: screen.instructor.badge, answer: screen.answer })
                : undefined
            }
            endSession={
              screen.answer.runningSession
                ? {
                    label: screen.answer.runningSession.own ? 'End my session' : `End ${screen.answer.runningSession.memberFirstName}’s session`,
                    onEnd: () => {
                      if (screen.answer.runningSession) void endSession(screen.answer.runningSession.id, screen.instructor.badge);
                    },
                  }
                : undefined
            }
            onDone={toIdle}
          />
        ) : null}
        {screen.name === 'duty' ? (
          <DutyFlow
            badge={screen.instructor.badge}
            firstName={screen.instructor.firstName}
            onChanged={() => void queryClient.invalidateQueries({ queryKey: stationStateKey() })}
            onExit={toIdle}
          />
        ) : null}
        {screen.name === 'sign-off' ? (
          <SignOffFlow instructor={screen.instructor} machineId={station.machine?.id ?? null} timeZone={timeZone} onExit={toIdle} />
        ) : null}
        {screen.name === 'safety' && screen.answer.member ? (
          <SafetyCheck
            badge={screen.badge}
            firstName={screen.answer.member.firstName}
            category={station.machine?.category ?? state.data?.machine.category ?? ''}
            checklist={screen.answer.safetyChecklist}
            requiresPin={screen.answer.requiresPin}
            onStarted={onStarted}
            onRefused={() => scan(screen.badge, true)}
            onCancel={toIdle}
          />
        ) : null}
        {screen.name === 'report' ? (
          <ReportProblem reporter={screen.reporter} sessionRunning={Boolean(running)} onReported={onReported} onCancel={toIdle} />
        ) : null}
        {screen.name === 'ended' ? <Ended text={screen.text} onDone={toIdle} /> : null}
      </main>
    </>
  );
}

function Ended({ text, onDone }: { text: string; onDone: () => void }) {
  useIdleReturn(ENDED_SHOWN_MS, onDone);
  return (
    <div role="status" className="flex flex-col items-center gap-6 text-center">
      <Icon name="check" className="size-20" />
      <h1 className="text-kiosk-title font-bold">{text}</h1>
      <Button onClick={onDone}>Done</Button>
    </div>
  );
}
