import type { StationDutyResult } from '@chuckkey/core';
import { useEffect, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { useSetDuty } from '../api/set-duty';
import { useIdleReturn } from '@/hooks/use-idle-return';
import { stationMessage } from '../utils/messages';
import { PinPad } from './pin-pad';

const DUTY_IDLE_MS = 60_000;
const DONE_SHOWN_MS = 8_000;

/** The instructor's PIN, then the server turns their duty on or off for the whole shop. */
export function DutyFlow({ badge, firstName, onChanged, onExit }: { badge: string; firstName: string; onChanged: () => void; onExit: () => void }) {
  useIdleReturn(DUTY_IDLE_MS, onExit);
  const duty = useSetDuty();
  const [result, setResult] = useState<StationDutyResult | null>(null);
  const [message, setMessage] = useState<string | null>(null);

  useEffect(() => {
    if (!result) return;
    const timer = setTimeout(onExit, DONE_SHOWN_MS);
    return () => clearTimeout(timer);
  }, [result, onExit]);

  if (result) {
    return (
      <div role="status" className="flex flex-col items-center gap-6 text-center">
        <Icon name={result.onDuty ? 'check' : 'person'} className="size-20" />
        <h1 className="text-kiosk-title font-bold">
          {result.onDuty ? `${result.supervisor.firstName}, you are on duty` : `${result.supervisor.firstName}, you are off duty`}
        </h1>
        <Button onClick={onExit}>Done</Button>
      </div>
    );
  }

  return (
    <div className="flex w-full max-w-5xl flex-col items-center gap-6">
      <div className="flex w-full items-start justify-between gap-4">
        <h1 className="text-kiosk-title font-bold">{firstName}, enter your PIN</h1>
        <Button variant="quiet" onClick={onExit}>
          <Icon name="cross" className="size-8" />
          Cancel
        </Button>
      </div>
      <PinPad
        label="Your PIN"
        disabled={duty.isPending}
        onSubmit={(pin) => {
          setMessage(null);
          duty.mutate(
            { badge, pin },
            {
              onSuccess: (answer) => {
                setResult(answer);
                onChanged();
              },
              onError: (error) => setMessage(stationMessage(error)),
            },
          );
        }}
        aside={
          <>
            <p className="text-kiosk-lead text-balance text-center">Going on duty lets members with a supervised sign-off start.</p>
            {message ? (
              <p role="alert" className="flex items-center gap-4 text-kiosk-body font-bold text-link-down">
                <Icon name="warning" className="size-9" />
                {message}
              </p>
            ) : null}
          </>
        }
      />
    </div>
  );
}
