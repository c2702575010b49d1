import { Button } from '@/components/ui/button';
import { Icon } from '@/components/ui/icon';
import { useIdleReturn } from '../hooks/use-idle-return';

const MENU_IDLE_MS = 60_000;

/** What an instructor or admin can do at the station; more arrives as it is built. */
export function InstructorMenu({ firstName, onSignOff, onDone }: { firstName: string; onSignOff: () => void; onDone: () => void }) {
  useIdleReturn(MENU_IDLE_MS, onDone);
  return (
    <div className="flex w-full max-w-3xl flex-col items-center gap-10 text-center">
      <div className="flex items-center gap-5">
        <Icon name="wrench" className="size-14" />
        <h1 className="text-kiosk-title font-bold">Instructor menu</h1>
      </div>
      <p className="text-kiosk-lead">Hello, {firstName}.</p>
      <Button onClick={onSignOff} className="w-full min-h-28">
        <Icon name="check" className="size-12" />
        Sign off a member
      </Button>
      <Button variant="quiet" onClick={onDone}>
        Done
      </Button>
    </div>
  );
}
