import type { StationSelf } from '@chuckkey/core';
import { useCallback, useState } from 'react';
import { useLookupMember } from '../api/lookup-member';
import { useHeartbeat } from '../hooks/use-heartbeat';
import { useStationLost } from '../hooks/use-station-lost';
import { stationMessage } from '../utils/messages';
import { BadgeOutcome } from './badge-outcome';
import { BadgeReader } from './badge-reader';
import { InstructorMenu } from './instructor-menu';
import { SignOffFlow, type ScannedInstructor } from './sign-off-flow';
import { StationHeader } from './station-header';

type Screen =
  | { name: 'idle' }
  | { name: 'member'; firstName: string }
  | { name: 'refused'; reason: 'unknown_badge' | 'member_inactive' }
  | { name: 'instructor-menu'; instructor: ScannedInstructor }
  | { name: 'sign-off'; instructor: ScannedInstructor };

/** A paired station: idle, then whatever the scanned badge opens. */
export function StationScreens({ station, timeZone }: { station: StationSelf; timeZone: string }) {
  const [screen, setScreen] = useState<Screen>({ name: 'idle' });
  const [message, setMessage] = useState<string | null>(null);
  const lookup = useLookupMember();
  useHeartbeat();
  useStationLost();

  const toIdle = useCallback(() => setScreen({ name: 'idle' }), []);

  const scan = (badge: string) => {
    setMessage(null);
    lookup.mutate(badge, {
      onSuccess: (answer) => {
        if (!answer.member) setScreen({ name: 'refused', reason: answer.reason });
        else if (answer.member.role === 'instructor' || answer.member.role === 'admin') {
          setScreen({ name: 'instructor-menu', instructor: { badge, id: answer.member.id, firstName: answer.member.firstName } });
        } else setScreen({ name: 'member', firstName: answer.member.firstName });
      },
      onError: (error) => setMessage(stationMessage(error)),
    });
  };

  return (
    <>
      <StationHeader station={station} compact={screen.name !== 'idle'} />
      <main className="flex flex-1 flex-col items-center justify-center gap-6 px-8 py-6">
        {screen.name === 'idle' ? (
          <BadgeReader prompt="Hold your badge to the camera or scan it" onBadge={scan} busy={lookup.isPending} message={message} />
        ) : null}
        {screen.name === 'member' ? <BadgeOutcome kind="member" firstName={screen.firstName} onDone={toIdle} /> : null}
        {screen.name === 'refused' ? <BadgeOutcome kind={screen.reason} onDone={toIdle} /> : null}
        {screen.name === 'instructor-menu' ? (
          <InstructorMenu
            firstName={screen.instructor.firstName}
            onSignOff={() => setScreen({ name: 'sign-off', instructor: screen.instructor })}
            onDone={toIdle}
          />
        ) : null}
        {screen.name === 'sign-off' ? (
          <SignOffFlow instructor={screen.instructor} machineId={station.machine?.id ?? null} timeZone={timeZone} onExit={toIdle} />
        ) : null}
      </main>
    </>
  );
}
