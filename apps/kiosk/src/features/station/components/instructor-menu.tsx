import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { useIdleReturn } from '@/hooks/use-idle-return';

const MENU_IDLE_MS = 60_000;

/** What an instructor or admin can do at the station. */
export function InstructorMenu({
  firstName,
  supervisorOnDuty,
  onDuty,
  onSignOff,
  onTagOut,
  onContinue,
  endSession,
  onDone,
}: {
  firstName: string;
  supervisorOnDuty?: string | null | undefined;
  onDuty: () => void;
  onSignOff: () => void;
  /** Offered while the machine is not tagged out already. */
  onTagOut?: (() => void) | undefined;
  /** Offered when the instructor is cleared to use this machine themselves. */
  onContinue?: (() => void) | undefined;
  /** A running session the instructor may end as a supervisor (or their own). */
  endSession?: { label: string; onEnd: () => void } | undefined;
  onDone: () => void;
}) {
  useIdleReturn(MENU_IDLE_MS, onDone);
  return (
    <div className="flex w-full max-w-3xl flex-col items-center gap-6 text-center">
      <div className="flex items-center gap-5">
        <Icon name="wrench" className="size-14" />
        <h1 className="text-kiosk-title font-bold">Instructor menu</h1>
      </div>
      <p className="text-kiosk-lead">Hello, {firstName}.</p>
      <p className="text-kiosk-body">{supervisorOnDuty ? `On duty now: ${supervisorOnDuty}` : 'No supervisor is on duty now.'}</p>
      <div className="grid w-full gap-4 landscape:grid-cols-2">
        <Button onClick={onDuty} className="min-h-24 w-full">
          <Icon name="person" className="size-10" />
          Go on duty / Go off duty
        </Button>
        <Button onClick={onSignOff} className="min-h-24 w-full">
          <Icon name="check" className="size-10" />
          Sign off a member
        </Button>
        {onTagOut ? (
          <Button onClick={onTagOut} className="min-h-24 w-full">
            <Icon name="padlock" className="size-10" />
            Tag out this machine
          </Button>
        ) : null}
        {onContinue ? (
          <Button onClick={onContinue} className="min-h-24 w-full">
            <Icon name="chuck" className="size-10" />
            Continue to safety check
          </Button>
        ) : null}
        {endSession ? (
          <Button onClick={endSession.onEnd} className="min-h-24 w-full">
            <Icon name="cross" className="size-10" />
            {endSession.label}
          </Button>
        ) : null}
      </div>
      <Button variant="quiet" onClick={onDone}>
        Done
      </Button>
    </div>
  );
}
