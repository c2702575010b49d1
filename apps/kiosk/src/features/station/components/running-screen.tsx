import { useState, type ReactNode } from 'react';
import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { TimeBar, type TimeBarItem } from '@/components/ui/time-bar';
import { useNow } from '@/hooks/use-now';
import { describeElapsed, formatElapsed } from '@/lib/elapsed';
import { BadgeReader } from './badge-reader';

/** A session runs: the time so far in digits readable across the shop, and the way to end it. */
export function RunningScreen({
  firstName,
  startedAt,
  onEnd,
  onReport,
  ending,
  onBadge,
  scanning,
  message,
  warning,
  reservedToday,
  nextReservationLine,
  timeZone,
}: {
  firstName: string;
  startedAt: string;
  onEnd: () => void;
  /** "Report a problem": the member tags the machine out, which ends the session. */
  onReport: () => void;
  ending: boolean;
  onBadge: (code: string) => void;
  scanning: boolean;
  message: ReactNode;
  /** Someone else's reservation is near: the session runs on, and the member is asked to finish. */
  warning: string | null;
  /** Today's reservations on the machine, for the day's time bar beside this session. */
  reservedToday: readonly TimeBarItem[];
  /** The next reservation in words ("Next reservation: Ines, 14:00–16:00"), or null when there is none. */
  nextReservationLine: string | null;
  timeZone: string;
}) {
  const now = useNow();
  const [confirming, setConfirming] = useState(false);
  const elapsed = now - new Date(startedAt).getTime();

  return (
    <div className="flex w-full max-w-5xl flex-col items-center gap-6 text-center">
      {warning ? (
        <p role="alert" className="flex w-full items-center justify-center gap-4 rounded-xl bg-state-reserved px-6 py-4 text-kiosk-lead font-bold text-white text-balance">
          <Icon name="hourglass" className="size-12 shrink-0" />
          <span>{warning}</span>
        </p>
      ) : null}
      <p className="flex items-center gap-4 text-kiosk-lead font-bold">
        <Icon name="chuck" className="size-12" />
        {firstName} is on this machine
      </p>
      <p className="font-mono text-[clamp(5rem,14vw,10rem)] leading-none font-bold tabular-nums" aria-hidden="true">
        {formatElapsed(elapsed)}
      </p>
      <p className="sr-only">Running for {describeElapsed(elapsed)}</p>
      <TimeBar
        size="full"
        label="Today on this machine"
        items={[{ startsAt: startedAt, endsAt: new Date(now).toISOString(), kind: 'session', who: firstName }, ...reservedToday]}
        now={new Date(now)}
        timeZone={timeZone}
        caption={
          <>
            <Icon name="hourglass" className="size-9" />
            {nextReservationLine ?? 'No reservation ahead on this machine'}
          </>
        }
      />
      {confirming ? (
        <div role="dialog" aria-label="End the session?" className="flex flex-col items-center gap-4">
          <p className="text-kiosk-lead font-bold">End {firstName}’s session now?</p>
          <div className="flex flex-wrap justify-center gap-4">
            <Button onClick={onEnd} disabled={ending} className="min-h-24">
              Yes, end the session
            </Button>
            <Button variant="quiet" onClick={() => setConfirming(false)} className="min-h-24">
              Keep running
            </Button>
          </div>
        </div>
      ) : (
        <div className="flex flex-wrap justify-center gap-4">
          <Button onClick={() => setConfirming(true)} className="min-h-24 px-16">
            End session
          </Button>
          <Button variant="quiet" onClick={onReport} className="min-h-24">
            <Icon name="warning" className="size-10" />
            Report a problem
          </Button>
        </div>
      )}
      <BadgeReader prompt="Someone else? Scan a badge" onBadge={onBadge} busy={scanning} message={message} camera={false} />
    </div>
  );
}
